import { clearCalendarToken } from '../../database/me'

/** DELETE /api/me/calendar-feed: turn the subscription address off */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['welder'])
  await clearCalendarToken(await useDb(), user)
  setResponseStatus(event, 204)
  return null
})
