import dayjs from 'dayjs'
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { confirmationChain, isoValidity, revalidationEnd } from '../../../../../shared/rules/iso-9606-1/validity'

// ISO 9606-1:2012 / EN ISO 9606-1:2017 clauses 9.2 and 9.3 as SOURCES.md F-C reads them on secondary pages (9.3 a/b/c
// verified on thewdc.co.uk; 9.2 on evroproces and necitservices). Dates are cross-checked with dayjs, not date-fns.
const plus = (day: string, n: number, unit: 'month' | 'year') => dayjs(day).add(n, unit).format('YYYY-MM-DD')

describe('ISO 9606-1 9.3 revalidation routes', () => {
  it('9.3 a): retest every 3 years', () => {
    expect(revalidationEnd('2025-03-14', 'a', [], '9999-12-31').expiresOn).toBe(plus('2025-03-14', 3, 'year'))
  })
  it('9.3 b): 2 years, extended by 2 years when production welds are tested in the last 6 months', () => {
    const end = plus('2024-05-20', 2, 'year')
    const inWindow = plus(end, -2, 'month')
    expect(revalidationEnd('2024-05-20', 'b', [], '9999-12-31').expiresOn).toBe(end)
    expect(revalidationEnd('2024-05-20', 'b', [inWindow], '9999-12-31').expiresOn).toBe(plus(end, 2, 'year'))
  })
  it('9.3 b): production welds tested before the last 6 months do not extend it', () => {
    const early = plus('2024-05-20', 1, 'year')
    const r = revalidationEnd('2024-05-20', 'b', [early], '9999-12-31')
    expect(r.expiresOn).toBe(plus('2024-05-20', 2, 'year'))
    expect(r.ignored).toEqual([early])
  })
  it('9.3 c): no end date (EN ISO 9606-1:2017)', () => {
    expect(revalidationEnd('2024-05-20', 'c', [], '9999-12-31').expiresOn).toBeNull()
  })
})

describe('ISO 9606-1 9.2 six-monthly confirmation', () => {
  it('each confirmation made before the six-month date moves the due date six months on (convention: before the date)', () => {
    const c1 = plus('2025-01-10', 5, 'month')
    const r = confirmationChain('2025-01-10', [c1], '9999-12-31')
    expect(r.lastConfirmed).toBe(c1)
    expect(r.confirmationDue).toBe(plus(c1, 6, 'month'))
  })
  it('a confirmation on or after the due date does not revive a lapsed certificate (necitservices: lapses whatever the 9.3 route)', () => {
    const late = plus('2025-01-10', 6, 'month')
    const r = confirmationChain('2025-01-10', [late], '9999-12-31')
    expect(r.confirmationDue).toBe(late)
    expect(r.ignored).toEqual([late])
  })
  it('month ends clamp: Aug 31 + 6 months = Feb 28 (dayjs agrees; common practice)', () => {
    expect(confirmationChain('2025-08-31', [], '9999-12-31').confirmationDue).toBe(plus('2025-08-31', 6, 'month'))
    expect(plus('2025-08-31', 6, 'month')).toBe('2026-02-28')
  })
  it('route c lapses when the confirmations stop; route a ends at 3 years even when confirmed (9.2 with 9.3)', () => {
    const confirmations = [1, 2, 3, 4, 5, 6, 7].map(k => ({ kind: 'confirmation' as const, on: plus('2020-02-03', 5 * k, 'month') }))
    const c = isoValidity({ testDate: '2020-02-03', route: 'c', records: confirmations, today: '2023-06-01' })
    expect(c.expiresOn).toBeNull()
    expect(c.lapsesOn).toBe(plus(confirmations.at(-1)!.on, 6, 'month'))
    expect(c.lapsedBy).toBe('confirmation')
    const a = isoValidity({ testDate: '2020-02-03', route: 'a', records: confirmations, today: '2023-06-01' })
    expect(a.lapsesOn).toBe(plus('2020-02-03', 3, 'year'))
    expect(a.lapsedBy).toBe('revalidation')
    expect(a.current).toBe(false)
  })
  it('every result names its clause (9.2, 9.3 a/b/c)', () => {
    const r = isoValidity({ testDate: '2025-01-10', route: 'b', records: [], today: '2025-02-01' })
    expect(r.reasons.map(x => x.clause)).toEqual(expect.arrayContaining(['ISO 9606-1, 9.2', 'ISO 9606-1, 9.3 b)']))
    expect(r.daysLeft).toBe(dayjs(plus('2025-01-10', 6, 'month')).diff(dayjs('2025-02-01'), 'day'))
  })
  it('property: the certificate never lapses later than six months after its last counted confirmation, nor after the route\'s end', () => {
    const day = fc.integer({ min: 0, max: 3000 }).map(n => dayjs('2018-01-01').add(n, 'day').format('YYYY-MM-DD'))
    fc.assert(fc.property(day, fc.array(day, { maxLength: 8 }), fc.constantFrom('a', 'b', 'c' as const), (test, dates, route) => {
      const r = isoValidity({ testDate: test, route, records: dates.map(on => ({ kind: 'confirmation', on })), today: '2030-01-01' })
      expect(r.lapsesOn <= plus(r.lastConfirmed, 6, 'month')).toBe(true)
      if (route === 'a') expect(r.lapsesOn <= plus(test, 3, 'year')).toBe(true)
      if (route === 'b') expect(r.lapsesOn <= plus(test, 2, 'year')).toBe(true)
    }))
  })
})
