// Edition labels that a current edition states otherwise (docs/sources.md, "Re-checked values").
import { describe, expect, it } from 'vitest'
import { ok } from '../helpers'

const d13 = (edition: string) => ok({
  code: 'aws-d1.3', edition, check: 'welder-ranges', unit: 'in',
  input: { process: 'GMAW', form: 'plate', weld: 'groove', joint: 'square-groove', testPositions: ['1G'], couponThickness: 0.06 },
}).reasons as { clause: string }[]

describe('AWS D1.3 clause labels by edition (docs/sources.md §B5)', () => {
  it('the older welder guide (Section 4) cites 4.7.2 and Table 4.4 for the thickness and position rules', () => {
    expect(d13('2008').map(r => r.clause)).toEqual(expect.arrayContaining(['D1.3 4.7.2', 'D1.3 Table 4.4']))
  })

  // AWS D1.3/D1.3M:2018 puts qualification in Clause 6 ("6. Qualification", Part C Performance Qualification;
  // scribd 486031131), so a 2018 result must not cite the Section 4 numbers of the older edition. The new clause and
  // table numbers were not seen: the label says clause 6 and the older number.
  it('a 2018 result does not cite the older edition\'s 4.7.2 / Table 4.4 as if they were 2018 clauses', () => {
    const reasons = d13('2018')
    expect(reasons.length).toBeGreaterThan(0)
    for (const reason of reasons) expect(reason.clause).not.toMatch(/^D1\.3 (4\.|Table 4\.)/)
    expect(reasons.map(r => r.clause)).toContain('D1.3:2018 clause 6 (numbered Table 4.4 in 2008)')
  })
})

describe('AWS D1.1 period of effectiveness clause (docs/sources.md §B6)', () => {
  it('2015: 4.2.3.1; 2020: 6.2.3 (eng-tips thread 488308 cites "D1.1-2020 Period of Effectiveness 6.2.3")', () => {
    const clause = (edition: string) => (ok({ code: 'aws-d1.1', edition, check: 'continuity', unit: 'in', input: { lastUse: '2026-01-15', on: '2026-07-15' } }).reasons as { clause: string }[]).map(r => r.clause)
    expect(clause('2015').join(' ')).toContain('4.2.3.1')
    expect(clause('2020').join(' ')).toContain('6.2.3')
  })
})
