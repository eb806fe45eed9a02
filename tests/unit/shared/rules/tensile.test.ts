import { describe, expect, it } from 'vitest'
import { ok } from './helpers'

const t = (input: Record<string, number>, unit: 'in' | 'mm' = 'in') => ok({ code: 'asme-ix', check: 'tensile', unit, input })

describe('tensile strength = load / (width × thickness); acceptance ASME IX QW-153.1 (from memory)', () => {
  it('0.75 in × 0.375 in at 19,687.5 lbf is 70,000 psi: accepted against 70,000 psi exactly', () => {
    const r = t({ width: 0.75, thickness: 0.375, load: 19687.5, minimumStrength: 70000 })
    expect(r).toMatchObject({ strength: 70000, accepted: true })
    expect(r.reasons).toContainEqual(expect.objectContaining({ clause: 'QW-153.1', basis: 'memory' }))
  })
  it('one pound short of the minimum is rejected (exact comparison, no float slack)', () => {
    expect(t({ width: 0.75, thickness: 0.375, load: 19686.5, minimumStrength: 70000 }).accepted).toBe(false)
  })
  it('SI: 20 mm × 10 mm at 97,000 N is 485 MPa', () => {
    expect(t({ width: 20, thickness: 10, load: 97000, minimumStrength: 485 }, 'mm')).toMatchObject({ strength: 485, accepted: true })
  })
})
