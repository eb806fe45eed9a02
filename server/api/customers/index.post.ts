import { customerSchema } from '#shared/schemas/project'
import { createCustomer } from '../../database/projects'

/** POST /api/customers: a new customer (quality manager) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const body = await validBody(event, customerSchema)
  const row = orThrow(await createCustomer(await useDb(), body, user.id))
  setResponseStatus(event, 201)
  return row
})
