import { describe, expect, it } from 'vitest'
import { ok } from './helpers'

// A set of welder tests against one weld (Rootface's rule, common practice: one test must cover the weld whole; tests
// are not added together). ASME IX positions from Table QW-461.9 (docs/sources.md §A3: 1G → F, 2G → F, H, 3G → F, V);
// "cannot tell" lists the fields to record (Rootface: never a false yes).
const production = { process: 'SMAW', form: 'plate', weld: 'groove', position: 'V', thickness: 0.5, fNumber: 4, backing: true, pNumber: '1' }
const t = (testPositions: string[], extra: Record<string, unknown> = {}) =>
  ({ process: 'SMAW', form: 'plate', weld: 'groove', testPositions, couponThickness: 0.375, fNumber: 4, backing: true, pNumber: '1', ...extra })
const covers = (test: unknown) => ok({ code: 'asme-ix', check: 'covers', unit: 'in', input: { test, production } })
type R = { covered: boolean, answer: string, record: string[], undetermined: { field: string }[], reasons: { text: string, clause: string }[] }

describe('a set of tests against one weld', () => {
  it('covered when one test covers it all; its own findings are shown, unnumbered', () => {
    const r = covers([t(['1G']), t(['3G'])]) as unknown as R
    expect([r.covered, r.answer, r.record, r.undetermined]).toEqual([true, 'covered', [], []])
    expect(r.reasons.find(x => x.clause === 'QW-461.9')!.text).toBe('Groove V on plate: the test qualifies F, V.')
    expect(r.reasons.some(x => x.text.startsWith('Test '))).toBe(false)
  })
  it('not covered: every test\'s findings, numbered in the order given', () => {
    const r = covers([t(['1G']), t(['2G'])]) as unknown as R
    expect([r.covered, r.answer, r.record]).toEqual([false, 'not-covered', []])
    const positions = r.reasons.filter(x => x.clause === 'QW-461.9').map(x => x.text)
    expect(positions).toEqual(['Test 1: Groove V on plate: the test qualifies F; not V.', 'Test 2: Groove V on plate: the test qualifies F, H; not V.'])
  })
  it('cannot tell when one test has nothing unmet but a field not recorded: its fields listed, every test\'s findings numbered', () => {
    const r = covers([t(['1G']), t(['3G'], { pNumber: undefined })]) as unknown as R
    expect([r.covered, r.answer, r.record]).toEqual([false, 'cannot-tell', ['test.pNumber']])
    expect(r.undetermined.map(u => u.field)).toEqual(['test.pNumber'])
    expect(r.reasons.filter(x => x.clause === 'QW-403.18, QW-423.1').map(x => x.text))
      .toEqual(['Test 1: Production P-No. 1: qualified by the test (P-No. 1).', 'Test 2: Production is P-No. 1; the test did not record its P-No.: cannot tell, record it.'])
  })
  it('one test alone answers for itself, unnumbered, with its record and undetermined fields', () => {
    const r = covers(t(['3G'], { pNumber: undefined })) as unknown as R
    expect([r.answer, r.record]).toEqual(['cannot-tell', ['test.pNumber']])
    expect(r.undetermined).toEqual([{ field: 'test.pNumber', needed: 'QW-403.18, QW-423.1: Production is P-No. 1; the test did not record its P-No.: cannot tell, record it.' }])
    expect(r.reasons.some(x => x.text.startsWith('Test '))).toBe(false)
    const no = covers(t(['1G'])) as unknown as R
    expect([no.answer, no.record, no.undetermined]).toEqual(['not-covered', [], []])
  })
  it('the order of the tests does not matter: the first test covering, or the first one that cannot tell, decides alike', () => {
    const first = covers([t(['3G']), t(['1G'])]) as unknown as R
    expect([first.covered, first.answer]).toEqual([true, 'covered'])
    const telling = covers([t(['3G'], { pNumber: undefined }), t(['1G'])]) as unknown as R
    expect([telling.answer, telling.record]).toEqual(['cannot-tell', ['test.pNumber']])
  })
})
