import { idParamSchema } from '#shared/schemas/list'
import { deleteCustomer } from '../../database/projects'

/** DELETE /api/customers/:id: only a customer without projects (quality manager) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  return orThrow(await deleteCustomer(await useDb(), id, user.id))
})
