import { describe, expect, it } from 'vitest'
import { ok, refused } from './helpers'

// The window is the shop's own WPS; the values are a demo window (the WPS is the limit, not a code table).
const window = { volts: { min: 17, max: 19 }, amps: { min: 110, max: 150 }, wireFeedSpeed: { min: 200, max: 300 }, travelSpeed: { min: 8, max: 14 }, ctwd: { min: 0.375, max: 0.625 }, gasFlow: { min: 25, max: 40 } }
const check = (readings: Record<string, number>) => ok({ code: 'asme-ix', check: 'readings', unit: 'in', input: { window, readings } })

describe('production readings against the WPS window', () => {
  it('every reading inside: within, each with its limit', () => {
    const r = check({ volts: 18, amps: 140, wireFeedSpeed: 250, travelSpeed: 12, ctwd: 0.5, gasFlow: 30 })
    expect(r.within).toBe(true)
    expect(r.checks).toHaveLength(6)
  })
  it('the window edges are inside, exactly (19 V against 19 V; 5/8 in CTWD)', () => {
    expect(check({ volts: 19, ctwd: 0.625 }).within).toBe(true)
  })
  it('a reading outside is named with its limit', () => {
    const r = check({ volts: 19.1, amps: 140 })
    expect(r.within).toBe(false)
    expect(r.checks).toEqual([expect.objectContaining({ parameter: 'volts', within: false, limit: { min: 17, max: 19 } }), expect.objectContaining({ parameter: 'amps', within: true })])
  })
  it('refuses a reading the window has no limit for', () => {
    expect(refused({ code: 'asme-ix', check: 'readings', unit: 'in', input: { window: { volts: { min: 17, max: 19 } }, readings: { amps: 140 } } })).toContain('no current')
  })
})
