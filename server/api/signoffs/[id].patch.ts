import { idParamSchema } from '#shared/schemas/list'
import { signoffResolveSchema } from '#shared/schemas/signoff'
import { resolveSignoff } from '../../database/signoffs'

/** PATCH /api/signoffs/:id: the one asked marks it done, the asker withdraws it */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, staff)
  const { id } = await validParams(event, idParamSchema)
  const { status } = await validBody(event, signoffResolveSchema)
  return orThrow(await resolveSignoff(await useDb(), user, id, status))
})
