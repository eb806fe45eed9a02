import { z } from 'zod'
import { calendarDate } from './fields'
import { listQuerySchema } from './list'

export const mailListQuerySchema = listQuerySchema(['createdAt', 'to', 'subject', 'status', 'kind']).extend({
  status: z.enum(['queued', 'sent', 'failed']).optional(),
  kind: z.string().trim().max(40).optional(),
  dir: z.enum(['asc', 'desc']).default('desc'),
})

/** Run the reminder job now; `today` (for a test clock) is honoured only when the server allows it. */
export const runRemindersSchema = z.object({
  today: calendarDate('today').optional(),
})
