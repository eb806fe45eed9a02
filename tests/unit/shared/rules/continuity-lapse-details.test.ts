import { describe, expect, it } from 'vitest'
import { continuity, parseDay } from '../../../../shared/rules/continuity-lapse'
import { ok } from './helpers'

// The lapse day and the words the screens print with it. Dates: docs/sources.md §A4 (ASME BPVC IX QW-322.1(a) "6 months
// or more": lapses on the six-month anniversary) and §B6 (AWS D1.1 "a period exceeding six months": lapses the day after).
// The sentences are Rootface's own (date convention (Rootface)); the check cases are worked by hand.
const asme = (lastUse: string, on: string) => ok({ code: 'asme-ix', check: 'continuity', unit: 'in', input: { lastUse, on } })
const reasonsOf = (r: Record<string, unknown>) => r.reasons as { clause: string, text: string, basis: string }[]

describe('continuity: the reasons say which side of the lapse day the asked day is', () => {
  it('current: names the last current day and the lapse day (last use 2026-01-15, §A4 check case)', () => {
    const [rule, convention] = reasonsOf(asme('2026-01-15', '2026-07-14'))
    expect(rule).toEqual({ clause: 'QW-322.1(a)', text: expect.stringContaining('6 months or more'), basis: 'verified' })
    expect(convention).toEqual({
      clause: 'date convention (Rootface)', basis: 'convention',
      text: 'Last use 2026-01-15: current on 2026-07-14; last current day 2026-07-14, lapses on 2026-07-15.',
    })
  })
  it('lapsed: on the lapse day itself the text says lapsed, not current', () => {
    expect(reasonsOf(asme('2026-01-15', '2026-07-15'))[1]!.text)
      .toBe('Last use 2026-01-15: lapsed on 2026-07-15 (last current day 2026-07-14), so not current on 2026-07-15.')
  })
  it('the day of the last use itself is current (an "on" equal to the last use is not refused)', () => {
    expect(asme('2026-03-10', '2026-03-10')).toMatchObject({ current: true, lapsesOn: '2026-09-10', lastCurrentDay: '2026-09-09' })
  })
  it('each convention prints its own words (§A4 and §B6)', () => {
    const rule = { clause: 'x', ruleText: 'y', basis: 'verified' as const }
    expect(continuity({ lastUse: '2026-01-15', on: '2026-01-15' }, { ...rule, convention: 'lapses-on-anniversary' }).convention)
      .toBe('Lapses on the day six calendar months after the last use (month ends clamp: Aug 31 + 6 months = Feb 28 or 29); current on every day before it.')
    const d11 = continuity({ lastUse: '2026-01-15', on: '2026-07-15' }, { ...rule, convention: 'lapses-day-after-anniversary' })
    expect(d11.convention).toBe('Still current on the six-month anniversary of the last use (month ends clamp: Aug 31 + 6 months = Feb 28 or 29); lapses the day after.')
    expect(d11).toMatchObject({ lapsesOn: '2026-07-16', lastCurrentDay: '2026-07-15', current: true, rule: 'y' })
  })
})

describe('continuity: a date must be a real YYYY-MM-DD day', () => {
  it('reads a real day as that local calendar day', () => {
    const day = parseDay('2028-02-29', 'on') // 2028 is a leap year (Gregorian calendar)
    expect([day.getFullYear(), day.getMonth(), day.getDate()]).toEqual([2028, 1, 29])
  })
  it('refuses a month 13, a 31st of a 30-day month, a Feb 29 of a common year and a two-digit year', () => {
    expect(() => parseDay('2026-13-01', 'on')).toThrow('on: 2026-13-01 is not a calendar date')
    expect(() => parseDay('2026-04-31', 'on')).toThrow('is not a calendar date')
    expect(() => parseDay('2027-02-29', 'lastUse')).toThrow('lastUse: 2027-02-29 is not a calendar date')
    expect(() => parseDay('0050-01-01', 'on')).toThrow('is not a calendar date') // JavaScript reads years 0–99 as 1900–1999
  })
  it('refuses other shapes with the expected format', () => {
    for (const text of ['2026-1-05', '20260105', ' 2026-01-05', '2026-01-05T00:00']) {
      expect(() => parseDay(text, 'on')).toThrow(`on: expected a date as YYYY-MM-DD, got "${text}"`)
    }
  })
  it('refuses an "on" before the last use, naming both', () => {
    const rule = { clause: 'x', ruleText: 'y', basis: 'verified' as const, convention: 'lapses-on-anniversary' as const }
    expect(() => continuity({ lastUse: '2026-03-02', on: '2026-03-01' }, rule)).toThrow('on: 2026-03-01 is before lastUse 2026-03-02')
  })
})
