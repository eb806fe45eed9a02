import { idParamSchema } from '#shared/schemas/list'
import { signoffResolveSchema } from '#shared/schemas/signoff'
import { resolveSignoff } from '../../database/signoffs'

/** PATCH /api/signoffs/:id: the one asked marks it done, the asker withdraws it */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, staff)
  const { id } = await validParams(event, idParamSchema)
  const { status } = await validBody(event, signoffResolveSchema)
  const result = await resolveSignoff(await useDb(), user, id, status)
  if ('row' in result) return result.row
  if (result.problem === 'missing') throw notFound('Sign-off request')
  if (result.problem === 'role') throw createError({ statusCode: 403, statusMessage: status === 'withdrawn' ? 'Only the one who asked can withdraw it' : 'Only the one asked can mark it done' })
  throw conflict('This request is already closed.')
})
