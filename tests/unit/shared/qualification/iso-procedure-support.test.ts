import { describe, expect, it } from 'vitest'
import { supportCheck, type SupportPqr, type SupportWps } from '../../../../shared/qualification/procedure-support'

// A WPS recorded with the ISO code is checked as ISO 15609-1 against ISO 15614-1 WPQRs (clause 8, from memory); what the
// record does not hold is "cannot tell", and approval stays a check by hand (house rule: never a false yes).
const pqr: SupportPqr = {
  id: 1, number: 'WPQR-1', code: 'iso-9606-1', edition: '2017', unit: 'mm', process: 'GMAW', transfer: 'spray', couponThickness: 15,
  depositThickness: 15, toughnessTested: true, heatInput: 1600, fNumber: '6', pNumber: '1.2', status: 'certified', resultsPass: true,
}
const wps: SupportWps = { code: 'iso-9606-1', edition: '2017', unit: 'mm', process: 'GMAW', thickness: { groove: { min: 8, max: 30 } }, toughnessRequired: true, baseMetals: { a: { pNumber: '1.2' } }, electrical: { heatInputMax: 2000 } }

describe('ISO 15609-1 WPS support in the app (ISO 15614-1, from memory)', () => {
  it('compares process (8.4.1), thickness (Table 6: 7.5 to 30 mm for t = 15) and heat input (8.4.8: 1.6 × 1.25 = 2.0 kJ/mm)', () => {
    const check = supportCheck(wps, [pqr])
    const met = (clause: string) => check.findings.find(f => f.clause === clause)?.met
    expect(met('ISO 15614-1, 8.4.1')).toBe(true)
    expect(met('ISO 15614-1, Table 6')).toBe(true)
    expect(met('ISO 15614-1, 8.4.8')).toBe(true)
    expect(check.supported).toBe(false) // positions, preheat, filler designation are not held: check by hand
    expect(check.findings.some(f => f.text.startsWith('Cannot tell'))).toBe(true)
  })
  it('a WPS thicker than 2t or with 25 % more heat input is not met (Table 6; 8.4.8)', () => {
    const check = supportCheck({ ...wps, thickness: { groove: { min: 8, max: 31 } }, electrical: { heatInputMax: 2100 } }, [pqr])
    expect(check.findings.find(f => f.clause === 'ISO 15614-1, Table 6')?.met).toBe(false)
    expect(check.findings.find(f => f.clause === 'ISO 15614-1, 8.4.8')?.met).toBe(false)
  })
})
