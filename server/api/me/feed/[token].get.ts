import { z } from 'zod'
import { calendarOf } from '../../../database/me'

const paramsSchema = z.object({ token: z.string().regex(/^[\w-]{20,64}(\.ics)?$/, 'Not a calendar address') })

/**
 * GET /api/me/feed/:token.ics: public by design (calendar apps cannot sign in): the secret in the address is the key.
 * An unknown or turned-off address is a 404.
 */
export default defineEventHandler(async (event) => {
  const { token } = await validParams(event, paramsSchema)
  const { welder, standings } = orThrow(await calendarOf(await useDb(), { token: token.replace(/\.ics$/, '') }, todayIso()))
  setResponseHeaders(event, { 'content-type': 'text/calendar; charset=utf-8', 'cache-control': 'private, max-age=3600' })
  return lapseCalendar(welder, standings)
})
