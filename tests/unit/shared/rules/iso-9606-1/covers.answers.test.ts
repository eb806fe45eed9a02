import { describe, expect, it } from 'vitest'
import { ok } from '../helpers'

// ISO 9606-1 coverage (edition 2012; EN ISO 9606-1:2017 the same text), one clause 5 variable at a time, with the
// whole reason rows. Sources, docs/sources.md §C (summary sheets S1, S2 of DIN EN ISO 9606-1:2013):
// 5.2 process (135 covers 138; 141, 143, 145 each other; short-circuit transfer covers the others: partial),
// 5.3 product (plate covers pipe over 500 mm; pipe over 25 mm covers plate: partial), 5.4 weld type (partial),
// 5.5 filler groups and 5.6 filler types (from memory, as the rule's table says), Table 6 per process s and the
// combination s1 + s2 (§C6), Table 8 (§C8, read), 5.9 weld details and layering (partial). Sentences: Rootface's.
type Row = { variable: string, state: string, clause: string, text: string, record?: string, process?: string }
const cv = (test: unknown, production: unknown) => ok({ code: 'iso-9606-1', check: 'covers', unit: 'mm', input: { test, production } })
const rows = (r: Record<string, unknown>) => (r.reasons as Row[]).map(x => [x.variable, x.state, x.text, x.record ?? ''])
const row = (r: Record<string, unknown>, variable: string) => rows(r).filter(x => x[0] === variable)

const fillet = { process: '135', form: 'plate', weld: 'fillet', testPositions: ['PB'], couponThickness: 10 }
const filletJoint = { process: '135', form: 'plate', weld: 'fillet', position: 'PB', thickness: 10 }
const butt = { process: '111', form: 'plate', weld: 'groove', testPositions: ['PA'], depositThickness: 10 }
const buttJoint = { process: '111', form: 'plate', weld: 'groove', position: 'PA', thickness: 10 }

// 5.6 filler material type (from memory): [test, production, covered].
const fillerTypes: [string, string, boolean][] = [
  ['B', 'RB', true], ['B', 'A', true], ['B', 'P', true], ['B', 'B', true], ['B', 'C', false], ['B', 'S', false],
  ['RB', 'A', true], ['A', 'RR', true], ['RB', 'B', false], ['A', 'C', false], ['C', 'C', true], ['C', 'A', false],
  ['S', 'M', true], ['M', 'S', true], ['S', 'B', false], ['M', 'P', false],
  ['P', 'Z', true], ['Z', 'V', true], ['P', 'A', false], ['V', 'M', false],
  ['b', 'rb', true],
]

describe('ISO 9606-1 5.6 filler type, as data (from memory)', () => {
  it.each(fillerTypes)('test %s, production %s: covered %s', (test, production, covered) => {
    const r = cv({ ...fillet, fillerType: test }, { ...filletJoint, fillerType: production })
    expect(row(r, 'filler-type')).toEqual([['filler-type', covered ? 'met' : 'not-met', covered
      ? `Production filler type ${production}: qualified by the test (filler type ${test}).`
      : `Production filler type ${production}: the test (filler type ${test}) does not qualify it.`, '']])
    expect(r.covered).toBe(covered)
  })
})

describe('ISO 9606-1 5.2 transfer and 5.5 filler group', () => {
  it('135 short-circuit covers spray and an unstated mode; spray covers spray only, and not an unstated mode', () => {
    expect(row(cv({ ...fillet, transfer: 'short-circuit' }, { ...filletJoint, transfer: 'spray' }), 'transfer')).toEqual([['transfer', 'met', 'Production spray transfer: qualified by the test (short-circuit transfer).', '']])
    expect(row(cv({ ...fillet, transfer: 'short-circuit' }, filletJoint), 'transfer')).toEqual([['transfer', 'met', 'The test (short-circuit transfer) qualifies every transfer mode.', '']])
    expect(row(cv({ ...fillet, transfer: 'spray' }, { ...filletJoint, transfer: 'short-circuit' }), 'transfer')).toEqual([['transfer', 'not-met', 'Production short-circuit transfer: the test (spray transfer) does not qualify it.', '']])
    expect(row(cv({ ...fillet, transfer: 'spray' }, { ...filletJoint, transfer: 'spray' }), 'transfer')[0]![1]).toBe('met')
    expect(row(cv({ ...fillet, transfer: 'spray' }, filletJoint), 'transfer')).toEqual([['transfer', 'not-recorded', 'The test was spray transfer, which does not qualify every transfer mode; production does not state its transfer mode: cannot tell, record it.', 'production.transfer']])
  })
  it('transfer is not compared for 111 or 141 (only 131, 135, 138)', () => {
    const r = cv({ ...fillet, process: '141', transfer: 'spray' }, { ...filletJoint, process: '141', transfer: 'short-circuit' })
    expect(row(r, 'transfer')).toEqual([])
    expect(row(cv({ ...fillet, process: '138', transfer: 'spray' }, { ...filletJoint, process: '138', transfer: 'pulse' }), 'transfer')[0]![1]).toBe('not-met')
    expect(row(cv({ ...fillet, process: '131', transfer: 'spray' }, { ...filletJoint, process: '131', transfer: 'pulse' }), 'transfer')[0]![1]).toBe('not-met')
  })
  it.each([
    [1, 2, true], [2, 1, true], [1, 3, false], [3, 1, true], [3, 3, true], [3, 4, false], [4, 2, true], [4, 3, false], [5, 1, false], [6, 6, true], [6, 5, false],
  ] as [number, number, boolean][])('filler group: test FM%s, production FM%s covered %s (5.5, from memory)', (test, production, covered) => {
    const r = cv({ ...fillet, fNumber: test }, { ...filletJoint, fNumber: production })
    expect(row(r, 'filler-group')).toEqual([['filler-group', covered ? 'met' : 'not-met', covered
      ? `Production FM${production}: qualified by the test (FM${test}).`
      : `Production FM${production}: the test (FM${test}) does not qualify it.`, '']])
  })
})

describe('ISO 9606-1 5.3 product type and Table 8 (§C8)', () => {
  it('a plate test covers pipe over 500 mm: 500 mm is not covered, 500.1 mm is', () => {
    expect(row(cv(butt, { ...buttJoint, form: 'pipe', outsideDiameter: 500 }), 'product')).toEqual([['product', 'not-met', 'A plate test covers pipe of D 500 mm only when it is rotated (over 75 mm, in PA, PB, PC or PD); that is not decided here.', '']])
    expect(row(cv(butt, { ...buttJoint, form: 'pipe', outsideDiameter: 500.1 }), 'product')).toEqual([['product', 'met', 'A plate test covers pipe over 500 mm (D 500.1 mm).', '']])
  })
  it('a pipe test covers plate only over 25 mm: 25 mm does not, 25.1 mm does; without its D it cannot tell', () => {
    const pipe = (outsideDiameter?: number) => ({ ...butt, form: 'pipe', outsideDiameter })
    expect(row(cv(pipe(25), buttJoint), 'product')).toEqual([['product', 'not-met', 'A pipe test of 25 mm or less does not cover plate.', '']])
    expect(row(cv(pipe(25.1), buttJoint), 'product')).toEqual([['product', 'met', 'A pipe test over 25 mm covers plate.', '']])
    const r = cv(pipe(), buttJoint)
    expect(row(r, 'product')).toEqual([['product', 'not-recorded', 'A pipe test covers plate only over 25 mm: the test pipe D was not recorded.', 'test.outsideDiameter']])
    expect(r.answer).toBe('cannot-tell')
  })
  it('pipe to pipe: Table 8 below, at and above 0.5D of a 60 mm test (30 mm and over)', () => {
    const pipe = { ...butt, form: 'pipe', outsideDiameter: 60 }
    const at = (D: number) => row(cv(pipe, { ...buttJoint, form: 'pipe', outsideDiameter: D }), 'diameter')[0]
    expect(at(29.9)).toEqual(['diameter', 'not-met', 'Pipe D 29.9 mm: covered 30 mm to unlimited.', ''])
    expect(at(30)).toEqual(['diameter', 'met', 'Pipe D 30 mm: covered 30 mm to unlimited.', ''])
    expect(at(30.1)![1]).toBe('met')
  })
  it('pipe D missing on either side: named, never passed', () => {
    expect(row(cv({ ...butt, form: 'pipe', outsideDiameter: 60 }, { ...buttJoint, form: 'pipe' }), 'diameter')).toEqual([['diameter', 'not-recorded', 'The production pipe D is not given.', 'production.outsideDiameter']])
    expect(row(cv({ ...butt, form: 'pipe' }, { ...buttJoint, form: 'pipe', outsideDiameter: 60 }), 'diameter')).toEqual([['diameter', 'not-recorded', 'The test pipe D was not recorded.', 'test.outsideDiameter']])
  })
})

describe('ISO 9606-1 5.4 weld type, thickness and 5.9 details', () => {
  it('a fillet test does not cover a butt weld and stops there; a butt test covers a fillet only with the supplementary test', () => {
    const r = cv(fillet, { ...buttJoint, process: '135' })
    expect(rows(r)).toEqual([['process', 'met', 'Process 135 is covered by the 135 test.', ''], ['weld', 'not-met', 'A fillet test does not cover butt welds.', '']])
    expect(row(cv(butt, { ...filletJoint, process: '111' }), 'weld')).toEqual([['weld', 'not-met', 'A butt test covers fillet welds only with a supplementary fillet test.', '']])
  })
  it('thickness missing on either side: cannot tell, with the field to record', () => {
    expect(row(cv(butt, { ...buttJoint, thickness: undefined }), 'thickness')).toEqual([['thickness', 'not-recorded', 'Production thickness not given: cannot tell, state it; the test covers 3 mm to 20 mm.', 'production.thickness']])
    expect(row(cv({ ...butt, depositThickness: undefined }, buttJoint), 'thickness')).toEqual([['thickness', 'not-recorded', 'The test thickness was not recorded.', 'test.depositThickness']])
    expect(row(cv({ ...fillet, couponThickness: undefined }, filletJoint), 'thickness')).toEqual([['thickness', 'not-recorded', 'The test thickness was not recorded.', 'test.couponThickness']])
  })
  it('fillet thickness on Table 7: a 2 mm test covers 2 to 3 mm (from memory); 3.1 mm is not covered', () => {
    const thin = { ...fillet, couponThickness: 2 }
    expect(row(cv(thin, { ...filletJoint, thickness: 3 }), 'thickness')).toEqual([['thickness', 'met', 'Thickness 3 mm: covered 2 mm to 3 mm.', '']])
    expect(row(cv(thin, { ...filletJoint, thickness: 3.1 }), 'thickness')[0]![1]).toBe('not-met')
    expect(row(cv(thin, { ...filletJoint, thickness: 1.9 }), 'thickness')[0]![1]).toBe('not-met')
  })
  // 5.9 (partial): single side without backing covers all; with backing and both sides cover each other.
  const details: [string, { sides: string, backing?: boolean }, { sides: string, backing?: boolean }, string][] = [
    ['ss nb covers bs', { sides: 'single', backing: false }, { sides: 'both' }, 'met'],
    ['ss nb covers ss mb', { sides: 'single', backing: false }, { sides: 'single', backing: true }, 'met'],
    ['ss mb covers bs', { sides: 'single', backing: true }, { sides: 'both' }, 'met'],
    ['bs covers ss mb', { sides: 'both' }, { sides: 'single', backing: true }, 'met'],
    ['ss mb does not cover ss nb', { sides: 'single', backing: true }, { sides: 'single', backing: false }, 'not-met'],
    ['bs does not cover ss nb', { sides: 'both' }, { sides: 'single', backing: false }, 'not-met'],
  ]
  it.each(details)('weld details: %s', (_name, test, production, state) => {
    expect(row(cv({ ...butt, ...test }, { ...buttJoint, ...production }), 'details')[0]![1]).toBe(state)
  })
  it('weld details words, and the gaps: ss nb covers an unstated joint; a stated joint with no test detail cannot tell', () => {
    expect(row(cv({ ...butt, sides: 'single', backing: false }, { ...buttJoint, sides: 'both' }), 'details')).toEqual([['details', 'met', 'Production both sides (bs): qualified by the test (single side without backing (ss nb)).', '']])
    expect(row(cv({ ...butt, sides: 'both' }, { ...buttJoint, sides: 'single', backing: false }), 'details')).toEqual([['details', 'not-met', 'Production single side without backing (ss nb): the test (both sides (bs)) does not qualify it.', '']])
    expect(row(cv({ ...butt, sides: 'single', backing: false }, buttJoint), 'details')[0]![1]).toBe('met')
    expect(row(cv({ ...butt, sides: 'single', backing: true }, buttJoint), 'details')).toEqual([['details', 'not-recorded', expect.stringContaining('The test was single side with backing (ss mb)'), 'production.sides']])
    expect(row(cv(butt, { ...buttJoint, sides: 'both' }), 'details')).toEqual([['details', 'not-recorded', expect.stringContaining('Production is both sides (bs)'), 'test.sides']])
    expect(row(cv({ ...butt, sides: 'single' }, { ...buttJoint, sides: 'single' }), 'details')).toEqual([]) // backing not stated on either side: not compared
  })
  it('fillet layering: multi-layer covers single and multi; single covers single only', () => {
    const l = (test: string, production?: string) => row(cv({ ...fillet, layering: test }, { ...filletJoint, layering: production }), 'layering')[0]
    expect(l('multi', 'single')).toEqual(['layering', 'met', 'Production single-layer: qualified by the test (multi-layer).', ''])
    expect(l('multi')![1]).toBe('met')
    expect(l('single', 'single')![1]).toBe('met')
    expect(l('single', 'multi')).toEqual(['layering', 'not-met', 'Production multi-layer: the test (single-layer) does not qualify it.', ''])
    expect(l('single')![3]).toBe('production.layering')
  })
})

describe('ISO 9606-1 combination tests: each process its own s, the joint by s1 + s2 (§C6)', () => {
  const combo = { form: 'plate', weld: 'groove', testPositions: ['PA'], processes: [{ process: '141', depositThickness: 3, fNumber: 1 }, { process: '111', depositThickness: 9 }] }
  it('141 s3 + 111 s9: 141 deposit 6 mm at its 2s, 111 deposit 18.1 mm over its 18 mm; the sum judged on its own', () => {
    const r = cv(combo, { form: 'plate', weld: 'groove', position: 'PA', processes: [{ process: '141', depositThickness: 6, fNumber: 1 }, { process: '111', depositThickness: 18.1 }] })
    expect(rows(r)).toEqual([
      ['process', 'met', 'Process 141 is covered by the 141 test.', ''],
      ['filler-group', 'met', 'Production FM1: qualified by the test (FM1).', ''],
      ['thickness', 'met', '141 deposit 6 mm: covered up to 6 mm (s of that process 3 mm).', ''],
      ['process', 'met', 'Process 111 is covered by the 111 test.', ''],
      ['thickness', 'not-met', '111 deposit 18.1 mm: covered up to 18 mm (s of that process 9 mm).', ''],
      ['weld', 'met', 'A butt test covers butt welds.', ''],
      ['position', 'met', 'Position PA: the test covers PA.', ''],
      ['thickness', 'met', 'Thickness 24.1 mm: covered 3 mm to unlimited (the combination: s1 + s2).', ''],
    ])
    expect(r.answer).toBe('not-covered')
  })
  it('a process the test does not have, a deposit the test did not record, a filler group recorded on one side only', () => {
    const test = { ...combo, processes: [{ process: '141', depositThickness: 3, fNumber: 1 }, { process: '111' }] }
    const r = cv(test, { form: 'plate', weld: 'groove', position: 'PA', processes: [{ process: '131', depositThickness: 2 }, { process: '111', depositThickness: 4, fNumber: 1 }] })
    expect(rows(r).slice(0, 4)).toEqual([
      ['process', 'not-met', 'Process 131 is not covered by the 141 + 111 test.', ''],
      ['process', 'met', 'Process 111 is covered by the 111 test.', ''],
      ['filler-group', 'not-recorded', 'Production is FM1; the test did not record its F-No.: cannot tell, record it.', 'test.processes[1].fNumber'],
      ['thickness', 'not-recorded', 'The test\'s 111 deposit was not recorded.', 'test.processes[1].depositThickness'],
    ])
    expect((r.reasons as Row[]).filter(x => x.variable === 'process').map(x => x.process)).toEqual(['131', '111'])
  })
  it('a production that names no process against a combination test: cannot tell, the processes named', () => {
    const r = cv(combo, { form: 'plate', weld: 'groove', position: 'PA', thickness: 10 })
    expect(rows(r)[0]).toEqual(['process', 'not-recorded', 'Production does not name its process: cannot tell, state it; the test was 141 + 111.', 'production.process'])
    expect(row(r, 'filler-group')).toEqual([])
    expect(r.answer).toBe('cannot-tell')
  })
  it('a production combination with one deposit missing is not summed', () => {
    const r = cv(combo, { form: 'plate', weld: 'groove', position: 'PA', processes: [{ process: '141', depositThickness: 3 }, { process: '111' }] })
    expect(row(r, 'thickness').map(x => x[2])).toEqual(['141 deposit 3 mm: covered up to 6 mm (s of that process 3 mm).', 'Production thickness not given: cannot tell, state it; the test covers 3 mm to unlimited.'])
  })
  it('the joint\'s code must be ISO 9606-1', () => {
    expect(rows(cv(fillet, { ...filletJoint, code: 'asme-ix' }))[0]).toEqual(['code', 'not-met', 'The joint is welded to ASME BPVC Section IX; an ISO 9606-1 test does not qualify it.', ''])
    expect(rows(cv(fillet, { ...filletJoint, code: 'iso-9606-1' }))[0]).toEqual(['code', 'met', 'The joint is welded to ISO 9606-1.', ''])
  })
})
