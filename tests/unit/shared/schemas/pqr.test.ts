import { describe, expect, it } from 'vitest'
import { pqrDraftSchema, pqrResultsSchema, psiToMpa } from '../../../../shared/schemas/pqr'

const smaw = { name: 'all passes', process: 'SMAW', transfer: null, fillerMetalId: 1, depositThickness: 0.375 }
const coupon = {
  number: 'PQR-1', testDate: '2026-03-02', code: 'asme-ix', edition: '2023', unit: 'in',
  couponThickness: 0.375, baseMetalId: 2, toughnessRequired: false, actuals: {}, labReportNumber: null, layers: [smaw],
}
const issues = (schema: typeof pqrDraftSchema | typeof pqrResultsSchema, value: unknown) => {
  const result = schema.safeParse(value)
  if (result.success) return {}
  const first: Record<string, string> = {}
  for (const i of result.error.issues) first[i.path.join('.')] ??= i.message
  return first
}

describe('pqrDraftSchema: the coupon as welded', () => {
  it('accepts a coupon; a picked id may come as text from a select', () => {
    expect(pqrDraftSchema.parse({ ...coupon, baseMetalId: '2' }).baseMetalId).toBe(2)
    expect(pqrDraftSchema.parse({ ...coupon, baseMetalBId: '3', welderId: '4' })).toMatchObject({ baseMetalBId: 3, welderId: 4 })
    expect(pqrDraftSchema.parse(coupon)).toMatchObject({ baseMetalBId: null, welderId: null })
  })
  it('a combination coupon: its deposits together are not thicker than the coupon; an autogenous GTAW layer needs no filler', () => {
    const gtaw = { name: 'root', process: 'GTAW', transfer: null, fillerMetalId: null, depositThickness: 0.125 }
    expect(issues(pqrDraftSchema, { ...coupon, layers: [gtaw, { ...smaw, depositThickness: 0.25 }] })).toEqual({})
    expect(issues(pqrDraftSchema, { ...coupon, layers: [gtaw, smaw] }).layers).toBe('The deposits together cannot be thicker than the coupon')
    expect(issues(pqrDraftSchema, { ...coupon, layers: [{ ...smaw, fillerMetalId: null }] })['layers.0.fillerMetalId']).toBe('Pick the filler metal')
    expect(issues(pqrDraftSchema, { ...coupon, layers: [] }).layers).toBe('Add at least one layer')
  })
  it('names what is wrong', () => {
    expect(issues(pqrDraftSchema, { ...coupon, baseMetalId: '' }).baseMetalId).toBe('Pick the base metal')
    expect(issues(pqrDraftSchema, { ...coupon, couponThickness: 0 }).couponThickness).toBe('the coupon thickness must be more than 0')
    expect(issues(pqrDraftSchema, { ...coupon, layers: [{ ...smaw, depositThickness: 0.5 }] })['layers.0.depositThickness']).toBe('The deposit cannot be thicker than the coupon')
    expect(issues(pqrDraftSchema, { ...coupon, testDate: '2026-02-30' }).testDate).toBe('Enter a real date')
    expect(issues(pqrDraftSchema, { ...coupon, layers: [{ ...smaw, process: 'GMAW' }] })['layers.0.transfer']).toBe('Pick the GMAW transfer mode')
  })
})

describe('pqrResultsSchema: the inspector\'s results', () => {
  const results = { version: 1, tensile: [{ label: 'T1', width: 0.75, thickness: 0.375, load: 22500, breakLocation: 'base metal' }], bends: [{ type: 'face', largestIndication: 0 }] }
  it('accepts results and fills defaults', () => {
    const parsed = pqrResultsSchema.parse(results)
    expect(parsed.bends[0]!.atCorner).toBe(false)
    expect(parsed.toughness).toBeNull()
  })
  it('refuses a specimen with no size or an unknown break location', () => {
    const found = issues(pqrResultsSchema, { ...results, tensile: [{ ...results.tensile[0], width: -1, breakLocation: 'somewhere' }] })
    expect(found['tensile.0.width']).toBe('the width must be more than 0')
    expect(found['tensile.0.breakLocation']).toBe('Pick where it broke')
    expect(issues(pqrResultsSchema, { ...results, bends: [{ type: 'twist', largestIndication: 0 }] })['bends.0.type']).toBe('Pick the bend type')
  })
})

describe('psiToMpa', () => {
  it('1 psi = 6894.757 Pa (NIST SP 811, Appendix B.8): 70 000 psi = 482.633 MPa', () => {
    expect(psiToMpa(70000)).toBe(482.633)
    expect(psiToMpa(58000)).toBe(399.896)
  })
})
