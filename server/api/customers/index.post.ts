import { customerSchema } from '#shared/schemas/project'
import { createCustomer } from '../../database/projects'
import { invalidField } from '../../sheets/errors'

/** POST /api/customers: a new customer (quality manager) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const body = await validBody(event, customerSchema)
  const result = await createCustomer(await useDb(), body, user.id)
  if ('error' in result) throw invalidField('name', 'A customer of this name exists already')
  setResponseStatus(event, 201)
  return result.row
})
