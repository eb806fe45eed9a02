import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { ok } from '../helpers'

type Obj = Record<string, unknown>
interface Support { supported: boolean, answer: string, record: string[], layers: { process: string, state: string, pqrs: string[] }[], procedure: { variable?: string, state?: string }[], byHand: { clause: string }[], violations: { clause: string }[] }
const support = (wps: Obj, pqrs: Obj[], edition = '2023') =>
  ok({ code: 'asme-ix', check: 'wps-support', unit: 'in', edition, input: { wps, pqrs } }) as unknown as Support

// Charpy results (invented) and acceptance values entered by the user from the construction code.
const accepted = { specimens: [{ energy: 30, lateralExpansion: 20 }, { energy: 28, lateralExpansion: 19 }, { energy: 32, lateralExpansion: 22 }], acceptance: { averageEnergy: 20, singleEnergy: 15, lateralExpansion: 15 } }

describe('ASME IX base metals, QW-424.1 (from memory)', () => {
  const wps = (a: string, b: string) => ({ process: 'SMAW', thickness: { min: 0.1875, max: 2 }, baseMetals: { a: { pNumber: a }, b: { pNumber: b } } })
  const pqr = (a: string, b: string, id = 'A') => ({ id, process: 'SMAW', couponThickness: 1, baseMetals: { a: { pNumber: a }, b: { pNumber: b } } })
  it('a P-No. 1 to P-No. 8 WPS is NOT supported by two PQRs P-1/P-1 and P-8/P-8 (the issue\'s wrong yes)', () => {
    const r = support(wps('1', '8'), [pqr('1', '1', 'A'), pqr('8', '8', 'B')])
    expect(r.answer).toBe('not-supported')
    expect(r.violations.map(v => v.clause)).toContain('QW-424.1')
  })
  it('a P-No. 1 to P-No. 8 WPS is supported by a P-1 to P-8 PQR', () => {
    expect(support(wps('1', '8'), [pqr('8', '1')]).answer).toBe('supported')
  })
  it('P-No. 4 to P-No. 4 qualifies 4 to 3 and 4 to 1 (the issue\'s wrong no); not 1 to 3', () => {
    expect(support(wps('4', '1'), [pqr('4', '4')]).answer).toBe('supported')
    expect(support(wps('4', '3'), [pqr('4', '4')]).answer).toBe('supported')
    expect(support(wps('1', '3'), [pqr('4', '4')]).answer).toBe('not-supported')
  })
  it('P-No. 5A to P-No. 5A qualifies 5A to 4, 3, 1; P-No. 4 to P-No. 1 qualifies 4 to 3 and 4 to 1, not 4 to 4', () => {
    expect(support(wps('5A', '4'), [pqr('5A', '5A')]).answer).toBe('supported')
    expect(support(wps('4', '3'), [pqr('4', '1')]).answer).toBe('supported')
    expect(support(wps('4', '4'), [pqr('4', '1')]).answer).toBe('not-supported')
  })
  it('P-No. 1 to P-No. 1 does not qualify P-No. 1 to P-No. 3 (no "to lower" row for P-No. 1)', () => {
    expect(support(wps('3', '1'), [pqr('1', '1')]).answer).toBe('not-supported')
  })
  it('a PQR that does not record its base metals: cannot tell, record it', () => {
    const r = support(wps('1', '1'), [{ process: 'SMAW', couponThickness: 1 }])
    expect([r.answer, r.record]).toEqual(['cannot-tell', ['pqrs[].baseMetals']])
  })
})

describe('ASME IX preheat, PWHT and toughness results', () => {
  const base = { process: 'SMAW', thickness: { min: 0.1875, max: 2 } }
  it('preheat: at most 100 °F below the PQR (QW-406.1, from memory)', () => {
    expect(support({ ...base, preheatMin: 150 }, [{ process: 'SMAW', couponThickness: 1, preheat: 250 }]).answer).toBe('supported')
    expect(support({ ...base, preheatMin: 149 }, [{ process: 'SMAW', couponThickness: 1, preheat: 250 }]).answer).toBe('not-supported')
  })
  it('PWHT condition must be the PQR\'s (QW-407.1, from memory); above the upper transformation the maximum is 1.1T (QW-407.4, from memory)', () => {
    expect(support({ ...base, pwht: { condition: 'none' } }, [{ process: 'SMAW', couponThickness: 1, pwht: { condition: 'below-lower' } }]).answer).toBe('not-supported')
    const r = support({ ...base, pwht: { condition: 'above-upper' } }, [{ process: 'SMAW', couponThickness: 1, pwht: { condition: 'above-upper' } }])
    expect(r.violations.map(v => v.clause)).toContain('QW-403.8, QW-451.1') // 1.1 × 1 in < 2 in
  })
  it('a toughness WPS: a PQR marked toughness-tested without results cannot support it; rejected results do not (QW-403.6)', () => {
    const wps = { ...base, toughness: true, thickness: { min: 0.625, max: 2 } }
    expect(support(wps, [{ process: 'SMAW', couponThickness: 1, toughness: true }]).answer).toBe('cannot-tell')
    expect(support(wps, [{ process: 'SMAW', couponThickness: 1, toughness: true, toughnessResults: accepted }]).answer).toBe('supported')
    const low = { ...accepted, specimens: [{ energy: 30, lateralExpansion: 20 }, { energy: 10, lateralExpansion: 19 }, { energy: 32, lateralExpansion: 22 }] }
    expect(support(wps, [{ process: 'SMAW', couponThickness: 1, toughness: true, toughnessResults: low }]).supported).toBe(false)
  })
  it('with toughness the supplementary variables Rootface does not compare are listed for checking by hand, with their clauses', () => {
    const r = support({ ...base, toughness: true, thickness: { min: 0.625, max: 2 } }, [{ process: 'SMAW', couponThickness: 1, toughness: true, toughnessResults: accepted }])
    expect(r.byHand.map(b => b.clause)).toEqual(expect.arrayContaining(['QW-405.2', 'QW-407.2', 'QW-410.9']))
  })
})

describe('ASME IX combination WPS: each process layer supported by a PQR layer or another PQR (QW-200.4, from memory)', () => {
  const wps = { thickness: { min: 0.1875, max: 1 }, layers: [{ process: 'GTAW', depositMax: 0.25 }, { process: 'SMAW', depositMax: 1 }] }
  it('a combination PQR GTAW 1/8 in + SMAW 1/2 in on a 5/8 in coupon: GTAW up to 1/4 in, SMAW up to 1 in (QW-451.1 column t, read)', () => {
    const combo = { id: 'C', couponThickness: 0.625, layers: [{ process: 'GTAW', depositThickness: 0.125 }, { process: 'SMAW', depositThickness: 0.5 }] }
    const r = support(wps, [combo])
    expect(r.answer).toBe('supported')
    expect(r.layers.map(l => [l.process, l.state, l.pqrs])).toEqual([['GTAW', 'met', ['C']], ['SMAW', 'met', ['C']]])
    expect(support({ ...wps, layers: [{ process: 'GTAW', depositMax: 0.3 }, { process: 'SMAW', depositMax: 1 }] }, [combo]).answer).toBe('not-supported')
  })
  it('two single-process PQRs support the two layers', () => {
    const r = support(wps, [{ id: 'G', process: 'GTAW', couponThickness: 0.5, depositThickness: 0.125 }, { id: 'S', process: 'SMAW', couponThickness: 1, depositThickness: 1 }])
    expect(r.layers.map(l => l.pqrs)).toEqual([['G'], ['S']])
    expect(r.answer).toBe('supported')
  })
  it('a layer with no PQR of its process is not supported', () => {
    expect(support(wps, [{ process: 'SMAW', couponThickness: 1 }]).layers.map(l => l.state)).toEqual(['not-met', 'met'])
  })
})

describe('WPS support: changing one variable of the WPS to an unqualified value never stays "supported" (fast-check)', () => {
  const pair = fc.record({
    T: fc.integer({ min: 16, max: 64 }).map(n => n / 32), // 1/2 to 2 in
    preheat: fc.integer({ min: 50, max: 400 }),
    fNumber: fc.constantFrom(1, 3, 4),
    pNo: fc.constantFrom('1', '3', '4', '5A', '8'),
    toughness: fc.boolean(),
    heat: fc.integer({ min: 10_000, max: 60_000 }),
  }).map(({ T, preheat, fNumber, pNo, toughness, heat }) => {
    const pqr: Obj = {
      id: 'P', process: 'SMAW', couponThickness: T, depositThickness: T, fNumber, preheat, pwht: { condition: 'none' }, heatInput: heat,
      baseMetals: { a: { pNumber: pNo } }, ...(toughness ? { toughness: true, toughnessResults: accepted } : {}),
    }
    const wps: Obj = {
      process: 'SMAW', thickness: { min: 0.1875, max: 2 * T }, depositMax: 2 * T, fNumber, preheatMin: preheat - 100, pwht: { condition: 'none' },
      baseMetals: { a: { pNumber: pNo }, b: { pNumber: pNo } }, ...(toughness ? { toughness: true, heatInputMax: heat, thickness: { min: Math.min(T, 0.625), max: 2 * T } } : {}),
    }
    return { wps, pqr }
  })
  const mutations: { id: string, applies?: (w: Obj) => boolean, change: (w: Obj) => Obj }[] = [
    { id: 'process', change: () => ({ process: 'GTAW' }) },
    // Above every QW-451.1 maximum a coupon of 2 in or less can give (8 in, read).
    { id: 'thickness', change: w => ({ thickness: { ...(w.thickness as Obj), max: 8.5 } }) },
    { id: 'thickness-min', change: w => ({ thickness: { ...(w.thickness as Obj), min: 1 / 64 } }) },
    { id: 'deposit', change: () => ({ depositMax: 8.5 }) },
    { id: 'f-number', change: w => ({ fNumber: (w.fNumber as number) === 4 ? 3 : 4 }) },
    { id: 'base-metals', change: w => ({ baseMetals: { a: (w.baseMetals as { a: Obj }).a, b: { pNumber: '43' } } }) },
    { id: 'preheat', change: w => ({ preheatMin: (w.preheatMin as number) - 1 }) },
    { id: 'pwht', change: () => ({ pwht: { condition: 'below-lower' } }) },
    { id: 'toughness', applies: w => w.toughness !== true, change: w => ({ toughness: true, heatInputMax: 1, thickness: { min: 0.625, max: (w.thickness as { max: number }).max } }) },
    { id: 'heat-input', applies: w => w.toughness === true, change: w => ({ heatInputMax: (w.heatInputMax as number) + 1 }) },
  ]
  it('holds for process, thickness, deposit, F-No., P-Nos., preheat, PWHT, toughness and heat input', () => {
    fc.assert(fc.property(pair, fc.nat(), ({ wps, pqr }, pick) => {
      expect(support(wps, [pqr]).answer).toBe('supported')
      const applicable = mutations.filter(m => !m.applies || m.applies(wps))
      const m = applicable[pick % applicable.length]!
      const changed = support({ ...wps, ...m.change(wps) }, [pqr])
      expect(changed.supported, m.id).toBe(false)
      expect(['not-supported', 'cannot-tell']).toContain(changed.answer)
    }), { numRuns: 300 })
  })
})
