import { describe, expect, it } from 'vitest'
import { ok, refused } from '../helpers'

const wr = (input: Record<string, unknown>, unit: 'in' | 'mm' = 'in') => ok({ code: 'aws-d1.3', check: 'welder-ranges', unit, input })
const pos = (r: Record<string, unknown>) => r.positions as { groove: string[], fillet: string[] }

describe('AWS D1.3 sheet steel welders (scribd AWS D1.3 WPQR guide, 4.7.2 and Table 4.4)', () => {
  it('square-groove: a sheet of thickness t qualifies 0.5t to 2t', () => {
    expect(wr({ process: 'GMAW', form: 'plate', weld: 'groove', joint: 'square-groove', testPositions: ['1G'], couponThickness: 0.0747 }).thickness).toEqual({ min: 0.03735, max: 0.1494 })
  })
  it('square-groove 2t is held to the 3/16 in scope', () => {
    expect(wr({ process: 'GMAW', form: 'plate', weld: 'groove', joint: 'square-groove', testPositions: ['1G'], couponThickness: 0.125 }).thickness).toEqual({ min: 0.0625, max: 0.1875 })
  })
  it('fillet and flare-groove: the minimum production sheet tested, up to the scope limit', () => {
    expect(wr({ process: 'GMAW', form: 'plate', weld: 'fillet', testPositions: ['2F'], couponThickness: 0.0598 }).thickness).toEqual({ min: 0.0598, max: 0.1875 })
  })
  it('arc spot and arc seam: each gauge is tested', () => {
    expect(wr({ process: 'SMAW', form: 'plate', weld: 'fillet', joint: 'arc-spot', testPositions: ['1F'], couponThickness: 0.0598 }).thickness).toEqual({ min: 0.0598, max: 0.0598 })
  })
  it('Table 4.4 positions: 1G F; 2G F, H; 3G F, H, V; 4G F, H, OH; arc seam 2F → H', () => {
    const g = (p: string) => pos(wr({ process: 'GMAW', form: 'plate', weld: 'groove', joint: 'flare-groove', testPositions: [p], couponThickness: 0.0747 })).groove
    expect(g('1G')).toEqual(['F'])
    expect(g('2G')).toEqual(['F', 'H'])
    expect(g('3G')).toEqual(['F', 'H', 'V'])
    expect(g('4G')).toEqual(['F', 'H', 'O'])
    expect(pos(wr({ process: 'SMAW', form: 'plate', weld: 'fillet', joint: 'arc-seam', testPositions: ['2F'], couponThickness: 0.0598 })).fillet).toEqual(['H'])
    expect(refused({ code: 'aws-d1.3', check: 'welder-ranges', unit: 'in', input: { process: 'SMAW', form: 'plate', weld: 'fillet', joint: 'arc-spot', testPositions: ['2F'], couponThickness: 0.0598 } })).toContain('1F')
  })
  it('scope: over 3/16 in (4.8 mm) is sent to AWS D1.1 (weldcerttest D1.3 page)', () => {
    expect(refused({ code: 'aws-d1.3', check: 'welder-ranges', unit: 'in', input: { process: 'GMAW', form: 'plate', weld: 'fillet', testPositions: ['1F'], couponThickness: 0.25 } })).toContain('aws-d1.1')
    expect(refused({ code: 'aws-d1.3', check: 'welder-ranges', unit: 'mm', input: { process: 'GMAW', form: 'plate', weld: 'fillet', testPositions: ['1F'], couponThickness: 4.9 } })).toContain('4.8 mm')
    expect(wr({ process: 'GMAW', form: 'plate', weld: 'fillet', testPositions: ['1F'], couponThickness: 4.8 }, 'mm').thickness).toEqual({ min: 4.8, max: 4.8 })
    const r = ok({ code: 'aws-d1.3', check: 'covers', unit: 'in', input: { test: { process: 'GMAW', form: 'plate', weld: 'fillet', testPositions: ['2F'], couponThickness: 0.0598 }, production: { form: 'plate', weld: 'fillet', position: 'H', thickness: 0.25 } } })
    expect(r.covered).toBe(false)
    expect(JSON.stringify(r.reasons)).toContain('AWS D1.1')
  })
  it('covers: joint type, position and thickness', () => {
    const test = { process: 'GMAW', form: 'plate', weld: 'fillet', testPositions: ['3F'], couponThickness: 0.0598 }
    const covers = (production: Record<string, unknown>) => ok({ code: 'aws-d1.3', check: 'covers', unit: 'in', input: { test, production } }).covered
    expect(covers({ process: 'GMAW', form: 'plate', weld: 'fillet', position: 'V', thickness: 0.0747 })).toBe(true)
    expect(covers({ form: 'plate', weld: 'fillet', position: 'OH', thickness: 0.0747 })).toBe(false)
    expect(covers({ form: 'plate', weld: 'fillet', position: 'V', thickness: 0.0478 })).toBe(false)
  })
})
