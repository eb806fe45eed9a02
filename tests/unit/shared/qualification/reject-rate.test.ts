import dayjs from 'dayjs'
import { createRequire } from 'node:module'
import { describe, expect, it } from 'vitest'
import { rejectRateOf, type ExamFact } from '../../../../shared/qualification/reject-rate'

const convert = createRequire(import.meta.url)('convert-units') as (value: number) => { from: (unit: string) => { to: (unit: string) => number } }
const today = '2026-12-01'
const ago = (days: number) => dayjs(today).subtract(days, 'day').format('YYYY-MM-DD')
const fact = (jointId: number, daysAgo: number, accepted: boolean, more: Partial<ExamFact> = {}): ExamFact => ({
  welderId: 1, jointId, repair: 0, method: 'RT', examinedOn: ago(daysAgo), accepted, lengthExamined: 12, defectLength: accepted ? null : 0.5, ...more,
})

describe('a welder\'s reject rate (common practice: rejected welds over welds examined, and RT indication length over length examined)', () => {
  it('counts a weld once however many films, and RT by length', () => {
    const rate = rejectRateOf(1, [fact(1, 10, false), fact(1, 10, false, { lengthExamined: 6, defectLength: 0.25 }), fact(2, 12, true), fact(3, 20, true), fact(4, 30, true)], today)
    expect(rate.examined).toBe(4)
    expect(rate.rejected).toBe(1)
    expect(rate.rate).toBe(0.25)
    expect(rate.rtLength).toBe(12 * 4 + 6)
    expect(rate.rtRejectLength).toBe(0.75)
    // 0.75 in over 54 in; the same ratio in mm (convert-units) gives the same rate
    expect(rate.rtRate).toBeCloseTo(convert(0.75).from('in').to('mm') / convert(54).from('in').to('mm'), 12)
  })

  it('a repair is a weld of its own, of its own welder', () => {
    const facts = [fact(1, 40, false), fact(1, 30, true, { repair: 1, welderId: 2 })]
    expect(rejectRateOf(1, facts, today)).toMatchObject({ examined: 1, rejected: 1 })
    expect(rejectRateOf(2, facts, today)).toMatchObject({ examined: 1, rejected: 0 })
  })

  it('flags a rate that rises into the newest 90 days with at least two rejects (shop convention; QW-322.1(b) is the inspector\'s call)', () => {
    const older = [fact(1, 120, true), fact(2, 130, true), fact(3, 140, false), fact(4, 150, true)]
    const newer = [fact(5, 5, false), fact(6, 15, false), fact(7, 25, true)]
    const rate = rejectRateOf(1, [...older, ...newer], today)
    expect(rate.trend.map(w => w.rejected)).toEqual([0, 0, 1, 2])
    expect(rate.trend[3]!.to).toBe(today)
    expect(rate.trend[3]!.from).toBe(dayjs(today).subtract(89, 'day').format('YYYY-MM-DD'))
    expect(rate.flagged).toBe(true)
    expect(rate.flagReason).toContain('QW-322.1(b)')
    // One reject only: no flag, however high the rate
    expect(rejectRateOf(1, [fact(5, 5, false)], today).flagged).toBe(false)
    // Falling rate: no flag
    expect(rejectRateOf(1, [fact(1, 100, false), fact(2, 110, false), fact(5, 5, false), fact(6, 15, false), fact(7, 25, true)], today).flagged).toBe(false)
  })

  it('no examinations: no rate at all rather than 0 %', () => {
    expect(rejectRateOf(1, [], today)).toMatchObject({ examined: 0, rate: null, rtRate: null, flagged: false })
  })
})
