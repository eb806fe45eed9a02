// Grouping for the dashboard picture, not a code rule: the inputs are invented and the week arithmetic is common practice
// (weeks counted from the window's first day), cross-checked by hand. The lapse dates themselves come from ASME IX QW-322.1 elsewhere.
import { describe, expect, it } from 'vitest'
import { lapseWeeks } from '../../../../shared/qualification/lapse-weeks'

describe('lapse dates per week (the dashboard timeline)', () => {
  it('counts each lapse date in its week, by standing, and counts those outside the window', () => {
    // 2026-12-01 minus 13 weeks (91 days) is 2026-09-01 (calendar arithmetic, cross-checked by hand)
    const t = lapseWeeks([
      { welderStamp: 'A', process: 'SMAW', lapsesOn: '2026-09-01', standing: 'lapsed' },
      { welderStamp: 'B', process: 'SMAW', lapsesOn: '2026-09-07', standing: 'lapsed' },
      { welderStamp: 'C', process: 'GTAW', lapsesOn: '2026-09-08', standing: 'lapsed' },
      { welderStamp: 'D', process: 'GMAW', lapsesOn: '2026-12-10', standing: 'lapsing' },
      { welderStamp: 'E', process: 'GMAW', lapsesOn: '2026-08-31', standing: 'lapsed' },
      { welderStamp: 'F', process: 'GMAW', lapsesOn: '2027-06-01', standing: 'current' },
    ], '2026-12-01')
    expect(t.from).toBe('2026-09-01')
    expect(t.weeks).toHaveLength(39)
    expect(t.weeks[0]).toMatchObject({ from: '2026-09-01', lapsed: 2, sample: ['A SMAW', 'B SMAW'] })
    expect(t.weeks[1]).toMatchObject({ from: '2026-09-08', lapsed: 1 })
    // 2026-12-10 is 100 days after 2026-09-01: week 14
    expect(t.weeks[14]).toMatchObject({ lapsing: 1 })
    // 2027-06-01 is past the 26 weeks ahead (window ends 2027-05-31)
    expect([t.before, t.after]).toEqual([1, 1])
  })
})
