// Table-driven boundary tests for ASME BPVC Section IX, through the public evaluate() request API.
// For each limit: the value just below, at and just above it, in inches and in millimetres (the code's
// own SI pairing, not a conversion). Every row names its source: the section of docs/sources.md where the
// value, its edition and the public page it was read on are listed.
import { describe, expect, it } from 'vitest'
import { ok, refused } from '../helpers'

type Unit = 'in' | 'mm'
interface Range { min: number | null, max: number | null }

const procedure = (input: Record<string, unknown>, unit: Unit, edition?: string) =>
  ok({ code: 'asme-ix', check: 'procedure-ranges', unit, ...(edition ? { edition } : {}), input })
const welder = (input: Record<string, unknown>, unit: Unit, edition?: string) =>
  ok({ code: 'asme-ix', check: 'welder-ranges', unit, ...(edition ? { edition } : {}), input })

function expectRange(actual: unknown, expected: Range) {
  const range = actual as Range
  for (const key of ['min', 'max'] as const) {
    if (expected[key] === null) expect(range[key]).toBeNull()
    else expect(range[key]).toBeCloseTo(expected[key] as number, 6)
  }
}

describe('QW-451.1 band edges (docs/sources.md §A1: ASME BPVC.IX-2017 Table QW-451.1, read in full; mm rows mechanicalguruji)', () => {
  // SMAW is a Note (3) process, so the 1-1/2 to 6 in row gives 8 in (200 mm). No toughness, t = T.
  const rows: [Unit, number, Range, string][] = [
    ['in', 0.0624, { min: 0.0624, max: 0.1248 }, 'under 1/16 in: T to 2T'],
    ['in', 0.0625, { min: 0.0625, max: 0.125 }, '1/16 in: first inclusive row, 1/16 in to 2T'],
    ['in', 0.0626, { min: 0.0625, max: 0.1252 }, 'just over 1/16 in'],
    ['in', 0.374, { min: 0.0625, max: 0.748 }, 'just under 3/8 in'],
    ['in', 0.375, { min: 0.0625, max: 0.75 }, '3/8 in is in the 1/16–3/8 inclusive row'],
    ['in', 0.376, { min: 0.1875, max: 0.752 }, 'over 3/8 in: 3/16 in to 2T'],
    ['in', 1.499, { min: 0.1875, max: 2.998 }, 'under 1-1/2 in: 2T'],
    ['in', 1.5, { min: 0.1875, max: 8 }, '1-1/2 in: 8 in (Note 3 process)'],
    ['in', 6, { min: 0.1875, max: 8 }, '6 in inclusive: 8 in'],
    ['in', 6.001, { min: 0.1875, max: 7.98133 }, 'over 6 in: 1.33T'],
    ['mm', 1.4, { min: 1.4, max: 2.8 }, 'under 1.5 mm: T to 2T'],
    ['mm', 1.5, { min: 1.5, max: 3 }, '1.5 mm: 1.5 mm to 2T'],
    ['mm', 1.6, { min: 1.5, max: 3.2 }, 'just over 1.5 mm'],
    ['mm', 9.9, { min: 1.5, max: 19.8 }, 'just under 10 mm'],
    ['mm', 10, { min: 1.5, max: 20 }, '10 mm inclusive'],
    ['mm', 10.1, { min: 5, max: 20.2 }, 'over 10 mm: 5 mm to 2T'],
    ['mm', 37.9, { min: 5, max: 75.8 }, 'under 38 mm: 2T'],
    ['mm', 38, { min: 5, max: 200 }, '38 mm: 200 mm'],
    ['mm', 150, { min: 5, max: 200 }, '150 mm inclusive: 200 mm'],
    ['mm', 150.1, { min: 5, max: 199.633 }, 'over 150 mm: 1.33T'],
  ]
  it.each(rows)('%s T = %s → %o (%s)', (unit, T, expected) => {
    expectRange(procedure({ process: 'SMAW', couponThickness: T }, unit).baseMetal, expected)
  })

  const specimenRows: [Unit, number, { face: number, root: number, side: number }][] = [
    ['in', 0.749, { face: 2, root: 2, side: 0 }],
    ['in', 0.75, { face: 0, root: 0, side: 4 }],
    ['in', 0.751, { face: 0, root: 0, side: 4 }],
    ['mm', 18.9, { face: 2, root: 2, side: 0 }],
    ['mm', 19, { face: 0, root: 0, side: 4 }],
    ['mm', 19.1, { face: 0, root: 0, side: 4 }],
  ]
  it.each(specimenRows)('%s T = %s: specimens %o, always 2 tension (QW-451.1, 2017)', (unit, T, split) => {
    expect(procedure({ process: 'SMAW', couponThickness: T }, unit).specimens).toEqual({ tension: 2, ...split })
  })

  const depositRows: [Unit, number, number][] = [
    // deposit t in a 1 in (25 mm) coupon: 2t when t is under 3/4 in (19 mm), else 2T
    ['in', 0.749, 1.498],
    ['in', 0.75, 2],
    ['in', 0.751, 2],
    ['mm', 18.9, 37.8],
    ['mm', 19, 50],
  ]
  it.each(depositRows)('%s deposit t = %s in a 1 in / 25 mm coupon → %s (QW-451.1 3/4 in to 1-1/2 in row)', (unit, t, max) => {
    const T = unit === 'in' ? 1 : 25
    expect(procedure({ process: 'GTAW', couponThickness: T, depositThickness: t }, unit).depositMax).toBeCloseTo(max, 6)
  })

  it('Note (3): FCAW is not in the 8 in list, so 1-1/2 in gives 2T = 3 in (docs/sources.md §A1, 2017 Note 3 as printed)', () => {
    expectRange(procedure({ process: 'FCAW', couponThickness: 1.5 }, 'in').baseMetal, { min: 0.1875, max: 3 })
    expectRange(procedure({ process: 'SAW', couponThickness: 1.5 }, 'in').baseMetal, { min: 0.1875, max: 8 })
  })
})

describe('QW-403.6 toughness minimum (docs/sources.md §A1.6: eng-tips 405962 and 336813)', () => {
  // minimum = T/2 when T < 1/4 in (6 mm), else T or 5/8 in (16 mm) whichever is less; the stricter of that and QW-451.1
  const rows: [Unit, number, number, string][] = [
    ['in', 0.249, 0.1245, 'under 1/4 in: T/2'],
    ['in', 0.25, 0.25, 'at 1/4 in: T (not T/2)'],
    ['in', 0.251, 0.251, 'just over 1/4 in: T'],
    ['in', 0.624, 0.624, 'under 5/8 in: T'],
    ['in', 0.625, 0.625, 'at 5/8 in: 5/8 in'],
    ['in', 0.626, 0.625, 'over 5/8 in: 5/8 in'],
    ['mm', 5.9, 2.95, 'under 6 mm: T/2'],
    ['mm', 6, 6, 'at 6 mm: T'],
    ['mm', 6.1, 6.1, 'over 6 mm: T'],
    ['mm', 16, 16, 'at 16 mm'],
    ['mm', 16.1, 16, 'over 16 mm: 16 mm'],
  ]
  it.each(rows)('%s T = %s → minimum %s (%s)', (unit, T, min) => {
    expect((procedure({ process: 'SMAW', couponThickness: T, toughness: true }, unit).baseMetal as Range).min).toBeCloseTo(min, 6)
  })
})

describe('QW-403.9 single pass over 1/2 in (docs/sources.md §A1.9: AWS forum tid=29205, V-partial)', () => {
  const rows: [Unit, number, number, number][] = [
    ['in', 1, 0.5, 2],
    ['in', 1, 0.501, 1.1],
    ['mm', 25, 13, 50],
    ['mm', 25, 13.1, 27.5],
  ]
  it.each(rows)('%s SAW T = %s, thickest pass %s → maximum %s', (unit, T, pass, max) => {
    expect((procedure({ process: 'SAW', couponThickness: T, maxPassThickness: pass }, unit).baseMetal as Range).max).toBeCloseTo(max, 6)
  })
})

describe('QW-403.10 / QW-404.32 short-circuit GMAW procedures, 2019 edition (docs/sources.md §A1.10: mewelding 2021 changes)', () => {
  // Deposit held at 1/4 in (6 mm) so that QW-404.32 does not mix in; T crosses 1/2 in (13 mm).
  const rows: [Unit, number, number, string][] = [
    ['in', 0.499, 0.5489, 'under 1/2 in: 1.1T'],
    ['in', 0.5, 1, 'at 1/2 in: QW-451.1 alone, 2T'],
    ['in', 0.501, 1.002, 'over 1/2 in: 2T'],
    ['mm', 12.9, 14.19, 'under 13 mm: 1.1T'],
    ['mm', 13, 26, 'at 13 mm: 2T'],
    ['mm', 13.1, 26.2, 'over 13 mm: 2T'],
  ]
  it.each(rows)('%s T = %s → maximum %s (%s)', (unit, T, max) => {
    const t = unit === 'in' ? 0.25 : 6
    const r = procedure({ process: 'GMAW', transfer: 'short-circuit', couponThickness: T, depositThickness: t }, unit, '2019')
    expect((r.baseMetal as Range).max).toBeCloseTo(max, 6)
  })

  it.each([['2021'], ['2023']])('edition %s: QW-403.10 no longer referenced, 0.499 in gives 2T', (edition) => {
    const r = procedure({ process: 'GMAW', transfer: 'short-circuit', couponThickness: 0.499, depositThickness: 0.25 }, 'in', edition)
    expect((r.baseMetal as Range).max).toBeCloseTo(0.998, 6)
  })

  const depositRows: [Unit, number, number][] = [
    ['in', 0.499, 0.5489],
    ['in', 0.5, 1],
    ['mm', 12.9, 14.19],
    ['mm', 13, 26],
  ]
  it.each(depositRows)('QW-404.32 (2019): %s deposit t = %s → deposit maximum %s', (unit, t, max) => {
    const T = unit === 'in' ? 0.6 : 15
    expect(procedure({ process: 'GMAW', transfer: 'short-circuit', couponThickness: T, depositThickness: t }, unit, '2019').depositMax).toBeCloseTo(max, 6)
  })
})

describe('QW-452.1(b) welder deposit (docs/sources.md §A2b: ASME IX 2010/2011a on scribd; interpretations IX-10-35 etc.)', () => {
  const rows: [Unit, number, number | null][] = [
    ['in', 0.499, 0.998],
    ['in', 0.5, null],
    ['in', 0.501, null],
    ['mm', 12.9, 25.8],
    ['mm', 13, null],
    ['mm', 13.1, null],
  ]
  it.each(rows)('%s t = %s in 3 layers → %s', (unit, t, max) => {
    const r = welder({ process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['1G'], couponThickness: t, layers: 3 }, unit)
    if (max === null) expect(r.depositMax).toBeNull()
    else expect(r.depositMax).toBeCloseTo(max, 6)
  })
  it('1/2 in in 2 layers is 2t only: the 3-layer condition matters', () => {
    expect(welder({ process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['1G'], couponThickness: 0.5, layers: 2 }, 'in').depositMax).toBe(1)
  })
})

describe('QW-404.32 short-circuit GMAW welders, all editions (docs/sources.md §A2.32: mewelding 2021 changes)', () => {
  const rows: [Unit, number, number][] = [
    ['in', 0.499, 0.5489],
    ['in', 0.5, 1],
    ['mm', 12.9, 14.19],
    ['mm', 13, 26],
  ]
  it.each(rows)('%s t = %s → deposit maximum %s (2023 edition)', (unit, t, max) => {
    const r = welder({ process: 'GMAW', transfer: 'short-circuit', form: 'plate', weld: 'groove', testPositions: ['1G'], couponThickness: t }, unit, '2023')
    expect(r.depositMax).toBeCloseTo(max, 6)
  })
})

describe('QW-452.1(a) bend specimens: face/root/side split, not only totals (docs/sources.md §A2a: ASME IX 2010/2011a Note 1)', () => {
  const split = (form: 'plate' | 'pipe', positions: string[], t: number, unit: Unit) =>
    welder({ process: 'GTAW', form, weld: 'groove', testPositions: positions, couponThickness: t, ...(form === 'pipe' ? { outsideDiameter: unit === 'in' ? 6.625 : 168 } : {}) }, unit).bendSpecimens
  const rows: [string, 'plate' | 'pipe', string[], Unit, number, { face: number, root: number, side: number, total: number }][] = [
    ['plate 1G just under 3/8 in', 'plate', ['1G'], 'in', 0.374, { face: 1, root: 1, side: 0, total: 2 }],
    ['plate 1G at 3/8 in', 'plate', ['1G'], 'in', 0.375, { face: 0, root: 0, side: 2, total: 2 }],
    ['plate 1G just under 10 mm', 'plate', ['1G'], 'mm', 9.9, { face: 1, root: 1, side: 0, total: 2 }],
    ['plate 1G at 10 mm', 'plate', ['1G'], 'mm', 10, { face: 0, root: 0, side: 2, total: 2 }],
    // Note 1: 5G or 6G need four specimens; the type follows the weld metal thickness.
    ['pipe 6G thin wall', 'pipe', ['6G'], 'in', 0.28, { face: 2, root: 2, side: 0, total: 4 }],
    ['pipe 6G at 3/8 in', 'pipe', ['6G'], 'in', 0.375, { face: 0, root: 0, side: 4, total: 4 }],
    ['pipe 5G thin wall', 'pipe', ['5G'], 'in', 0.28, { face: 2, root: 2, side: 0, total: 4 }],
    // Note 1: 2G and 5G in one coupon need six; equal face and root halves are from memory (QW-463.2 figure not seen).
    ['pipe 2G + 5G thin wall', 'pipe', ['2G', '5G'], 'in', 0.28, { face: 3, root: 3, side: 0, total: 6 }],
    ['pipe 2G + 5G thick wall', 'pipe', ['2G', '5G'], 'in', 0.5, { face: 0, root: 0, side: 6, total: 6 }],
    ['pipe 2G + 5G at 10 mm', 'pipe', ['2G', '5G'], 'mm', 10, { face: 0, root: 0, side: 6, total: 6 }],
    ['pipe 2G alone', 'pipe', ['2G'], 'in', 0.28, { face: 1, root: 1, side: 0, total: 2 }],
  ]
  it.each(rows)('%s', (_label, form, positions, unit, t, expected) => {
    expect(split(form, positions, t, unit)).toEqual(expected)
  })
})

describe('QW-452.3 groove diameter bands (docs/sources.md §A2.3: slideshare, TWI FAQ, mewelding)', () => {
  const rows: [Unit, number, number][] = [
    ['in', 0.999, 0.999],
    ['in', 1, 1],
    ['in', 1.001, 1],
    ['in', 2.874, 1],
    ['in', 2.875, 1],
    ['in', 2.876, 2.875],
    ['mm', 24.9, 24.9],
    ['mm', 25, 25],
    ['mm', 25.1, 25],
    ['mm', 73, 25],
    ['mm', 73.1, 73],
  ]
  it.each(rows)('%s OD %s → minimum %s, no maximum', (unit, od, min) => {
    const r = welder({ process: 'GTAW', form: 'pipe', weld: 'groove', testPositions: ['1G'], couponThickness: unit === 'in' ? 0.2 : 5, outsideDiameter: od }, unit)
    expectRange(r.diameter, { min, max: null })
  })
})

describe('QW-452.5 fillet test coupon 3/16 in (docs/sources.md §A2.5: underfill blog V-partial; the under-3/16 row from memory)', () => {
  const rows: [Unit, number, Range, number | null][] = [
    ['in', 0.1874, { min: 0.1874, max: 0.3748 }, 0.1874],
    ['in', 0.1875, { min: null, max: null }, null],
    ['in', 0.1876, { min: null, max: null }, null],
    ['mm', 4.9, { min: 4.9, max: 9.8 }, 4.9],
    ['mm', 5, { min: null, max: null }, null],
  ]
  it.each(rows)('%s coupon %s → thickness %o, fillet size up to %s', (unit, T, thickness, filletMax) => {
    const r = welder({ process: 'SMAW', form: 'plate', weld: 'fillet', testPositions: ['2F'], couponThickness: T }, unit)
    expectRange(r.thickness, thickness)
    if (filletMax === null) expect(r.filletSizeMax).toBeNull()
    else expect(r.filletSizeMax).toBeCloseTo(filletMax, 6)
  })
})

describe('QW-163 bend acceptance, 1/8 in (3 mm) (docs/sources.md §A5.163: QW-163 text, proxied scribd copy)', () => {
  const bend = (size: number, unit: Unit, extra: Record<string, unknown> = {}) =>
    ok({ code: 'asme-ix', check: 'bend', unit, input: { specimens: [{ type: 'face', indications: [{ size, ...extra }] }] } }).accepted
  const rows: [Unit, number, boolean][] = [
    ['in', 0.124, true],
    ['in', 0.125, true],
    ['in', 0.126, false],
    ['mm', 2.9, true],
    ['mm', 3, true],
    ['mm', 3.1, false],
    ['mm', 3.175, false],
  ]
  it.each(rows)('%s open discontinuity %s → accepted %s', (unit, size, accepted) => {
    expect(bend(size, unit)).toBe(accepted)
  })
  it('a corner indication over 1/8 in is not counted without evidence of an internal cause, and is with it', () => {
    expect(bend(0.2, 'in', { atCorner: true })).toBe(true)
    expect(bend(0.2, 'in', { atCorner: true, fromInternalDefect: true })).toBe(false)
  })
  it('no specimen is refused, never a pass', () => {
    expect(refused({ code: 'asme-ix', check: 'bend', unit: 'in', input: { specimens: [] } })).toContain('specimens')
  })
})

describe('QW-191.1.2.2 radiography (docs/sources.md §A5.191: ilovetranslation copy of the code text)', () => {
  const rt = (thickness: number, indications: { kind: string, length: number }[], unit: Unit = 'in') =>
    ok({ code: 'asme-ix', check: 'radiography', unit, input: { thickness, indications } }).accepted
  const slagRows: [Unit, number, number, boolean, string][] = [
    ['in', 0.375, 0.125, true, 't ≤ 3/8 in: 1/8 in allowed'],
    ['in', 0.375, 0.126, false, 't ≤ 3/8 in: over 1/8 in rejects'],
    ['in', 0.6, 0.2, true, '3/8 < t ≤ 2-1/4 in: t/3'],
    ['in', 0.6, 0.201, false, 'over t/3 rejects'],
    ['in', 3, 0.75, true, 't > 2-1/4 in: 3/4 in'],
    ['in', 3, 0.751, false, 'over 3/4 in rejects'],
    ['mm', 10, 3, true, 't ≤ 10 mm: 3 mm'],
    ['mm', 10, 3.1, false, 'over 3 mm rejects'],
    ['mm', 60, 19, true, 't > 57 mm: 19 mm'],
    ['mm', 60, 19.1, false, 'over 19 mm rejects'],
  ]
  it.each(slagRows)('%s t = %s, slag %s → accepted %s (%s)', (unit, t, length, accepted) => {
    expect(rt(t, [{ kind: 'slag', length }], unit)).toBe(accepted)
  })
  const roundRows: [Unit, number, number, boolean, string][] = [
    ['in', 0.5, 0.1, true, '20% of t'],
    ['in', 0.5, 0.101, false, 'over 20% of t'],
    ['in', 1, 0.125, true, '1/8 in is smaller than 20% of t'],
    ['in', 1, 0.126, false, 'over 1/8 in'],
    ['in', 0.1, 0.031, true, 'under 1/32 in is not counted'],
    ['in', 0.1, 0.03125, false, '1/32 in is counted and exceeds 20% of t = 0.02 in'],
  ]
  it.each(roundRows)('%s t = %s, rounded %s → accepted %s (%s)', (unit, t, length, accepted) => {
    expect(rt(t, [{ kind: 'rounded', length }], unit)).toBe(accepted)
  })
})
