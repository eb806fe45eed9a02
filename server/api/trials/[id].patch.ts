import { idParamSchema } from '#shared/schemas/list'
import { trialSeriesPatchSchema } from '#shared/schemas/trials'
import { updateSeries } from '../../database/trials'

/** PATCH /api/trials/:id: the series header as edited, with the version it was loaded at */
export default defineEventHandler(async (event) => {
  const user = await requireTrialUser(event)
  const { id } = await validParams(event, idParamSchema)
  const { version, series } = await validBody(event, trialSeriesPatchSchema)
  return orThrow(await updateSeries(await useDb(), user, id, version, series))
})
