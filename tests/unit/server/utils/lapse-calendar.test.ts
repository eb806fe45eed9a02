import dayjs from 'dayjs'
import { describe, expect, it } from 'vitest'
import { lapseCalendar } from '../../../../server/utils/lapse-calendar'

/** RFC 5545 section 3.3.6, dur-value: ["+" / "-"] "P" (dur-date / dur-time / dur-week); a "T" must be followed by a time. */
const durValue = /^[+-]?P(?:\d+W|\d+D(?:T(?:\d+H(?:\d+M(?:\d+S)?)?|\d+M(?:\d+S)?|\d+S))?|T(?:\d+H(?:\d+M(?:\d+S)?)?|\d+M(?:\d+S)?|\d+S))$/

const welder = { id: 4, name: 'Test Welder', stamp: 'T-04' }
// Invented standings for the shape only; the dates are checked against dayjs, not against the code's own date library.
const standings = [
  { process: 'SMAW', lastUse: '2026-06-30', lapsesOn: '2026-12-31', rule: 'QW-322.1.' },
  { process: 'GTAW', lastUse: '2026-08-29', lapsesOn: '2027-02-28', rule: 'QW-322.1.' },
] as never

function unfolded(text: string): string[] {
  return text.replace(/\r\n[ \t]/g, '').split('\r\n')
}

describe('lapse calendar (RFC 5545)', () => {
  const lines = unfolded(lapseCalendar(welder, standings))

  it('writes every duration and trigger in the dur-value grammar (RFC 5545 3.3.6)', () => {
    const durations = lines.filter(l => /^(DURATION|TRIGGER)[:;]/.test(l)).map(l => l.slice(l.lastIndexOf(':') + 1))
    expect(durations).toHaveLength(4)
    for (const value of durations) expect(value).toMatch(durValue)
    expect(durations).toContain('-PT720H')
    expect(durations).toContain('-PT168H')
  })

  it('makes each lapse an all-day event ending the next day, across a month and a year end (cross-checked with dayjs)', () => {
    const starts = lines.filter(l => l.startsWith('DTSTART')).map(l => l.split(':')[1])
    const ends = lines.filter(l => l.startsWith('DTEND')).map(l => l.split(':')[1])
    expect(starts).toEqual(['20261231', '20270228'])
    expect(ends).toEqual([dayjs('2026-12-31').add(1, 'day').format('YYYYMMDD'), dayjs('2027-02-28').add(1, 'day').format('YYYYMMDD')])
    expect(ends).toEqual(['20270101', '20270301'])
    expect(lines.filter(l => l.startsWith('DTSTART')).every(l => l.includes('VALUE=DATE'))).toBe(true)
  })
})
