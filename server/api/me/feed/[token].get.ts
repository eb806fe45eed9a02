import { z } from 'zod'
import { welderByCalendarToken } from '../../../database/me'

const paramsSchema = z.object({ token: z.string().regex(/^[\w-]{20,64}(\.ics)?$/, 'Not a calendar address') })

/**
 * GET /api/me/feed/:token.ics: public by design (calendar apps cannot sign in): the secret in the address is the key.
 * An unknown or turned-off address is a 404.
 */
export default defineEventHandler(async (event) => {
  const { token } = await validParams(event, paramsSchema)
  const db = await useDb()
  const welder = await welderByCalendarToken(db, token.replace(/\.ics$/, ''))
  if (!welder) throw httpError(missing('Calendar'))
  const standings = (await standingsOfWelders(db, [welder.id])).get(welder.id) ?? []
  setResponseHeaders(event, { 'content-type': 'text/calendar; charset=utf-8', 'cache-control': 'private, max-age=3600' })
  return lapseCalendar(welder, standings)
})
