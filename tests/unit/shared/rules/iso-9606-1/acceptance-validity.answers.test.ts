import dayjs from 'dayjs'
import { describe, expect, it } from 'vitest'
import { designation } from '../../../../../shared/rules/iso-9606-1/designation'
import { confirmationChain, isoValidity, revalidationEnd } from '../../../../../shared/rules/iso-9606-1/validity'
import { ok, refused } from '../helpers'

// ISO 9606-1 bend acceptance (clause 7, from memory: no single imperfection over 3 mm; corners only when they come
// from the weld), 9.2 confirmation and 9.3 a/b/c revalidation (docs/sources.md §C and the rule's own notes: partly
// read; the day boundaries are this program's convention), and the clause 10 designation (S2 worked examples).
// Dates are cross-checked with dayjs, not date-fns which the code uses. Sentences are Rootface's.
const bend = (specimens: unknown[]) => ok({ code: 'iso-9606-1', check: 'bend', unit: 'mm', input: { specimens } })
const plus = (day: string, n: number, unit: 'day' | 'month' | 'year') => dayjs(day).add(n, unit).format('YYYY-MM-DD')

describe('ISO 9606-1 bend acceptance (clause 7, from memory)', () => {
  it('whole answer: 3 mm accepted, 3.01 mm rejected, corner ones counted only from the weld', () => {
    const r = bend([
      { type: 'face', indications: [{ size: 1 }, { size: 3 }, { size: 9, atCorner: true }] },
      { type: 'root', indications: [{ size: 3.01 }] },
      { type: 'side', indications: [{ size: 3.5, atCorner: true, fromInternalDefect: true }] },
      { type: 'side', indications: [{ size: 4, atCorner: true }] },
    ])
    expect(r.accepted).toBe(false)
    expect(r.specimens).toEqual([
      { accepted: true, reason: 'face bend: largest imperfection 3 mm, not over 3 mm.' },
      { accepted: false, reason: 'root bend: an imperfection of 3.01 mm exceeds 3 mm.' },
      { accepted: false, reason: 'side bend: an imperfection of 3.5 mm exceeds 3 mm.' },
      { accepted: true, reason: 'side bend: no counted imperfection.' },
    ])
    expect(r.reasons).toEqual([
      { clause: 'ISO 9606-1, 7', text: 'No single imperfection over 3 mm in any direction on a bend specimen; corner imperfections count only when they come from the weld.', basis: 'memory' },
      { clause: 'ISO 9606-1, 7 and ISO 5817', text: 'Visual, radiographic and fracture results against ISO 5817 levels are judged by the examiner: check by hand.', basis: 'memory' },
    ])
  })
  it('every specimen within the limit: accepted', () => {
    expect(bend([{ type: 'face', indications: [{ size: 2.99 }] }, { type: 'root', indications: [] }]).accepted).toBe(true)
  })
  it('no specimen is never accepted (the schema refuses an empty list first)', () => {
    expect(refused({ code: 'iso-9606-1', check: 'bend', unit: 'mm', input: { specimens: [] } })).toBe('input.specimens: specimens needs at least one specimen')
  })
})

describe('ISO 9606-1 9.3 b) production-weld window, below, at and above its edges', () => {
  const end = plus('2024-05-20', 2, 'year') // 2026-05-20
  const from = plus(end, -6, 'month') // 2025-11-20
  it.each([
    [plus(from, -1, 'day'), false], [from, true], [plus(end, -1, 'day'), true], [end, false],
  ])('production welds tested on %s extend it: %s', (on, extends_) => {
    const r = revalidationEnd('2024-05-20', 'b', [on], '9999-12-31')
    expect(r.expiresOn).toBe(extends_ ? plus(end, 2, 'year') : end)
    expect(r.windowFrom).toBe(extends_ ? plus(plus(end, 2, 'year'), -6, 'month') : from)
    expect(r.ignored).toEqual(extends_ ? [] : [on])
  })
  it('a record after today is not counted yet', () => {
    const on = plus(from, 10, 'day')
    expect(revalidationEnd('2024-05-20', 'b', [on], plus(on, -1, 'day'))).toMatchObject({ expiresOn: end, ignored: [on] })
    expect(revalidationEnd('2024-05-20', 'b', [on], on)).toMatchObject({ expiresOn: plus(end, 2, 'year'), ignored: [] })
  })
  it('two windows in turn extend it twice; routes a and c ignore production-weld records', () => {
    const second = plus(plus(end, 2, 'year'), -1, 'month')
    expect(revalidationEnd('2024-05-20', 'b', [second, plus(end, -1, 'month')], '9999-12-31').expiresOn).toBe(plus(end, 4, 'year'))
    expect(revalidationEnd('2024-05-20', 'a', ['2025-01-01'], '9999-12-31')).toEqual({ expiresOn: '2027-05-20', windowFrom: null, ignored: ['2025-01-01'] })
    expect(revalidationEnd('2024-05-20', 'c', ['2025-01-01'], '9999-12-31')).toEqual({ expiresOn: null, windowFrom: null, ignored: ['2025-01-01'] })
  })
})

describe('ISO 9606-1 9.2 confirmations, below, at and above the six-month date', () => {
  const due = plus('2025-01-10', 6, 'month') // 2025-07-10
  it.each([
    [plus(due, -1, 'day'), true], [due, false], [plus(due, 1, 'day'), false],
  ])('a confirmation on %s counts: %s', (on, counts) => {
    const r = confirmationChain('2025-01-10', [on], '9999-12-31')
    expect(r).toEqual(counts ? { lastConfirmed: on, confirmationDue: plus(on, 6, 'month'), ignored: [] } : { lastConfirmed: '2025-01-10', confirmationDue: due, ignored: [on] })
  })
  it('on or before the test day it is passed over silently; after a lapse every later one is ignored; after today not yet counted', () => {
    expect(confirmationChain('2025-01-10', ['2025-01-10', '2025-01-01'], '9999-12-31')).toEqual({ lastConfirmed: '2025-01-10', confirmationDue: due, ignored: [] })
    const late = plus(due, 5, 'day')
    const later = plus(late, 30, 'day')
    expect(confirmationChain('2025-01-10', [later, late], '9999-12-31').ignored).toEqual([late, later])
    expect(confirmationChain('2025-01-10', ['2025-03-01'], '2025-02-28')).toEqual({ lastConfirmed: '2025-01-10', confirmationDue: due, ignored: ['2025-03-01'] })
    const afterToday = confirmationChain('2025-01-10', ['2025-03-01', '2025-05-01'], '2025-04-01')
    expect(afterToday).toEqual({ lastConfirmed: '2025-03-01', confirmationDue: plus('2025-03-01', 6, 'month'), ignored: ['2025-05-01'] })
  })
})

describe('ISO 9606-1 validity, whole answers', () => {
  it('route b with a counted confirmation and an ignored late weld record: every field and reason', () => {
    const r = isoValidity({ testDate: '2025-01-10', route: 'b', today: '2025-06-01', records: [{ kind: 'confirmation', on: '2025-05-01' }, { kind: 'production-welds', on: '2025-03-01' }] })
    expect(r).toEqual({
      route: 'b', lastConfirmed: '2025-05-01', confirmationDue: '2025-11-01', expiresOn: '2027-01-10', productionWindowFrom: '2026-07-10',
      lapsesOn: '2025-11-01', lapsedBy: 'confirmation', daysLeft: dayjs('2025-11-01').diff(dayjs('2025-06-01'), 'day'), current: true,
      ignored: [{ kind: 'production-welds', on: '2025-03-01' }],
      reasons: [
        { clause: 'ISO 9606-1, 9.2', text: 'Confirmed last on 2025-05-01; the next six-monthly confirmation is due before 2025-11-01 (without it the qualification lapses whatever the 9.3 route).', basis: 'partial' },
        { clause: 'ISO 9606-1, 9.3 b)', text: 'Every 2 years: valid until 2027-01-10; two production welds tested (volumetric or destructive) from 2026-07-10 extend it by 2 years.', basis: 'verified' },
        { clause: 'ISO 9606-1, 9.2 and 9.3 (day count)', text: 'A confirmation counts when made before the six-month date; the certificate lapses on that date (this program\'s convention).', basis: 'convention' },
        { clause: 'ISO 9606-1, 9.2 and 9.3', text: 'Not counted: production-welds of 2025-03-01 (after a lapse, outside the window, or after today).', basis: 'convention' },
      ],
    })
  })
  it('routes a and c: their 9.3 sentences; ignored production welds are not listed for them; no "not counted" line when all count', () => {
    const a = isoValidity({ testDate: '2025-01-10', route: 'a', today: '2025-02-01', records: [{ kind: 'production-welds', on: '2025-01-20' }] })
    expect(a.reasons[1]).toEqual({ clause: 'ISO 9606-1, 9.3 a)', text: 'Retest every 3 years: valid until 2028-01-10.', basis: 'verified' })
    expect([a.ignored, a.reasons.length, a.productionWindowFrom]).toEqual([[], 3, null])
    const c = isoValidity({ testDate: '2025-01-10', route: 'c', today: '2025-02-01', records: [] })
    expect(c.reasons[1]).toEqual({ clause: 'ISO 9606-1, 9.3 c)', text: 'No end date while the 9.2 confirmations continue and the manufacturer, verified to ISO 3834-2, keeps evidence that the welder makes welds of acceptable quality: check by hand.', basis: 'verified' })
    expect([c.expiresOn, c.lapsesOn, c.lapsedBy]).toEqual([null, '2025-07-10', 'confirmation'])
  })
  it('on the lapse day it is no longer current; the day before it is, with one day left', () => {
    const on = (today: string) => isoValidity({ testDate: '2025-01-10', route: 'c', today, records: [] })
    expect([on('2025-07-09').current, on('2025-07-09').daysLeft]).toEqual([true, 1])
    expect([on('2025-07-10').current, on('2025-07-10').daysLeft]).toEqual([false, 0])
  })
  it('the confirmation due date and the 9.3 end on the same day: lapsed by confirmation; one day later: by revalidation', () => {
    // route a ends 3 years after the test (2028-01-10); confirmations every 5 months, the last on 2027-07-10 (due 2028-01-10)
    const chain = ['2025-06-10', '2025-11-10', '2026-04-10', '2026-09-10', '2027-02-10']
    const at = (last: string) => isoValidity({ testDate: '2025-01-10', route: 'a', today: '2027-08-01', records: [...chain, last].map(on => ({ kind: 'confirmation' as const, on })) })
    expect([at('2027-07-10').confirmationDue, at('2027-07-10').lapsesOn, at('2027-07-10').lapsedBy]).toEqual(['2028-01-10', '2028-01-10', 'confirmation'])
    expect([at('2027-07-11').confirmationDue, at('2027-07-11').lapsesOn, at('2027-07-11').lapsedBy]).toEqual(['2028-01-11', '2028-01-10', 'revalidation'])
  })
  it('an unknown route is refused with its message', () => {
    expect(() => isoValidity({ testDate: '2025-01-10', route: 'd' as never, today: '2025-02-01', records: [] })).toThrow('route: ISO 9606-1 9.3 routes are a, b and c; got "d"')
  })
})

describe('ISO 9606-1 designation parts (clause 10 as S2 writes it)', () => {
  it('both sides: gouging follows "bs" on a butt weld only', () => {
    const base = { processes: [{ process: '111', depositThickness: 10 }], form: 'plate' as const, weld: 'groove' as const, fillerGroup: 1, fillerType: 'B', positions: ['PA'] }
    expect(designation({ ...base, details: 'bs', gouging: 'gg' })).toBe('ISO 9606-1 111 P BW FM1 B s10 PA bs gg')
    expect(designation({ ...base, details: 'ss nb', gouging: 'gg' })).toBe('ISO 9606-1 111 P BW FM1 B s10 PA ss nb')
    expect(designation({ ...base, weld: 'fillet', details: 'bs', gouging: 'gg', couponThickness: 10 })).toBe('ISO 9606-1 111 P FW FM1 B t10 PA bs')
  })
  it('no process: "?"; pipe without D: "D?"; decimals rounded to two places', () => {
    expect(designation({ processes: [], form: 'pipe', weld: 'fillet', couponThickness: 3.456, positions: ['PB', 'PD'] })).toBe('ISO 9606-1 ? T FW FM? ? t3,46 D? PB PD')
  })
})
