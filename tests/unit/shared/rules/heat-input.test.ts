import { describe, expect, it } from 'vitest'
import { ok, refused } from './helpers'

const hi = (input: Record<string, unknown>, unit: 'in' | 'mm' = 'in', code = 'asme-ix') => ok({ code, check: 'heat-input', unit, input })

describe('heat input, ASME IX QW-409.1 (weldinginspections.net, eng-tips 213479; Appendix H 2023)', () => {
  it('(a) worked example: 18.4 V × 140 A × 60 / 12 in/min = 12,880 J/in', () => {
    const r = hi({ volts: 18.4, amps: 140, travelSpeed: 12 })
    expect(r).toMatchObject({ heatInput: 12880, perUnit: 'J/in', method: 'volts-amps' })
    expect(r.reasons).toContainEqual(expect.objectContaining({ clause: 'QW-409.1(a)' }))
  })
  it('the same weld in SI: 304.8 mm/min gives about 507 J/mm', () => {
    expect(hi({ volts: 18.4, amps: 140, travelSpeed: 304.8 }, 'mm').heatInput).toBeCloseTo(507.09, 2)
  })
  it('(c) energy and power methods', () => {
    expect(hi({ energy: 128800, weldLength: 10 })).toMatchObject({ heatInput: 12880, method: 'energy' })
    expect(hi({ power: 2576, arcTime: 50, weldLength: 10 })).toMatchObject({ heatInput: 12880, method: 'power' })
  })
  it('other codes give arc energy as common practice', () => {
    expect(hi({ volts: 18.4, amps: 140, travelSpeed: 12 }, 'in', 'aws-d1.1').reasons).toContainEqual(expect.objectContaining({ basis: 'convention' }))
  })
  it('refuses mixed or incomplete methods with field messages', () => {
    expect(refused({ code: 'asme-ix', check: 'heat-input', unit: 'in', input: { volts: 18 } })).toContain('input.amps')
    expect(refused({ code: 'asme-ix', check: 'heat-input', unit: 'in', input: { volts: 18, amps: 140, travelSpeed: 12, energy: 5 } })).toContain('exactly one method')
    expect(refused({ code: 'asme-ix', check: 'heat-input', unit: 'in', input: { volts: 18, amps: 140, travelSpeed: 0 } })).toContain('travelSpeed must be more than 0')
  })
})
