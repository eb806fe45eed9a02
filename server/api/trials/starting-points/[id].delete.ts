import { idParamSchema } from '#shared/schemas/list'
import { removeStartingPoint } from '../../../database/trials'

/** DELETE /api/trials/starting-points/:id: a row of starting settings (supervisor) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  return orThrow(await removeStartingPoint(await useDb(), user, id))
})
