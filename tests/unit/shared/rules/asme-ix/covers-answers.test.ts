import { describe, expect, it } from 'vitest'
import { ok } from '../helpers'

// Whole ASME IX "does this test cover this weld?" answers, variable by variable, as the coverage screen lists them.
// Positions: Table QW-461.9, columns A/B/C and † (docs/sources.md §A3); diameter: QW-452.3 bands and the plate-test
// † limit of 2-7/8 in (§A2.3); deposit: 2t, QW-452.1(b), and 1.1t for short-circuit GMAW, QW-404.32 (§A2b, §A2.32);
// F-Nos.: QW-433 (from memory, §A6); P-Nos.: QW-423.1 (§A6); the other welder variables (QW-402.4, QW-404.14,
// QW-404.22, QW-404.23, QW-405.3, QW-408.8, QW-409.2, QW-409.4) from memory of the QW-350 table. Sentences: Rootface's.
const covers = (test: Record<string, unknown>, production: Record<string, unknown>) =>
  ok({ code: 'asme-ix', check: 'covers', unit: 'in', edition: '2023', input: { test, production } })
const m = (variable: string, clause: string, text: string, basis: string, process?: string) =>
  ({ met: true, state: 'met', variable, clause, text, basis, ...(process ? { process } : {}) })
const no = (variable: string, clause: string, text: string, basis: string, process?: string) =>
  ({ met: false, state: 'not-met', variable, clause, text, basis, ...(process ? { process } : {}) })

describe('ASME IX coverage answers, variable by variable', () => {
  it('SMAW plate 3G + 4G on vertical pipe over 24 in OD: position and diameter met; deposit over 2t and downhill are not', () => {
    const r = covers(
      { process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['3G', '4G'], couponThickness: 0.375, fNumber: 4, backing: true, pNumber: '1', progression: 'uphill' },
      { process: 'SMAW', form: 'pipe', weld: 'groove', position: 'V', outsideDiameter: 30, thickness: 0.8, fNumber: 3, backing: true, pNumber: '8', progression: 'downhill' },
    )
    expect([r.covered, r.answer, r.record]).toEqual([false, 'not-covered', []])
    expect(r.reasons).toEqual([
      m('weld', 'QW-303.1', 'A groove test qualifies groove welds.', 'verified'),
      m('position', 'QW-461.9', 'Groove V on pipe over 24 in OD: the test qualifies F, V, O.', 'verified'), // column A of 3G + 4G
      m('diameter', 'QW-461.9 †', 'OD 30 in: qualified 2-7/8 in to unlimited.', 'verified'),
      m('process', 'QW-350', 'SMAW was tested.', 'partial', 'SMAW'),
      m('f-number', 'QW-404.15, QW-433', 'Production F-No. 3: qualified by the test (F-No. 4).', 'memory', 'SMAW'), // F-No. 4 with backing qualifies 1–4
      no('deposit', 'QW-404.30, QW-452.1(b)', 'SMAW deposit 0.8 in: qualified up to 3/4 in.', 'verified', 'SMAW'), // 2t = 3/4 in
      m('backing', 'QW-402.4', 'Production with backing: qualified by the test (with backing).', 'memory', 'SMAW'),
      no('progression', 'QW-405.3', 'Production downhill vertical: the test (uphill vertical) does not qualify it.', 'memory', 'SMAW'),
      m('p-number', 'QW-403.18, QW-423.1', 'Production P-No. 8: qualified by the test (P-No. 1).', 'verified'), // P-No. 1 qualifies P-No. 1–15F
    ])
  })

  it('GMAW short-circuit test against spray production: the transfer is not qualified; the deposit is 1.1t', () => {
    const r = covers(
      { process: 'GMAW', transfer: 'short-circuit', form: 'plate', weld: 'groove', testPositions: ['2G'], couponThickness: 0.25, fNumber: 6, backing: true, pNumber: '1' },
      { process: 'GMAW', transfer: 'spray', form: 'plate', weld: 'groove', position: 'H', thickness: 0.25, fNumber: 6, backing: true, pNumber: '1' },
    )
    expect(r.covered).toBe(false)
    expect(r.reasons).toEqual([
      m('weld', 'QW-303.1', 'A groove test qualifies groove welds.', 'verified'),
      m('position', 'QW-461.9', 'Groove H on plate: the test qualifies F, H.', 'verified'), // 2G row
      m('process', 'QW-350', 'GMAW was tested.', 'partial', 'GMAW'),
      no('transfer', 'QW-409.2', 'Production spray transfer: the test (short-circuit transfer) does not qualify it.', 'memory', 'GMAW'),
      m('f-number', 'QW-404.15, QW-433', 'Production F-No. 6: qualified by the test (F-No. 6).', 'memory', 'GMAW'),
      m('deposit', 'QW-404.32', 'GMAW deposit 0.25 in: qualified up to 0.275 in.', 'verified', 'GMAW'), // 1.1 × 1/4 in
      m('backing', 'QW-402.4', 'Production with backing: qualified by the test (with backing).', 'memory', 'GMAW'),
      m('p-number', 'QW-403.18, QW-423.1', 'Production P-No. 1: qualified by the test (P-No. 1).', 'verified'),
    ])
  })

  it('GTAW 6G on 2-3/8 in pipe against an overhead weld on 0.84 in pipe: the diameter and four GTAW variables are not qualified', () => {
    const r = covers(
      { process: 'GTAW', form: 'pipe', weld: 'groove', testPositions: ['6G'], couponThickness: 0.28, outsideDiameter: 2.375, fNumber: 6, backing: false, pNumber: '1', current: 'DCEN', fillerAdded: true, consumableInsert: false, fillerForm: 'solid', backingGas: true },
      { process: 'GTAW', form: 'pipe', weld: 'groove', position: 'O', outsideDiameter: 0.84, thickness: 0.1, fNumber: 6, backing: false, pNumber: '1', current: 'AC', fillerAdded: true, consumableInsert: true, fillerForm: 'flux-cored', backingGas: false },
    )
    expect(r.covered).toBe(false)
    expect(r.reasons).toEqual([
      m('weld', 'QW-303.1', 'A groove test qualifies groove welds.', 'verified'),
      m('position', 'QW-461.9', 'Groove O on pipe of 24 in OD or less: the test qualifies all positions (F, H, V, O).', 'verified'), // 6G, column B
      no('diameter', 'QW-452.3', 'OD 0.84 in: qualified 1 in to unlimited.', 'verified'), // 2-3/8 in test: 1 in and over
      m('process', 'QW-350', 'GTAW was tested.', 'partial', 'GTAW'),
      m('f-number', 'QW-404.15, QW-433', 'Production F-No. 6: qualified by the test (F-No. 6).', 'memory', 'GTAW'),
      m('deposit', 'QW-404.30, QW-452.1(b)', 'GTAW deposit 0.1 in: qualified up to 0.56 in.', 'verified', 'GTAW'), // 2 × 0.28 in
      m('backing', 'QW-402.4', 'Production without backing: qualified by the test (without backing).', 'memory', 'GTAW'),
      m('filler-added', 'QW-404.14', 'Production with filler metal: qualified by the test (with filler metal).', 'memory', 'GTAW'),
      no('consumable-insert', 'QW-404.22', 'Production with a consumable insert: the test (without a consumable insert) does not qualify it.', 'memory', 'GTAW'),
      no('filler-form', 'QW-404.23', 'Production flux-cored filler: the test (solid filler) does not qualify it.', 'memory', 'GTAW'),
      no('backing-gas', 'QW-408.8', 'Production without inert backing gas: the test (with inert backing gas) does not qualify it.', 'memory', 'GTAW'),
      no('current', 'QW-409.4', 'Production AC: the test (DCEN) does not qualify it.', 'memory', 'GTAW'),
      m('p-number', 'QW-403.18, QW-423.1', 'Production P-No. 1: qualified by the test (P-No. 1).', 'verified'),
    ])
  })
})

// [variable, state, clause, text, record] of each finding, for the shorter cases below.
const rows = (r: Record<string, unknown>) => (r.reasons as { variable: string, state: string, clause: string, text: string, record?: string }[]).map(x => [x.variable, x.state, x.clause, x.text, x.record ?? ''])

describe('ASME IX coverage answers: fillet tests, other codes, other processes, missing values', () => {
  const fillet = { process: 'SMAW', form: 'plate', weld: 'fillet', testPositions: ['2F'], couponThickness: 0.125 }
  it('a 1/8 in fillet test qualifies base metal T to 2T (QW-452.5, from memory): 1/4 in yes, 0.26 in no, unstated: record it', () => {
    const at = (thickness?: number) => covers(fillet, { process: 'SMAW', form: 'plate', weld: 'fillet', position: 'H', ...(thickness === undefined ? {} : { thickness }) })
    expect(rows(at(0.25))).toEqual([
      ['position', 'met', 'QW-461.9', 'Fillet H: the test qualifies F, H.', ''], // 2F row
      ['thickness', 'met', 'QW-452.5', 'Base metal 0.25 in: qualified 1/8 in to 1/4 in.', ''],
      ['process', 'met', 'QW-350', 'SMAW was tested.', ''],
    ])
    expect(at(0.25).covered).toBe(true)
    expect(rows(at(0.26))[1]).toEqual(['thickness', 'not-met', 'QW-452.5', 'Base metal 0.26 in: qualified 1/8 in to 1/4 in.', ''])
    expect(rows(at())[1]).toEqual(['thickness', 'not-recorded', 'QW-452.5', 'The test qualifies base metal 1/8 in to 1/4 in; the production thickness is not given.', 'production.thickness'])
    expect(at().record).toEqual(['production.thickness'])
  })
  it('a 3/16 in fillet test qualifies every thickness; an unrecorded coupon thickness asks for it', () => {
    const thick = covers({ ...fillet, couponThickness: 0.1875 }, { process: 'SMAW', form: 'plate', weld: 'fillet', position: 'F', thickness: 2 })
    expect(rows(thick)[1]).toEqual(['thickness', 'met', 'QW-452.5', 'A fillet test coupon of 3/16 in or more qualifies all base metal thicknesses and fillet sizes.', ''])
    const unknown = covers({ ...fillet, couponThickness: undefined }, { process: 'SMAW', form: 'plate', weld: 'fillet', position: 'F', thickness: 2 })
    expect(rows(unknown)[1]).toEqual(['thickness', 'not-recorded', 'QW-452.5', 'The fillet test coupon thickness was not recorded.', 'test.couponThickness'])
  })
  it('a fillet test on a groove weld to another code: each refusal named, the code in its full name', () => {
    const r = covers({ ...fillet, couponThickness: 0.1875 }, { process: 'SMAW', form: 'pipe', weld: 'groove', position: 'F', outsideDiameter: 3, code: 'aws-d1.1' })
    expect(r.answer).toBe('not-covered')
    expect(rows(r).slice(0, 4)).toEqual([
      ['code', 'not-met', 'QW-301', 'The joint is welded to AWS D1.1; an ASME IX test does not qualify it.', ''],
      ['weld', 'not-met', 'QW-452.5', 'A fillet test qualifies fillet welds only, not groove welds.', ''],
      ['position', 'not-met', 'QW-461.9', 'Groove F on pipe of 24 in OD or less: the test qualifies none; not F.', ''],
      ['diameter', 'met', 'QW-461.9 †', 'OD 3 in: qualified 2-7/8 in to unlimited.', ''],
    ])
  })
  it('a groove test on a fillet weld of unnamed process: qualified in size and diameter, the process asked for', () => {
    const r = covers({ process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['3G'], couponThickness: 0.375 }, { form: 'pipe', weld: 'fillet', position: 'V' })
    expect([r.answer, r.record]).toEqual(['cannot-tell', ['production.process']])
    expect(rows(r)).toEqual([
      ['weld', 'met', 'QW-452.6, QW-303.1', 'A groove test qualifies fillet welds of all sizes, thicknesses and diameters.', ''],
      ['position', 'met', 'QW-461.9', 'Fillet V: the test qualifies F, H, V.', ''], // 3G row, column C
      ['diameter', 'met', 'QW-452.6', 'A groove test qualifies fillet welds of all sizes, thicknesses and diameters.', ''],
      ['process', 'not-recorded', 'QW-350', 'Production does not name its process: cannot tell, state it; the test was SMAW (its other variables are compared as for that process).', 'production.process'],
      ['process', 'met', 'QW-350', 'SMAW was tested.', ''],
    ])
  })
  it('another process needs its own test; pipe of unknown OD: V only in column A, so cannot tell', () => {
    const r = covers({ process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['3G'], couponThickness: 0.375 }, { process: 'GTAW', form: 'pipe', weld: 'groove', positions: ['F', 'V'] })
    expect(rows(r)).toEqual([
      ['weld', 'met', 'QW-303.1', 'A groove test qualifies groove welds.', ''],
      ['position', 'not-recorded', 'QW-461.9', 'Groove V on pipe is qualified only over 24 in OD (column A); the pipe OD is not given.', 'production.outsideDiameter'],
      ['diameter', 'not-recorded', 'QW-403.16', 'The pipe OD is not given.', 'production.outsideDiameter'],
      ['process', 'not-met', 'QW-350', 'The test was SMAW; GTAW needs its own test.', ''],
    ])
  })
  it('a combination coupon (QW-306): each production process within its own deposit; a pipe test without its OD asks for it', () => {
    const r = covers(
      { form: 'pipe', weld: 'groove', testPositions: ['5G'], couponThickness: 0.5, processes: [{ process: 'GTAW', depositThickness: 0.125 }, { process: 'SMAW', depositThickness: 0.375, layers: 3 }] },
      { form: 'pipe', weld: 'groove', position: 'V', outsideDiameter: 4, processes: [{ process: 'GTAW', depositThickness: 0.1 }, { process: 'SMAW', depositThickness: 0.5 }], code: 'asme-ix' },
    )
    expect([r.answer, r.record]).toEqual(['cannot-tell', ['test.outsideDiameter']])
    expect(rows(r)).toEqual([
      ['code', 'met', 'QW-301', 'The joint is welded to ASME IX.', ''],
      ['weld', 'met', 'QW-303.1', 'A groove test qualifies groove welds.', ''],
      ['position', 'met', 'QW-461.9', 'Groove V on pipe of 24 in OD or less: the test qualifies F, V, O.', ''], // 5G row, column B
      ['diameter', 'not-recorded', 'QW-452.3', 'The test pipe OD was not recorded.', 'test.outsideDiameter'],
      ['process', 'met', 'QW-350', 'GTAW was tested in the combination coupon (QW-306; each process within its own deposit).', ''],
      ['deposit', 'met', 'QW-404.30, QW-452.1(b)', 'GTAW deposit 0.1 in: qualified up to 1/4 in.', ''], // 2 × 1/8 in
      ['process', 'met', 'QW-350', 'SMAW was tested in the combination coupon (QW-306; each process within its own deposit).', ''],
      ['deposit', 'met', 'QW-404.30, QW-452.1(b)', 'SMAW deposit 0.5 in: qualified up to 3/4 in.', ''], // 3/8 in < 1/2 in: 2t
      ['backing', 'met', 'QW-402.4', 'Production with backing: qualified by the test (with backing).', ''], // a later layer is welded on the earlier deposit
    ])
  })
})
