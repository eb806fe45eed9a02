// Table-driven boundary tests for AWS D1.1, AWS D1.3 and ISO 9606-1, through the public evaluate() API.
// Below, at and above each limit, in the record's unit; each block names its section of docs/sources.md.
import { describe, expect, it } from 'vitest'
import { ok, refused } from '../helpers'

type Unit = 'in' | 'mm'
interface Range { min: number | null, max: number | null }

function expectRange(actual: unknown, expected: Range) {
  const range = actual as Range
  for (const key of ['min', 'max'] as const) {
    if (expected[key] === null) expect(range[key]).toBeNull()
    else expect(range[key]).toBeCloseTo(expected[key] as number, 6)
  }
}

describe('AWS D1.1 plate thickness bands (docs/sources.md §B1: weldcerttest FAQ; AWS forum pid=272340, D1.1-2010 Table 4.11)', () => {
  const plate = (T: number, unit: Unit) => ok({ code: 'aws-d1.1', check: 'welder-ranges', unit, input: { process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['1G'], couponThickness: T } })
  const rows: [Unit, number, Range, { face: number, root: number, side: number }][] = [
    ['in', 0.375, { min: 0.125, max: 0.75 }, { face: 1, root: 1, side: 0 }],
    ['in', 0.376, { min: 0.125, max: 0.752 }, { face: 0, root: 0, side: 2 }],
    ['in', 0.999, { min: 0.125, max: 1.998 }, { face: 0, root: 0, side: 2 }],
    ['in', 1, { min: 0.125, max: null }, { face: 0, root: 0, side: 2 }],
    ['in', 1.001, { min: 0.125, max: null }, { face: 0, root: 0, side: 2 }],
    // SI values from memory (D1.1M): 10 mm, 25 mm, 3 mm minimum, 20 mm maximum for the 10 mm plate
    ['mm', 10, { min: 3, max: 20 }, { face: 1, root: 1, side: 0 }],
    ['mm', 10.1, { min: 3, max: 20.2 }, { face: 0, root: 0, side: 2 }],
    ['mm', 24.9, { min: 3, max: 49.8 }, { face: 0, root: 0, side: 2 }],
    ['mm', 25, { min: 3, max: null }, { face: 0, root: 0, side: 2 }],
  ]
  it.each(rows)('%s plate %s → %o, bends %o', (unit, T, thickness, bends) => {
    const r = plate(T, unit)
    expectRange(r.thickness, thickness)
    expect(r.bendSpecimens).toEqual({ ...bends, total: 2 })
  })
  it.each([['in', 0.374], ['mm', 9.9]] as [Unit, number][])('%s plate %s is under the table: refused, pointing to D1.3', (unit, T) => {
    expect(refused({ code: 'aws-d1.1', check: 'welder-ranges', unit, input: { process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['1G'], couponThickness: T } })).toContain('D1.3')
  })
})

describe('AWS D1.1:2020 Table 10.13 pipe (docs/sources.md §B2: proxied scribd "WQT - AWS D1.1", Clause 10)', () => {
  const pipe = (od: number, wall: number, positions: string[]) =>
    ok({ code: 'aws-d1.1', check: 'welder-ranges', unit: 'in', input: { process: 'SMAW', form: 'pipe', weld: 'groove', testPositions: positions, couponThickness: wall, outsideDiameter: od } })
  const rows: [string, number, number, string[], Range, { face: number, root: number, side: number, total: number }][] = [
    ['4 in pipe, any wall, 1G', 4, 0.5, ['1G'], { min: 0.125, max: 0.75 }, { face: 1, root: 1, side: 0, total: 2 }],
    ['4 in pipe, 6G', 4, 0.5, ['6G'], { min: 0.125, max: 0.75 }, { face: 2, root: 2, side: 0, total: 4 }],
    ['over 4 in, wall 3/8 in, 1G', 4.001, 0.375, ['1G'], { min: 0.125, max: 0.75 }, { face: 1, root: 1, side: 0, total: 2 }],
    ['over 4 in, wall 3/8 in, 5G', 6.625, 0.375, ['5G'], { min: 0.125, max: 0.75 }, { face: 2, root: 2, side: 0, total: 4 }],
    ['over 4 in, wall over 3/8 in, 1G', 4.001, 0.376, ['1G'], { min: 0.1875, max: null }, { face: 0, root: 0, side: 2, total: 2 }],
    ['over 4 in, wall over 3/8 in, 6G', 6.625, 0.5, ['6G'], { min: 0.1875, max: null }, { face: 0, root: 0, side: 4, total: 4 }],
  ]
  it.each(rows)('%s: wall %o, bends %o', (_label, od, wall, positions, thickness, bends) => {
    const r = pipe(od, wall, positions)
    expectRange(r.thickness, thickness)
    expect(r.bendSpecimens).toEqual(bends)
  })
  it('a 4 in test pipe qualifies sizes 3/4 to 4 in; over 4 in up to unlimited from the test size (note f not legible: convention)', () => {
    expectRange(pipe(4, 0.25, ['1G']).diameter, { min: 0.75, max: 4 })
    expectRange(pipe(4.001, 0.25, ['1G']).diameter, { min: 4.001, max: null })
  })
})

describe('AWS D1.1 bend acceptance (docs/sources.md §B3: D1.1-2015 4.9.3.3, scribd bend-test-acepten)', () => {
  type Indication = { size: number, atCorner?: boolean, fromInternalDefect?: boolean }
  const bend = (indications: Indication[], unit: Unit = 'in') =>
    ok({ code: 'aws-d1.1', check: 'bend', unit, input: { specimens: [{ type: 'face', indications }] } }).specimens as { accepted: boolean, replace?: boolean }[]
  const many = (n: number, size: number) => Array.from({ length: n }, () => ({ size }))

  it.each([
    ['in', 0.125, true], ['in', 0.126, false], ['mm', 3, true], ['mm', 3.1, false],
  ] as [Unit, number, boolean][])('%s largest discontinuity %s → accepted %s (no discontinuity over 1/8 in / 3 mm)', (unit, size, accepted) => {
    expect(bend([{ size }], unit)[0]!.accepted).toBe(accepted)
  })

  it('indications of exactly 1/32 in are not "over 1/32 in": thirteen of them (13/32 in) do not count toward the 3/8 in sum', () => {
    expect(bend(many(13, 0.03125))[0]!.accepted).toBe(true)
  })
  it('just over 1/32 in they count: thirteen of 0.0313 in add up to more than 3/8 in', () => {
    expect(bend(many(13, 0.0313))[0]!.accepted).toBe(false)
  })
  it('in mm: eleven indications of exactly 1 mm are not counted; of 1.01 mm they add up to over 10 mm', () => {
    expect(bend(many(11, 1), 'mm')[0]!.accepted).toBe(true)
    expect(bend(many(11, 1.01), 'mm')[0]!.accepted).toBe(false)
  })
  it('the sum may reach 3/8 in exactly, not more', () => {
    expect(bend(many(3, 0.125))[0]!.accepted).toBe(true)
    expect(bend([...many(3, 0.125), { size: 0.0313 }])[0]!.accepted).toBe(false)
    expect(bend([...many(3, 3), { size: 1 }], 'mm')[0]!.accepted).toBe(true)
    expect(bend([...many(3, 3), { size: 1.01 }], 'mm')[0]!.accepted).toBe(false)
  })
  it('corner cracks: up to 1/4 in accepted; over it the specimen is replaced; from slag the 1/8 in limit applies', () => {
    expect(bend([{ size: 0.25, atCorner: true }])[0]).toMatchObject({ accepted: true })
    expect(bend([{ size: 0.251, atCorner: true }])[0]).toMatchObject({ accepted: false, replace: true })
    expect(bend([{ size: 0.126, atCorner: true, fromInternalDefect: true }])[0]).toMatchObject({ accepted: false })
    expect(bend([{ size: 6, atCorner: true }], 'mm')[0]).toMatchObject({ accepted: true })
    expect(bend([{ size: 6.1, atCorner: true }], 'mm')[0]).toMatchObject({ accepted: false, replace: true })
  })
})

describe('AWS D1.3 sheet (docs/sources.md §B5: D1.3 WPQR guide on scribd, 4.7.2; scope weldcerttest)', () => {
  const sheet = (t: number, unit: Unit, joint = 'square-groove') =>
    ok({ code: 'aws-d1.3', check: 'welder-ranges', unit, input: { process: 'GMAW', form: 'plate', weld: joint === 'fillet' ? 'fillet' : 'groove', joint, testPositions: [joint === 'fillet' ? '1F' : '1G'], couponThickness: t } })
  const rows: [Unit, number, Range][] = [
    ['in', 0.06, { min: 0.03, max: 0.12 }],
    ['in', 0.09375, { min: 0.046875, max: 0.1875 }],
    ['in', 0.094, { min: 0.047, max: 0.1875 }],
    ['in', 0.1875, { min: 0.09375, max: 0.1875 }],
    ['mm', 2.4, { min: 1.2, max: 4.8 }],
    ['mm', 2.5, { min: 1.25, max: 4.8 }],
    ['mm', 4.8, { min: 2.4, max: 4.8 }],
  ]
  it.each(rows)('square groove, %s t = %s → 0.5t to 2t held to the 3/16 in (4.8 mm) scope: %o', (unit, t, range) => {
    expectRange(sheet(t, unit).thickness, range)
  })
  it.each([['in', 0.1876], ['mm', 4.9]] as [Unit, number][])('%s %s is over the D1.3 scope: refused, pointing to D1.1', (unit, t) => {
    expect(refused({ code: 'aws-d1.3', check: 'welder-ranges', unit, input: { process: 'GMAW', form: 'plate', weld: 'groove', joint: 'square-groove', testPositions: ['1G'], couponThickness: t } })).toContain('D1.1')
  })
  it('fillet tests: the thinnest production sheet up to the scope limit', () => {
    expectRange(sheet(0.06, 'in', 'fillet').thickness, { min: 0.06, max: 0.1875 })
  })
})

describe('ISO 9606-1 Table 6 butt welds by deposit s (docs/sources.md §C6: DIN EN ISO 9606-1:2013 summary sheets S1, S2)', () => {
  const butt = (s: number, process = '135') =>
    ok({ code: 'iso-9606-1', check: 'welder-ranges', unit: 'mm', input: { process, form: 'plate', weld: 'groove', testPositions: ['PA'], depositThickness: s } })
  const rows: [string, number, Range][] = [
    ['135', 2.9, { min: 2.9, max: 5.8 }],
    ['135', 3, { min: 3, max: 6 }],
    ['135', 3.1, { min: 3, max: 6.2 }],
    ['135', 11.9, { min: 3, max: 23.8 }],
    ['135', 12, { min: 3, max: null }],
    ['135', 12.1, { min: 3, max: null }],
    // gas welding (311): factor 1.5 (Pruef-Norm sheet)
    ['311', 2.9, { min: 2.9, max: 4.35 }],
    ['311', 3, { min: 3, max: 4.5 }],
    ['311', 11.9, { min: 3, max: 17.85 }],
  ]
  it.each(rows)('process %s, s = %s mm → %o', (process, s, range) => {
    expectRange(butt(s, process).thickness, range)
  })
  it('gas welding at s = 12 mm is not carried: refused, not guessed', () => {
    expect(refused({ code: 'iso-9606-1', check: 'welder-ranges', unit: 'mm', input: { process: '311', form: 'plate', weld: 'groove', testPositions: ['PA'], depositThickness: 12 } })).toContain('12 mm')
  })
})

describe('ISO 9606-1 Tables 7 and 8 (docs/sources.md §C7, §C8: summary sheets S1, S2)', () => {
  it.each([
    [2.9, { min: 2.9, max: 3 }], [3, { min: 3, max: null }], [3.1, { min: 3, max: null }],
  ] as [number, Range][])('fillet on t = %s mm → %o', (t, range) => {
    expectRange(ok({ code: 'iso-9606-1', check: 'welder-ranges', unit: 'mm', input: { process: '135', form: 'plate', weld: 'fillet', testPositions: ['PB'], couponThickness: t } }).thickness, range)
  })
  it.each([
    [24.9, { min: 24.9, max: 49.8 }], [25, { min: 25, max: 50 }], [25.1, { min: 25, max: null }],
    [49.9, { min: 25, max: null }], [50, { min: 25, max: null }], [50.1, { min: 25.05, max: null }],
  ] as [number, Range][])('pipe D = %s mm → %o', (D, range) => {
    expectRange(ok({ code: 'iso-9606-1', check: 'welder-ranges', unit: 'mm', input: { process: '141', form: 'pipe', weld: 'groove', testPositions: ['PA'], depositThickness: 3, outsideDiameter: D } }).diameter, range)
  })
})
