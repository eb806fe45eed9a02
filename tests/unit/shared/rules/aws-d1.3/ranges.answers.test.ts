import { describe, expect, it } from 'vitest'
import dayjs from 'dayjs'
import { welderRanges } from '../../../../../shared/rules/aws-d1.3/welder-ranges'
import { ok, refused } from '../helpers'

// AWS D1.3 sheet steel, whole answers and each limit below, at and above. docs/sources.md §B5 (D1.3 welder guide,
// Section 4, 4.7.2 and Table 4.4, edition not stated, read): scope 3/16 in (4.8 mm) or less; square-groove on t:
// 0.5t to 2t; flare-groove and fillet on the thinnest production sheet; arc spot and arc seam per gauge; Table 4.4:
// 1G/1F F, 2G/2F F, H, 3G/3F F, H, V, 4G/4F F, H, OH; arc spot 1F F; arc seam 1F F, 2F H. Essential variables F-No.
// (SMAW), joint type, process, coating, vertical progression (4.7, same guide). The 2008 edition keeps the Section 4
// numbers; 2018 answers name clause 6 (§B5, Re-checked values). Sentences are Rootface's.
type Unit = 'in' | 'mm'
const request = (check: string, input: unknown, unit: Unit = 'in', edition = '2008') => ({ code: 'aws-d1.3', edition, check, unit, input })
const wr = (input: Record<string, unknown>, unit: Unit = 'in') => ok(request('welder-ranges', input, unit))
const no = (input: Record<string, unknown>, unit: Unit = 'in') => refused(request('welder-ranges', input, unit))
const cv = (test: unknown, production: unknown, unit: Unit = 'in') => ok(request('covers', { test, production }, unit))
const noCover = (test: unknown, production: unknown) => refused(request('covers', { test, production }))
const square = (t: number, extra: Record<string, unknown> = {}) => ({ process: 'GMAW', form: 'plate', weld: 'groove', joint: 'square-groove', testPositions: ['1G'], couponThickness: t, ...extra })
const texts = (r: Record<string, unknown>) => (r.reasons as { clause: string, text: string }[]).map(x => [x.clause, x.text])
type Row = { variable: string, state: string, clause: string, text: string, record?: string }
const rows = (r: Record<string, unknown>) => (r.reasons as Row[]).map(x => [x.variable, x.state, x.clause, x.text, x.record ?? ''])
const row = (r: Record<string, unknown>, variable: string) => rows(r).filter(x => x[0] === variable)

// 4.7.2 square-groove, 0.5t to 2t held to the 3/16 in (4.8 mm) scope: [unit, t, min, max, held to the scope].
const squareGroove: [Unit, number, number, number, boolean][] = [
  ['in', 0.0747, 0.03735, 0.1494, false], // 14 ga (§D)
  ['in', 0.0937, 0.04685, 0.1874, false], // 2t just under 3/16 in
  ['in', 0.09375, 0.046875, 0.1875, false], // 2t = 3/16 in exactly
  ['in', 0.0938, 0.0469, 0.1875, true], // 2t just over: held
  ['in', 0.1875, 0.09375, 0.1875, true], // the scope limit itself
  ['mm', 2, 1, 4, false],
  ['mm', 2.4, 1.2, 4.8, false], // 2t = 4.8 mm exactly
  ['mm', 2.5, 1.25, 4.8, true],
]

describe('AWS D1.3 welder ranges (§B5)', () => {
  it.each(squareGroove)('%s square-groove t = %s: %s to %s (held: %s)', (unit, t, min, max, held) => {
    const r = wr(square(t), unit)
    expect(r.thickness).toEqual({ min, max })
    expect(texts(r)[0]![1]).toContain(held ? '0.5t to 2t, held to the D1.3 scope limit = ' : '0.5t to 2t = ')
  })
  it('a whole square-groove answer: thickness, Table 4.4 row, the two assemblies and the other variables', () => {
    const r = wr(square(0.0747, { testPositions: ['3G'] }))
    expect(r.positions).toEqual({ groove: ['F', 'H', 'V'], fillet: [] })
    expect(texts(r)).toEqual([
      ['D1.3 4.7.2', 'Square-groove test on 0.0747 in: 0.5t to 2t = 0.03735 in to 0.1494 in.'],
      ['D1.3 Table 4.4', 'square-groove test in 3G: F, H, V.'],
      ['D1.3 4.7', 'Two test assemblies are required for each joint type. Essential variables also include F-Number (SMAW), joint type, process, coating and vertical progression.'],
    ])
  })
  it('fillet and flare-groove: the sheet tested up to the scope; the fillet answer lists fillet positions only', () => {
    const f = wr({ process: 'GMAW', form: 'plate', weld: 'fillet', testPositions: ['4F'], couponThickness: 0.0598 })
    expect([f.thickness, f.positions]).toEqual([{ min: 0.0598, max: 0.1875 }, { groove: [], fillet: ['F', 'H', 'O'] }])
    expect(texts(f).slice(0, 2)).toEqual([
      ['D1.3 4.7.2', 'fillet tests are made on the thinnest production sheet: 0.0598 in to 3/16 in (the upper limit is the D1.3 scope).'],
      ['D1.3 Table 4.4', 'fillet test in 4F: F, H, OH.'],
    ])
    const g = wr({ process: 'GMAW', form: 'plate', weld: 'groove', joint: 'flare-groove', testPositions: ['2G'], couponThickness: 3 }, 'mm')
    expect([g.thickness, g.positions]).toEqual([{ min: 3, max: 4.8 }, { groove: ['F', 'H'], fillet: [] }])
  })
  it('arc spot and arc seam: the gauge tested only; arc seam 1F + 2F gives F, H', () => {
    const r = wr({ process: 'SMAW', form: 'plate', weld: 'fillet', joint: 'arc-seam', testPositions: ['1F', '2F'], couponThickness: 0.0598 })
    expect([r.thickness, r.positions]).toEqual([{ min: 0.0598, max: 0.0598 }, { groove: [], fillet: ['F', 'H'] }])
    expect(texts(r)[0]).toEqual(['D1.3 4.7.2', 'arc-seam welds: each gauge used in production is tested; this test covers 0.0598 in only.'])
    expect(wr({ process: 'SMAW', form: 'plate', weld: 'fillet', joint: 'arc-spot', testPositions: ['1f'], couponThickness: 0.0598 }).positions).toEqual({ groove: [], fillet: ['F'] })
  })
  it('Table 4.4 fillet rows and a union: 1F F; 2F F, H; 3F F, H, V; 3F + 4F all', () => {
    const f = (tests: string[]) => (wr({ process: 'GMAW', form: 'plate', weld: 'fillet', testPositions: tests, couponThickness: 0.0598 }).positions as { fillet: string[] }).fillet
    expect([f(['1F']), f(['2F']), f(['3F']), f(['3F', '4F'])]).toEqual([['F'], ['F', 'H'], ['F', 'H', 'V'], ['F', 'H', 'V', 'O']])
  })
  it('refusals, each with its message', () => {
    expect(no({ ...square(0.0747), form: 'pipe', outsideDiameter: 2 })).toBe('form: AWS D1.3 qualifies welders on sheet ("plate"), not pipe')
    expect(no({ ...square(0.0747), couponThickness: undefined })).toBe('couponThickness: AWS D1.3 qualifies by the sheet thickness tested (4.7.2)')
    expect(no({ ...square(0.0747), joint: undefined })).toBe('joint: AWS D1.3 groove tests are square-groove or flare-groove: give joint')
    expect(no({ ...square(0.0747), joint: 'fillet' })).toBe('joint: fillet does not match weld "groove"')
    expect(no({ process: 'GMAW', form: 'plate', weld: 'fillet', joint: 'flare-groove', testPositions: ['1F'], couponThickness: 0.0598 })).toBe('joint: flare-groove does not match weld "fillet"')
    expect(no({ ...square(0.0747), testPositions: ['1F'] })).toBe('testPositions: 1F is not a square-groove test position of AWS D1.3 Table 4.4')
    expect(no({ process: 'GMAW', form: 'plate', weld: 'fillet', testPositions: ['2G'], couponThickness: 0.0598 })).toBe('testPositions: 2G is not a fillet test position of AWS D1.3 Table 4.4')
    expect(no({ ...square(0.0747), testPositions: ['5G'] })).toBe('testPositions: 5G is not a square-groove test position of AWS D1.3 Table 4.4')
    expect(no({ process: 'SMAW', form: 'plate', weld: 'fillet', joint: 'arc-spot', testPositions: ['2F'], couponThickness: 0.0598 })).toBe('testPositions: Table 4.4 gives arc-spot tests in 1F only')
    expect(no({ process: 'SMAW', form: 'plate', weld: 'fillet', joint: 'arc-seam', testPositions: ['3F'], couponThickness: 0.0598 })).toBe('testPositions: Table 4.4 gives arc-seam tests in 1F and 2F only')
    expect(no({ process: 'SMAW', form: 'plate', weld: 'fillet', joint: 'plug', testPositions: ['1F'], couponThickness: 0.0598 })).toBe('joint: the thickness rule for plug-weld tests is not carried; 4.7.2 names arc spot, arc seam, flare-groove, fillet and square-groove welds')
  })
  it('scope: 3/16 in and 4.8 mm are in; just over is refused and sent to D1.1', () => {
    expect(wr(square(0.1875)).thickness).toEqual({ min: 0.09375, max: 0.1875 })
    expect(wr(square(4.8), 'mm').thickness).toEqual({ min: 2.4, max: 4.8 })
    expect(no(square(0.1876))).toBe('0.1876 in is over 3/16 in, outside AWS D1.3 (sheet steel): qualify it under AWS D1.1 (code "aws-d1.1")')
    expect(no(square(4.81), 'mm')).toBe('4.81 mm is over 4.8 mm, outside AWS D1.3 (sheet steel): qualify it under AWS D1.1 (code "aws-d1.1")')
  })
})

const test = { process: 'SMAW', form: 'plate', weld: 'groove', joint: 'square-groove', testPositions: ['4G'], couponThickness: 0.0747, fNumber: 4, coating: 'none', progression: 'uphill' }
const joint = { process: 'SMAW', form: 'plate', weld: 'groove', joint: 'square-groove', position: 'F', thickness: 0.1, fNumber: 4, coating: 'none' }

describe('AWS D1.3 coverage (§B5), 2008 clause numbers', () => {
  it('a whole covered answer: every row met, no progression row for a flat weld', () => {
    const r = cv(test, joint)
    expect([r.covered, r.answer]).toEqual([true, 'covered'])
    expect(rows(r)).toEqual([
      ['joint', 'met', 'D1.3 4.7 (joint type)', 'Joint square-groove was tested.', ''],
      ['process', 'met', 'D1.3 4.7 (process)', 'Process SMAW was tested.', ''],
      ['position', 'met', 'D1.3 Table 4.4', 'Position F: the test qualifies F, H, OH.', ''],
      ['thickness', 'met', 'D1.3 4.7.2', 'Sheet 0.1 in: qualified 0.03735 in to 0.1494 in.', ''],
      ['f-number', 'met', 'D1.3 4.7 (F-Number)', 'Production F-No. 4: qualified by the test (F-No. 4).', ''],
      ['coating', 'met', 'D1.3 4.7 (coating)', 'Production uncoated: qualified by the test (uncoated).', ''],
    ])
  })
  it('thickness below, at and above 0.5t and 2t of a 14 ga test (0.03735 in to 0.1494 in)', () => {
    const at = (thickness: number) => row(cv(test, { ...joint, thickness }), 'thickness')[0]![1]
    expect([at(0.0373), at(0.03735), at(0.0374), at(0.1493), at(0.1494), at(0.1495)]).toEqual(['not-met', 'met', 'met', 'met', 'met', 'not-met'])
  })
  it('scope of the joint: 3/16 in is judged, just over stops at the scope row', () => {
    expect(row(cv({ ...test, couponThickness: 0.09375 }, { ...joint, thickness: 0.1875 }), 'thickness')[0]![1]).toBe('met')
    expect(rows(cv(test, { ...joint, thickness: 0.1876 }))).toEqual([['scope', 'not-met', 'D1.3 scope', '0.1876 in is over 3/16 in, outside AWS D1.3 (sheet steel): qualify it under AWS D1.1 (code "aws-d1.1")', '']])
  })
  it('positions: OH is OH, overhead on a 4G test is met, vertical is not; several positions listed; a bad letter refused', () => {
    expect(row(cv(test, { ...joint, position: 'OH' }), 'position')).toEqual([['position', 'met', 'D1.3 Table 4.4', 'Position OH: the test qualifies F, H, OH.', '']])
    expect(row(cv(test, { ...joint, positions: ['F', 'V'], position: undefined, progression: 'uphill' }), 'position')).toEqual([['position', 'not-met', 'D1.3 Table 4.4', 'Position F, V: the test qualifies F, H, OH.', '']])
    expect(noCover(test, { ...joint, position: 'X' })).toBe('production.position: "X" is not F, H, V or OH')
  })
  it('vertical progression is compared only on a vertical weld', () => {
    const t3 = { ...test, testPositions: ['3G'] }
    expect(row(cv(t3, { ...joint, position: 'V', progression: 'uphill' }), 'progression')).toEqual([['progression', 'met', 'D1.3 4.7 (vertical progression)', 'Production uphill vertical: qualified by the test (uphill vertical).', '']])
    expect(row(cv(t3, { ...joint, position: 'V', progression: 'downhill' }), 'progression')[0]![1]).toBe('not-met')
    expect(row(cv(t3, { ...joint, position: 'H', progression: 'downhill' }), 'progression')).toEqual([])
  })
  it('F-No. is compared for SMAW on either side only; not for GMAW on both', () => {
    expect(row(cv(test, { ...joint, fNumber: 3 }), 'f-number')).toEqual([['f-number', 'not-met', 'D1.3 4.7 (F-Number)', 'Production F-No. 3: the test (F-No. 4) does not qualify it.', '']])
    const gmaw = { ...test, process: 'GMAW' }
    expect(row(cv(gmaw, { ...joint, process: 'GMAW', fNumber: 6 }), 'f-number')).toEqual([])
    expect(row(cv(gmaw, { ...joint, process: 'SMAW', fNumber: 6 }), 'f-number')[0]![1]).toBe('not-met')
    expect(row(cv(test, { ...joint, process: 'GMAW', fNumber: 6 }), 'f-number')[0]![1]).toBe('not-met')
  })
  it('coating: the same coating in any case, "none" shown as uncoated; a different coating not met', () => {
    expect(row(cv({ ...test, coating: 'Galvanized' }, { ...joint, coating: ' galvanized' }), 'coating')).toEqual([['coating', 'met', 'D1.3 4.7 (coating)', 'Production  galvanized coated: qualified by the test (Galvanized coated).', '']])
    expect(row(cv(test, { ...joint, coating: 'galvanized' }), 'coating')).toEqual([['coating', 'not-met', 'D1.3 4.7 (coating)', 'Production galvanized coated: the test (uncoated) does not qualify it.', '']])
  })
  it('process and joint type: another process or joint needs its own test', () => {
    expect(row(cv(test, { ...joint, process: 'GMAW' }), 'process')).toEqual([['process', 'not-met', 'D1.3 4.7 (process)', 'The test was SMAW; GMAW needs its own test.', '']])
    expect(row(cv(test, { ...joint, process: 'smaw' }), 'process')[0]![1]).toBe('met')
    expect((cv(test, { ...joint, process: 'GMAW' }).reasons as { variable: string, process?: string }[]).filter(x => x.variable === 'process').map(x => x.process)).toEqual(['GMAW'])
    expect(row(cv(test, { ...joint, joint: 'flare-groove' }), 'joint')).toEqual([['joint', 'not-met', 'D1.3 4.7 (joint type)', 'The test was square-groove; flare-groove is a different joint type and needs its own test.', '']])
  })
  it('a fillet test: the fillet row of Table 4.4 and the sheet up to the scope; a groove joint gets the groove row (none)', () => {
    const f = { process: 'GMAW', form: 'plate', weld: 'fillet', testPositions: ['3F'], couponThickness: 0.0598 }
    const r = cv(f, { process: 'GMAW', form: 'plate', weld: 'fillet', position: 'V', thickness: 0.1875, progression: 'uphill' })
    expect(rows(r).slice(0, 4)).toEqual([
      ['joint', 'met', 'D1.3 4.7 (joint type)', 'Joint fillet was tested.', ''],
      ['process', 'met', 'D1.3 4.7 (process)', 'Process GMAW was tested.', ''],
      ['position', 'met', 'D1.3 Table 4.4', 'Position V: the test qualifies F, H, V.', ''],
      ['thickness', 'met', 'D1.3 4.7.2', 'Sheet 0.1875 in: qualified 0.0598 in to 3/16 in.', ''],
    ])
    expect(row(r, 'progression')).toEqual([['progression', 'not-recorded', 'D1.3 4.7 (vertical progression)', 'Production is uphill vertical; the test did not record its vertical progression: cannot tell, record it.', 'test.progression']])
  })
  it('the joint\'s code must be AWS D1.3; mm sheets are judged against 4.8 mm', () => {
    expect(rows(cv(test, { ...joint, code: 'aws-d1.1' }))[0]).toEqual(['code', 'not-met', 'D1.3 4.7', 'The joint is welded to AWS D1.1; an AWS D1.3 test does not qualify it.', ''])
    const mm = cv({ ...test, couponThickness: 2 }, { ...joint, thickness: 4 }, 'mm')
    expect(row(mm, 'thickness')).toEqual([['thickness', 'met', 'D1.3 4.7.2', 'Sheet 4 mm: qualified 1 mm to 4 mm.', '']])
    expect(rows(cv({ ...test, couponThickness: 2 }, { ...joint, thickness: 4.9 }, 'mm'))[0]![3]).toContain('over 4.8 mm')
  })
})

describe('AWS D1.3 period of effectiveness and Table 4.4 spellings (§B6: six months, as D1.1; partly read)', () => {
  it('last use 2026-01-15: current through the six-month anniversary, lapsed the day after (dates cross-checked with dayjs)', () => {
    const r = ok({ code: 'aws-d1.3', check: 'continuity', unit: 'in', input: { lastUse: '2026-01-15', on: '2026-02-01' } })
    const anniversary = dayjs('2026-01-15').add(6, 'month')
    expect([r.current, r.lastCurrentDay, r.lapsesOn]).toEqual([true, anniversary.format('YYYY-MM-DD'), anniversary.add(1, 'day').format('YYYY-MM-DD')])
    expect(r.convention).toBe('Still current on the six-month anniversary of the last use (month ends clamp: Aug 31 + 6 months = Feb 28 or 29); lapses the day after.')
    expect(r.rule).toBe('A welder\'s qualification remains in effect unless the welder has not engaged in the process for a period exceeding six months.')
    expect(r.reasons).toContainEqual({ clause: 'D1.3 period of effectiveness', text: r.rule, basis: 'partial' })
    expect(ok({ code: 'aws-d1.3', check: 'continuity', unit: 'in', input: { lastUse: '2026-01-15', on: anniversary.add(1, 'day').format('YYYY-MM-DD') } }).current).toBe(false)
  })
  it('test positions are read whole: 12G, 1GR and G1 are refused; lower case is accepted', () => {
    for (const p of ['12G', '1GR', 'G1']) expect(no(square(0.0747, { testPositions: [p] }))).toBe(`testPositions: ${p} is not a square-groove test position of AWS D1.3 Table 4.4`)
    expect((wr(square(0.0747, { testPositions: ['2g'] })).positions as { groove: string[] }).groove).toEqual(['F', 'H'])
  })
  it('an empty position list is refused by the rule itself too (the request schema refuses it first)', () => {
    expect(() => welderRanges(square(0.0747, { testPositions: [] }) as never, { code: 'aws-d1.3', edition: '2008', unit: 'in' })).toThrow('testPositions: give at least one test position')
  })
})

describe('AWS D1.3 coverage: how sure each row is (§B5 read: verified; F-No. and coating comparison: partial; code: convention)', () => {
  const basis = (r: Record<string, unknown>) => (r.reasons as { variable: string, basis: string }[]).map(x => [x.variable, x.basis])
  it('a vertical SMAW joint with every variable stated', () => {
    const t3 = { ...test, testPositions: ['3G'] }
    expect(basis(cv(t3, { ...joint, position: 'V', progression: 'uphill', code: 'aws-d1.3' }))).toEqual([
      ['code', 'convention'], ['joint', 'verified'], ['process', 'verified'], ['position', 'verified'], ['thickness', 'verified'],
      ['f-number', 'partial'], ['coating', 'partial'], ['progression', 'verified'],
    ])
  })
  it('pipe, no process, no thickness, over the scope: each row verified', () => {
    expect(basis(cv(test, { form: 'pipe', weld: 'groove', joint: 'square-groove', position: 'F' })).slice(0, 4)).toEqual([['scope', 'verified'], ['joint', 'verified'], ['process', 'verified'], ['position', 'verified']])
    expect(basis(cv(test, { form: 'pipe', weld: 'groove', joint: 'square-groove', position: 'F' })).find(x => x[0] === 'thickness')).toEqual(['thickness', 'verified'])
    expect(basis(cv(test, { ...joint, thickness: 0.25 }))).toEqual([['scope', 'verified']])
  })
  it('a two-position arc seam test names both positions joined with +', () => {
    const r = wr({ process: 'SMAW', form: 'plate', weld: 'fillet', joint: 'arc-seam', testPositions: ['1F', '2F'], couponThickness: 0.0598 })
    expect(texts(r)[1]).toEqual(['D1.3 Table 4.4', 'arc-seam test in 1F + 2F: F, H.'])
  })
})
