import { describe, expect, it } from 'vitest'
import { procedureCovers, type ProcedureRanges } from '../../../../shared/qualification/wps-coverage'

// "Who can weld it?": a WPS's stated ranges against a joint, every finding in words. A stated range includes its ends
// (common practice); a variable the WPS limits and the joint leaves out is "cannot tell: state it" (Rootface's rule,
// never a false yes); lengths are converted at 25.4 mm per inch exactly (the inch's definition, 1959). Clauses: ASME
// BPVC IX QW-401, QW-409.2, QW-403.11/QW-424, QW-403.8/QW-451.1, QW-405.1, QW-404.4 (docs/sources.md §A1, §A6);
// other codes: the WPS's own stated values.
const asme: ProcedureRanges = {
  code: 'asme-ix', unit: 'in', process: 'GMAW', transfer: 'spray', pNumberA: '1', pNumberB: '8', thicknessMin: 0.1875, thicknessMax: 1.5,
  diameterMin: 2.875, positions: ['F', 'H'], fNumbers: ['6'],
}
const d11: ProcedureRanges = { ...asme, code: 'aws-d1.1', transfer: 'short-circuit', pNumberA: null, pNumberB: null, diameterMin: null, fNumbers: [] }
const texts = (r: { reasons: { met: boolean, clause: string, text: string, state?: string, record?: string }[] }) => r.reasons.map(x => [x.met, x.clause, x.text, x.record ?? ''])

describe('WPS coverage answers, finding by finding', () => {
  it('an ASME IX spray GMAW WPS against a P-No. 8 pipe joint in F and H, stated in mm', () => {
    const r = procedureCovers(asme, { process: 'GMAW', transfer: 'pulse', unit: 'mm', pNumber: '8', thickness: 38.1, form: 'pipe', outsideDiameter: 73.025, weld: 'groove', positions: ['f', 'H'], position: 'F', fNumber: 6, code: 'asme-ix' })
    expect(r.covered).toBe(true)
    expect(texts(r)).toEqual([
      [true, 'code', 'The WPS is written to ASME BPVC Section IX, the joint\'s code.', ''],
      [true, 'QW-401', 'Process GMAW.', ''],
      [true, 'QW-409.2', 'Transfer spray; the joint calls for pulse.', ''], // spray and pulse are one family, short circuit the other
      [true, 'QW-403.11, QW-424', 'Base metals P-No. 1 to P-No. 8; the joint is P-No. 8.', ''],
      [true, 'QW-403.8, QW-451.1', 'Thickness 1.5 in: the WPS covers 3/16 in to 1-1/2 in.', ''], // 38.1 mm = 1.5 in, the upper end
      [true, 'WPS stated range', 'Pipe OD 2.875 in: the WPS states 2.875 in and over.', ''], // 73.025 mm = 2-7/8 in, the lower end
      [true, 'QW-405.1', 'Position F, H: the WPS lists F, H.', ''],
      [true, 'QW-404.4', 'F-No. 6: the WPS lists F-No. 6.', ''],
    ])
  })
  it('one step outside each end is not covered, and each finding says so', () => {
    const r = procedureCovers(asme, { process: 'FCAW', transfer: 'short-circuit', unit: 'in', pNumber: '5a', thickness: 1.51, form: 'pipe', outsideDiameter: 2.874, weld: 'groove', position: 'V', fNumber: 5, code: 'aws-d1.1' })
    expect(r.covered).toBe(false)
    expect(texts(r)).toEqual([
      [false, 'code', 'The WPS is written to ASME BPVC Section IX; the joint is welded to AWS D1.1.', ''],
      [false, 'QW-401', 'Process GMAW, not FCAW.', ''],
      [false, 'QW-409.2', 'Transfer spray; the joint calls for short-circuit.', ''],
      [false, 'QW-403.11, QW-424', 'Base metals P-No. 1 to P-No. 8; the joint is P-No. 5a.', ''],
      [false, 'QW-403.8, QW-451.1', 'Thickness 1.51 in: the WPS covers 3/16 in to 1-1/2 in.', ''],
      [false, 'WPS stated range', 'Pipe OD 2.874 in: the WPS states 2.875 in and over.', ''],
      [false, 'QW-405.1', 'Position V: the WPS lists F, H.', ''],
      [false, 'QW-404.4', 'F-No. 5: the WPS lists F-No. 6.', ''],
    ])
  })
  it('what the joint leaves out is asked for, the pipe OD and position included', () => {
    const r = procedureCovers(asme, { process: 'GMAW', unit: 'in', form: 'pipe', weld: 'groove' })
    expect(r.covered).toBe(false)
    expect(texts(r)).toEqual([
      [true, 'QW-401', 'Process GMAW.', ''],
      [false, 'QW-403.11, QW-424', 'The joint does not state its base metal P-No.: cannot tell, state it.', 'production.pNumber'],
      [false, 'QW-403.8, QW-451.1', 'The joint does not state its thickness: cannot tell, state it.', 'production.thickness'],
      [false, 'WPS stated range', 'The joint does not state its pipe outside diameter: cannot tell, state it.', 'production.outsideDiameter'],
      [false, 'QW-405.1', 'Position not given: the WPS lists F, H.', ''],
      [false, 'QW-404.4', 'The joint does not state its filler F-No.: cannot tell, state it.', 'production.fNumber'],
    ])
  })
  it('a WPS of another code names its variables by what the WPS states; what it does not limit is not asked for', () => {
    const r = procedureCovers(d11, { process: 'GMAW', transfer: 'spray', unit: 'in', thickness: 0.1875, form: 'plate', weld: 'fillet', position: 'H' })
    expect(r.covered).toBe(false)
    expect(texts(r)).toEqual([
      [true, 'WPS process', 'Process GMAW.', ''],
      [false, 'WPS transfer mode', 'Transfer short-circuit; the joint calls for spray.', ''],
      [true, 'WPS thickness range', 'Thickness 0.1875 in: the WPS covers 3/16 in to 1-1/2 in.', ''], // not ASME: no QW-202.2(c) fillet rule
      [true, 'WPS positions', 'Position H: the WPS lists F, H.', ''],
    ])
  })
  it('an open-ended WPS range: no minimum, no maximum', () => {
    const open = { ...d11, thicknessMin: null, thicknessMax: null, positions: [] }
    const r = procedureCovers(open, { process: 'GMAW', unit: 'in', thickness: 9, form: 'plate', weld: 'groove', position: 'F' })
    expect(texts(r)).toEqual([
      [true, 'WPS process', 'Process GMAW.', ''],
      [true, 'WPS thickness range', 'Thickness 9 in: the WPS covers no minimum to unlimited.', ''],
      [false, 'WPS positions', 'Position F: the WPS lists none.', ''],
    ])
  })
})
