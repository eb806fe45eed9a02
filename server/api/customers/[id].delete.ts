import { idParamSchema } from '#shared/schemas/list'
import { deleteCustomer } from '../../database/projects'

/** DELETE /api/customers/:id: only a customer without projects (quality manager) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const result = await deleteCustomer(await useDb(), id, user.id)
  if ('ok' in result) return { ok: true }
  if (result.error === 'missing') throw notFound('Customer')
  throw conflict('This customer has projects; delete or move them first.')
})
