import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { ok } from '../helpers'

const support = (wps: Record<string, unknown>, pqrs: unknown[], edition = '2020', unit: 'in' | 'mm' = 'in') =>
  ok({ code: 'aws-d1.1', check: 'wps-support', unit, edition, input: { wps, pqrs } })
const states = (r: Record<string, unknown>) => Object.fromEntries((r.reasons as { variable: string, state: string }[]).map(x => [x.variable, x.state]))
const clauses = (r: Record<string, unknown>) => (r.violations as { clause: string }[]).map(v => v.clause)

// A 1 in FCAW plate tested in 1G and 3G, 150 °F preheat, as welded (values invented for the test).
const pqr = { id: 'P1', process: 'FCAW', couponThickness: 1, preheat: 150, pwht: { condition: 'none' }, testPositions: ['1G', '3G'] }
const wps = { process: 'FCAW', thickness: { min: 0.125, max: 4 }, preheatMin: 150, pwht: { condition: 'none' }, positions: ['F', 'V'] }

describe('AWS D1.1 WPS qualified by test against its PQRs (Table 4.5 in 2015, Table 6.5 from 2020; from memory)', () => {
  it('a 1 in PQR supports 1/8 in to any thickness in the positions it was tested (D1.1:2015 Table 4.2, 1 in and over: unlimited; from memory)', () => {
    const r = support(wps, [pqr])
    expect(r.answer).toBe('supported')
    expect(r.supported).toBe(true)
  })
  it('what is not compared is always listed to check by hand (house rule: never a false yes)', () => {
    const byHand = support(wps, [pqr]).byHand as { state: string, text: string }[]
    expect(byHand.length).toBeGreaterThan(0)
    expect(byHand.every(b => b.state === 'not-checked' && b.text.includes('check by hand'))).toBe(true)
    expect(byHand.some(b => b.text.startsWith('Not compared by Rootface: check by hand. Shielding gas'))).toBe(true)
  })
  it('a 3/8 in PQR qualifies up to 2T = 3/4 in (D1.1:2015 Table 4.2, from memory): a WPS to 1 in is not supported', () => {
    const thin = { ...pqr, couponThickness: 0.375 }
    expect(support({ ...wps, thickness: { min: 0.125, max: 0.75 } }, [thin]).answer).toBe('supported')
    const r = support({ ...wps, thickness: { min: 0.125, max: 1 } }, [thin], '2015')
    expect(r.answer).toBe('not-supported')
    expect(clauses(r)).toEqual(['Table 4.2'])
  })
  it('preheat may fall at most 25 °F below the PQR (D1.1:2015 Table 4.5, from memory)', () => {
    expect(states(support({ ...wps, preheatMin: 125 }, [pqr])).preheat).toBe('met')
    const r = support({ ...wps, preheatMin: 124 }, [pqr], '2015')
    expect(r.answer).toBe('not-supported')
    expect(clauses(r)).toEqual(['Table 4.5'])
  })
  it('in millimetres the drop is 15 °C (D1.1:2015 Table 4.5, from memory); 2020 names Table 6.5 (from memory)', () => {
    const metric = { ...pqr, couponThickness: 25, preheat: 65 }
    const w = { ...wps, thickness: { min: 3, max: 100 }, preheatMin: 50 }
    expect(support(w, [metric], '2020', 'mm').answer).toBe('supported')
    const r = support({ ...w, preheatMin: 49 }, [metric], '2020', 'mm')
    expect(clauses(r)).toEqual(['Table 6.5'])
  })
  it('adding or deleting PWHT needs a new PQR (D1.1:2015 Table 4.5, from memory)', () => {
    expect(states(support({ ...wps, pwht: { condition: 'below-lower' } }, [pqr])).pwht).toBe('not-met')
    expect(states(support(wps, [{ ...pqr, pwht: { condition: 'below-lower' } }])).pwht).toBe('not-met')
  })
  it('a PQR tested in 1G only does not qualify vertical (each test its own position, from memory)', () => {
    const r = support(wps, [{ ...pqr, testPositions: ['1G'] }])
    expect(states(r).positions).toBe('not-met')
    expect(states(support(wps, [{ ...pqr, testPositions: ['6G'] }])).positions).toBe('met')
  })
  it('a change of process, or GMAW to or from short-circuit, needs a new PQR (D1.1:2015 Table 4.5, from memory)', () => {
    expect(states(support({ ...wps, process: 'SMAW' }, [pqr])).process).toBe('not-met')
    const spray = { ...pqr, process: 'GMAW', transfer: 'spray' }
    expect(states(support({ ...wps, process: 'GMAW', transfer: 'short-circuit' }, [spray])).transfer).toBe('not-met')
    expect(states(support({ ...wps, process: 'GMAW', transfer: 'pulse' }, [spray])).transfer).toBe('met')
  })
  it('with CVN testing heat input may rise at most 10 % above the PQR (D1.1:2015 Table 4.6, from memory)', () => {
    const cvn = { ...pqr, toughness: true, heatInput: 50000, toughnessResults: { specimens: [{ energy: 30 }, { energy: 28 }, { energy: 32 }], acceptance: { averageEnergy: 20, singleEnergy: 15 } } }
    const w = { ...wps, thickness: { min: 0.625, max: 4 }, toughness: true }
    expect(support({ ...w, heatInputMax: 55000 }, [cvn]).answer).toBe('supported')
    const r = support({ ...w, heatInputMax: 55001 }, [cvn], '2015')
    expect(clauses(r)).toEqual(['Table 4.6'])
    expect(states(support({ ...w, heatInputMax: 55000 }, [{ ...pqr, heatInput: 50000 }])).toughness).toBe('not-met')
  })
  it('a value the PQR does not record makes the answer "cannot tell" and names what to record (house rule)', () => {
    const r = support(wps, [{ ...pqr, preheat: undefined }])
    expect(r.answer).toBe('cannot-tell')
    expect(r.record).toContain('pqrs[].preheat')
    expect(support({ ...wps, positions: undefined }, [pqr]).record).toContain('wps.positions')
  })
  it('refuses a process not carried for D1.1 procedures (ESW and EGW have their own limits)', () => {
    expect(() => support({ ...wps, process: 'ESW' }, [pqr])).toThrow(/not carried/)
  })
})

describe('property: one essential variable moved to an unqualified value never leaves "supported"', () => {
  it('holds for thickness, preheat, PWHT, position, process and transfer (tables as above, from memory)', () => {
    const t = fc.integer({ min: 8, max: 96 }).map(n => n / 32) // coupon 1/4 in to 3 in
    const change = fc.constantFrom('thickness', 'preheat', 'pwht', 'position', 'process', 'transfer')
    fc.assert(fc.property(t, fc.integer({ min: 50, max: 400 }), fc.integer({ min: 26, max: 300 }), change, (T, preheat, drop, which) => {
      const p = { process: 'GMAW', transfer: 'spray', couponThickness: T, preheat, pwht: { condition: 'none' }, testPositions: ['1G'] }
      const w: Record<string, unknown> = { process: 'GMAW', transfer: 'spray', thickness: { min: 0.125, max: T >= 1 ? 10 : 2 * T }, preheatMin: preheat, pwht: { condition: 'none' }, positions: ['F'] }
      expect(support(w, [p]).answer).toBe('supported')
      if (which === 'thickness') w.thickness = { min: 0.125, max: T >= 1 ? 10 : 2 * T + 0.0625 }
      if (which === 'thickness' && T >= 1) w.thickness = { min: 0.0625, max: 10 }
      if (which === 'preheat') w.preheatMin = preheat - drop
      if (which === 'pwht') w.pwht = { condition: 'between' }
      if (which === 'position') w.positions = ['F', 'O']
      if (which === 'process') w.process = 'SMAW'
      if (which === 'transfer') w.transfer = 'short-circuit'
      expect(support(w, [p]).answer).not.toBe('supported')
    }), { numRuns: 150 })
  })
})
