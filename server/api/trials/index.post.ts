import { trialSeriesSchema } from '#shared/schemas/trials'
import { createSeries } from '../../database/trials'

/** POST /api/trials: a new trial series (supervisor, inspector; a welder when the shop allows) */
export default defineEventHandler(async (event) => {
  const user = await requireTrialUser(event)
  const input = await validBody(event, trialSeriesSchema)
  setResponseStatus(event, 201)
  return createSeries(await useDb(), user, input)
})
