import { z } from 'zod'
import { idParamSchema } from '#shared/schemas/list'
import { customerSchema } from '#shared/schemas/project'
import { updateCustomer } from '../../database/projects'

const patchSchema = customerSchema.extend({ version: z.number({ required_error: 'version is required' }).int().positive() })

/** PATCH /api/customers/:id: rename a customer or change the contact (quality manager); a stale version is a 409 */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const body = await validBody(event, patchSchema)
  return orThrow(await updateCustomer(await useDb(), id, body, user.id))
})
