import { shopNameOf } from '../../database/mail'

/** mail:reminders (daily at 06:00): queue lapse reminders and the weekly digest, then send the outbox. Payload `today` sets the day. */
export default defineTask({
  meta: { name: 'mail:reminders', description: 'Lapse reminders (30, 14, 7 days) and the weekly lapse digest' },
  async run({ payload }) {
    const db = await useDb()
    const today = typeof payload?.today === 'string' ? payload.today : todayIso()
    const run = await queueReminders(db, today, appUrl(), await shopNameOf(db))
    const sent = await sendQueuedMail(db)
    return { result: { ...run, ...sent } }
  },
})
