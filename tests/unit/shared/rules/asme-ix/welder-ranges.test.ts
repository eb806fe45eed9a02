import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { ok, refused } from '../helpers'

type Input = Record<string, unknown>
const wr = (input: Input, unit: 'in' | 'mm' = 'in', edition?: string) =>
  ok({ code: 'asme-ix', check: 'welder-ranges', unit, ...(edition ? { edition } : {}), input })
const plate = (testPositions: string[], extra: Input = {}) => wr({ process: 'SMAW', form: 'plate', weld: 'groove', testPositions, couponThickness: 0.375, ...extra })
const pipe = (testPositions: string[], extra: Input = {}) => wr({ process: 'GTAW', form: 'pipe', weld: 'groove', testPositions, couponThickness: 0.28, outsideDiameter: 6.625, ...extra })
type Positions = { groove: string[], groovePipe?: string[], groovePipeMinDiameter?: number, fillet: string[], filletPipeMinDiameter?: number }
const positions = (r: Record<string, unknown>) => r.positions as Positions

describe('ASME IX welder deposit, QW-452.1(b) and QW-404.32 (2010 ed. with 2011a; mewelding 2021 changes)', () => {
  it('any coupon qualifies 2t', () => {
    expect(plate(['1G'], { couponThickness: 0.25 }).depositMax).toBe(0.5)
  })
  it('1/2 in or more in at least 3 layers qualifies the maximum to be welded (null)', () => {
    expect(plate(['1G'], { couponThickness: 0.5, layers: 3 }).depositMax).toBeNull()
    expect(plate(['1G'], { couponThickness: 0.5, layers: 2 }).depositMax).toBe(1)
    expect(plate(['1G'], { couponThickness: 13, layers: 3 }).depositMax).toBeNull()
  })
  it('SI: 13 mm in 3 layers is unlimited, 12 mm is 2t', () => {
    expect(wr({ process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['1G'], couponThickness: 13, layers: 3 }, 'mm').depositMax).toBeNull()
    expect(wr({ process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['1G'], couponThickness: 12, layers: 3 }, 'mm').depositMax).toBe(24)
  })
  it('QW-404.32: GMAW-S under 1/2 in qualifies 1.1t, in every edition', () => {
    for (const edition of ['2019', '2021', '2025']) {
      expect(wr({ process: 'GMAW', transfer: 'short-circuit', form: 'plate', weld: 'groove', testPositions: ['1G'], couponThickness: 0.25 }, 'in', edition).depositMax).toBe(0.275)
    }
  })
})

describe('ASME IX welder bend specimens, QW-452.1(a)', () => {
  it('under 3/8 in: 1 face + 1 root; 3/8 in and over: 2 side', () => {
    expect(plate(['1G'], { couponThickness: 0.25 }).bendSpecimens).toEqual({ face: 1, root: 1, side: 0, total: 2 })
    expect(plate(['1G'], { couponThickness: 0.375 }).bendSpecimens).toEqual({ face: 0, root: 0, side: 2, total: 2 })
    expect(plate(['1G'], { couponThickness: 1 }).bendSpecimens).toEqual({ face: 0, root: 0, side: 2, total: 2 })
  })
  it('pipe in 5G or 6G: 4 specimens; 2G and 5G on one coupon: 6', () => {
    expect(pipe(['6G']).bendSpecimens).toMatchObject({ total: 4 })
    expect(pipe(['2G', '5G']).bendSpecimens).toMatchObject({ total: 6 })
    expect(pipe(['2G']).bendSpecimens).toMatchObject({ total: 2 })
  })
})

describe('ASME IX diameter, QW-452.3 (slideshare, TWI, mewelding)', () => {
  it('under 1 in: the size welded and over; 1 to 2-7/8 in: 1 in; over 2-7/8 in: 2-7/8 in', () => {
    expect(pipe(['1G'], { outsideDiameter: 0.84 }).diameter).toEqual({ min: 0.84, max: null })
    expect(pipe(['1G'], { outsideDiameter: 1 }).diameter).toEqual({ min: 1, max: null })
    expect(pipe(['1G'], { outsideDiameter: 2.875 }).diameter).toEqual({ min: 1, max: null })
    expect(pipe(['1G'], { outsideDiameter: 2.876 }).diameter).toEqual({ min: 2.875, max: null })
  })
  it('SI bands: 25 and 73 mm', () => {
    const mm = (od: number) => wr({ process: 'GTAW', form: 'pipe', weld: 'groove', testPositions: ['1G'], couponThickness: 5, outsideDiameter: od }, 'mm').diameter
    expect(mm(24)).toEqual({ min: 24, max: null })
    expect(mm(73)).toEqual({ min: 25, max: null })
    expect(mm(73.1)).toEqual({ min: 73, max: null })
  })
})

describe('ASME IX positions, Table QW-461.9 (ru.scribd 365768748 and 394232648, about 2010)', () => {
  it('plate groove rows: columns A (plate and pipe > 24 in), B (pipe ≤ 24 in, † 2-7/8 in and over), C (fillet)', () => {
    expect(positions(plate(['1G']))).toMatchObject({ groove: ['F'], groovePipe: ['F'], groovePipeMinDiameter: 2.875, fillet: ['F'] })
    expect(positions(plate(['2G']))).toMatchObject({ groove: ['F', 'H'], groovePipe: ['F', 'H'], fillet: ['F', 'H'] })
    expect(positions(plate(['3G']))).toMatchObject({ groove: ['F', 'V'], groovePipe: ['F'], fillet: ['F', 'H', 'V'] })
    expect(positions(plate(['4G']))).toMatchObject({ groove: ['F', 'O'], groovePipe: ['F'], fillet: ['F', 'H', 'O'] })
  })
  it('plate combination rows: 3G + 4G → F, V, O / F † / all; 2G + 3G + 4G → all / F, H † / all', () => {
    expect(positions(plate(['3G', '4G']))).toMatchObject({ groove: ['F', 'V', 'O'], groovePipe: ['F'], fillet: ['F', 'H', 'V', 'O'] })
    expect(positions(plate(['2G', '3G', '4G']))).toMatchObject({ groove: ['F', 'H', 'V', 'O'], groovePipe: ['F', 'H'], fillet: ['F', 'H', 'V', 'O'] })
  })
  it('pipe rows: 1G F; 2G F, H; 5G F, V, O with fillet all; 6G and 2G + 5G all', () => {
    expect(positions(pipe(['1G']))).toMatchObject({ groove: ['F'], groovePipe: ['F'], fillet: ['F'] })
    expect(positions(pipe(['2G']))).toMatchObject({ groove: ['F', 'H'], groovePipe: ['F', 'H'], fillet: ['F', 'H'] })
    expect(positions(pipe(['5G']))).toMatchObject({ groove: ['F', 'V', 'O'], groovePipe: ['F', 'V', 'O'], fillet: ['F', 'H', 'V', 'O'] })
    expect(positions(pipe(['6G']))).toMatchObject({ groove: ['F', 'H', 'V', 'O'], groovePipe: ['F', 'H', 'V', 'O'] })
    expect(positions(pipe(['2G', '5G']))).toMatchObject({ groove: ['F', 'H', 'V', 'O'], groovePipe: ['F', 'H', 'V', 'O'], fillet: ['F', 'H', 'V', 'O'] })
    expect(positions(pipe(['6G'])).groovePipeMinDiameter).toBeUndefined()
  })
  it('plate fillet rows are limited to pipe of 2-7/8 in OD and over (†); 3F + 4F → all', () => {
    const fillet = (testPositions: string[]) => wr({ process: 'SMAW', form: 'plate', weld: 'fillet', testPositions, couponThickness: 0.375 })
    expect(positions(fillet(['1F']))).toMatchObject({ groove: [], fillet: ['F'], filletPipeMinDiameter: 2.875 })
    expect(positions(fillet(['2F'])).fillet).toEqual(['F', 'H'])
    expect(positions(fillet(['3F'])).fillet).toEqual(['F', 'H', 'V'])
    expect(positions(fillet(['4F'])).fillet).toEqual(['F', 'H', 'O'])
    expect(positions(fillet(['3F', '4F'])).fillet).toEqual(['F', 'H', 'V', 'O'])
  })
  it('pipe fillet rows 1F, 2F, 2FR, 4F, 5F are from memory and say so', () => {
    const r = wr({ process: 'SMAW', form: 'pipe', weld: 'fillet', testPositions: ['5F'], couponThickness: 0.25, outsideDiameter: 4.5 })
    expect(positions(r).fillet).toEqual(['F', 'H', 'V', 'O'])
    expect(r.reasons).toContainEqual(expect.objectContaining({ clause: 'QW-461.9', basis: 'memory' }))
  })
  it('SI: plate groove † is 73 mm', () => {
    expect(positions(wr({ process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['1G'], couponThickness: 10 }, 'mm')).groovePipeMinDiameter).toBe(73)
  })
  it('refuses positions that are not in the table for the form', () => {
    expect(refused({ code: 'asme-ix', check: 'welder-ranges', unit: 'in', input: { process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['6G'], couponThickness: 0.375 } })).toContain('6G')
    expect(refused({ code: 'asme-ix', check: 'welder-ranges', unit: 'in', input: { process: 'SMAW', form: 'pipe', weld: 'groove', testPositions: ['3G'], couponThickness: 0.375, outsideDiameter: 6 } })).toContain('3G')
  })

  const platePositions = fc.subarray(['1G', '2G', '3G', '4G'], { minLength: 1 })
  it('property: adding a test position never shrinks any position set (QW-461.9)', () => {
    fc.assert(fc.property(platePositions, fc.constantFrom('1G', '2G', '3G', '4G'), (tests, extra) => {
      const before = positions(plate(tests))
      const after = positions(plate([...new Set([...tests, extra])]))
      for (const key of ['groove', 'groovePipe', 'fillet'] as const) {
        for (const p of before[key] ?? []) expect(after[key]).toContain(p)
      }
    }))
    fc.assert(fc.property(fc.subarray(['1G', '2G', '5G', '6G'], { minLength: 1 }), fc.constantFrom('1G', '2G', '5G', '6G'), (tests, extra) => {
      const before = positions(pipe(tests))
      const after = positions(pipe([...new Set([...tests, extra])]))
      for (const p of before.groove) expect(after.groove).toContain(p)
      for (const p of before.fillet) expect(after.fillet).toContain(p)
    }))
  })

  it('property: a thicker groove coupon never qualifies a smaller deposit (QW-452.1(b), QW-404.32)', () => {
    const t = fc.integer({ min: 1, max: 2 * 64 }).map(n => n / 64)
    fc.assert(fc.property(t, t, fc.boolean(), fc.integer({ min: 1, max: 6 }), (a, b, short, layers) => {
      const [thin, thick] = a <= b ? [a, b] : [b, a]
      const max = (T: number) => wr({ process: 'GMAW', ...(short ? { transfer: 'short-circuit' } : {}), form: 'plate', weld: 'groove', testPositions: ['1G'], couponThickness: T, layers }).depositMax as number | null
      const thinMax = max(thin)
      const thickMax = max(thick)
      if (thinMax === null) expect(thickMax).toBeNull()
      else if (thickMax !== null) expect(thickMax).toBeGreaterThanOrEqual(thinMax)
    }), { numRuns: 300 })
  })
})

describe('ASME IX fillet tests, QW-452.5 ([V-partial]; under 3/16 in from memory) and QW-452.4', () => {
  it('3/16 in and over: all thicknesses and fillet sizes', () => {
    const r = wr({ process: 'SMAW', form: 'plate', weld: 'fillet', testPositions: ['2F'], couponThickness: 0.1875 })
    expect(r.thickness).toEqual({ min: null, max: null })
    expect(r.filletSizeMax).toBeNull()
  })
  it('under 3/16 in: T to 2T, fillet up to T (from memory)', () => {
    const r = wr({ process: 'SMAW', form: 'plate', weld: 'fillet', testPositions: ['2F'], couponThickness: 0.125 })
    expect(r.thickness).toEqual({ min: 0.125, max: 0.25 })
    expect(r.filletSizeMax).toBe(0.125)
    expect(r.reasons).toContainEqual(expect.objectContaining({ clause: 'QW-452.5', basis: 'memory' }))
  })
  it('small-diameter pipe fillet test uses the QW-452.4 bands', () => {
    expect(wr({ process: 'SMAW', form: 'pipe', weld: 'fillet', testPositions: ['2F'], couponThickness: 0.25, outsideDiameter: 2 }).diameter).toEqual({ min: 1, max: null })
  })
})

describe('ASME IX base metals QW-423.1 (2015, 2023 editions; older edition) and F-Numbers QW-433 (from memory)', () => {
  it('2015 and later: P-No. 1 qualifies P-No. 1 through 15F, 34, 41 through 49', () => {
    expect(plate(['1G'], { pNumber: '1' }).pNumbers).toEqual(['P-No. 1 through P-No. 15F, P-No. 34, P-No. 41 through P-No. 49'])
  })
  it('before 2015: P-No. 1 qualifies P-No. 1 through 11, 34, 41 through 47', () => {
    expect(wr({ process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['1G'], couponThickness: 0.375, pNumber: '1' }, 'in', '2013').pNumbers)
      .toEqual(['P-No. 1 through P-No. 11, P-No. 34, P-No. 41 through P-No. 47'])
  })
  it('P-No. 26 is in the 21–26 row from 2015 but in no row before', () => {
    expect(plate(['1G'], { pNumber: '26' }).pNumbers).toEqual(['P-No. 21 through P-No. 26'])
    expect(refused({ code: 'asme-ix', edition: '2013', check: 'welder-ranges', unit: 'in', input: { process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['1G'], couponThickness: 0.375, pNumber: '26' } })).toContain('no QW-423.1 row')
  })
  it('F4 with backing → F1–F4 with backing; F4 without backing → F1–F4 with and without', () => {
    expect(plate(['1G'], { fNumber: 4, backing: true }).fNumbers).toEqual({ numbers: [1, 2, 3, 4], withBacking: true, withoutBacking: false })
    expect(plate(['1G'], { fNumber: 4, backing: false }).fNumbers).toEqual({ numbers: [1, 2, 3, 4], withBacking: true, withoutBacking: true })
    expect(plate(['1G'], { fNumber: 3, backing: false }).fNumbers).toMatchObject({ numbers: [1, 2, 3] })
  })
  it('F6 and F2x groups by edition (older page F21–F25; current F21–F26 from memory)', () => {
    expect(plate(['1G'], { fNumber: 6, backing: true }).fNumbers).toMatchObject({ numbers: [6] })
    expect((plate(['1G'], { fNumber: 22, backing: true }).fNumbers as { numbers: number[] }).numbers).toContain(26)
    expect((wr({ process: 'GTAW', form: 'plate', weld: 'groove', testPositions: ['1G'], couponThickness: 0.375, fNumber: 22, backing: true }, 'in', '2010').fNumbers as { numbers: number[] }).numbers).not.toContain(26)
  })
  it('an F-Number without the backing condition: with backing only, and backing listed as undetermined (QW-433, QW-402.4, from memory)', () => {
    const r = ok({ code: 'asme-ix', check: 'welder-ranges', unit: 'in', input: { process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['1G'], couponThickness: 0.375, fNumber: 4 } })
    expect(r.fNumbers).toEqual({ numbers: [1, 2, 3, 4], withBacking: true, withoutBacking: false })
    expect(r.undetermined).toEqual([expect.objectContaining({ field: 'backing' })])
  })
})
