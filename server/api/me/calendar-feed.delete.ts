import { clearCalendarToken } from '../../database/me'

/** DELETE /api/me/calendar-feed: turn the subscription address off */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['welder'])
  const db = await useDb()
  await clearCalendarToken(db, user.welderId ?? -1)
  await recordAudit(db, { accountId: user.id, action: 'calendar-feed-off', recordType: 'welder', recordId: user.welderId })
  setResponseStatus(event, 204)
  return null
})
