import { describe, expect, it } from 'vitest'
import { ok } from '../helpers'

// Whole AWS D1.3 coverage answers, variable by variable. Square-groove test on t: 0.5t to 2t; Table 4.4 3G → F, H, V;
// sheet steel only (docs/sources.md §B5, read on a D1.3 welder guide, 4.7.2); F-No. (SMAW), coating and vertical
// progression as essential variables (4.7, same source, partial). 14 ga = 0.0747 in (§D). Sentences: Rootface's.
const cv = (test: unknown, production: unknown) => ok({ code: 'aws-d1.3', check: 'covers', unit: 'in', input: { test, production } })
const rows = (r: Record<string, unknown>) => (r.reasons as { variable: string, state: string, clause: string, text: string, record?: string }[]).map(x => [x.variable, x.state, x.clause, x.text, x.record ?? ''])
const test = { process: 'SMAW', form: 'plate', weld: 'groove', joint: 'square-groove', testPositions: ['3G'], couponThickness: 0.0747, fNumber: 3, coating: 'galvanized', progression: 'uphill' }
const c47 = 'D1.3:2018 clause 6 (numbered 4.7 in 2008)'

describe('AWS D1.3 coverage, variable by variable', () => {
  it('a 14 ga square-groove 3G test on a vertical square groove of 0.1 in: met but for coating and progression', () => {
    const r = cv(test, { process: 'SMAW', form: 'plate', weld: 'groove', joint: 'square-groove', position: 'V', thickness: 0.1, fNumber: 3, coating: 'none', progression: 'downhill', code: 'aws-d1.3' })
    expect([r.covered, r.answer]).toEqual([false, 'not-covered'])
    expect(rows(r)).toEqual([
      ['code', 'met', c47, 'The joint is welded to AWS D1.3.', ''],
      ['joint', 'met', `${c47} (joint type)`, 'Joint square-groove was tested.', ''],
      ['process', 'met', `${c47} (process)`, 'Process SMAW was tested.', ''],
      ['position', 'met', 'D1.3:2018 clause 6 (numbered Table 4.4 in 2008)', 'Position V: the test qualifies F, H, V.', ''],
      ['thickness', 'met', 'D1.3:2018 clause 6 (numbered 4.7.2 in 2008)', 'Sheet 0.1 in: qualified 0.03735 in to 0.1494 in.', ''], // 0.5t to 2t of 0.0747 in
      ['f-number', 'met', `${c47} (F-Number)`, 'Production F-No. 3: qualified by the test (F-No. 3).', ''],
      ['coating', 'not-met', `${c47} (coating)`, 'Production uncoated: the test (galvanized coated) does not qualify it.', ''],
      ['progression', 'not-met', `${c47} (vertical progression)`, 'Production downhill vertical: the test (uphill vertical) does not qualify it.', ''],
    ])
  })
  it('an overhead fillet on pipe with little stated: each gap named in trade words, nothing passed', () => {
    const r = cv(test, { form: 'pipe', weld: 'fillet', position: 'OH' })
    expect([r.covered, r.answer]).toEqual([false, 'not-covered'])
    expect(rows(r)).toEqual([
      ['scope', 'not-met', 'D1.3 scope', 'AWS D1.3 covers sheet steel, not pipe.', ''],
      ['joint', 'not-met', `${c47} (joint type)`, 'The test was square-groove; fillet is a different joint type and needs its own test.', ''],
      ['process', 'not-recorded', `${c47} (process)`, 'Production does not name its process: cannot tell, state it; the test was SMAW.', 'production.process'],
      ['position', 'not-met', 'D1.3:2018 clause 6 (numbered Table 4.4 in 2008)', 'Position OH: the test qualifies none for this weld type.', ''],
      ['thickness', 'not-recorded', 'D1.3:2018 clause 6 (numbered 4.7.2 in 2008)', 'AWS D1.3 coverage depends on the sheet thickness: give it.', 'production.thickness'],
      ['f-number', 'not-recorded', `${c47} (F-Number)`, 'The test was F-No. 3, which does not qualify every F-No.; production does not state its F-No.: cannot tell, record it.', 'production.fNumber'],
      ['coating', 'not-recorded', `${c47} (coating)`, 'The test was galvanized coated, which does not qualify every coating; production does not state its coating: cannot tell, record it.', 'production.coating'],
    ])
  })
  it('a sheet over 3/16 in is out of D1.3 and says so before anything else (§B5 scope)', () => {
    const r = cv(test, { process: 'SMAW', form: 'plate', weld: 'groove', joint: 'square-groove', position: 'F', thickness: 0.25 })
    expect(rows(r).map(x => x[0])).toEqual(['scope'])
    expect(r.covered).toBe(false)
  })
})
