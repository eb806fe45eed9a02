import { createRequire } from 'node:module'
import { describe, expect, it } from 'vitest'
import { convertDraft, convertValue } from '../../../../shared/qualification/procedure-units'
import { blankProcedureDraft } from '../../../../shared/schemas/procedure'

type Convert = (value: number) => { from: (unit: string) => { to: (unit: string) => number } }
// Cross-checked with convert-units, not with the code under test; its own factors are rounded, so within 1e-6 relative.
const convert = createRequire(import.meta.url)('convert-units') as Convert
const relative = (a: number, b: number) => Math.abs(a - b) / Math.abs(b)

describe('inch ↔ millimetre records, converted exactly', () => {
  it('lengths and speeds: 1 in = 25.4 mm exactly (NIST SP 811, B.8)', () => {
    expect(convertValue(1, 'length', 'in', 'mm')).toBe(25.4)
    expect(convertValue(0.1345, 'length', 'in', 'mm')).toBe(3.4163)
    expect(relative(convertValue(0.1345, 'length', 'in', 'mm'), convert(0.1345).from('in').to('mm'))).toBeLessThan(1e-6)
    expect(convertValue(14, 'speed', 'in', 'mm')).toBe(355.6)
    expect(convertValue(3.4163, 'length', 'mm', 'in')).toBe(0.1345)
  })
  it('gas flow: 1 ft³ = 28.316846592 L exactly (NIST SP 811, B.8), so 30 ft³/h = 14.158423296 L/min', () => {
    expect(convertValue(30, 'flow', 'in', 'mm')).toBe(14.158423296)
    expect(relative(convertValue(30, 'flow', 'in', 'mm'), convert(30).from('ft3/h').to('l/min'))).toBeLessThan(1e-6)
  })
  it('heat input per length: J/in ÷ 25.4 = J/mm (common practice)', () => {
    expect(convertValue(25400, 'heat', 'in', 'mm')).toBe(1000)
    expect(convertValue(1000, 'heat', 'mm', 'in')).toBe(25400)
  })
  it('temperature: °C = (°F − 32) × 5/9 (NIST SP 811, B.8)', () => {
    expect(convertValue(50, 'temperature', 'in', 'mm')).toBe(10)
    expect(convertValue(350, 'temperature', 'in', 'mm')).toBeCloseTo(convert(350).from('F').to('C'), 6)
    expect(convertValue(100, 'temperature', 'mm', 'in')).toBe(212)
  })
  it('a whole draft: every value with a unit converts, empty ones stay empty, and the unit changes', () => {
    const draft = blankProcedureDraft()
    draft.thickness.groove = { min: 0.0625, max: 0.1345 }
    draft.layers[0]!.ctwd = { min: 0.375, max: 0.5, setPoint: null }
    draft.layers[0]!.amps = { min: 95, max: 135, setPoint: null }
    draft.layers[0]!.fillers[0]!.size = 0.035
    const mm = convertDraft(draft, 'in', 'mm')
    expect(mm.unit).toBe('mm')
    expect(mm.thickness.groove).toEqual({ min: 1.5875, max: 3.4163 })
    expect(mm.layers[0]!.ctwd).toEqual({ min: 9.525, max: 12.7, setPoint: null })
    expect(mm.layers[0]!.amps).toEqual({ min: 95, max: 135, setPoint: null })
    // 0.035 in × 25.4 = 0.889 mm (NIST SP 811, B.8)
    expect(mm.layers[0]!.fillers[0]!.size).toBe(0.889)
    expect(mm.thickness.fillet).toEqual({ min: null, max: null })
    expect(convertDraft(mm, 'mm', 'in').thickness.groove).toEqual({ min: 0.0625, max: 0.1345 })
    expect(draft.unit).toBe('in')
  })
})
