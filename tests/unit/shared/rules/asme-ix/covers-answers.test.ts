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
