import { cardTokenParamSchema } from '#shared/schemas/welder-card'
import { publicCard } from '../../database/welder-cards'

/**
 * GET /api/cards/:token: public, no sign-in. What the welder behind an ID card's QR code is qualified and current for
 * today: name, stamp, and per process the positions, thickness and lapse date. Off, renewed or unknown: 404.
 */
export default defineEventHandler(async (event) => {
  const { token } = await validParams(event, cardTokenParamSchema)
  const card = orThrow(await publicCard(await useDb(), token, todayIso()))
  setResponseHeader(event, 'cache-control', 'no-store')
  return card
})
