import { trialListQuerySchema } from '#shared/schemas/trials'
import { listSeries } from '../../database/trials'

/** GET /api/trials: the trial series, newest worked-on first (supervisor, inspector; a welder when the shop allows) */
export default defineEventHandler(async (event) => {
  await requireTrialUser(event)
  const query = await validQuery(event, trialListQuerySchema)
  return listSeries(await useDb(), query)
})
