import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { layeredSupport } from '../../../../shared/qualification/layer-support'
import type { SupportPqr } from '../../../../shared/qualification/procedure-support'
import { blankLayer, blankProcedureDraft, type ProcedureDraft, type ProcedureLayer } from '../../../../shared/schemas/procedure'

// A combination coupon, invented: T = 1/2 in, GTAW root t = 1/8 in, SMAW fill and cap t = 3/8 in, P-No. 1 to P-No. 8.
const coupon = (process: string, deposit: number, fNumber: string | null, over: Partial<SupportPqr> = {}): SupportPqr => ({
  id: 1, number: `PQR-C (${process})`, code: 'asme-ix', edition: '2023', unit: 'in', process, transfer: null,
  couponThickness: 0.5, depositThickness: deposit, toughnessTested: false, heatInput: null, fNumber, pNumber: '1', pNumberB: '8',
  status: 'certified', resultsPass: true, ...over,
})
const pqrs = () => [coupon('GTAW', 0.125, '6'), coupon('SMAW', 0.375, '5')]
const filler = (fNumber: string) => ({ fillerMetalId: null, specification: 'SFA', classification: 'X', fNumber, aNumber: '8', size: 0.125 })
const layer = (process: ProcedureLayer['process'], name: string, depositMax: number, fNumber: string): ProcedureLayer =>
  ({ ...blankLayer(process, name), depositMax, fillers: [filler(fNumber)] })
const draft = (layers: ProcedureLayer[], over: Partial<ProcedureDraft> = {}): ProcedureDraft => ({
  ...blankProcedureDraft(), number: 'W', title: 'T', edition: '2023',
  baseMetals: { a: { baseMetalId: null, pNumber: '1', groupNumber: null }, b: { baseMetalId: null, pNumber: '8', groupNumber: null } },
  thickness: { groove: { min: 0.1875, max: 1 }, fillet: { min: null, max: null } }, layers, ...over,
})
const pipe = () => [layer('GTAW', 'root', 0.25, '6'), layer('SMAW', 'fill and cap', 0.75, '5')]

describe('layeredSupport: each WPS layer against the PQR layers of its process (QW-200.4)', () => {
  it('a GTAW root and SMAW fill within what the combination coupon qualifies is supported', () => {
    // ASME BPVC IX-2023, Table QW-451.1: T from 3/8 in to under 3/4 in qualifies 3/16 in to 2T (1 in); deposit up to 2t of each process.
    const check = layeredSupport(draft(pipe()), pqrs())
    expect(check.checked).toBe(true)
    expect(check.violations).toEqual([])
    expect(check.supported).toBe(true)
  })

  it('a layer deposit over 2t of its own process is flagged on that layer (QW-404.30, Table QW-451.1)', () => {
    // GTAW t = 1/8 in qualifies up to 2t = 1/4 in (ASME BPVC IX-2023, Table QW-451.1); 5/16 in is over.
    const check = layeredSupport(draft([layer('GTAW', 'root', 0.3125, '6'), layer('SMAW', 'fill and cap', 0.75, '5')]), pqrs())
    expect(check.supported).toBe(false)
    expect(check.violations.map(v => v.field)).toContain('layers.0.depositMax')
    expect(check.violations.find(v => v.field === 'layers.0.depositMax')?.text).toMatch(/^root \(GTAW\)/)
  })

  it('a process no PQR welded is not supported (QW-200.2, from memory)', () => {
    const check = layeredSupport(draft([...pipe(), layer('FCAW', 'cap', 0.25, '6')]), pqrs())
    expect(check.supported).toBe(false)
    expect(check.violations.some(v => v.field === 'layers.2.process')).toBe(true)
  })

  it('a filler F-No. the process did not weld is flagged on its layer (QW-404.4, from memory)', () => {
    const check = layeredSupport(draft([layer('GTAW', 'root', 0.25, '6'), layer('SMAW', 'fill and cap', 0.75, '4')]), pqrs())
    expect(check.supported).toBe(false)
    expect(check.violations.some(v => v.field === 'layers.1.fillers')).toBe(true)
  })

  it('property: raising one layer deposit beyond 2t of its process never leaves "supported" (Table QW-451.1)', () => {
    fc.assert(fc.property(fc.integer({ min: 0, max: 1 }), fc.double({ min: 1.01, max: 4, noNaN: true }), (i, factor) => {
      const layers = pipe()
      const limit = i === 0 ? 0.25 : 0.75
      layers[i] = { ...layers[i]!, depositMax: Math.round(limit * factor * 1e4) / 1e4 + 0.001 }
      return layeredSupport(draft(layers), pqrs()).supported === false
    }))
  })
})
