import dayjs from 'dayjs'
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { ok, refused } from './helpers'

const asme = (lastUse: string, on: string) => ok({ code: 'asme-ix', check: 'continuity', unit: 'in', input: { lastUse, on } })
const d11 = (lastUse: string, on: string) => ok({ code: 'aws-d1.1', check: 'continuity', unit: 'in', input: { lastUse, on } })

describe('continuity', () => {
  it('ASME BPVC IX QW-322.1(a) "6 months or more": last use 2026-01-15 lapses on 2026-07-15 (docs/sources.md §A4 check case)', () => {
    expect(asme('2026-01-15', '2026-07-14')).toMatchObject({ lapsesOn: '2026-07-15', current: true, lastCurrentDay: '2026-07-14' })
    expect(asme('2026-01-15', '2026-07-15')).toMatchObject({ lapsesOn: '2026-07-15', current: false })
  })

  it('AWS D1.1-2020 6.2.3 "a period exceeding six months": current on 2026-07-15, lapsed on 2026-07-16', () => {
    expect(d11('2026-01-15', '2026-07-15')).toMatchObject({ lapsesOn: '2026-07-16', current: true })
    expect(d11('2026-01-15', '2026-07-16')).toMatchObject({ current: false })
    expect(d11('2026-01-15', '2026-07-15').reasons).toContainEqual(expect.objectContaining({ clause: '6.2.3' }))
    expect(ok({ code: 'aws-d1.1', edition: '2015', check: 'continuity', unit: 'in', input: { lastUse: '2026-01-15', on: '2026-02-01' } }).reasons)
      .toContainEqual(expect.objectContaining({ clause: '4.2.3.1' }))
  })

  it('month ends clamp (docs/sources.md §A4 convention): Aug 31 + 6 months = Feb 28, Feb 29 in a leap year', () => {
    expect(asme('2025-08-31', '2025-09-01').lapsesOn).toBe('2026-02-28')
    expect(asme('2027-08-31', '2027-09-01').lapsesOn).toBe('2028-02-29')
    expect(d11('2025-08-31', '2025-09-01').lapsesOn).toBe('2026-03-01')
  })

  it('carries the rule text and the convention for the screens', () => {
    const result = asme('2026-01-15', '2026-03-01')
    expect(String(result.rule)).toContain('6 months or more')
    expect(String(result.convention)).toContain('six calendar months')
    expect(String(result.caution)).toContain('final word')
  })

  it('ISO 9606-1 9.2 six-monthly confirmation (secondary source) lapses on the anniversary', () => {
    const result = ok({ code: 'iso-9606-1', check: 'continuity', unit: 'mm', input: { lastUse: '2026-01-15', on: '2026-07-15' } })
    expect(result).toMatchObject({ lapsesOn: '2026-07-15', current: false })
  })

  it('refuses impossible dates and an "on" before the last use', () => {
    expect(refused({ code: 'asme-ix', check: 'continuity', unit: 'in', input: { lastUse: '2026-02-30', on: '2026-03-01' } })).toContain('not a calendar date')
    expect(refused({ code: 'asme-ix', check: 'continuity', unit: 'in', input: { lastUse: '2026-03-01', on: '2026-02-01' } })).toContain('before lastUse')
    expect(refused({ code: 'asme-ix', check: 'continuity', unit: 'in', input: { lastUse: '15/01/2026', on: '2026-02-01' } })).toContain('YYYY-MM-DD')
  })

  it('property: agrees with dayjs (a second date library) on the lapse day, both conventions', () => {
    const days = fc.integer({ min: 0, max: 365 * 30 }).map(n => dayjs('2000-01-01').add(n, 'day'))
    fc.assert(fc.property(days, (last) => {
      const lastUse = last.format('YYYY-MM-DD')
      const anniversary = last.add(6, 'month')
      expect(asme(lastUse, lastUse).lapsesOn).toBe(anniversary.format('YYYY-MM-DD'))
      expect(d11(lastUse, lastUse).lapsesOn).toBe(anniversary.add(1, 'day').format('YYYY-MM-DD'))
    }), { numRuns: 300 })
  })

  it('property: current exactly on the days before the lapse day', () => {
    const pair = fc.tuple(fc.integer({ min: 0, max: 365 * 20 }), fc.integer({ min: 0, max: 400 }))
    fc.assert(fc.property(pair, ([start, gap]) => {
      const last = dayjs('2005-01-01').add(start, 'day')
      const on = last.add(gap, 'day').format('YYYY-MM-DD')
      const result = asme(last.format('YYYY-MM-DD'), on)
      expect(result.current).toBe(on < String(result.lapsesOn))
    }), { numRuns: 300 })
  })
})
