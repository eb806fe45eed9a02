import { idParamSchema } from '#shared/schemas/list'
import { proposePqrSchema } from '#shared/schemas/trials'
import { proposePqrFromTrials } from '../../../database/trial-proposals'

/** POST /api/trials/:id/propose-pqr: a draft PQR at the values of the accepted region's middle bead (supervisor) */
export default defineEventHandler(async (event) => {
  const user = await requireTrialUser(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const input = await validBody(event, proposePqrSchema)
  const created = orThrow(await proposePqrFromTrials(await useDb(), user, id, input))
  setResponseStatus(event, 201)
  return created
})
