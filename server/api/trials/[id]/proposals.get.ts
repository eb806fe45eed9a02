import { idParamSchema } from '#shared/schemas/list'
import { trialProposals } from '../../../database/trial-proposals'

/** GET /api/trials/:id/proposals: what "propose a PQR" and "propose the WPS window" would create, each value with its source */
export default defineEventHandler(async (event) => {
  await requireTrialUser(event, ['supervisor', 'inspector'])
  const { id } = await validParams(event, idParamSchema)
  return orThrow(await trialProposals(await useDb(), id))
})
