import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { layeredSupport } from '../../../../shared/qualification/layer-support'
import { handCheckNeeded, pqrQualifies, type SupportPqr } from '../../../../shared/qualification/procedure-support'
import type { IsoWpqrRecord } from '../../../../shared/qualification/iso-procedure-support'
import { blankLayer, blankProcedureDraft, type ProcedureDraft } from '../../../../shared/schemas/procedure'

// An ISO 15609-1 WPS in the app against an ISO 15614-1:2017 WPQR as stored (all ranges from memory of clause 8).
const piece: IsoWpqrRecord = {
  processes: ['135'], thickness: 15, form: 'plate', outsideDiameter: null, runs: 'multi', positions: ['PA'], materialGroup: '1.2',
  heatInputs: [1600], impactTested: true, hardnessTested: false, preheat: 20, interpass: 250, pwht: { done: false, temperature: null, hours: null },
  filler: 'ISO 14341-A G 42 4 M21 3Si1', fillerGroup: '1',
}
const wpqr = (iso: Partial<IsoWpqrRecord> | null = {}): SupportPqr => ({
  id: 1, number: 'WPQR-1', code: 'iso-15614-1', edition: '2017', unit: 'mm', process: '135', transfer: null, couponThickness: 15, depositThickness: null,
  toughnessTested: true, heatInput: 1600, fNumber: null, pNumber: null, status: 'certified', resultsPass: true, iso: iso === null ? null : { ...piece, ...iso },
})
function draft(change: Partial<ProcedureDraft> = {}): ProcedureDraft {
  const layer = { ...blankLayer('GMAW'), process: '135' as ProcedureDraft['layers'][number]['process'], transfer: null, heatInputMax: 2000,
    fillers: [{ fillerMetalId: null, specification: 'ISO 14341-A', classification: 'G 42 4 M21 3Si1', fNumber: 'FM1', aNumber: null, size: 1.2 }] }
  return {
    ...blankProcedureDraft(), code: 'iso-15614-1', edition: '2017', unit: 'mm', positions: ['PA', 'PF'], supportingPqrIds: [1],
    baseMetals: { a: { baseMetalId: null, pNumber: '1.2', groupNumber: null }, b: { baseMetalId: null, pNumber: '1.2', groupNumber: null } },
    thickness: { groove: { min: 8, max: 30 }, fillet: { min: null, max: null } }, preheatMin: 20, interpassMax: 250,
    pwht: { required: false, temperature: { min: null, max: null }, holdHours: null, note: null }, layers: [layer], ...change,
  }
}

describe('ISO 15609-1 WPS support in the app (ISO 15614-1:2017 clause 8, from memory)', () => {
  it('a WPS inside the WPQR on every variable is supported; each finding names its clause', () => {
    const check = layeredSupport(draft(), [wpqr()])
    expect(check.violations).toEqual([])
    expect(check.supported).toBe(true)
    expect(check.findings.map(f => f.clause)).toContain('ISO 15614-1:2017, 8.3.2.1, Table 6')
    expect(check.caution).toContain('ISO 15614-1:2017')
  })
  it('a WPQR without its test piece is "cannot tell", never supported', () => {
    const check = layeredSupport(draft(), [wpqr(null)])
    expect(check.supported).toBe(false)
    expect(check.violations[0]?.text).toMatch(/^Cannot tell: WPQR-1 holds no ISO 15614-1 test piece/)
  })
  it('only check-by-hand items left: approval goes through the signed hand-check statement', () => {
    const check = layeredSupport(draft({ baseMetals: { a: { baseMetalId: null, pNumber: '1.1', groupNumber: null }, b: { baseMetalId: null, pNumber: '1.1', groupNumber: null } } }), [wpqr()])
    expect(check.supported).toBe(false)
    expect(check.violations.every(v => v.byHand)).toBe(true)
    expect(handCheckNeeded(check)).toBe(true)
  })
  it('an uncertified WPQR blocks approval even when every variable is met', () => {
    const check = layeredSupport(draft(), [{ ...wpqr(), status: 'recorded' }])
    expect(check.supported).toBe(false)
    expect(check.blockers.join(' ')).toContain('WPQR-1: its results are not certified')
  })
  it('an ASME PQR does not support an ISO 15609-1 WPS', () => {
    const check = layeredSupport(draft(), [{ ...wpqr(), code: 'asme-ix', iso: null }])
    expect(check.supported).toBe(false)
    expect(check.violations.some(v => v.clause === 'code')).toBe(true)
  })
  it('what the WPQR qualifies: Table 6 thickness 7.5 to 30 mm for t = 15 (from memory), with every clause', () => {
    const q = pqrQualifies(wpqr(), { code: 'iso-15614-1', edition: '2017', unit: 'mm' })
    expect(q.baseMetal).toEqual({ min: 7.5, max: 30 })
    expect(q.reasons).toHaveLength(10)
  })
  it('property: one essential variable of the WPS changed to an unqualified value never leaves "supported"', () => {
    const layer = draft().layers[0]!
    const bad = fc.oneof(
      fc.constantFrom('111', '141', '136').map(p => ({ layers: [{ ...layer, process: p as typeof layer.process }] })), // 8.4.1
      fc.double({ min: 30.001, max: 200, noNaN: true }).map(max => ({ thickness: { groove: { min: 8, max }, fillet: { min: null, max: null } } })), // Table 6
      fc.constantFrom('PG', 'PJ', 'J-L045').map(p => ({ positions: ['PA', p] as ProcedureDraft['positions'] })), // 8.4.2
      fc.integer({ min: 2001, max: 9000 }).map(h => ({ layers: [{ ...layer, heatInputMax: h }] })), // 8.4.8 (J/mm; 1.25 × 1600)
      fc.integer({ min: -40, max: 19 }).map(preheatMin => ({ preheatMin })), // 8.4.6
      fc.integer({ min: 251, max: 600 }).map(interpassMax => ({ interpassMax })), // 8.4.7
      fc.constant({ pwht: { required: true, temperature: { min: 580, max: 620 }, holdHours: 2, note: null } }), // 8.4.9
      fc.constant({ layers: [{ ...layer, fillers: [{ ...layer.fillers[0]!, classification: 'G 46 4 M21 4Si1' }] }] }), // 8.4.4
      fc.integer({ min: 1, max: 500 }).map(min => ({ diameter: { min, max: null } })), // 8.3.2.2: plate test, pipe WPS
    )
    fc.assert(fc.property(bad, change => !layeredSupport(draft(change as Partial<ProcedureDraft>), [wpqr()]).supported), { numRuns: 300 })
  })
})
