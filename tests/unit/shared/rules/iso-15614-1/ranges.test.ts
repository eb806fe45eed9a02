import { createRequire } from 'node:module'
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { diameterRange, isoWpsSupport, positionRange, thicknessRange, wpqrRanges, type IsoWps, type WpqrTestPiece } from '../../../../../shared/rules/iso-15614-1'
import { ok, refused } from '../helpers'

const convert = createRequire(import.meta.url)('convert-units') as (value: number) => { from: (unit: string) => { to: (unit: string) => number } }

// ISO 15614-1:2017 clause 8 as remembered: every expected value below is FROM MEMORY (no public copy was read).
describe('ISO 15614-1 WPQR ranges (clause 8, from memory)', () => {
  it('Table 6: t ≤ 3 → 0.7t to 1.3t; 3 < t ≤ 12 → 3 to 2t; 12 < t ≤ 100 → 0.5t to 2t (from memory)', () => {
    expect(thicknessRange(2)).toEqual({ min: 1.4, max: 2.6 })
    expect(thicknessRange(10)).toEqual({ min: 3, max: 20 })
    expect(thicknessRange(20)).toEqual({ min: 10, max: 40 })
    expect(thicknessRange(120)).toEqual({ min: 50, max: 240 })
  })
  it('Table 7: D ≤ 25 → 0.5D to 2D; D > 25 → 0.5D and over, 25 mm minimum (from memory)', () => {
    expect(diameterRange(20)).toEqual({ min: 10, max: 40 })
    expect(diameterRange(168.3)).toEqual({ min: 84.15, max: null })
    expect(diameterRange(40)).toEqual({ min: 25, max: null })
  })
  it('8.4.2: one position approves all but vertical-down; PG approves PG only (from memory)', () => {
    expect(positionRange(['PA'])).toEqual(['PA', 'PB', 'PC', 'PD', 'PE', 'PF', 'PH', 'H-L045'])
    expect(positionRange(['PG'])).toEqual(['PG'])
  })
  it('8.4.8: with impact tests, heat input up to 25 % above the highest used; with hardness, 25 % below the lowest (from memory)', () => {
    const r = wpqrRanges({ processes: ['135'], form: 'plate', thickness: 15, positions: ['PA'], impactTested: true, hardnessTested: true, heatInputMax: 1.6, heatInputMin: 1.2 })
    expect(r.heatInput).toEqual({ min: 0.9, max: 2 })
  })
  it('8.4.7: interpass up to 50 °C above the test (from memory); 50 °C difference is 90 °F (convert-units cross-check)', () => {
    const r = wpqrRanges({ processes: ['111'], form: 'plate', thickness: 10, positions: ['PA'], interpassMax: 200 })
    expect(r.interpassMax).toBe(250)
    expect(convert(250).from('C').to('F') - convert(200).from('C').to('F')).toBeCloseTo(90, 9)
  })
  it('npm run rules: { code: "iso-15614-1", check: "wpqr-ranges" } answers with the caution; inches are refused', () => {
    const r = ok({ code: 'iso-15614-1', check: 'wpqr-ranges', input: { processes: ['135'], form: 'plate', thickness: 10, positions: ['PF'] } })
    expect(r.thickness).toEqual({ min: 3, max: 20 })
    expect(String(r.caution)).toContain('final word')
    expect(refused({ code: 'iso-15614-1', check: 'wpqr-ranges', unit: 'in', input: {} })).toContain('millimetres')
  })
})

describe('ISO 15609-1 WPS against ISO 15614-1 WPQRs (from memory)', () => {
  const piece: WpqrTestPiece = { processes: ['135'], form: 'plate', thickness: 15, positions: ['PA'], materialGroup: '1.2', impactTested: true, heatInputMax: 1.6, preheat: 20, interpassMax: 200, pwht: { done: false }, filler: 'ISO 14341-A G 42 4 M21 3Si1' }
  const wps: IsoWps = { processes: ['135'], form: 'plate', thickness: { min: 8, max: 30 }, positions: ['PA', 'PF'], materialGroup: '1.2', heatInput: { max: 2 }, preheatMin: 20, interpassMax: 250, pwht: { done: false }, filler: 'ISO 14341-A G 42 4 M21 3Si1' }
  it('a WPS inside every range is supported, each finding with its clause', () => {
    const r = isoWpsSupport(wps, [piece])
    expect(r.answer).toBe('supported')
    expect(r.findings.every(f => f.clause.startsWith('ISO 15614-1'))).toBe(true)
  })
  it('a variable not given is "cannot tell", never supported (house rule)', () => {
    expect(isoWpsSupport({ ...wps, preheatMin: undefined }, [piece]).answer).toBe('cannot-tell')
  })
  it('property: one essential variable changed to an unapproved value never leaves "supported"', () => {
    const bad = fc.oneof(
      fc.constantFrom('111', '141', '136').map(p => ({ processes: [p] })), // 8.4.1
      fc.double({ min: 30.01, max: 300, noNaN: true }).map(max => ({ thickness: { min: 8, max } })), // Table 6: 2t = 30
      fc.double({ min: 0.5, max: 7.49, noNaN: true }).map(min => ({ thickness: { min, max: 30 } })), // Table 6: 0.5t = 7.5
      fc.constantFrom('PG', 'PJ', 'J-L045').map(p => ({ positions: ['PA', p] })), // 8.4.2
      fc.double({ min: 2.01, max: 10, noNaN: true }).map(max => ({ heatInput: { max } })), // 8.4.8: 1.6 × 1.25 = 2
      fc.integer({ min: -40, max: 19 }).map(preheatMin => ({ preheatMin })), // 8.4.6
      fc.integer({ min: 251, max: 600 }).map(interpassMax => ({ interpassMax })), // 8.4.7
      fc.constant({ pwht: { done: true, temperature: 600, hours: 2 } }), // 8.4.9
      fc.constant({ filler: 'ISO 2560-A E 42 4 B 42' }), // 8.4.4
    )
    fc.assert(fc.property(bad, (change) => {
      expect(isoWpsSupport({ ...wps, ...change }, [piece]).answer).not.toBe('supported')
    }))
  })
})
