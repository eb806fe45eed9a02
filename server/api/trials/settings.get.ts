import { welderRecordsTrials } from '../../database/trials'

/** GET /api/trials/settings: whether welders may record trials (staff, and welders, whose menu shows Trial runs by it) */
export default defineEventHandler(async (event) => {
  await requireRole(event, ['supervisor', 'inspector', 'welder'])
  return { welderRecordsTrials: await welderRecordsTrials(await useDb()) }
})
