import { beadParamsSchema } from '#shared/schemas/trials'
import { removeBead } from '../../../../database/trials'

/** DELETE /api/trials/:id/beads/:beadId: a bead recorded by mistake (its photos removed first) */
export default defineEventHandler(async (event) => {
  const user = await requireTrialUser(event)
  const { id, beadId } = await validParams(event, beadParamsSchema)
  return orThrow(await removeBead(await useDb(), user, id, beadId))
})
