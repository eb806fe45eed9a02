import { welderRecordsTrials } from '../../database/trials'

/** GET /api/trials/settings: whether welders may record trials (staff) */
export default defineEventHandler(async (event) => {
  await requireRole(event, ['supervisor', 'inspector'])
  return { welderRecordsTrials: await welderRecordsTrials(await useDb()) }
})
