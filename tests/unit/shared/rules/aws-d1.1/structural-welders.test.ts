import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { ok } from '../helpers'
import { evaluate } from '../../../../../shared/rules'

const wr = (input: Record<string, unknown>, edition = '2020') => ok({ code: 'aws-d1.1', check: 'welder-ranges', unit: 'in', edition, input })
const rt = (input: Record<string, unknown>, edition = '2020') => evaluate({ code: 'aws-d1.1', check: 'radiography', unit: 'in', edition, input })

describe('AWS D1.1 pipe tests over 4 in (D1.1:2020 Table 10.13, read: over 4 in qualifies up to unlimited size)', () => {
  it('an 8-5/8 in test pipe qualifies 8-5/8 in and over: note f (the smallest size) is not carried, so the test size is the floor (convention)', () => {
    const r = wr({ process: 'FCAW', form: 'pipe', weld: 'groove', testPositions: ['6G'], couponThickness: 0.5, outsideDiameter: 8.625 })
    expect(r.diameter).toEqual({ min: 8.625, max: null })
    // Wall over 3/8 in on a pipe over 4 in: 3/16 in to unlimited, 4 side bends in 6G (Table 10.13, read)
    expect(r.thickness).toEqual({ min: 0.1875, max: null })
    expect(r.bendSpecimens).toEqual({ face: 0, root: 0, side: 4, total: 4 })
  })
  it('a 4 in test pipe still qualifies 3/4 to 4 in (Table 10.13, read)', () => {
    expect(wr({ process: 'SMAW', form: 'pipe', weld: 'groove', testPositions: ['2G'], couponThickness: 0.237, outsideDiameter: 4 }).diameter).toEqual({ min: 0.75, max: 4 })
  })
  it('property: a bigger test pipe over 4 in never qualifies a smaller minimum size (never wider than the test)', () => {
    fc.assert(fc.property(fc.integer({ min: 401, max: 4800 }), (hundredths) => {
      const od = hundredths / 100
      const r = wr({ process: 'SMAW', form: 'pipe', weld: 'groove', testPositions: ['5G'], couponThickness: 0.5, outsideDiameter: od })
      return (r.diameter as { min: number }).min === od
    }))
  })
})

describe('6GR (D1.1:2020 Table 10.13 bend columns "5G/6G/6GR", read; its positions from memory)', () => {
  it('qualifies all positions and takes the 5G/6G bend count', () => {
    const r = wr({ process: 'SMAW', form: 'pipe', weld: 'groove', testPositions: ['6GR'], couponThickness: 0.25, outsideDiameter: 6.625 })
    expect((r.positions as { groove: string[] }).groove).toEqual(['F', 'H', 'V', 'O'])
    expect(r.bendSpecimens).toEqual({ face: 2, root: 2, side: 0, total: 4 })
  })
})

describe('fillet weld test on plate (Table 6.11 in 2020, 4.11 in 2015; from memory: 1/8 in and over)', () => {
  it('qualifies 1/8 in to unlimited base metal, marked from memory', () => {
    const r = wr({ process: 'FCAW', form: 'plate', weld: 'fillet', testPositions: ['2F'], couponThickness: 0.5 })
    expect(r.thickness).toEqual({ min: 0.125, max: null })
    expect((r.reasons as { basis: string }[]).some(x => x.basis === 'memory')).toBe(true)
  })
})

describe('radiography in place of bends (4.31.3 in 2015, from memory; not for GMAW-S: public summary of Table 6.11)', () => {
  it('a clean film is accepted; a crack or incomplete fusion rejects', () => {
    expect(rt({ thickness: 0.375, indications: [], process: 'SMAW' })).toMatchObject({ accepted: true })
    expect(rt({ thickness: 0.375, indications: [{ kind: 'crack', length: 0.1 }] })).toMatchObject({ accepted: false })
    expect(rt({ thickness: 0.375, indications: [{ kind: 'incomplete-fusion', length: 0.05 }] })).toMatchObject({ accepted: false })
  })
  it('GMAW short-circuit cannot be qualified by radiography', () => {
    expect(rt({ thickness: 0.375, indications: [], process: 'GMAW', transfer: 'short-circuit' })).toMatchObject({ accepted: false })
  })
  it('slag or porosity is judged by hand (the discontinuity figures are not carried): an error, never an acceptance', () => {
    const r = rt({ thickness: 0.375, indications: [{ kind: 'rounded', length: 0.02 }] })
    expect(r).toHaveProperty('error')
    expect(String((r as { error: string }).error)).toContain('by hand')
  })
  it('names 4.31.3 in 2015', () => {
    const r = rt({ thickness: 0.375, indications: [] }, '2015') as { reasons: { clause: string }[] }
    expect(r.reasons[0]!.clause).toBe('4.31.3')
  })
})
