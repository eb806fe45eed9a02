import { z } from 'zod'
import { idParamSchema } from '#shared/schemas/list'
import { customerSchema } from '#shared/schemas/project'
import { updateCustomer } from '../../database/projects'
import { invalidField } from '../../sheets/errors'

const patchSchema = customerSchema.extend({ version: z.number({ required_error: 'version is required' }).int().positive() })

/** PATCH /api/customers/:id: rename a customer or change the contact (quality manager); a stale version is a 409 */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const body = await validBody(event, patchSchema)
  const result = await updateCustomer(await useDb(), id, body, user.id)
  if ('row' in result) return result.row
  if (result.error === 'missing') throw notFound('Customer')
  if (result.error === 'stale') throw conflict('Someone changed this customer since you opened it; reload and try again.')
  throw invalidField('name', 'A customer of this name exists already')
})
