import { describe, expect, it } from 'vitest'
import { welderTestSchema } from '../../../../shared/schemas/welder-test'
import { qualifiedRangesOf } from '../../../../shared/qualification/test-ranges'

// An ISO 9606-1 test in ISO terms: ISO 4063 processes (5.2), ISO 6947 positions (5.8, Tables 9 and 10), FM groups (5.5),
// weld details (5.9), the 9.3 route. The ASME/AWS form keeps its own words.
const iso = { fillerType: 'S', details: 'ss nb', gouging: null, examiner: 'A. Examiner', examiningBody: null, testMethods: ['VT', 'BT'], welderIdentification: null, route: 'b' }
const base = {
  welderId: 1, testDate: '2026-01-15', code: 'iso-9606-1', edition: '2017', unit: 'mm', form: 'plate', weld: 'groove', couponThickness: 10,
  processes: [{ process: '135', transfer: 'short-circuit', depositThickness: null, fNumber: null }], fNumber: '1', positions: ['PF'], examination: 'bend', iso,
}
const fields = (v: unknown) => {
  const r = welderTestSchema.safeParse(v)
  return r.success ? {} : r.error.flatten().fieldErrors as Record<string, string[]>
}

describe('welder test schema, ISO 9606-1', () => {
  it('accepts 135 P BW FM1 S t10 PF ss nb with an examiner and route b', () => {
    expect(welderTestSchema.safeParse(base).success).toBe(true)
  })
  it('refuses ASME process names and 1G–6G on an ISO test, and ISO numbers on an ASME test', () => {
    expect(Object.keys(fields({ ...base, processes: [{ process: 'GMAW', transfer: null, depositThickness: null, fNumber: null }] }))).toContain('processes')
    expect(fields({ ...base, positions: ['3G'] }).positions).toBeDefined()
    expect(Object.keys(fields({ ...base, code: 'asme-ix', edition: '2023', unit: 'in', iso: null }))).toContain('processes')
  })
  it('a fillet test is welded in a Table 10 position with sl or ml; a butt test with ss nb, ss mb or bs', () => {
    expect(fields({ ...base, weld: 'fillet', positions: ['PC'], examination: 'macro-fracture' }).positions).toBeDefined()
    expect(fields({ ...base, weld: 'fillet', positions: ['PB'], examination: 'macro-fracture' }).iso).toBeDefined()
    expect(welderTestSchema.safeParse({ ...base, weld: 'fillet', positions: ['PB'], examination: 'macro-fracture', iso: { ...iso, details: 'ml' } }).success).toBe(true)
  })
  it('needs the ISO block (examiner, methods, route) and FM1–FM6; ISO details on another code are refused', () => {
    expect(fields({ ...base, iso: null }).iso).toBeDefined()
    expect(fields({ ...base, fNumber: '7' }).fNumber).toBeDefined()
    expect(fields({ ...base, iso: { ...iso, examiner: '' } }).iso).toBeDefined()
    expect(fields({ ...base, code: 'asme-ix', edition: '2023', unit: 'in', processes: [{ process: 'GMAW', transfer: null, depositThickness: null, fNumber: null }], positions: ['3G'] }).iso).toBeDefined()
  })
  it('the stored test ranges in ISO terms: t10 butt → 3 to 20 mm (Table 6, summary sheet), PF → PA, PF (Table 9), FM1 → FM1, FM2', () => {
    const r = qualifiedRangesOf({ code: 'iso-9606-1', edition: '2017', unit: 'mm', process: '135', form: 'plate', weld: 'groove', couponThickness: 10, depositThickness: null, fNumber: '1', positions: ['PF'], iso })
    expect('error' in r).toBe(false)
    const ok = r as unknown as { thickness: unknown, positions: { groove: string[] }, fillerGroups: string[] }
    expect(ok.thickness).toEqual({ min: 3, max: 20 })
    expect(ok.positions.groove).toEqual(['PA', 'PF'])
    expect(ok.fillerGroups).toEqual(['FM1', 'FM2'])
  })
})
