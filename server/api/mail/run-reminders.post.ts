import { runRemindersSchema } from '#shared/schemas/mail'
import type { ReminderRun } from '../../tasks/mail/reminders'

/** POST /api/mail/run-reminders {today?}: run the daily reminder job now, through the same Nitro task (supervisor) */
export default defineEventHandler(async (event) => {
  await requireRole(event, ['supervisor'])
  const body = await validBody(event, runRemindersSchema)
  const testClock = String(useRuntimeConfig().mailTestClock) === 'true'
  if (body.today && !testClock) {
    throw httpError(fieldFailure('today', 'Another day can be set only when the server runs with NUXT_MAIL_TEST_CLOCK=true'))
  }
  const { result } = await runTask('mail:reminders', { payload: body.today ? { today: body.today } : {} })
  // A Nitro task answers `unknown`; this one answers the run of server/tasks/mail/reminders.ts.
  return result as ReminderRun
})
