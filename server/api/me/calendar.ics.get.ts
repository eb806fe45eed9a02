import { calendarOf } from '../../database/me'

/** GET /api/me/calendar.ics: the signed-in welder's lapse dates as an iCalendar file */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['welder'])
  const { welder, standings } = orThrow(await calendarOf(await useDb(), { welderId: user.welderId ?? -1 }, todayIso()))
  setResponseHeaders(event, { 'content-type': 'text/calendar; charset=utf-8', 'content-disposition': `attachment; filename="lapse-dates-${welder.stamp}.ics"`, 'cache-control': 'no-store' })
  return lapseCalendar(welder, standings)
})
