import { describe, expect, it } from 'vitest'
import { findingsFor, handCheckNeeded, pqrQualifies, supportCheck, type SupportPqr, type SupportWps } from '../../../../shared/qualification/procedure-support'

// A 10 ga (0.1345 in) short-circuit GMAW coupon, P-No. 1, F-No. 6, welded to the 2019 edition.
const coupon = (over: Partial<SupportPqr> = {}): SupportPqr => ({
  id: 1, number: 'PQR-A', code: 'asme-ix', edition: '2019', unit: 'in', process: 'GMAW', transfer: 'short-circuit',
  couponThickness: 0.1345, depositThickness: 0.1345, toughnessTested: false, heatInput: null, fNumber: '6', pNumber: '1',
  status: 'certified', resultsPass: true, ...over,
})
const wps = (over: Partial<SupportWps> = {}): SupportWps => ({
  code: 'asme-ix', edition: '2019', unit: 'in', process: 'GMAW', transfer: 'short-circuit',
  thickness: { groove: { min: 0.0625, max: 0.1479 } }, baseMetals: { a: { pNumber: '1' }, b: { pNumber: '1' } },
  fillers: [{ fNumber: '6' }], ...over,
})

describe('supportCheck: a WPS against its supporting PQRs', () => {
  it('within what the coupon qualifies: supported, nothing blocks approval', () => {
    const check = supportCheck(wps(), [coupon()])
    expect(check.checked).toBe(true)
    expect(check.supported).toBe(true)
    expect(check.blockers).toEqual([])
    // ASME BPVC IX-2019, Table QW-451.1 (1/16 in to 2T) limited by QW-403.10 for GMAW-S under 1/2 in: 1.1T = 0.14795 in.
    expect(check.qualifies[0]!.baseMetal).toEqual({ min: 0.0625, max: 0.14795 })
  })

  it('a thickness over 1.1T is flagged on the thickness field with QW-403.8 and QW-451.1', () => {
    const check = supportCheck(wps({ thickness: { groove: { min: 0.0625, max: 0.25 } } }), [coupon()])
    expect(check.supported).toBe(false)
    const at = findingsFor(check, 'thickness.groove')
    expect(at.map(f => f.clause)).toEqual(['QW-403.8, QW-451.1'])
    expect(findingsFor(check, 'thickness.groove.max')).toHaveLength(1)
    expect(findingsFor(check, 'process')).toEqual([])
  })

  it('from the 2021 edition QW-403.10 no longer limits GMAW-S procedures: 2T = 0.269 in (ASME BPVC IX-2021, QW-255)', () => {
    const check = supportCheck(wps({ edition: '2021', thickness: { groove: { min: 0.0625, max: 0.25 } } }), [coupon({ edition: '2021' })])
    expect(check.supported).toBe(true)
  })

  it('spray transfer is not qualified by a short-circuit coupon (QW-409.2, from memory)', () => {
    const check = supportCheck(wps({ transfer: 'spray' }), [coupon()])
    expect(findingsFor(check, 'transfer').map(f => f.clause)).toEqual(['QW-409.2'])
  })

  it('another F-No. or another P-No. needs its own PQR (QW-404.4, QW-424.1, from memory)', () => {
    const check = supportCheck(wps({ fillers: [{ fNumber: '6' }, { fNumber: '4' }], baseMetals: { a: { pNumber: '8' }, b: { pNumber: '1' } } }), [coupon()])
    expect(findingsFor(check, 'fillers').map(f => f.clause)).toEqual(['QW-404.4'])
    expect(findingsFor(check, 'baseMetals').map(f => f.clause)).toEqual(['QW-424.1'])
  })

  it('a millimetre WPS is checked in millimetres against the inch coupon converted exactly (0.1345 in = 3.4163 mm)', () => {
    // SI column of Table QW-451.1: from 1.5 mm; QW-403.10: 1.1 × 3.4163 mm = 3.75793 mm.
    const inside = supportCheck(wps({ unit: 'mm', thickness: { groove: { min: 1.5, max: 3.75 } } }), [coupon()])
    expect(inside.supported).toBe(true)
    expect(inside.qualifies[0]!.baseMetal).toEqual({ min: 1.5, max: 3.75793 })
    expect(supportCheck(wps({ unit: 'mm', thickness: { groove: { min: 1.5, max: 3.8 } } }), [coupon()]).supported).toBe(false)
  })

  it('results not certified, or failed, block approval even when the ranges fit', () => {
    expect(supportCheck(wps(), [coupon({ status: 'recorded' })]).blockers.join(' ')).toMatch(/not certified/)
    const failed = supportCheck(wps(), [coupon({ status: 'failed', resultsPass: false })])
    expect(failed.blockers).toContain('No supporting PQR has certified results that pass (tensile and bends accepted).')
    expect(supportCheck(wps(), []).blockers).toEqual(['Pick at least one supporting PQR.'])
  })

  it('a code without procedure rules here is "not checked", never "supported"', () => {
    const check = supportCheck(wps({ code: 'aws-d1.3', edition: '2018' }), [coupon({ code: 'aws-d1.3', edition: '2018' })])
    expect(check.checked).toBe(false)
    expect(check.supported).toBe(false)
    expect(check.rulesMissing).toBe(true)
    expect(check.violations[0]!.text).toMatch(/no procedure-support rules for AWS D1.3/)
  })

  it('a PQR of another code does not support the WPS', () => {
    const check = supportCheck(wps(), [coupon({ code: 'aws-d1.1' })])
    expect(check.supported).toBe(false)
    expect(findingsFor(check, 'supportingPqrIds')).toHaveLength(1)
  })
})

describe('pqrQualifies', () => {
  it('T = 3/4 in SMAW qualifies 3/16 in to 1-1/2 in (ASME BPVC IX-2019, Table QW-451.1)', () => {
    const q = pqrQualifies(coupon({ process: 'SMAW', transfer: null, couponThickness: 0.75, depositThickness: 0.75 }), { code: 'asme-ix', edition: '2019', unit: 'in' })
    expect(q.baseMetal).toEqual({ min: 0.1875, max: 1.5 })
  })
})

describe('ranges a groove PQR does not limit (from memory)', () => {
  it('fillet thickness (QW-202.2(c)) and pipe diameter (QW-403) are noted as within support', () => {
    const draft = { ...wps(), thickness: { groove: { min: 0.0625, max: 0.1479 }, fillet: { min: 0.0625, max: 1 } }, diameter: { min: 2, max: null } }
    const check = supportCheck(draft, [coupon()])
    expect(check.supported).toBe(true)
    expect(check.findings.filter(f => f.met).map(f => f.clause)).toEqual(expect.arrayContaining(['QW-202.2(c)', 'QW-403']))
  })
})

describe('supportCheck for an AWS D1.1 WPS qualified by test (values invented; tables from memory)', () => {
  // A 3/8 in SMAW plate tested 3G at 50 °F, as welded: D1.1:2015 Table 4.2 (from memory) qualifies 1/8 to 3/4 in.
  const d11Pqr = (over: Partial<SupportPqr> = {}) => coupon({ code: 'aws-d1.1', edition: '2020', process: 'SMAW', transfer: null, couponThickness: 0.375, depositThickness: 0.375, fNumber: null, pNumber: null, preheat: 50, pwht: 'none', testPosition: '3G', ...over })
  const d11Wps = (over: Partial<SupportWps> = {}) => wps({ code: 'aws-d1.1', edition: '2020', process: 'SMAW', transfer: null, thickness: { groove: { min: 0.125, max: 0.75 } }, baseMetals: undefined, fillers: [{ fNumber: '4' }], preheatMin: 50, pwht: { required: false }, positions: ['V'], ...over })

  it('compared variables met: nothing outside support, the rest is left to the signed hand check', () => {
    const check = supportCheck(d11Wps(), [d11Pqr()])
    expect(check.checked).toBe(true)
    expect(check.rulesMissing).toBe(false)
    expect(check.violations.filter(v => !v.byHand)).toEqual([])
    expect(check.violations.some(v => v.byHand && v.clause === 'Table 6.5')).toBe(true)
    expect(check.supported).toBe(false)
    expect(handCheckNeeded(check)).toBe(true)
  })

  it('a preheat more than 25 °F under the PQR (D1.1:2015 Table 4.5, from memory) sits on the preheat field and blocks approval', () => {
    const check = supportCheck(d11Wps({ preheatMin: 20 }), [d11Pqr()])
    expect(findingsFor(check, 'preheatMin').map(f => f.clause)).toEqual(['Table 6.5'])
    expect(handCheckNeeded(check)).toBe(false)
  })

  it('overhead is not qualified by a 3G test (each test its own position, from memory); PWHT written as a temperature is PWHT', () => {
    expect(findingsFor(supportCheck(d11Wps({ positions: ['V', 'O'] }), [d11Pqr()]), 'positions')).toHaveLength(1)
    expect(findingsFor(supportCheck(d11Wps(), [d11Pqr({ pwht: null, pwhtTemperature: 1150 })]), 'pwht')).toHaveLength(1)
  })

  it('a PQR that does not record its test position: cannot tell, not approvable by statement', () => {
    const check = supportCheck(d11Wps(), [d11Pqr({ testPosition: null })])
    expect(findingsFor(check, 'positions')[0]!.text).toContain('not recorded')
    expect(handCheckNeeded(check)).toBe(false)
  })
})
