import { describe, expect, it } from 'vitest'
import { testOutcome, type TestRecord } from '../../../../shared/qualification/test-outcome'

const pipe6G = (bends: TestRecord['bends']): TestRecord => ({
  code: 'asme-ix', edition: '2023', unit: 'in', process: 'SMAW', transfer: null, form: 'pipe', weld: 'groove',
  couponThickness: 0.375, depositThickness: 0.375, layers: 3, outsideDiameter: 6.625, pNumber: '1', fNumber: '4', backing: true,
  positions: ['6G'], visualAccepted: true, visualNotes: null, examination: 'bend', bends, radiography: null, macro: null,
})

describe('a bend test passes only with the specimen set of the table (ASME BPVC IX-2023, QW-452.1(a))', () => {
  it('a 6G coupon of 3/8 in with four acceptable face bends and no root bend is incomplete, not passed', () => {
    const r = testOutcome(pipe6G([0, 0, 0, 0].map(size => ({ type: 'face', largestIndication: size }))))
    expect(r.outcome).toBe('pending')
    expect(r.specimenSet?.answer).toBe('incomplete')
    expect(r.steps.at(-1)?.text).toMatch(/^Incomplete/)
  })
  it('the same coupon passes with 2 face + 2 root, or 4 side bends (QW-452.1(a): 3/8 to under 3/4 in)', () => {
    expect(testOutcome(pipe6G(['face', 'root', 'face', 'root'].map(type => ({ type, largestIndication: 0 })))).outcome).toBe('passed')
    expect(testOutcome(pipe6G(['side', 'side', 'side', 'side'].map(type => ({ type, largestIndication: 0 })))).outcome).toBe('passed')
  })
})
