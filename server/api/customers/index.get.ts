import { listCustomers } from '../../database/projects'

/** GET /api/customers: the customers and how many projects each has (quality manager) */
export default defineEventHandler(async (event) => {
  await requireRole(event, ['supervisor'])
  return listCustomers(await useDb())
})
