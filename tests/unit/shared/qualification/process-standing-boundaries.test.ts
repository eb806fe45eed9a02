import dayjs from 'dayjs'
import { describe, expect, it } from 'vitest'
import { continuityChain, lapsingSoonDays, processStanding, standingOn, standingWords } from '../../../../shared/qualification/process-standing'

// Boundaries of the standing words and of the chain. Lapse day: ASME BPVC IX QW-322.1(a) with the date convention of
// docs/sources.md §A4 (lapses on last use + 6 calendar months); a use on or after the lapse day does not revive it
// (QW-322.2(a), §A4). "Lapses soon" within 30 days is Rootface's own warning window (common practice for reminders).
// Day counts are cross-checked with dayjs, not with date-fns which the code uses.
const asme = { process: 'GTAW', code: 'asme-ix' as const, edition: '2023' }
const chain = continuityChain({ ...asme, testDate: '2026-01-15', uses: [] }) // lapses on 2026-07-15
const dayBefore = (day: string, n: number) => dayjs(day).subtract(n, 'day').format('YYYY-MM-DD')

describe('standing words at their boundaries (30-day window, Rootface)', () => {
  it('the window is 30 days', () => {
    expect(lapsingSoonDays).toBe(30)
  })
  it('31 days left is current, 30 is lapsing, 1 is lapsing, 0 (the lapse day) is lapsed, -1 is lapsed', () => {
    expect(chain.lapsesOn).toBe(dayjs('2026-01-15').add(6, 'month').format('YYYY-MM-DD'))
    const at = (n: number) => standingOn(chain, dayBefore(chain.lapsesOn, n))
    expect([at(31).daysLeft, at(31).standing]).toEqual([31, 'current'])
    expect([at(30).daysLeft, at(30).standing]).toEqual([30, 'lapsing'])
    expect([at(1).daysLeft, at(1).standing]).toEqual([1, 'lapsing'])
    expect([at(0).daysLeft, at(0).standing]).toEqual([0, 'lapsed'])
    expect([at(-1).daysLeft, at(-1).standing]).toEqual([-1, 'lapsed'])
  })
  it('keeps the chain it was given and says it in words', () => {
    expect(standingOn(chain, '2026-02-01')).toEqual({ ...chain, daysLeft: dayjs('2026-07-15').diff('2026-02-01', 'day'), standing: 'current' })
    expect(chain).toMatchObject({ process: 'GTAW', code: 'asme-ix', edition: '2023', testDate: '2026-01-15', lastUse: '2026-01-15', rule: expect.stringContaining('6 months or more') })
    expect(standingWords).toEqual({ current: 'Current', lapsing: 'Lapses soon', lapsed: 'Lapsed' })
  })
  it('refuses a day that does not exist', () => {
    expect(() => standingOn(chain, '2026-02-30')).toThrow('today: 2026-02-30 is not a calendar date')
  })
})

describe('the continuity chain at its boundaries (QW-322.1(a), QW-322.2(a))', () => {
  it('a use on the last current day keeps it alive; a use on the lapse day does not', () => {
    const lastDay = dayBefore('2026-07-15', 1)
    expect(continuityChain({ ...asme, testDate: '2026-01-15', uses: [lastDay] }).lastUse).toBe('2026-07-14')
    expect(continuityChain({ ...asme, testDate: '2026-01-15', uses: [lastDay] }).lapsesOn).toBe(dayjs('2026-07-14').add(6, 'month').format('YYYY-MM-DD'))
    expect(continuityChain({ ...asme, testDate: '2026-01-15', uses: ['2026-07-15'] }).lastUse).toBe('2026-01-15')
  })
  it('reads the uses in date order, whatever order they are given in', () => {
    const uses = ['2026-09-01', '2026-03-01', '2026-06-01']
    expect(continuityChain({ ...asme, testDate: '2026-01-15', uses }).lastUse).toBe('2026-09-01')
  })
  it('a use on the test day or before it changes nothing; a later use the same day as another counts once', () => {
    const c = continuityChain({ ...asme, testDate: '2026-01-15', uses: ['2026-01-15', '2026-01-10', '2026-02-01', '2026-02-01'] })
    expect([c.lastUse, c.lapsesOn]).toEqual(['2026-02-01', '2026-08-01'])
  })
  it('a use on the day asked counts; a use after it does not (no future uses)', () => {
    expect(processStanding({ ...asme, testDate: '2026-01-15', uses: ['2026-04-01'], today: '2026-04-01' }).lastUse).toBe('2026-04-01')
    expect(processStanding({ ...asme, testDate: '2026-01-15', uses: ['2026-04-02'], today: '2026-04-01' }).lastUse).toBe('2026-01-15')
    expect(continuityChain({ ...asme, testDate: '2026-01-15', uses: ['2026-04-02'] }, '2026-04-01').lastUse).toBe('2026-01-15')
  })
  it('a gap: after the first lapse a later use is never counted, even if it falls before the second lapse would have', () => {
    const c = continuityChain({ ...asme, testDate: '2026-01-15', uses: ['2026-08-01', '2026-09-01'] })
    expect([c.lastUse, c.lapsesOn]).toEqual(['2026-01-15', '2026-07-15'])
  })
})
