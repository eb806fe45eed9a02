import dayjs from 'dayjs'
import { describe, expect, it } from 'vitest'
import { processStanding } from '../../../../shared/qualification/process-standing'

// ASME BPVC IX QW-322.1(a): a welder who has not welded with a process for 6 months or more loses the qualification
// for that process. Date convention (docs/sources.md §A4, stated on screen): lapses on last use + 6 calendar months.
const asme = { process: 'GMAW', code: 'asme-ix' as const, edition: '2023' }

describe('process standing from a test and the continuity log (ASME IX QW-322.1, QW-322.2)', () => {
  it('with no use after the test, lapses six months after the test date (QW-322.1(a))', () => {
    const s = processStanding({ ...asme, testDate: '2026-01-15', uses: [], today: '2026-07-14' })
    expect(s.lapsesOn).toBe('2026-07-15')
    expect(s.daysLeft).toBe(1)
    expect(s.standing).toBe('lapsing')
    // cross-check with dayjs, a different date library than the rules use
    expect(dayjs('2026-01-15').add(6, 'month').format('YYYY-MM-DD')).toBe(s.lapsesOn)
  })

  it('each use while current pushes the lapse date to six months after that use', () => {
    const s = processStanding({ ...asme, testDate: '2026-01-15', uses: ['2026-03-01', '2026-06-30'], today: '2026-08-01' })
    expect(s.lastUse).toBe('2026-06-30')
    expect(s.lapsesOn).toBe('2026-12-30')
    expect(s.standing).toBe('current')
    expect(s.daysLeft).toBe(dayjs('2026-12-30').diff(dayjs('2026-08-01'), 'day'))
  })

  it('a use on or after the lapse date does not revive it: only a new test renews (QW-322.2(a))', () => {
    const s = processStanding({ ...asme, testDate: '2026-01-15', uses: ['2026-07-15', '2026-08-01'], today: '2026-08-02' })
    expect(s.lastUse).toBe('2026-01-15')
    expect(s.lapsesOn).toBe('2026-07-15')
    expect(s.standing).toBe('lapsed')
    expect(s.daysLeft).toBe(-18)
  })

  it('uses before the test date and in the future are ignored', () => {
    const s = processStanding({ ...asme, testDate: '2026-03-10', uses: ['2026-02-01', '2026-12-01'], today: '2026-04-01' })
    expect(s.lastUse).toBe('2026-03-10')
    expect(s.lapsesOn).toBe('2026-09-10')
  })

  it('month ends clamp: Aug 31 + 6 months = Feb 28 (docs/sources.md §A4 convention, date-fns addMonths)', () => {
    const s = processStanding({ ...asme, testDate: '2025-08-31', uses: [], today: '2026-01-01' })
    expect(s.lapsesOn).toBe('2026-02-28')
    // cross-check the code's answer with dayjs (a different date library than the rules use)
    expect(s.lapsesOn).toBe(dayjs('2025-08-31').add(6, 'month').format('YYYY-MM-DD'))
    // leap year: Aug 31 + 6 months = Feb 29
    const leap = processStanding({ ...asme, testDate: '2023-08-31', uses: [], today: '2024-01-01' })
    expect(leap.lapsesOn).toBe('2024-02-29')
    expect(leap.lapsesOn).toBe(dayjs('2023-08-31').add(6, 'month').format('YYYY-MM-DD'))
  })

  it('AWS D1.1 "a period exceeding six months": still current on the anniversary, lapses the next day', () => {
    const s = processStanding({ process: 'SMAW', code: 'aws-d1.1', edition: '2020', testDate: '2026-01-15', uses: [], today: '2026-07-15' })
    expect(s.lapsesOn).toBe('2026-07-16')
    expect(s.standing).toBe('lapsing')
  })
})
