import { welderName } from '../../database/me'

/** GET /api/me/calendar.ics: the signed-in welder's lapse dates as an iCalendar file */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['welder'])
  const db = await useDb()
  const welder = await welderName(db, user.welderId ?? -1)
  if (!welder) throw httpError(missing('Roster entry'))
  const standings = (await standingsOfWelders(db, [welder.id])).get(welder.id) ?? []
  setResponseHeaders(event, { 'content-type': 'text/calendar; charset=utf-8', 'content-disposition': `attachment; filename="lapse-dates-${welder.stamp}.ics"`, 'cache-control': 'no-store' })
  return lapseCalendar(welder, standings)
})
