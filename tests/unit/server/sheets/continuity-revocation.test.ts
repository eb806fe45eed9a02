import dayjs from 'dayjs'
import { describe, expect, it } from 'vitest'
import { gapsInPeriod } from '../../../../server/sheets/continuity-log'

// ASME BPVC IX QW-322.1(b): a revoked qualification is not current from the revocation; QW-322.2(b): a new test
// restores it. The continuity log and the packet count those days as not current.
const dayBefore = (day: string) => dayjs(day).subtract(1, 'day').format('YYYY-MM-DD')
const test = (id: number, testDate: string, extra: Record<string, unknown> = {}) => ({ id, process: 'SMAW', code: 'asme-ix', edition: '2023', testDate, procedure: null, ...extra })
const period = { from: '2026-01-01', to: '2026-12-31' }
const uses = ['2026-02-01', '2026-05-01', '2026-08-01', '2026-11-01'].map(weldedOn => ({ process: 'SMAW', weldedOn }))
const revocation = { id: 1, process: 'SMAW', revokedOn: '2026-06-10', reason: 'Slag lines in two joints', revokedBy: 'An inspector', basisTestId: 1 }

describe('gapsInPeriod with a revocation', () => {
  it('without a revocation, steady use keeps the process current all year (QW-322.1(a))', () => {
    expect(gapsInPeriod([test(1, '2025-12-15')], uses, 'SMAW', period)).toEqual([])
  })

  it('a revocation opens a gap from its day; uses after it do not close it', () => {
    expect(gapsInPeriod([test(1, '2025-12-15')], uses, 'SMAW', period, [revocation]))
      .toEqual([{ process: 'SMAW', from: '2026-06-10', to: '2026-12-31', why: 'revoked', reason: 'Slag lines in two joints' }])
  })

  it('a new certified test after the revocation closes the gap the day before it (QW-322.2(b))', () => {
    const gaps = gapsInPeriod([test(1, '2025-12-15'), test(2, '2026-07-20')], uses, 'SMAW', period, [revocation])
    expect(gaps).toEqual([{ process: 'SMAW', from: '2026-06-10', to: dayBefore('2026-07-20'), why: 'revoked', reason: 'Slag lines in two joints' }])
  })

  it('a welding operator\'s test never holds a welder\'s process', () => {
    const operatorOnly = [test(3, '2025-12-15', { qualifiedAs: 'welding-operator' })]
    expect(gapsInPeriod(operatorOnly, uses, 'SMAW', period)).toEqual([{ process: 'SMAW', from: period.from, to: period.to, why: 'never-held' }])
  })
})
