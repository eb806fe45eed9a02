import { describe, expect, it } from 'vitest'
import { procedureCovers, type ProcedureRanges } from '../../../../shared/qualification/wps-coverage'

const wps: ProcedureRanges = {
  code: 'asme-ix', unit: 'in', process: 'SMAW', transfer: null, pNumberA: '1', pNumberB: '1', thicknessMin: 0.1875, thicknessMax: 1.5,
  diameterMin: null, positions: ['F', 'H', 'V', 'O'], fNumbers: ['4'],
}

describe('does an approved WPS take in a joint', () => {
  it('compares the joint with the WPS stated ranges, boundaries included (common practice: a stated range is inclusive)', () => {
    expect(procedureCovers(wps, { process: 'SMAW', unit: 'in', thickness: 1.5, form: 'plate', weld: 'groove', position: 'V', fNumber: 4, pNumber: '1' }).covered).toBe(true)
    expect(procedureCovers(wps, { process: 'SMAW', unit: 'in', thickness: 0.1875, form: 'plate', weld: 'groove', position: 'F', fNumber: 4, pNumber: '1' }).covered).toBe(true)
    expect(procedureCovers(wps, { process: 'SMAW', unit: 'in', thickness: 1.6, form: 'plate', weld: 'groove', position: 'F' }).covered).toBe(false)
  })

  it('converts a joint in mm into the WPS unit (25.4 mm per inch exactly): 38.1 mm = 1-1/2 in is inside, 40 mm is not', () => {
    expect(procedureCovers(wps, { process: 'SMAW', unit: 'mm', thickness: 38.1, form: 'plate', weld: 'groove', position: 'F', fNumber: 4, pNumber: '1' }).covered).toBe(true)
    expect(procedureCovers(wps, { process: 'SMAW', unit: 'mm', thickness: 40, form: 'plate', weld: 'groove', position: 'F' }).covered).toBe(false)
  })

  it('a groove WPS takes in fillet welds on any thickness (ASME BPVC IX-2023, QW-202.2(c))', () => {
    const result = procedureCovers(wps, { process: 'SMAW', unit: 'in', thickness: 3, form: 'plate', weld: 'fillet', position: 'H', fNumber: 4, pNumber: '1' })
    expect(result.covered).toBe(true)
    expect(result.reasons.map(r => r.clause)).toContain('QW-202.2(c)')
  })

  it('names each unmet variable: process, P-No., F-No. and position', () => {
    const result = procedureCovers({ ...wps, positions: ['F', 'H'] }, { process: 'GTAW', unit: 'in', thickness: 0.5, form: 'plate', weld: 'groove', position: 'O', pNumber: '8', fNumber: 6 })
    expect(result.reasons.filter(r => !r.met).map(r => r.clause)).toEqual(['QW-401', 'QW-403.11, QW-424', 'QW-405.1', 'QW-404.4'])
  })

  it('a variable the WPS limits and the joint leaves out is "cannot tell", never covered (P-No., F-No., thickness)', () => {
    const full = { process: 'SMAW', unit: 'in' as const, thickness: 0.5, form: 'plate' as const, weld: 'groove' as const, position: 'F', fNumber: 4, pNumber: '1' }
    expect(procedureCovers(wps, full).covered).toBe(true)
    for (const field of ['pNumber', 'fNumber', 'thickness'] as const) {
      const { [field]: _left, ...joint } = full
      const result = procedureCovers(wps, joint)
      expect(result.covered, field).toBe(false)
      expect(result.reasons.filter(r => !r.met).map(r => [r.state, r.record])).toEqual([['not-recorded', `production.${field}`]])
    }
  })
})
