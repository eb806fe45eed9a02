import { describe, expect, it } from 'vitest'
import { ok } from '../helpers'

const support = (wps: Record<string, unknown>, pqrs: unknown[], edition?: string) =>
  ok({ code: 'asme-ix', check: 'wps-support', unit: 'in', ...(edition ? { edition } : {}), input: { wps, pqrs } })
// A toughness-tested PQR supports a toughness WPS only with its Charpy results recorded and accepted (values invented, judged against themselves).
const charpy = { toughnessResults: { specimens: [{ energy: 30 }, { energy: 28 }, { energy: 32 }], acceptance: { averageEnergy: 20, singleEnergy: 15 } } }
const violations = (r: Record<string, unknown>) => (r.violations as { clause: string }[]).map(v => v.clause)

describe('ASME IX WPS supported by its PQRs, variable by variable (QW-451.1 ranges from the 2017 table)', () => {
  it('a 1 in SMAW PQR supports a 3/16 to 2 in WPS (QW-451.1)', () => {
    expect(support({ process: 'SMAW', thickness: { min: 0.1875, max: 2 } }, [{ process: 'SMAW', couponThickness: 1 }]).supported).toBe(true)
  })
  it('a WPS beyond 2T is a QW-403.8 violation', () => {
    const r = support({ process: 'SMAW', thickness: { min: 0.1875, max: 2.5 } }, [{ process: 'SMAW', couponThickness: 1 }])
    expect(r.supported).toBe(false)
    expect(violations(r)).toContain('QW-403.8, QW-451.1')
  })
  it('two PQRs join: 3/16 in (1/16–3/8) and 1-1/2 in (3/16–8) support 1/16 to 8 in', () => {
    const r = support({ process: 'SMAW', thickness: { min: 0.0625, max: 8 } }, [{ process: 'SMAW', couponThickness: 0.1875 }, { process: 'SMAW', couponThickness: 1.5 }])
    expect(r.supported).toBe(true)
  })
  it('toughness on the WPS: minimum per QW-403.6 and a toughness-tested PQR', () => {
    expect(violations(support({ process: 'SMAW', toughness: true, thickness: { min: 0.1875, max: 2 } }, [{ process: 'SMAW', couponThickness: 1, toughness: true, ...charpy }]))).toContain('QW-403.8, QW-451.1')
    expect(support({ process: 'SMAW', toughness: true, thickness: { min: 0.625, max: 2 } }, [{ process: 'SMAW', couponThickness: 1, toughness: true, ...charpy }]).supported).toBe(true)
    expect(violations(support({ process: 'SMAW', toughness: true, thickness: { min: 0.625, max: 2 } }, [{ process: 'SMAW', couponThickness: 1 }]))).toContain('QW-403.6')
  })
  it('heat input above the PQR with toughness required is a QW-409.1 violation (12,880 J/in worked example)', () => {
    const pqr = { process: 'GMAW', transfer: 'spray', couponThickness: 1, toughness: true, heatInput: 12880, ...charpy }
    expect(support({ process: 'GMAW', transfer: 'spray', toughness: true, heatInputMax: 12880, thickness: { min: 0.625, max: 2 } }, [pqr]).supported).toBe(true)
    expect(violations(support({ process: 'GMAW', transfer: 'spray', toughness: true, heatInputMax: 13000, thickness: { min: 0.625, max: 2 } }, [pqr]))).toContain('QW-409.1')
  })
  it('GMAW-S up to 2019: a 1/4 in PQR supports 1.1T = 0.275 in, not 1/2 in (QW-403.10)', () => {
    const pqr = { process: 'GMAW', transfer: 'short-circuit', couponThickness: 0.25 }
    expect(violations(support({ process: 'GMAW', transfer: 'short-circuit', thickness: { min: 0.0625, max: 0.5 } }, [pqr], '2019'))).toContain('QW-403.8, QW-451.1')
    expect(support({ process: 'GMAW', transfer: 'short-circuit', thickness: { min: 0.0625, max: 0.5 } }, [pqr], '2023').supported).toBe(true)
  })
  it('a different process or transfer mode is named as its own violation', () => {
    expect(violations(support({ process: 'GTAW', thickness: { min: 0.1875, max: 2 } }, [{ process: 'SMAW', couponThickness: 1 }]))).toContain('QW-200.2')
    expect(violations(support({ process: 'GMAW', transfer: 'short-circuit', thickness: { min: 0.1875, max: 2 } }, [{ process: 'GMAW', transfer: 'spray', couponThickness: 1 }]))).toContain('QW-409.2')
  })
})
