import dayjs from 'dayjs'
import { describe, expect, it } from 'vitest'
import { gapsInPeriod } from '../../../../server/sheets/continuity-log'
import { summaryOf } from '../../../../server/sheets/packet-document'

// Six months after the last use, cross-checked with dayjs (not date-fns, which the rules use).
const sixMonthsAfter = (day: string) => dayjs(day).add(6, 'month').format('YYYY-MM-DD')
const dayBefore = (day: string) => dayjs(day).subtract(1, 'day').format('YYYY-MM-DD')
const test = (testDate: string, process = 'SMAW') => ({ id: 1, process, code: 'asme-ix', edition: '2023', testDate, procedure: null })
const period = { from: '2026-01-01', to: '2026-12-31' }

describe('gapsInPeriod: the days a welder was not current for a process', () => {
  it('a combination coupon counts for each of its processes (ASME BPVC IX-2023 QW-306: each process qualified by it)', () => {
    const combination = { ...test('2025-12-15', 'GTAW'), processes: ['GTAW', 'SMAW'] }
    const uses = ['2026-03-01', '2026-08-01', '2026-12-01'].map(weldedOn => ({ process: 'SMAW', weldedOn }))
    expect(gapsInPeriod([combination], uses, 'SMAW', period)).toEqual([])
    // without the list of processes only its first one would count, and SMAW would read as never held
    expect(gapsInPeriod([test('2025-12-15', 'GTAW')], uses, 'SMAW', period)).toEqual([{ process: 'SMAW', from: period.from, to: period.to, why: 'never-held' }])
  })

  it('no gap while each use falls within six months of the previous one', () => {
    // ASME BPVC IX-2023 QW-322.1(a): a process lapses when not used for six months
    const uses = ['2026-03-01', '2026-08-01', '2026-12-01'].map(weldedOn => ({ process: 'SMAW', weldedOn }))
    expect(gapsInPeriod([test('2025-12-15')], uses, 'SMAW', period)).toEqual([])
  })

  it('a gap from the lapse to the end of the period when the welder stops using the process', () => {
    // ASME BPVC IX-2023 QW-322.1(a): last use 2026-02-01, lapses six months later
    const gaps = gapsInPeriod([test('2025-12-15')], [{ process: 'SMAW', weldedOn: '2026-02-01' }], 'SMAW', period)
    expect(gaps).toEqual([{ process: 'SMAW', from: sixMonthsAfter('2026-02-01'), to: '2026-12-31', why: 'lapsed' }])
  })

  it('a use after the lapse does not revive it; a new certified test does', () => {
    // ASME BPVC IX-2023 QW-322.1(a) (use after lapse does not count) and QW-322.2(a) (renewal by one test coupon)
    const uses = [{ process: 'SMAW', weldedOn: '2026-10-01' }]
    const gaps = gapsInPeriod([test('2025-12-15'), test('2026-11-02')], uses, 'SMAW', period)
    expect(gaps).toEqual([{ process: 'SMAW', from: sixMonthsAfter('2025-12-15'), to: dayBefore('2026-11-02'), why: 'lapsed' }])
  })

  it('before the first certified test of the process the welder was not qualified at all', () => {
    // common practice: no qualification on record means not qualified
    const gaps = gapsInPeriod([test('2026-04-10', 'GTAW')], [], 'GTAW', period)
    expect(gaps[0]).toEqual({ process: 'GTAW', from: '2026-01-01', to: '2026-04-09', why: 'no-test' })
    expect(gaps[1]).toEqual({ process: 'GTAW', from: sixMonthsAfter('2026-04-10'), to: '2026-12-31', why: 'lapsed' })
  })

  it('another process\'s uses do not keep this one alive', () => {
    // ASME BPVC IX-2023 QW-322.1(a): continuity is kept per process
    const gaps = gapsInPeriod([test('2025-12-15')], [{ process: 'GTAW', weldedOn: '2026-03-01' }], 'SMAW', period)
    expect(gaps).toEqual([{ process: 'SMAW', from: sixMonthsAfter('2025-12-15'), to: '2026-12-31', why: 'lapsed' }])
  })
})

describe('a process the welder never held', () => {
  it('is one "never held" line for the whole period, not a lapse', () => {
    // ASME BPVC IX-2023 QW-322.1: only a qualification once held can lapse; a welder with no certified test of a
    // process never held it (from memory: a welder who did not weld the process on the project need not hold it)
    const gaps = gapsInPeriod([test('2025-12-15', 'GTAW')], [], 'SMAW', period)
    expect(gaps).toEqual([{ process: 'SMAW', from: period.from, to: period.to, why: 'never-held' }])
  })

  it('the packet summary lists it once, in words, apart from the lapses', () => {
    const gaps = [
      { process: 'SMAW', from: period.from, to: period.to, why: 'never-held' as const, welder: 'A. Welder', stamp: 'W-1' },
      { process: 'SMAW', from: period.from, to: period.to, why: 'never-held' as const, welder: 'A. Welder', stamp: 'W-1' },
      { process: 'GTAW', from: '2026-07-01', to: period.to, why: 'lapsed' as const, welder: 'A. Welder', stamp: 'W-1' },
    ]
    const summary = summaryOf(gaps)
    expect(summary.neverHeld).toEqual(['A. Welder (W-1) holds no qualification for SMAW: may not have welded it on this project'])
    expect(summary.lapses.map(g => g.why)).toEqual(['lapsed'])
  })
})
