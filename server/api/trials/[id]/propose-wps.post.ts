import { idParamSchema } from '#shared/schemas/list'
import { proposeWpsSchema } from '#shared/schemas/trials'
import { proposeWpsFromTrials } from '../../../database/trial-proposals'

/** POST /api/trials/:id/propose-wps: a draft WPS window from the accepted region clipped to the certified PQR (supervisor) */
export default defineEventHandler(async (event) => {
  const user = await requireTrialUser(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const input = await validBody(event, proposeWpsSchema)
  const created = orThrow(await proposeWpsFromTrials(await useDb(), user, id, input))
  setResponseStatus(event, 201)
  return created
})
