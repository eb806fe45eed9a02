import { createRequire } from 'node:module'
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import {
  diameterRange, heatInputRange, isoWpsSupport, positionRange, pwhtRange, thicknessRange, wpqrRanges, type IsoWps, type WpqrTestPiece,
} from '../../../../../shared/rules/iso-15614-1'
import { ok, refused } from '../helpers'

const convert = createRequire(import.meta.url)('convert-units') as (value: number) => { from: (unit: string) => { to: (unit: string) => number } }

// ISO 15614-1:2017 (level 2), clause 8 as remembered: EVERY expected value below is "from memory" (no public copy of the
// tables was read; SOURCES.md carries no ISO 15614-1 entry). Each test names the clause or table it is remembered from.
describe('ISO 15614-1:2017 WPQR ranges, one test per range (from memory)', () => {
  it('Table 6, multi-run (from memory): t ≤ 3 → 0.7t to 2t; 3 < t ≤ 12 → 3 to 2t; 12 < t ≤ 100 → 0.5t to 2t; t > 100 → 50 to 2t', () => {
    expect(thicknessRange(2)).toEqual({ min: 1.4, max: 4 })
    expect(thicknessRange(3)).toEqual({ min: 2.1, max: 6 }) // boundary: t = 3 is in the first band
    expect(thicknessRange(3.01)).toEqual({ min: 3, max: 6.02 })
    expect(thicknessRange(10)).toEqual({ min: 3, max: 20 })
    expect(thicknessRange(12)).toEqual({ min: 3, max: 24 })
    expect(thicknessRange(20)).toEqual({ min: 10, max: 40 })
    expect(thicknessRange(100)).toEqual({ min: 50, max: 200 })
    expect(thicknessRange(120)).toEqual({ min: 50, max: 240 })
  })
  it('Table 6, single-run (from memory): t ≤ 3 → 0.7t to 1.3t; 3 < t ≤ 12 → 0.5t (3 min) to 1.3t; 12 < t ≤ 100 → 0.5t to 1.1t; over 100 not given', () => {
    expect(thicknessRange(2, 'single')).toEqual({ min: 1.4, max: 2.6 })
    expect(thicknessRange(5, 'single')).toEqual({ min: 3, max: 6.5 })
    expect(thicknessRange(10, 'single')).toEqual({ min: 5, max: 13 })
    expect(thicknessRange(20, 'single')).toEqual({ min: 10, max: 22 })
    expect(() => thicknessRange(120, 'single')).toThrow(/check by hand/)
  })
  it('Table 7 (from memory): D ≤ 25 → 0.5D to 2D; D > 25 → 0.5D and over, 25 mm minimum', () => {
    expect(diameterRange(20)).toEqual({ min: 10, max: 40 })
    expect(diameterRange(25)).toEqual({ min: 12.5, max: 50 })
    expect(diameterRange(40)).toEqual({ min: 25, max: null })
    expect(diameterRange(168.3)).toEqual({ min: 84.15, max: null })
  })
  it('8.4.2 (from memory): one position qualifies all but vertical-down; PG, PJ, J-L045 qualify only themselves', () => {
    expect(positionRange(['PA'])).toEqual(['PA', 'PB', 'PC', 'PD', 'PE', 'PF', 'PH', 'H-L045'])
    expect(positionRange(['PG'])).toEqual(['PG'])
    expect(positionRange(['PF', 'J-L045'])).toEqual(['PA', 'PB', 'PC', 'PD', 'PE', 'PF', 'PH', 'H-L045', 'J-L045'])
    expect(() => positionRange(['2G'])).toThrow(/ISO 6947/)
  })
  it('8.4.8 (from memory): impact tests → up to +25 % of the highest heat input; hardness → down to −25 % of the lowest; neither → no limit', () => {
    expect(heatInputRange({ impactTested: true, hardnessTested: true, heatInputMax: 1.6, heatInputMin: 1.2 })).toEqual({ min: 0.9, max: 2 })
    expect(heatInputRange({ impactTested: true, heatInputMax: 1.6 })).toEqual({ min: null, max: 2 })
    expect(heatInputRange({})).toBeNull()
  })
  it('8.4.6 and 8.4.7 (from memory): preheat not below that used; interpass not above the highest reached (the narrower reading)', () => {
    const r = wpqrRanges({ processes: ['111'], form: 'plate', thickness: 10, positions: ['PA'], preheat: 80, interpassMax: 200 })
    expect(r.preheatMin).toBe(80)
    expect(r.interpassMax).toBe(200)
    // °C limits stay in °C: 200 °C is 392 °F (convert-units cross-check of the unit the standard prints)
    expect(convert(200).from('C').to('F')).toBeCloseTo(392, 9)
  })
  it('8.4.9 (from memory): PWHT as tested, holding temperature ±20 °C; as welded stays as welded', () => {
    expect(pwhtRange({ done: true, temperature: 580, hours: 2 })).toEqual({ done: true, temperature: { min: 560, max: 600 }, hours: 2 })
    expect(pwhtRange({ done: false })).toEqual({ done: false, temperature: null, hours: null })
    expect(pwhtRange(undefined)).toBeNull()
  })
  it('8.4.4 and 8.4.1 (from memory): the filler designation and the processes, in order, as tested', () => {
    const r = wpqrRanges({ processes: ['141', '135'], form: 'plate', thickness: 10, positions: ['PA'], filler: ' ISO 14341-A G 42 4 M21 3Si1 ', fillerGroup: '1' })
    expect(r.filler).toEqual({ designation: 'ISO 14341-A G 42 4 M21 3Si1', group: '1' })
    expect(r.processes).toEqual(['141', '135'])
  })
  it('every reason names its ISO 15614-1:2017 clause and says "memory"', () => {
    const r = wpqrRanges({ processes: ['135'], form: 'pipe', outsideDiameter: 168.3, thickness: 10, positions: ['PH'], preheat: 20, interpassMax: 250, pwht: { done: false }, filler: 'X' })
    expect(r.reasons.map(x => x.variable).sort()).toEqual(['diameter', 'filler', 'heat-input', 'interpass', 'material', 'position', 'preheat', 'process', 'pwht', 'thickness'])
    for (const x of r.reasons) {
      expect(x.clause).toMatch(/^ISO 15614-1:2017, 8\./)
      expect(x.basis).toBe('memory')
    }
  })
  it('npm run rules: { code: "iso-15614-1", check: "wpqr-ranges" } answers with the caution; inches are refused', () => {
    const r = ok({ code: 'iso-15614-1', check: 'wpqr-ranges', input: { processes: ['135'], form: 'plate', thickness: 10, positions: ['PF'] } })
    expect(r.thickness).toEqual({ min: 3, max: 20 })
    expect(String(r.caution)).toContain('final word')
    expect(refused({ code: 'iso-15614-1', check: 'wpqr-ranges', unit: 'in', input: {} })).toContain('millimetres')
  })
})

describe('ISO 15609-1 WPS against ISO 15614-1:2017 WPQRs (from memory)', () => {
  const piece: WpqrTestPiece = {
    processes: ['135'], form: 'plate', thickness: 15, positions: ['PA'], materialGroup: '1.2', impactTested: true, heatInputMax: 1.6, heatInputMin: 1.1,
    preheat: 20, interpassMax: 250, pwht: { done: false }, filler: 'ISO 14341-A G 42 4 M21 3Si1', fillerGroup: '1',
  }
  const wps: IsoWps = {
    processes: ['135'], form: 'plate', thickness: { min: 8, max: 30 }, positions: ['PA', 'PF'], materialGroup: '1.2', heatInput: { max: 2 },
    preheatMin: 20, interpassMax: 250, pwht: { done: false }, filler: 'ISO 14341-A G 42 4 M21 3Si1',
  }
  it('a WPS inside every range is supported, each variable met with its clause', () => {
    const r = isoWpsSupport(wps, [piece])
    expect(r.answer).toBe('supported')
    expect(r.findings.map(f => f.variable).sort()).toEqual(['diameter', 'filler', 'heat-input', 'interpass', 'material', 'position', 'preheat', 'process', 'pwht', 'thickness'])
    expect(r.findings.every(f => f.clause.startsWith('ISO 15614-1:2017, ') && f.state === 'met')).toBe(true)
  })
  it('a variable not recorded is "cannot tell: record …", never supported (house rule)', () => {
    const r = isoWpsSupport({ ...wps, preheatMin: undefined }, [piece])
    expect(r.answer).toBe('cannot-tell')
    expect(r.findings.find(f => f.variable === 'preheat')?.text).toMatch(/^Cannot tell: record the preheat on the WPS/)
    const noPiecePreheat = isoWpsSupport(wps, [{ ...piece, preheat: undefined }])
    expect(noPiecePreheat.findings.find(f => f.variable === 'preheat')?.text).toContain('on the WPQR')
  })
  it('what Rootface does not decide is "check by hand", never supported: another group (Table 3), another filler (8.4.4), a plate test for small pipe (8.3.2.2)', () => {
    for (const change of [{ materialGroup: '1.1' }, { filler: 'ISO 14341-A G 46 4 M21 4Si1' }, { form: 'pipe' as const, outsideDiameterMin: 200 }]) {
      const r = isoWpsSupport({ ...wps, ...change }, [piece])
      expect(r.answer).toBe('cannot-tell')
      expect(r.findings.some(f => f.state === 'by-hand' && f.text.startsWith('Check by hand'))).toBe(true)
    }
  })
  it('PWHT (8.4.9): a WPS held within ±20 °C for the tested time is met; another time is a check by hand', () => {
    const hot: WpqrTestPiece = { ...piece, pwht: { done: true, temperature: 600, hours: 2 } }
    expect(isoWpsSupport({ ...wps, pwht: { done: true, temperature: { min: 580, max: 620 }, hours: 2 } }, [hot]).answer).toBe('supported')
    expect(isoWpsSupport({ ...wps, pwht: { done: true, temperature: { min: 580, max: 620 }, hours: 3 } }, [hot]).answer).toBe('cannot-tell')
    expect(isoWpsSupport({ ...wps, pwht: { done: true, temperature: { min: 580, max: 621 }, hours: 2 } }, [hot]).answer).toBe('not-supported')
  })
  it('two WPQRs: the one that meets every variable is reported', () => {
    const r = isoWpsSupport(wps, [{ ...piece, processes: ['111'] }, piece])
    expect(r.answer).toBe('supported')
    expect(r.wpqr).toBe(1)
  })
  it('no WPQR: not supported', () => {
    expect(isoWpsSupport(wps, []).answer).toBe('not-supported')
  })
  it('property: one essential variable changed to an unqualified value never leaves "supported"', () => {
    const bad = fc.oneof(
      fc.constantFrom('111', '141', '136', '121').map(p => ({ processes: [p] })), // 8.4.1
      fc.constant({ processes: ['141', '135'] }), // 8.4.1: another combination
      fc.double({ min: 30.001, max: 300, noNaN: true }).map(max => ({ thickness: { min: 8, max } })), // Table 6: 2t = 30
      fc.double({ min: 0.5, max: 7.499, noNaN: true }).map(min => ({ thickness: { min, max: 30 } })), // Table 6: 0.5t = 7.5
      fc.constantFrom('PG', 'PJ', 'J-L045').map(p => ({ positions: ['PA', p] })), // 8.4.2
      fc.double({ min: 2.001, max: 10, noNaN: true }).map(max => ({ heatInput: { max } })), // 8.4.8: 1.6 × 1.25 = 2
      fc.constant({ heatInput: undefined }), // 8.4.8: impact tested, WPS limit not given
      fc.integer({ min: -40, max: 19 }).map(preheatMin => ({ preheatMin })), // 8.4.6
      fc.integer({ min: 251, max: 600 }).map(interpassMax => ({ interpassMax })), // 8.4.7
      fc.constant({ pwht: { done: true, temperature: { min: 580, max: 620 }, hours: 2 } }), // 8.4.9: PWHT added
      fc.constantFrom('ISO 2560-A E 42 4 B 42', 'ISO 14341-A G 42 4 M21 3Si1 X').map(filler => ({ filler })), // 8.4.4
      fc.constantFrom('1.1', '2', '8.1').map(materialGroup => ({ materialGroup })), // 8.3.1.1, Table 3
      fc.integer({ min: 1, max: 500 }).map(outsideDiameterMin => ({ form: 'pipe' as const, outsideDiameterMin })), // 8.3.2.2
    )
    fc.assert(fc.property(bad, (change) => {
      expect(isoWpsSupport({ ...wps, ...change } as IsoWps, [piece]).answer).not.toBe('supported')
    }), { numRuns: 400 })
  })
})
