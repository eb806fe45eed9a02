import { addDays, parseISO } from 'date-fns'
import { createEvents, type EventAttributes } from 'ics'
import type { ProcessStanding } from '#shared/qualification/process-standing'

/**
 * An iCalendar (RFC 5545) of a welder's lapse dates: one all-day event per process, with reminders 30 and 7 days before.
 * The event ends with DTEND on the next day and the reminders are given in hours (-PT720H): the ics package writes a day
 * duration as "P1DT", a "T" with no time after it, which RFC 5545's dur-value grammar (3.3.6) does not allow.
 */
export function lapseCalendar(welder: { id: number, name: string, stamp: string }, standings: ProcessStanding[]): string {
  if (!standings.length) {
    return ['BEGIN:VCALENDAR', 'VERSION:2.0', 'PRODID:-//Rootface//Lapse dates//EN', `X-WR-CALNAME:Lapse dates ${welder.stamp}`, 'END:VCALENDAR', ''].join('\r\n')
  }
  const events: EventAttributes[] = standings.map((s) => {
    const [y, m, d] = s.lapsesOn.split('-').map(Number) as [number, number, number]
    const next = addDays(parseISO(s.lapsesOn), 1)
    return {
      uid: `lapse-${welder.id}-${s.process}@rootface`,
      title: `${s.process} qualification lapses (${welder.stamp})`,
      description: `${welder.name}, stamp ${welder.stamp}: ${s.process} lapses on ${s.lapsesOn} ${s.code === 'iso-9606-1' ? `unless the ISO 9606-1 certificate is confirmed (9.2) before then. Last confirmation ${s.lastUse}.` : `unless the process is used and logged before then. Last logged use ${s.lastUse}.`} ${s.rule} The governing code edition, the shop's quality manual and the inspector have the final word.`,
      start: [y, m, d], end: [next.getFullYear(), next.getMonth() + 1, next.getDate()],
      productId: '-//Rootface//Lapse dates//EN', calName: `Lapse dates ${welder.stamp}`,
      alarms: [
        { action: 'display', description: `${s.process} lapses in 30 days`, trigger: { hours: 30 * 24, before: true } },
        { action: 'display', description: `${s.process} lapses in 7 days`, trigger: { hours: 7 * 24, before: true } },
      ],
    }
  })
  const { error, value } = createEvents(events)
  if (error || !value) throw createError({ statusCode: 500, statusMessage: 'Could not build the calendar' })
  return value
}
