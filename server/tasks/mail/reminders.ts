import { shopNameOf } from '../../database/mail'

/** What one run answers: the reminders and digests queued, and what the outbox then sent. */
export type ReminderRun = Awaited<ReturnType<typeof queueReminders>> & Awaited<ReturnType<typeof sendQueuedMail>>

/** mail:reminders (daily at 06:00): queue lapse reminders and the weekly digest, then send the outbox. Payload `today` sets the day. */
export default defineTask({
  meta: { name: 'mail:reminders', description: 'Lapse reminders (30, 14, 7 days) and the weekly lapse digest' },
  async run({ payload }) {
    const db = await useDb()
    const today = typeof payload?.today === 'string' ? payload.today : todayIso()
    const run = await queueReminders(db, today, appUrl(), await shopNameOf(db))
    const sent = await sendQueuedMail(db)
    const result: ReminderRun = { ...run, ...sent }
    return { result }
  },
})
