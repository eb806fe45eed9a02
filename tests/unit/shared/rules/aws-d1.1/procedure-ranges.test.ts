import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { ok } from '../helpers'

const pr = (input: Record<string, unknown>, edition = '2020', unit: 'in' | 'mm' = 'in') => ok({ code: 'aws-d1.1', check: 'procedure-ranges', unit, edition, input })

describe('AWS D1.1 WPS qualified by test: PQR thickness (Table 4.2 in 2015, Clause 6 from 2020; from memory)', () => {
  it('3/8 in plate qualifies 1/8 to 3/4 in with 2 face + 2 root bends (from memory)', () => {
    const r = pr({ process: 'SMAW', couponThickness: 0.375 })
    expect(r.baseMetal).toEqual({ min: 0.125, max: 0.75 })
    expect(r.specimens).toEqual({ tension: 2, face: 2, root: 2, side: 0 })
  })
  it('3/4 in plate qualifies 1/8 to 1-1/2 in (2T, from memory); 1 in and over: unlimited with 4 side bends (from memory)', () => {
    expect(pr({ process: 'FCAW', couponThickness: 0.75 }).baseMetal).toEqual({ min: 0.125, max: 1.5 })
    const thick = pr({ process: 'FCAW', couponThickness: 1 })
    expect(thick.baseMetal).toEqual({ min: 0.125, max: null })
    expect(thick.specimens).toEqual({ tension: 2, face: 0, root: 0, side: 4 })
  })
  it('with CVN testing: T or 5/8 in, whichever is less; 1/8 in under 1/4 in T (Table 4.6 line 2, quoted on weldinginspections.net)', () => {
    expect((pr({ process: 'SMAW', couponThickness: 1, toughness: true }).baseMetal as { min: number }).min).toBe(0.625)
    expect((pr({ process: 'SMAW', couponThickness: 0.5, toughness: true }).baseMetal as { min: number }).min).toBe(0.5)
    expect((pr({ process: 'SMAW', couponThickness: 0.1875, toughness: true }).baseMetal as { min: number }).min).toBe(0.125)
  })
  it('names Table 4.2 in 2015', () => {
    expect((pr({ process: 'SMAW', couponThickness: 0.375 }, '2015').reasons as { clause: string }[])[0]!.clause).toBe('Table 4.2')
  })
  it('positions: each test qualifies its own position (from memory); 6GR all', () => {
    expect(pr({ process: 'SMAW', couponThickness: 0.375, testPositions: ['2G'] }).positions).toEqual(['H'])
    expect(pr({ process: 'SMAW', couponThickness: 0.375, testPositions: ['6GR'] }).positions).toEqual(['F', 'H', 'V', 'O'])
  })
  it('lists what needs requalification (Table 4.5 in 2015, from memory)', () => {
    expect((pr({ process: 'SMAW', couponThickness: 0.375 }).requalification as string[]).some(s => s.includes('preheat'))).toBe(true)
  })
  // Backward compatible: the request without the new input still answers as before for ASME.
  it('ASME procedure-ranges answers as before (ASME BPVC IX-2017 Table QW-451.1: a 1 in coupon qualifies 3/16 to 2 in)', () => {
    expect(ok({ code: 'asme-ix', check: 'procedure-ranges', unit: 'in', input: { process: 'SMAW', couponThickness: 1 } }).baseMetal).toEqual({ min: 0.1875, max: 2 })
  })
  it('property: a thicker D1.1 PQR never qualifies a smaller maximum (Table 4.2 bands)', () => {
    fc.assert(fc.property(fc.integer({ min: 8, max: 400 }), fc.integer({ min: 1, max: 100 }), (sixtyFourths, step) => {
      const a = sixtyFourths / 64
      const b = (sixtyFourths + step) / 64
      const maxOf = (t: number) => (pr({ process: 'GMAW', transfer: 'spray', couponThickness: t }).baseMetal as { max: number | null }).max
      const ma = maxOf(a)
      const mb = maxOf(b)
      return mb === null || (ma !== null && mb >= ma)
    }), { numRuns: 60 })
  })
})
