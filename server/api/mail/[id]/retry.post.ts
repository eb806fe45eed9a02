import { idParamSchema } from '#shared/schemas/list'
import { retryMail } from '../../../database/mail'

/** POST /api/mail/:id/retry: queue a message that failed every attempt once more, and send it (supervisor) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  return orThrow(await retryMail(await useDb(), user, id))
})
