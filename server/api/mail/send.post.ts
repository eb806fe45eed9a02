import { z } from 'zod'

/** POST /api/mail/send {}: send what is due in the outbox now instead of waiting for the minute task (supervisor) */
export default defineEventHandler(async (event) => {
  await requireRole(event, ['supervisor'])
  await validBody(event, z.object({}).strict())
  return sendQueuedMail(await useDb())
})
