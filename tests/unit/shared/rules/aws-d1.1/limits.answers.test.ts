import { describe, expect, it } from 'vitest'
import { ok, refused } from '../helpers'

// AWS D1.1, each limit below, at and above, with whole reason rows. Sources, docs/sources.md:
// §B8 WPS by test: PQR on T qualifies 1/8 in to 2T under 1 in, unlimited from 1 in; 2 face + 2 root up to 3/8 in, 4 side
//   above (from memory); with CVN the minimum is T or 5/8 in, whichever is less, 1/8 in when T is under 1/4 in
//   (Table 4.6 line 2, quoted). SI values 3, 6, 10, 16 and 25 mm: from memory (D1.1M pairs them with the inch values).
// §B4 plate positions and note b (a plate test covers pipe CJP only at 24 in / 600 mm and over with backing or
//   backgouging, read); §B2 pipe sizes (4 in and under: 3/4 to 4 in, read); welder essential variables and the SMAW
//   electrode groups (a group qualifies itself and the lower ones, F1–F4): from memory. Sentences are Rootface's.
type Unit = 'in' | 'mm'
const pr = (input: Record<string, unknown>, unit: Unit = 'in', edition = '2020') => ok({ code: 'aws-d1.1', check: 'procedure-ranges', unit, edition, input })
const prNo = (input: Record<string, unknown>, unit: Unit = 'in') => refused({ code: 'aws-d1.1', check: 'procedure-ranges', unit, edition: '2020', input })
const texts = (r: Record<string, unknown>) => (r.reasons as { clause: string, text: string, basis: string }[]).map(x => [x.clause, x.text, x.basis] as [string, string, string])

// [unit, T, min, max, specimens with side bends]
const pqrBands: [Unit, number, number, number | null, boolean][] = [
  ['in', 0.125, 0.125, 0.25, false],
  ['in', 0.375, 0.125, 0.75, false],
  ['in', 0.376, 0.125, 0.752, true],
  ['in', 0.999, 0.125, 1.998, true],
  ['in', 1, 0.125, null, true],
  ['mm', 3, 3, 6, false],
  ['mm', 10, 3, 20, false],
  ['mm', 10.1, 3, 20.2, true],
  ['mm', 24.9, 3, 49.8, true],
  ['mm', 25, 3, null, true],
]
// CVN minimum: [unit, T, min]
const cvn: [Unit, number, number][] = [
  ['in', 0.249, 0.125], ['in', 0.25, 0.25], ['in', 0.624, 0.624], ['in', 0.625, 0.625], ['in', 0.626, 0.625], ['in', 2, 0.625],
  ['mm', 5.9, 3], ['mm', 6, 6], ['mm', 15.9, 15.9], ['mm', 16, 16], ['mm', 16.1, 16],
]

describe('AWS D1.1 WPS by test: PQR thickness bands (§B8)', () => {
  it.each(pqrBands)('%s T = %s: %s to %s (side bends %s)', (unit, T, min, max, side) => {
    const r = pr({ process: 'SMAW', couponThickness: T }, unit)
    expect(r.baseMetal).toEqual({ min, max })
    expect(r.specimens).toEqual(side ? { tension: 2, face: 0, root: 0, side: 4 } : { tension: 2, face: 2, root: 2, side: 0 })
    expect(r.depositMax).toBeNull()
  })
  it.each(cvn)('with CVN, %s T = %s: minimum %s', (unit, T, min) => {
    expect((pr({ process: 'SMAW', couponThickness: T, toughness: true }, unit).baseMetal as { min: number }).min).toBe(min)
  })
  it('the whole answer of a 3/8 in GMAW-S PQR with CVN tested in 2G + 3G, 2020 table names', () => {
    const r = pr({ process: 'gmaw', transfer: 'short-circuit', couponThickness: 0.375, toughness: true, testPositions: ['2G', '3g'] })
    expect(r.positions).toEqual(['H', 'V'])
    expect(texts(r)).toEqual([
      ['Clause 6 PQR thickness table (Table 4.2 in 2015)', 'A CJP groove PQR on 3/8 in plate qualifies 1/8 in to 3/4 in (2T).', 'memory'],
      ['Clause 6 CVN table (Table 4.6 in 2015)', 'With CVN testing the minimum is T or 5/8 in, whichever is less (1/8 in when T is under 1/4 in): 3/8 in.', 'partial'],
      ['Clause 6 PQR thickness table (Table 4.2 in 2015)', 'Specimens: 2 reduced-section tension, 2 face and 2 root bends (4 side bends may replace them at 3/8 in); the plate is also examined by RT or UT.', 'memory'],
      ['Clause 6 PQR essential variables table (Table 4.5 in 2015)', 'GMAW short-circuit is never prequalified: this PQR qualifies GMAW-S only.', 'memory'],
      ['Clause 6 WPS positions table (Table 4.1 in 2015)', 'Tested in 2G + 3g: the WPS is qualified in H, V (each test its own position; a wider reading of the table is checked by hand).', 'memory'],
      ['Clause 6 PQR essential variables table (Table 4.5 in 2015)', `Requalification is needed for: ${(r.requalification as string[]).join('; ')}.`, 'memory'],
    ])
    expect(r.requalification).toHaveLength(7)
  })
  it('2015 names: Tables 4.2, 4.6, 4.1 and 4.5; 1 in and over says unlimited; 4 side bends', () => {
    const r = pr({ process: 'FCAW', couponThickness: 1, toughness: true, testPositions: ['4G'] }, 'in', '2015')
    expect(texts(r).map(x => x[0])).toEqual(['Table 4.2', 'Table 4.6', 'Table 4.2', 'Table 4.1', 'Table 4.5'])
    expect(texts(r)[0]![1]).toBe('A CJP groove PQR on 1 in plate qualifies 1/8 in to unlimited (1 in and over: unlimited).')
    expect(texts(r)[2]![1]).toBe('Specimens: 2 reduced-section tension, 4 side bends; the plate is also examined by RT or UT.')
    expect(r.positions).toEqual(['O'])
  })
  it('no GMAW-S line for spray or for FCAW; no positions without test positions', () => {
    expect(texts(pr({ process: 'GMAW', transfer: 'spray', couponThickness: 0.5 })).some(x => x[1].includes('never prequalified'))).toBe(false)
    expect(texts(pr({ process: 'FCAW', transfer: 'short-circuit', couponThickness: 0.5 })).some(x => x[1].includes('never prequalified'))).toBe(false)
    expect(pr({ process: 'SMAW', couponThickness: 0.5 })).not.toHaveProperty('positions')
  })
  it('refusals word for word: ESW, under 1/8 in (and 3 mm), an unknown test position', () => {
    expect(prNo({ process: 'ESW', couponThickness: 1 })).toBe('process: AWS D1.1 qualification of a ESW WPS by test is not carried (carried: SMAW, SAW, GMAW, FCAW, GTAW); ESW and EGW have their own limits')
    expect(prNo({ process: 'SMAW', couponThickness: 0.124 })).toBe('couponThickness: Clause 6 PQR thickness table (Table 4.2 in 2015) starts at 1/8 in; sheet under it is welded to AWS D1.3')
    expect(prNo({ process: 'SMAW', couponThickness: 2.9 }, 'mm')).toBe('couponThickness: Clause 6 PQR thickness table (Table 4.2 in 2015) starts at 3 mm; sheet under it is welded to AWS D1.3')
    expect(prNo({ process: 'SMAW', couponThickness: 0.5, testPositions: ['1F'] })).toBe('testPositions: 1F is not a groove test position carried for D1.1 procedures (1G, 2G, 3G, 4G, 5G, 6G, 6GR)')
  })
})

const cv = (test: unknown, production: unknown, unit: Unit = 'in') => ok({ code: 'aws-d1.1', check: 'covers', unit, edition: '2020', input: { test, production } })
type Row = { variable: string, state: string, clause: string, text: string, record?: string }
const row = (r: Record<string, unknown>, variable: string) => (r.reasons as Row[]).filter(x => x.variable === variable).map(x => [x.state, x.clause, x.text, x.record ?? ''])
const plate = { process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['2G'], couponThickness: 1, backing: true }
const pipeJoint = (outsideDiameter: number | undefined, backing?: boolean) => ({ process: 'SMAW', form: 'pipe', weld: 'groove', position: 'F', thickness: 1, outsideDiameter, backing })

describe('AWS D1.1 coverage limits (§B4 note b, §B2, electrode groups from memory)', () => {
  it('a plate test on pipe: 24 in with backing met, 23.9 in not, backing unstated cannot tell, no backing not met', () => {
    expect(row(cv(plate, pipeJoint(24, true)), 'diameter')).toEqual([['met', 'Table 6.10 note b', 'A plate test covers pipe CJP welds only of 24 in and over with backing or backgouging (pipe 24 in, with backing or backgouging).', '']])
    expect(row(cv(plate, pipeJoint(23.9, true)), 'diameter')[0]![0]).toBe('not-met')
    expect(row(cv(plate, pipeJoint(30)), 'diameter')).toEqual([['not-recorded', 'Table 6.10 note b', 'A plate test covers pipe CJP welds only of 24 in and over with backing or backgouging (pipe 30 in, backing not stated).', 'production.backing']])
    expect(row(cv(plate, pipeJoint(30, false)), 'diameter')).toEqual([['not-met', 'Table 6.10 note b', 'A plate test covers pipe CJP welds only of 24 in and over with backing or backgouging (pipe 30 in, no backing or backgouging).', '']])
    expect(row(cv({ ...plate, couponThickness: 25 }, { ...pipeJoint(600, true), thickness: 25 }, 'mm'), 'diameter')[0]![0]).toBe('met')
    expect(row(cv({ ...plate, couponThickness: 25 }, { ...pipeJoint(599, true), thickness: 25 }, 'mm'), 'diameter')[0]![0]).toBe('not-met')
    expect(row(cv(plate, pipeJoint(undefined, true)), 'diameter')).toEqual([['not-recorded', 'Table 10.13', 'The production pipe size is not given.', 'production.outsideDiameter']])
  })
  it('a 4 in test pipe covers 3/4 to 4 in: 0.74 and 4.01 in are not covered; the test size unrecorded cannot tell', () => {
    const pipe = (outsideDiameter?: number, couponThickness: number | null = 0.25) => ({ process: 'SMAW', form: 'pipe', weld: 'groove', testPositions: ['6G'], couponThickness: couponThickness ?? undefined, outsideDiameter, backing: true })
    const at = (D: number) => row(cv(pipe(4), { ...pipeJoint(D, true), thickness: 0.5 }), 'diameter')[0]
    expect(at(0.75)).toEqual(['met', 'Table 10.13', 'Size 0.75 in: qualified 3/4 in to 4 in.', ''])
    expect(at(0.74)![0]).toBe('not-met')
    expect(at(4)![0]).toBe('met')
    expect(at(4.01)![0]).toBe('not-met')
    expect(row(cv(pipe(undefined), pipeJoint(2, true)), 'diameter')).toEqual([['not-recorded', 'Table 10.13', 'The test pipe size was not recorded.', 'test.outsideDiameter']])
    expect(row(cv(pipe(2, null), pipeJoint(2, true)), 'diameter')).toEqual([['not-checked', 'Table 10.13 note f', 'The minimum pipe size this test qualifies (note f) is not carried: check by hand.', '']])
    expect(row(cv(pipe(2, null), pipeJoint(2, true)), 'thickness')).toEqual([['not-recorded', 'Table 10.13', 'The test thickness was not recorded.', 'test.couponThickness']])
  })
  it('production thickness: unstated is asked only when the range has a maximum', () => {
    expect(row(cv(plate, { process: 'SMAW', form: 'plate', weld: 'groove', position: 'F', backing: true }), 'thickness')).toEqual([])
    expect(row(cv({ ...plate, couponThickness: 0.375 }, { process: 'SMAW', form: 'plate', weld: 'groove', position: 'F', backing: true }), 'thickness')).toEqual([['not-recorded', 'Table 6.11', 'Production thickness not given: cannot tell, state it; the test qualifies 1/8 in to 3/4 in.', 'production.thickness']])
    expect(row(cv({ ...plate, couponThickness: 10 }, { process: 'SMAW', form: 'plate', weld: 'groove', position: 'F', thickness: 20, backing: true }, 'mm'), 'thickness')).toEqual([['met', 'Table 6.11', 'Thickness 20 mm: qualified 3 mm to 20 mm.', '']])
  })
  it.each([
    [4, 1, true], [4, 4, true], [3, 4, false], [1, 1, true], [1, 2, false], [5, 5, false], [5, 1, false],
  ] as [number, number, boolean][])('SMAW electrode group: test F%s, production F%s covered %s', (test, production, covered) => {
    expect(row(cv({ ...plate, fNumber: test }, { ...pipeJoint(30, true), form: 'plate', fNumber: production }), 'f-number')[0]![0]).toBe(covered ? 'met' : 'not-met')
  })
  it('GMAW transfer: short-circuit and the other modes do not qualify each other; the other modes qualify each other', () => {
    const g = (t: string, p: string) => row(cv({ ...plate, process: 'GMAW', transfer: t }, { ...pipeJoint(30, true), form: 'plate', process: 'GMAW', transfer: p }), 'transfer')[0]
    expect(g('short-circuit', 'short-circuit')![0]).toBe('met')
    expect(g('spray', 'globular')).toEqual(['met', 'Clause 6 WPQ essential variables table (Table 4.12 in 2015) (GMAW-S)', 'Production globular transfer: qualified by the test (spray transfer).', ''])
    expect(g('short-circuit', 'spray')![0]).toBe('not-met')
    expect(g('pulse', 'short-circuit')![0]).toBe('not-met')
    expect(row(cv({ ...plate, process: 'FCAW', transfer: 'spray' }, { ...pipeJoint(30, true), form: 'plate', process: 'FCAW', transfer: 'short-circuit' }), 'transfer')).toEqual([])
  })
  it('backing: a test without backing covers both; with backing covers only with backing; a later layer welds on backing', () => {
    const b = (test?: boolean, production?: boolean) => row(cv({ ...plate, backing: test }, { ...pipeJoint(30, production), form: 'plate' }), 'backing')[0]
    expect(b(false, true)![0]).toBe('met')
    expect(b(false)![0]).toBe('met')
    expect(b(true, false)![0]).toBe('not-met')
    expect(b(true)).toEqual(['not-recorded', 'Clause 6 WPQ essential variables table (Table 4.12 in 2015)', 'The test was with backing, which does not qualify every backing; production does not state its backing: cannot tell, record it.', 'production.backing'])
    expect(b(undefined, true)).toEqual(['met', 'Clause 6 WPQ essential variables table (Table 4.12 in 2015)', 'Production with backing: qualified by any test.', ''])
    const combo = { form: 'plate', weld: 'groove', testPositions: ['2G'], couponThickness: 1, backing: false, processes: [{ process: 'GTAW' }, { process: 'SMAW', fNumber: 4 }] }
    const r = cv(combo, { form: 'plate', weld: 'groove', position: 'F', thickness: 1, backing: false, processes: [{ process: 'GTAW' }, { process: 'SMAW', fNumber: 5 }] })
    expect(row(r, 'backing').map(x => x[0])).toEqual(['met', 'met'])
    expect(row(r, 'f-number')[0]).toEqual(['not-met', 'Clause 6 electrode groups table (Table 4.13 in 2015)', 'Production electrode group F5: the test (electrode group F4) does not qualify it.', ''])
  })
  it('process: another process needs its own test; a joint naming no process against a combination test cannot tell', () => {
    expect(row(cv(plate, { ...pipeJoint(30, true), form: 'plate', process: 'FCAW' }), 'process')).toEqual([['not-met', 'Clause 6 WPQ essential variables table (Table 4.12 in 2015)', 'The test was SMAW; FCAW needs its own test.', '']])
    const combo = { form: 'plate', weld: 'groove', testPositions: ['2G'], couponThickness: 1, processes: [{ process: 'GTAW' }, { process: 'SMAW' }] }
    const r = cv(combo, { form: 'plate', weld: 'groove', position: 'F', thickness: 1 })
    expect(row(r, 'process')).toEqual([['not-recorded', 'Clause 6 WPQ essential variables table (Table 4.12 in 2015)', 'Production does not name its process: cannot tell, state it; the test was GTAW + SMAW.', 'production.process']])
    expect(row(r, 'backing')).toEqual([])
  })
  it('a fillet test: fillet positions only; a groove joint is refused by weld type and stops there', () => {
    const fillet = { process: 'SMAW', form: 'plate', weld: 'fillet', testPositions: ['2F'], couponThickness: 0.375 }
    expect(row(cv(fillet, { process: 'SMAW', form: 'plate', weld: 'fillet', position: 'H' }), 'position')).toEqual([['met', 'Table 6.10', 'Fillet H: the test qualifies F, H.', '']])
    expect(row(cv(fillet, { process: 'SMAW', form: 'plate', weld: 'fillet', positions: ['H', 'OH'] }), 'position')).toEqual([['not-met', 'Table 6.10', 'Fillet H, OH: the test qualifies F, H.', '']])
    const g = cv(fillet, { process: 'SMAW', form: 'plate', weld: 'groove', position: 'F', thickness: 0.5 })
    expect((g.reasons as Row[]).map(x => x.variable)).toEqual(['process', 'weld'])
    expect(row(g, 'weld')).toEqual([['not-met', 'Table 6.10', 'A fillet test qualifies fillet welds only.', '']])
    expect(refused({ code: 'aws-d1.1', check: 'covers', unit: 'in', input: { test: fillet, production: { form: 'plate', weld: 'fillet', position: '2F' } } })).toBe('production.position: "2F" is not F, H, V or OH')
  })
  it('the joint\'s code: D1.1 met; D1.3 not', () => {
    expect(row(cv(plate, { ...pipeJoint(30, true), form: 'plate', code: 'aws-d1.1' }), 'code')[0]).toEqual(['met', 'Clause 6 WPQ essential variables table (Table 4.12 in 2015)', 'The joint is welded to AWS D1.1.', ''])
    expect(row(cv(plate, { ...pipeJoint(30, true), form: 'plate', code: 'aws-d1.3' }), 'code')[0]![0]).toBe('not-met')
  })
})
