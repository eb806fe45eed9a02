import { startingRows } from '../../../database/trials'

/** GET /api/trials/starting-points: the shop's table of starting settings */
export default defineEventHandler(async (event) => {
  await requireTrialUser(event)
  return { items: await startingRows(await useDb()) }
})
