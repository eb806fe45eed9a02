import { z } from 'zod'
import { rotateCalendarToken } from '../../database/me'

const bodySchema = z.object({ rotate: z.literal(true, { errorMap: () => ({ message: 'Send { "rotate": true } to make a new address' }) }) })

/** POST /api/me/calendar-feed: a new secret address for calendar apps to subscribe to (the previous one stops working) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['welder'])
  await validBody(event, bodySchema)
  return rotateCalendarToken(await useDb(), user)
})
