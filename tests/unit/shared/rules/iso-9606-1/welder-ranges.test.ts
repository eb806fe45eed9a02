import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { ok, refused } from '../helpers'

// ISO 9606-1:2012 ranges come from summary sheets of DIN EN ISO 9606-1:2013 (S1, S2) or from memory; each test says which.
const wr = (input: Record<string, unknown>) => ok({ code: 'iso-9606-1', check: 'welder-ranges', unit: 'mm', input })
const pos = (r: Record<string, unknown>) => r.positions as { groove: string[], fillet: string[] }

describe('ISO 9606-1 welder ranges', () => {
  it('S2 example 2 (summary sheet): 136 P BW FM1 B s15 PE ss nb → s ≥ 3 mm, PA, PC, PE, FM1 + FM2', () => {
    const r = wr({ process: '136', form: 'plate', weld: 'groove', testPositions: ['PE'], depositThickness: 15, fNumber: 1 })
    expect(r.thickness).toEqual({ min: 3, max: null })
    expect(pos(r).groove).toEqual(['PA', 'PC', 'PE'])
    expect(r.fillerGroups).toEqual(['FM1', 'FM2'])
  })
  it('S2 example 1 (summary sheet): 135 P FW FM1 S t10 PB ml → t ≥ 3 mm, PA and PB, 135 covers 138, short-circuit covers all modes', () => {
    const r = wr({ process: '135', transfer: 'short-circuit', form: 'plate', weld: 'fillet', testPositions: ['PB'], couponThickness: 10 })
    expect(r.thickness).toEqual({ min: 3, max: null })
    expect(pos(r).fillet).toEqual(['PA', 'PB'])
    expect(r.processes).toEqual(['135', '138'])
    expect(r.transfers).toEqual(['short-circuit', 'globular', 'spray', 'pulse'])
  })
  it('Table 6 middle band 3 mm to 2s (stahlnorm: 10 mm → 3–20 mm, weak corroboration); under 3 mm s to 2s', () => {
    expect(wr({ process: '111', form: 'plate', weld: 'groove', testPositions: ['PA'], depositThickness: 10 }).thickness).toEqual({ min: 3, max: 20 })
    expect(wr({ process: '111', form: 'plate', weld: 'groove', testPositions: ['PA'], depositThickness: 2 }).thickness).toEqual({ min: 2, max: 4 })
  })
  it('gas welding 311 uses 1.5 instead of 2 (Pruef-Norm sheet)', () => {
    expect(wr({ process: '311', form: 'plate', weld: 'groove', testPositions: ['PA'], depositThickness: 4 }).thickness).toEqual({ min: 3, max: 6 })
  })
  it('Table 7 under 3 mm: t to 3 mm (from memory)', () => {
    const r = wr({ process: '135', form: 'plate', weld: 'fillet', testPositions: ['PB'], couponThickness: 2 })
    expect(r.thickness).toEqual({ min: 2, max: 3 })
    expect(r.reasons).toContainEqual(expect.objectContaining({ clause: 'ISO 9606-1 Table 7', basis: 'memory' }))
  })
  it('Table 8 (summary sheet S1): D ≤ 25 mm → D to 2D; D > 25 mm → 0.5D and over, 25 mm minimum', () => {
    const d = (D: number) => wr({ process: '141', form: 'pipe', weld: 'groove', testPositions: ['PH'], depositThickness: 3, outsideDiameter: D }).diameter
    expect(d(25)).toEqual({ min: 25, max: 50 })
    expect(d(40)).toEqual({ min: 25, max: null })
    expect(d(114.3)).toEqual({ min: 57.15, max: null })
  })
  it('Table 9 rows from summary sheet S1', () => {
    const g = (t: string[], form = 'pipe') => pos(wr({ process: '141', form, weld: 'groove', testPositions: t, depositThickness: 3, outsideDiameter: 60 })).groove
    expect(g(['PF'], 'plate')).toEqual(['PA', 'PF'])
    expect(g(['PG'], 'plate')).toEqual(['PG'])
    expect(g(['PH'])).toEqual(['PA', 'PE', 'PF', 'PH'])
    expect(g(['PJ'])).toEqual(['PA', 'PE', 'PG', 'PJ'])
    expect(g(['H-L045'])).toEqual(['PA', 'PC', 'PE', 'PF', 'PH', 'H-L045'])
    expect(g(['PC', 'PH'])).toContain('H-L045')
  })
  it('Table 10 PD and PF rows are from memory and say so', () => {
    const r = wr({ process: '135', form: 'plate', weld: 'fillet', testPositions: ['PD'], couponThickness: 10 })
    expect(pos(r).fillet).toEqual(['PA', 'PB', 'PC', 'PD', 'PE'])
    expect(r.reasons).toContainEqual(expect.objectContaining({ clause: 'ISO 9606-1 Table 10', basis: 'memory' }))
  })
  it('prints in millimetres only: an inch request is refused', () => {
    expect(refused({ code: 'iso-9606-1', check: 'welder-ranges', unit: 'in', input: { process: '135', form: 'plate', weld: 'fillet', testPositions: ['PB'], couponThickness: 0.375 } })).toContain('"unit": "mm"')
  })
  it('a butt test does not cover fillets without the supplementary test; a pipe test over 25 mm covers plate', () => {
    const test = { process: '141', form: 'pipe', weld: 'groove', testPositions: ['H-L045'], depositThickness: 5, outsideDiameter: 60 }
    const covers = (production: Record<string, unknown>) => ok({ code: 'iso-9606-1', check: 'covers', unit: 'mm', input: { test, production } }).covered
    expect(covers({ process: '141', form: 'plate', weld: 'groove', position: 'PF', thickness: 8 })).toBe(true)
    expect(covers({ form: 'plate', weld: 'fillet', position: 'PB' })).toBe(false)
    expect(covers({ form: 'pipe', weld: 'groove', position: 'PG', outsideDiameter: 60 })).toBe(false)
  })
  it('property: adding a butt test position never shrinks the position set', () => {
    const all = ['PA', 'PC', 'PE', 'PF', 'PG', 'PH', 'PJ', 'H-L045', 'J-L045']
    fc.assert(fc.property(fc.subarray(all, { minLength: 1 }), fc.constantFrom(...all), (tests, extra) => {
      const g = (t: string[]) => pos(wr({ process: '141', form: 'pipe', weld: 'groove', testPositions: t, depositThickness: 3, outsideDiameter: 60 })).groove
      const before = g(tests)
      const after = g([...new Set([...tests, extra])])
      for (const p of before) expect(after).toContain(p)
    }))
  })
})
