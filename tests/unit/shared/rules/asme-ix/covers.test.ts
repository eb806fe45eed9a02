import { describe, expect, it } from 'vitest'
import { ok, refused } from '../helpers'

const plate3G4G = { process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['3G', '4G'], couponThickness: 0.375, fNumber: 4, backing: true, pNumber: '1' }
const covers = (test: unknown, production: Record<string, unknown>, unit: 'in' | 'mm' = 'in') =>
  ok({ code: 'asme-ix', check: 'covers', unit, input: { test, production } })

describe('ASME IX coverage of a production weld by a welder test (QW-461.9, QW-452, QW-433, QW-423.1)', () => {
  it('plate 3G + 4G covers vertical groove on pipe over 24 in OD (column A)', () => {
    expect(covers(plate3G4G, { form: 'pipe', weld: 'groove', position: 'V', outsideDiameter: 30 }).covered).toBe(true)
  })
  it('plate 3G + 4G does not cover vertical groove on pipe of 24 in OD or less (column B: F only)', () => {
    const r = covers(plate3G4G, { form: 'pipe', weld: 'groove', position: 'V', outsideDiameter: 24 })
    expect(r.covered).toBe(false)
    expect(r.reasons).toContainEqual(expect.objectContaining({ clause: 'QW-461.9', met: false }))
  })
  it('a plate groove test covers flat groove on pipe only at 2-7/8 in OD and over (QW-461.9 †)', () => {
    expect(covers(plate3G4G, { form: 'pipe', weld: 'groove', position: 'F', outsideDiameter: 2.875 }).covered).toBe(true)
    expect(covers(plate3G4G, { form: 'pipe', weld: 'groove', position: 'F', outsideDiameter: 2.375 }).covered).toBe(false)
  })
  it('groove tests cover fillets of all sizes and diameters (QW-452.6) in column C', () => {
    expect(covers(plate3G4G, { form: 'pipe', weld: 'fillet', position: 'H', outsideDiameter: 1 }).covered).toBe(true)
  })
  it('a fillet test never covers a groove weld (QW-452.5)', () => {
    const fillet = { process: 'SMAW', form: 'plate', weld: 'fillet', testPositions: ['3F', '4F'], couponThickness: 0.375 }
    expect(covers(fillet, { form: 'plate', weld: 'groove', position: 'F' }).covered).toBe(false)
    expect(covers(fillet, { form: 'plate', weld: 'fillet', position: 'O' }).covered).toBe(true)
  })
  it('deposit thickness against QW-452.1(b): 3/8 in coupon covers 3/4 in, not 0.8 in', () => {
    expect(covers(plate3G4G, { form: 'plate', weld: 'groove', position: 'V', thickness: 0.75 }).covered).toBe(true)
    expect(covers(plate3G4G, { form: 'plate', weld: 'groove', position: 'V', thickness: 0.8 }).covered).toBe(false)
  })
  it('F-No. and backing (QW-433): F4 with backing covers F3 with backing, not without', () => {
    expect(covers(plate3G4G, { form: 'plate', weld: 'groove', position: 'F', fNumber: 3, backing: true }).covered).toBe(true)
    expect(covers(plate3G4G, { form: 'plate', weld: 'groove', position: 'F', fNumber: 3, backing: false }).covered).toBe(false)
    expect(covers(plate3G4G, { form: 'plate', weld: 'groove', position: 'F', fNumber: 5, backing: true }).covered).toBe(false)
  })
  it('P-No. (QW-423.1, 2023): a P-No. 1 test covers P-No. 8, not P-No. 51', () => {
    expect(covers(plate3G4G, { form: 'plate', weld: 'groove', position: 'F', pNumber: '8' }).covered).toBe(true)
    expect(covers(plate3G4G, { form: 'plate', weld: 'groove', position: 'F', pNumber: '51' }).covered).toBe(false)
  })
  it('process must match (QW-350)', () => {
    expect(covers(plate3G4G, { form: 'plate', weld: 'groove', position: 'F', process: 'GTAW' }).covered).toBe(false)
  })
  it('a set of tests covers when one of them does, and names each test when none does', () => {
    const g1 = { ...plate3G4G, testPositions: ['1G'] }
    expect(covers([g1, plate3G4G], { form: 'plate', weld: 'groove', position: 'O' }).covered).toBe(true)
    const none = covers([g1, { ...g1, testPositions: ['2G'] }], { form: 'plate', weld: 'groove', position: 'O' })
    expect(none.covered).toBe(false)
    expect(none.reasons.some(r => String((r as { text: string }).text).startsWith('Test 2:'))).toBe(true)
  })
  it('a pipe production weld without its diameter: cannot tell, record it (QW-461.9 †); refuses a position that is not F, H, V or O', () => {
    const r = covers(plate3G4G, { form: 'pipe', weld: 'groove', position: 'F' })
    expect([r.covered, r.answer, r.record]).toEqual([false, 'cannot-tell', ['production.outsideDiameter']])
    expect(refused({ code: 'asme-ix', check: 'covers', unit: 'in', input: { test: plate3G4G, production: { form: 'plate', weld: 'groove', position: '3G' } } })).toContain('not F, H, V or O')
  })
})
