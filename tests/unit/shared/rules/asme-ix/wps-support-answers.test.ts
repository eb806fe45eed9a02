import { describe, expect, it } from 'vitest'
import { ok } from '../helpers'

// A two-process toughness WPS (GTAW root, GMAW spray fill) against one PQR, variable by variable, and the values at each
// limit. Thickness and deposit: Table QW-451.1 (docs/sources.md §A1: T = 1 in qualifies 3/16 in to 2T, deposit 2t, and
// 2T for t of 3/4 in and over) with QW-403.6 (§A1.6: with toughness the minimum is T or 5/8 in, whichever is less);
// QW-409.1 heat input not above the PQR's (verified, §A6); QW-406.1 preheat at most 100 °F below, QW-406.3 interpass at
// most 100 °F above, QW-407.1 PWHT, QW-403.5 group, QW-424.1 base metals, QW-404.4/.5/.14 and QW-409.2: from memory.
// Charpy results are invented and judged against acceptance values entered as the construction code would give them.
type Obj = Record<string, unknown>
const accepted = { specimens: [{ energy: 30 }, { energy: 28 }, { energy: 32 }], acceptance: { averageEnergy: 20, singleEnergy: 15 } }
const wps = {
  thickness: { min: 0.625, max: 2 }, toughness: true, baseMetals: { a: { pNumber: '1', group: 2 } }, preheatMin: 50, interpassMax: 550, pwht: { condition: 'below-lower' },
  layers: [{ process: 'GTAW', depositMax: 0.25, fNumber: 6, aNumber: 1, fillerAdded: true, heatInputMax: 32000 }, { process: 'GMAW', transfer: 'spray', depositMax: 2, fNumber: 6, aNumber: 1, heatInputMax: 45000 }],
}
const pqr = {
  id: 'PQR-9', couponThickness: 1, toughness: true, toughnessResults: accepted, baseMetals: { a: { pNumber: '1', group: 2 } }, preheat: 150, interpassMax: 450, pwht: { condition: 'below-lower' },
  layers: [{ process: 'GTAW', depositThickness: 0.25, fNumber: 6, aNumber: 1, fillerAdded: true, heatInput: 32000 }, { process: 'GMAW', transfer: 'spray', depositThickness: 0.75, fNumber: 6, aNumber: 1, heatInput: 45000 }],
}
const support = (w: Obj, pqrs: Obj[]) => ok({ code: 'asme-ix', check: 'wps-support', unit: 'in', edition: '2023', input: { wps: w, pqrs } })
type Finding = { variable: string, state: string, clause: string, text: string, record?: string, process?: string }
const findings = (r: Obj) => r.reasons as Finding[]
const one = (r: Obj, variable: string, process?: string) => findings(r).filter(f => f.variable === variable && (process === undefined || f.process === process))

describe('ASME IX WPS support: a supported toughness WPS at its limits', () => {
  const r = support(wps, [pqr])
  it('is supported, every layer by PQR-9', () => {
    expect([r.supported, r.answer, r.violations, r.record, r.undetermined]).toEqual([true, 'supported', [], [], []])
    expect((r.layers as { process: string, state: string, pqrs: string[] }[]).map(l => [l.process, l.state, l.pqrs])).toEqual([['GTAW', 'met', ['PQR-9']], ['GMAW', 'met', ['PQR-9']]])
  })
  it('the procedure findings name each limit and its value', () => {
    expect((r.procedure as Finding[]).map(f => [f.variable, f.state, f.clause, f.text])).toEqual([
      ['toughness', 'met', 'QW-403.6', 'Toughness is qualified by PQR-9.'],
      ['toughness-results', 'met', 'QW-403.6, construction code', 'PQR-9 Charpy results accepted: Average energy 30 ft·lbf of 3 specimens: at least 20 ft·lbf required. Lowest single energy 28 ft·lbf: at least 15 ft·lbf required.'],
      ['base-metals', 'met', 'QW-424.1', 'P-No. 1 to P-No. 1: qualified by PQR-9 (P-No. 1 to 1).'],
      ['group', 'met', 'QW-403.5', 'Group No. matches a PQR.'],
      ['preheat', 'met', 'QW-406.1', 'Preheat 50 °F minimum: at most 100 °F below the PQR preheat (150 °F).'], // exactly 100 °F below
      ['interpass', 'met', 'QW-406.3', 'Interpass 550 °F maximum: at most 100 °F above the PQR\'s (450 °F).'], // exactly 100 °F above
      ['pwht', 'met', 'QW-407.1', 'PWHT below-lower: as welded on the PQRs.'],
    ])
  })
  it('each layer: deposit, numbers, heat input and thickness at their limits', () => {
    const texts = (process: string) => (r.layers as { process: string, variables: Finding[] }[]).find(l => l.process === process)!.variables.map(f => `${f.clause} | ${f.text}`)
    expect(texts('GTAW')).toEqual([
      'QW-200.2 | GTAW is qualified by PQR-9.',
      'QW-404.30, QW-451.1 | GTAW deposit up to 1/4 in: PQR-9 qualifies up to 1/2 in.', // 2t, t = 1/4 in
      'QW-404.4 | F-No. 6: PQR-9 used 6.',
      'QW-404.5 | A-No. 1: PQR-9 used 1.',
      'QW-404.14 | filler metal added true: PQR-9 used true.',
      'QW-409.1 | Heat input up to 32000 J/in: PQR-9 recorded 32000 J/in.', // equal is allowed
      'QW-403.8, QW-451.1 | Base metal 5/8 in to 2 in lies within 5/8 in to 2 in.', // 5/8 in (QW-403.6) to 2T
    ])
    expect(texts('GMAW')).toEqual([
      'QW-200.2 | GMAW is qualified by PQR-9.',
      'QW-409.2 | Spray, globular or pulsed transfer is qualified by PQR-9.',
      'QW-404.30, QW-451.1 | GMAW deposit up to 2 in: PQR-9 qualifies up to 2 in.', // t = 3/4 in on T = 1 in: 2T
      'QW-404.4 | F-No. 6: PQR-9 used 6.',
      'QW-404.5 | A-No. 1: PQR-9 used 1.',
      'QW-409.1 | Heat input up to 45000 J/in: PQR-9 recorded 45000 J/in.',
      'QW-403.8, QW-451.1 | Base metal 5/8 in to 2 in lies within 5/8 in to 2 in.',
    ])
  })
  it('lists what Rootface does not check, toughness rows and the combination rule included', () => {
    expect((r.byHand as Finding[]).map(f => [f.clause, f.state])).toEqual([
      ['QW-403.5', 'not-checked'], ['QW-405.2', 'not-checked'], ['QW-407.2', 'not-checked'], ['QW-410.9', 'not-checked'],
      ['QW-404.12', 'not-checked'], ['QW-409.4', 'not-checked'], ['QW-408.2', 'not-checked'], ['QW-404.33', 'not-checked'], ['QW-200.4(b)', 'not-checked'],
    ])
    expect((r.byHand as Finding[])[0]!.text).toBe('Not checked by Rootface: check by hand. Base metal Group No. (with toughness): compared only when the WPS and the PQR give the group.')
  })
})

describe('ASME IX WPS support: one step past each limit is not supported', () => {
  const past = (w: Obj, p: Obj = pqr) => support(w, [p])
  it('preheat 1 °F lower, interpass 1 °F higher', () => {
    expect(one(past({ ...wps, preheatMin: 49 }), 'preheat')[0]).toMatchObject({ state: 'not-met', text: 'Preheat 49 °F minimum: at most 100 °F below the PQR preheat (150 °F).' })
    expect(one(past({ ...wps, interpassMax: 551 }), 'interpass')[0]).toMatchObject({ state: 'not-met', text: 'Interpass 551 °F maximum: at most 100 °F above the PQR\'s (450 °F).' })
  })
  it('heat input 1 J/in over the PQR\'s, and a deposit over 2t', () => {
    const hot = { ...wps, layers: [{ ...wps.layers[0], heatInputMax: 32001 }, wps.layers[1]] }
    expect(one(past(hot), 'heat-input', 'GTAW')[0]).toMatchObject({ state: 'not-met', text: 'Heat input up to 32001 J/in: PQR-9 recorded 32000 J/in.' })
    const thick = { ...wps, layers: [{ ...wps.layers[0], depositMax: 0.5001 }, wps.layers[1]] }
    expect(one(past(thick), 'deposit', 'GTAW')[0]!.state).toBe('not-met')
    const atLimit = { ...wps, layers: [{ ...wps.layers[0], depositMax: 0.5 }, wps.layers[1]] }
    expect(one(past(atLimit), 'deposit', 'GTAW')[0]!.state).toBe('met')
  })
  it('another Group No., another PWHT condition, another A-No., short-circuit transfer', () => {
    expect(one(past({ ...wps, baseMetals: { a: { pNumber: '1', group: 1 } } }), 'group')[0]).toMatchObject({ state: 'not-met', text: 'With toughness the base metal Group No. must be the one of the PQR.' })
    expect(one(past({ ...wps, pwht: { condition: 'none' } }), 'pwht')[0]).toMatchObject({ state: 'not-met', text: 'PWHT none: PQR-9 was below-lower.' })
    const aNo = { ...wps, layers: [wps.layers[0], { ...wps.layers[1], aNumber: 2 }] }
    expect(one(past(aNo), 'a-number', 'GMAW')[0]).toMatchObject({ state: 'not-met', text: 'A-No. 2: PQR-9 used 1.' })
    const short = { ...wps, layers: [wps.layers[0], { ...wps.layers[1], transfer: 'short-circuit' }] }
    expect(one(past(short), 'transfer', 'GMAW')[0]).toMatchObject({ state: 'not-met', text: 'PQR-9 used spray transfer; the WPS short-circuit.' })
  })
})

describe('ASME IX WPS support: what is not recorded is asked for, never passed', () => {
  it('a PQR without heat input, preheat or interpass; a WPS without a transfer mode', () => {
    const bare = { ...pqr, preheat: undefined, interpassMax: undefined, layers: [{ ...pqr.layers[0], heatInput: undefined }, pqr.layers[1]] }
    const r = support({ ...wps, layers: [wps.layers[0], { ...wps.layers[1], transfer: undefined }] }, [bare])
    expect(r.answer).toBe('cannot-tell')
    expect(r.record).toEqual(['pqrs[].preheat', 'pqrs[].interpassMax', 'pqrs[].heatInput', 'wps.transfer'])
    expect(one(r, 'preheat')[0]!.text).toBe('PQR-9 do not record the preheat used.')
    expect(one(r, 'interpass')[0]!.text).toBe('With toughness the interpass temperature is limited; a PQR does not record it.')
    expect(one(r, 'heat-input', 'GTAW')[0]!.text).toBe('Heat input is limited when toughness is required, but PQR-9 does not record its heat input.')
    expect(one(r, 'transfer', 'GMAW')[0]!.text).toBe('PQR-9: the WPS does not state the GMAW transfer mode.')
  })
  it('a WPS that leaves out heat input, preheat and PWHT the PQR records', () => {
    const w = { ...wps, preheatMin: undefined, pwht: undefined, layers: [{ ...wps.layers[0], heatInputMax: undefined }, wps.layers[1]] }
    const r = support(w, [{ ...pqr, pwht: { condition: 'above-upper' } }])
    expect(r.record).toEqual(['wps.preheatMin', 'wps.pwht', 'wps.heatInputMax'])
    expect(one(r, 'heat-input', 'GTAW')[0]!.text).toBe('With toughness the WPS must limit heat input (PQR-9 recorded 32000).')
    expect(one(r, 'pwht')[0]!.text).toBe('A PQR was heat treated; the WPS must state its PWHT condition.')
  })
  it('the deposit of a combination coupon layer not recorded; a group the PQR leaves out', () => {
    const p = { ...pqr, baseMetals: { a: { pNumber: '1' } }, layers: [{ ...pqr.layers[0], depositThickness: undefined }, pqr.layers[1]] }
    const r = support(wps, [p])
    expect(one(r, 'deposit', 'GTAW')[0]).toMatchObject({ state: 'not-recorded', text: 'PQR-9: the GTAW deposit of the combination coupon is not recorded.', record: 'pqrs[].layers[].depositThickness' })
    expect(one(r, 'group')[0]).toMatchObject({ state: 'not-recorded', text: 'With toughness the Group No. must match; the PQRs do not record it.', record: 'pqrs[].baseMetals.a.group' })
  })
  it('without toughness, a single-process WPS lists only its process\'s by-hand rows', () => {
    const r = support({ process: 'SMAW', thickness: { min: 0.1875, max: 2 } }, [{ process: 'SMAW', couponThickness: 1 }])
    expect(r.byHand).toEqual([])
    const g = support({ process: 'GTAW', thickness: { min: 0.1875, max: 2 } }, [{ process: 'GTAW', couponThickness: 1 }])
    expect((g.byHand as Finding[]).map(f => f.clause)).toEqual(['QW-408.2', 'QW-404.33'])
  })
})
