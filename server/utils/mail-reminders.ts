import type { Db } from '../database/client'
import { activeQualityManagers, queueMail, reminderRoster } from '../database/mail'
import { digestWindowDays, isoWeekOf, reminderStepFor } from '#shared/mail/reminder-steps'
import { standingsOf } from '../database/standings'
import { calibrationsDue } from '../database/equipment'
import { lapseReminderMail, weeklyDigestMail, type DigestRow } from './mail-messages'

export interface ReminderRun {
  today: string
  week: string
  remindersQueued: number
  digestsQueued: number
  /** Active welders with a qualification in a reminder step but no e-mail address to send it to. */
  withoutAddress: string[]
}

/**
 * The daily job: each active welder with a qualification lapsing within 30, 14 or 7 days gets one reminder per step,
 * and every active quality manager gets one digest per ISO week of what lapses in the next 60 days.
 * Dedupe keys make a re-run (same day, or a missed day caught up) queue nothing twice.
 */
export async function queueReminders(db: Db, today: string, base: string, shopName: string): Promise<ReminderRun> {
  const roster = await reminderRoster(db)
  const byId = new Map<number, (typeof roster)[number]>()
  for (const w of roster) if (!byId.has(w.id)) byId.set(w.id, w)
  const standings = await standingsOf(db, [...byId.keys()], today)

  const run: ReminderRun = { today, week: isoWeekOf(today), remindersQueued: 0, digestsQueued: 0, withoutAddress: [] }
  const digest: DigestRow[] = []
  for (const [id, welder] of byId) {
    for (const standing of standings.get(id) ?? []) {
      if (standing.daysLeft > 0 && standing.daysLeft <= digestWindowDays) digest.push({ stamp: welder.stamp, name: welder.name, standing })
      const step = reminderStepFor(standing.daysLeft)
      if (!step) continue
      // The address the welder signs in with, else the one on the roster.
      const to = welder.accountEmail || welder.email
      if (!to) {
        run.withoutAddress.push(`${welder.stamp} ${standing.process}`)
        continue
      }
      if (await queueMail(db, lapseReminderMail({ welder, to, standing, step, link: `${base}/me`, shopName }))) run.remindersQueued++
    }
  }

  digest.sort((a, b) => a.standing.lapsesOn.localeCompare(b.standing.lapsesOn) || a.stamp.localeCompare(b.stamp) || a.standing.process.localeCompare(b.standing.process))
  const managers = await activeQualityManagers(db)
  const calibrations = (await calibrationsDue(db, today, digestWindowDays)).map(c => ({ tag: c.tag, kindWords: c.kindWords, text: c.calibration.text }))
  for (const account of managers) {
    const mail = weeklyDigestMail({ week: run.week, account, today, windowDays: digestWindowDays, rows: digest, link: `${base}/welders`, shopName, calibrations })
    if (await queueMail(db, mail)) run.digestsQueued++
  }
  return run
}
