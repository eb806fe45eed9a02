import { idParamSchema } from '#shared/schemas/list'
import { cardLinkSchema } from '#shared/schemas/welder-card'
import { setCardLink } from '../../../database/welder-cards'

/** POST /api/welders/:id/card-page: turn the public ID-card page on or off, or renew its address (quality manager) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const input = await validBody(event, cardLinkSchema)
  return orThrow(await setCardLink(await useDb(), user, id, input))
})
