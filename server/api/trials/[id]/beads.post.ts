import { idParamSchema } from '#shared/schemas/list'
import { trialBeadSchema } from '#shared/schemas/trials'
import { addBead } from '../../../database/trials'

/** POST /api/trials/:id/beads: one more bead, numbered after the last */
export default defineEventHandler(async (event) => {
  const user = await requireTrialUser(event)
  const { id } = await validParams(event, idParamSchema)
  const bead = await validBody(event, trialBeadSchema)
  const row = orThrow(await addBead(await useDb(), user, id, bead))
  setResponseStatus(event, 201)
  return row
})
