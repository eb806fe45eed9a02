import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { ok, refused } from '../helpers'

const wr = (input: Record<string, unknown>, unit: 'in' | 'mm' = 'in', edition?: string) =>
  ok({ code: 'aws-d1.1', check: 'welder-ranges', unit, ...(edition ? { edition } : {}), input })
const plate = (testPositions: string[], couponThickness = 0.375) => wr({ process: 'FCAW', form: 'plate', weld: 'groove', testPositions, couponThickness })
const pos = (r: Record<string, unknown>) => r.positions as { groove: string[], fillet: string[], groovePipeMinDiameter?: number }

describe('AWS D1.1 plate thickness, Table 6.11 (2020) / 4.11 (2015)', () => {
  it('a 3/8 in test plate qualifies 1/8 to 3/4 in (weldcerttest FAQ; D1.1-2010 Table 4.11 on the AWS forum)', () => {
    expect(plate(['1G']).thickness).toEqual({ min: 0.125, max: 0.75 })
  })
  it('a 1 in plate qualifies 1/8 in to unlimited (weldcerttest FAQ)', () => {
    expect(plate(['1G'], 1).thickness).toEqual({ min: 0.125, max: null })
  })
  it('over 3/8 and under 1 in: 2T maximum (AWS forum, D1.1-2010); the 1/8 in minimum from memory', () => {
    const r = plate(['1G'], 0.5)
    expect(r.thickness).toEqual({ min: 0.125, max: 1 })
    expect(r.reasons).toContainEqual(expect.objectContaining({ basis: 'memory' }))
  })
  it('names Table 6.11 from 2020 and Table 4.11 in 2015', () => {
    expect(plate(['1G']).reasons).toContainEqual(expect.objectContaining({ clause: 'Table 6.11' }))
    expect(wr({ process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['1G'], couponThickness: 0.375 }, 'in', '2015').reasons).toContainEqual(expect.objectContaining({ clause: 'Table 4.11' }))
  })
  it('refuses plate under 3/8 in and points sheet to D1.3', () => {
    expect(refused({ code: 'aws-d1.1', check: 'welder-ranges', unit: 'in', input: { process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['1G'], couponThickness: 0.25 } })).toContain('D1.3')
  })
})

describe('AWS D1.1:2020 Table 6.10 plate positions (scribd AWS D1.1 Section 6)', () => {
  it('rows 1G–4G: groove and fillet', () => {
    expect(pos(plate(['1G']))).toMatchObject({ groove: ['F'], fillet: ['F', 'H'] })
    expect(pos(plate(['2G']))).toMatchObject({ groove: ['F', 'H'], fillet: ['F', 'H'] })
    expect(pos(plate(['3G']))).toMatchObject({ groove: ['F', 'H', 'V'], fillet: ['F', 'H', 'V'] })
    expect(pos(plate(['4G']))).toMatchObject({ groove: ['F', 'O'], fillet: ['F', 'H', 'O'] })
    expect(pos(plate(['3G', '4G']))).toMatchObject({ groove: ['F', 'H', 'V', 'O'], fillet: ['F', 'H', 'V', 'O'] })
  })
  it('fillet rows 1F–4F and 3F + 4F', () => {
    const f = (t: string[]) => pos(wr({ process: 'SMAW', form: 'plate', weld: 'fillet', testPositions: t, couponThickness: 0.375 })).fillet
    expect(f(['1F'])).toEqual(['F'])
    expect(f(['2F'])).toEqual(['F', 'H'])
    expect(f(['3F'])).toEqual(['F', 'H', 'V'])
    expect(f(['4F'])).toEqual(['F', 'H', 'O'])
    expect(f(['3F', '4F'])).toEqual(['F', 'H', 'V', 'O'])
  })
  it('note b: a plate test qualifies pipe CJP only at 24 in and over', () => {
    expect(pos(plate(['2G'])).groovePipeMinDiameter).toBe(24)
  })
  it('property: adding a test position never shrinks the position sets', () => {
    fc.assert(fc.property(fc.subarray(['1G', '2G', '3G', '4G'], { minLength: 1 }), fc.constantFrom('1G', '2G', '3G', '4G'), (tests, extra) => {
      const before = pos(plate(tests))
      const after = pos(plate([...new Set([...tests, extra])]))
      for (const p of before.groove) expect(after.groove).toContain(p)
      for (const p of before.fillet) expect(after.fillet).toContain(p)
    }))
  })
  it('property: a thicker plate never qualifies a smaller maximum (Table 6.11)', () => {
    const t = fc.integer({ min: 24, max: 128 }).map(n => n / 64)
    fc.assert(fc.property(t, t, (a, b) => {
      const [thin, thick] = a <= b ? [a, b] : [b, a]
      const max = (T: number) => (plate(['1G'], T).thickness as { max: number | null }).max
      const m1 = max(thin)
      const m2 = max(thick)
      if (m1 === null) expect(m2).toBeNull()
      else if (m2 !== null) expect(m2).toBeGreaterThanOrEqual(m1)
    }))
  })
})

describe('AWS D1.1:2020 Table 10.13 pipe groove ranges (proxied scribd "WQT - AWS D1.1") and Table 10.12', () => {
  const pipe = (od: number, wall: number, testPositions = ['6G']) => wr({ process: 'SMAW', form: 'pipe', weld: 'groove', testPositions, couponThickness: wall, outsideDiameter: od })
  it('4 in and under: sizes 3/4 to 4 in, wall 1/8 to 3/4 in; 5G/6G 2 face + 2 root', () => {
    const r = pipe(4, 0.237)
    expect(r.diameter).toEqual({ min: 0.75, max: 4 })
    expect(r.thickness).toEqual({ min: 0.125, max: 0.75 })
    expect(r.bendSpecimens).toEqual({ face: 2, root: 2, side: 0, total: 4 })
  })
  it('over 4 in, wall over 3/8 in: wall 3/16 in to unlimited, 4 side bends in 6G, 2 side in 2G', () => {
    expect(pipe(8.625, 0.5).thickness).toEqual({ min: 0.1875, max: null })
    expect(pipe(8.625, 0.5).bendSpecimens).toEqual({ face: 0, root: 0, side: 4, total: 4 })
    expect(pipe(8.625, 0.5, ['2G']).bendSpecimens).toEqual({ face: 0, root: 0, side: 2, total: 2 })
  })
  it('over 4 in: unlimited size (read); note f (the minimum) is not carried, so the test size is the floor (convention)', () => {
    expect(pipe(8.625, 0.322).diameter).toEqual({ min: 8.625, max: null })
  })
  it('pipe fillet 4F → F, H, OH and 5F → all (Table 10.12, read)', () => {
    const f = (t: string) => pos(wr({ process: 'SMAW', form: 'pipe', weld: 'fillet', testPositions: [t], outsideDiameter: 6 })).fillet
    expect(f('4F')).toEqual(['F', 'H', 'O'])
    expect(f('5F')).toEqual(['F', 'H', 'V', 'O'])
  })
})

describe('AWS D1.1 coverage and bends', () => {
  const test = { process: 'FCAW', form: 'plate', weld: 'groove', testPositions: ['3G'], couponThickness: 1 }
  const covers = (production: Record<string, unknown>) => ok({ code: 'aws-d1.1', check: 'covers', unit: 'in', input: { test, production } })
  it('3G covers vertical but not overhead (weldcerttest FAQ)', () => {
    expect(covers({ process: 'FCAW', form: 'plate', weld: 'groove', position: 'V', thickness: 2 }).covered).toBe(true)
    expect(covers({ form: 'plate', weld: 'groove', position: 'OH' }).covered).toBe(false)
  })
  it('a CJP groove test also covers fillets (weldcerttest FAQ)', () => {
    expect(covers({ process: 'FCAW', form: 'plate', weld: 'fillet', position: 'H' }).covered).toBe(true)
  })
  it('plate test → pipe CJP only at 24 in and over with backing or backgouging (Table 6.10 note b)', () => {
    expect(covers({ process: 'FCAW', form: 'pipe', weld: 'groove', position: 'F', outsideDiameter: 24, backing: true, thickness: 1 }).covered).toBe(true)
    expect(covers({ form: 'pipe', weld: 'groove', position: 'F', outsideDiameter: 24, backing: false }).covered).toBe(false)
    expect(covers({ form: 'pipe', weld: 'groove', position: 'F', outsideDiameter: 20, backing: true }).covered).toBe(false)
  })
  const bend = (indications: unknown[]) => ok({ code: 'aws-d1.1', check: 'bend', unit: 'in', edition: '2015', input: { specimens: [{ type: 'side', indications }] } })
  it('D1.1-2015 4.9.3.3: no discontinuity over 1/8 in; those over 1/32 in add up to at most 3/8 in (scribd bend-test-acepten)', () => {
    expect(bend([{ size: 0.125 }]).accepted).toBe(true)
    expect(bend([{ size: 0.13 }]).accepted).toBe(false)
    expect(bend([{ size: 0.125 }, { size: 0.125 }, { size: 0.125 }]).accepted).toBe(true)
    expect(bend([{ size: 0.125 }, { size: 0.125 }, { size: 0.125 }, { size: 0.05 }]).accepted).toBe(false)
    expect(bend([{ size: 0.125 }, { size: 0.125 }, { size: 0.125 }, { size: 0.03 }]).accepted).toBe(true)
  })
  it('corner cracks: up to 1/4 in pass; over 1/4 in with no slag → replace; from slag → 1/8 in applies', () => {
    expect(bend([{ size: 0.25, atCorner: true }]).accepted).toBe(true)
    const big = bend([{ size: 0.3, atCorner: true }])
    expect(big.accepted).toBe(false)
    expect(big.specimens).toEqual([expect.objectContaining({ replace: true })])
    expect(bend([{ size: 0.2, atCorner: true, fromInternalDefect: true }]).accepted).toBe(false)
  })
  it('D1.1 procedure-ranges refuses what it does not carry (ESW, sheet under 1/8 in), not guessed', () => {
    expect(refused({ code: 'aws-d1.1', check: 'procedure-ranges', unit: 'in', input: { process: 'ESW', couponThickness: 1 } })).toContain('not carried')
    expect(refused({ code: 'aws-d1.1', check: 'procedure-ranges', unit: 'in', input: { process: 'SMAW', couponThickness: 0.1 } })).toContain('D1.3')
  })
})
