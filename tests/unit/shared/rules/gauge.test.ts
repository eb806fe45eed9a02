import { createRequire } from 'node:module'
import { describe, expect, it } from 'vitest'
import { ok, refused } from './helpers'

const convert = createRequire(import.meta.url)('convert-units') as (value: number) => { from: (unit: string) => { to: (unit: string) => number } }

const gauge = (g: number, unit: 'in' | 'mm' = 'in', material = 'steel') => ok({ code: 'aws-d1.3', check: 'gauge', unit, input: { gauge: g, material } })

describe('Manufacturers\' Standard Gauge for sheet steel (docs/sources.md §D)', () => {
  it('10 ga = 0.1345 in (cableorganizer; induspecs and machinecalcs charts)', () => {
    expect(gauge(10).thickness).toBe(0.1345)
  })
  it('verified chart values: 7, 14, 16, 18, 20, 24, 30 ga', () => {
    expect(gauge(7).thickness).toBe(0.1793)
    expect(gauge(14).thickness).toBe(0.0747)
    expect(gauge(16).thickness).toBe(0.0598)
    expect(gauge(18).thickness).toBe(0.0478)
    expect(gauge(20).thickness).toBe(0.0359)
    expect(gauge(24).thickness).toBe(0.0239)
    expect(gauge(30).thickness).toBe(0.012)
  })
  it('from memory: 15 ga 0.0673 in is marked memory', () => {
    const r = gauge(15)
    expect(r.thickness).toBe(0.0673)
    expect(r.reasons).toContainEqual(expect.objectContaining({ basis: 'memory' }))
  })
  it('mm = in × 25.4, matching the table\'s 3-decimal column (10 ga 3.416 mm, 14 ga 1.897 mm)', () => {
    expect(gauge(10, 'mm').thickness).toBeCloseTo(3.416, 3)
    expect(gauge(14, 'mm').thickness).toBeCloseTo(1.897, 3)
    // cross-check with convert-units (not the library the code uses): 0.1345 in and 0.0747 in in mm
    expect(Number(gauge(10, 'mm').thickness)).toBeCloseTo(convert(0.1345).from('in').to('mm'), 4)
    expect(Number(gauge(14, 'mm').thickness)).toBeCloseTo(convert(0.0747).from('in').to('mm'), 4)
  })
  it('weight check: 41.82 lb/ft² per inch gives 5.625 lb/ft² for 10 ga (cableorganizer)', () => {
    expect(41.82 * Number(gauge(10).thickness)).toBeCloseTo(5.625, 2)
  })
  it('refuses other materials and gauges not in the table', () => {
    expect(refused({ code: 'asme-ix', check: 'gauge', unit: 'in', input: { gauge: 10, material: 'aluminium' } })).toContain('different gauge table')
    expect(refused({ code: 'asme-ix', check: 'gauge', unit: 'in', input: { gauge: 25, material: 'steel' } })).toContain('25 ga')
  })
})
