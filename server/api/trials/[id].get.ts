import { idParamSchema } from '#shared/schemas/list'
import { seriesDetail } from '../../database/trials'

/** GET /api/trials/:id: one series with its beads judged, heat inputs, plots and nearest starting row */
export default defineEventHandler(async (event) => {
  await requireTrialUser(event)
  const { id } = await validParams(event, idParamSchema)
  return orThrow(await seriesDetail(await useDb(), id))
})
