import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { designation } from '../../../../../shared/rules/iso-9606-1/designation'
import { ok } from '../helpers'

// Designations as ISO 9606-1:2012 clause 10 writes them; the examples are the worked designations of summary sheet S2
// (DIN EN ISO 9606-1:2013 examples, SOURCES.md F-C) and the issue's own example.
describe('ISO 9606-1 designation (clause 10)', () => {
  it('S2 example 2: 136 P BW FM1 B s15 PE ss nb', () => {
    expect(designation({ processes: [{ process: '136', depositThickness: 15 }], form: 'plate', weld: 'groove', fillerGroup: 1, fillerType: 'B', couponThickness: 15, positions: ['PE'], details: 'ss nb' }))
      .toBe('ISO 9606-1 136 P BW FM1 B s15 PE ss nb')
  })
  it('S2 example 1: 135 P FW FM1 S t10 PB ml', () => {
    expect(designation({ processes: [{ process: '135' }], form: 'plate', weld: 'fillet', fillerGroup: 1, fillerType: 'S', couponThickness: 10, positions: ['PB'], details: 'ml' }))
      .toBe('ISO 9606-1 135 P FW FM1 S t10 PB ml')
  })
  it('a butt weld without its deposit recorded is written by t (issue 19 example: 135 P BW FM1 S t10 PF ss nb)', () => {
    expect(designation({ processes: [{ process: '135', depositThickness: null }], form: 'plate', weld: 'groove', fillerGroup: 1, fillerType: 'S', couponThickness: 10, positions: ['PF'], details: 'ss nb' }))
      .toBe('ISO 9606-1 135 P BW FM1 S t10 PF ss nb')
  })
  it('pipe (T) with D, decimals with a comma (S2 writes "s3,6"); a combination joins processes (from memory)', () => {
    expect(designation({ processes: [{ process: '141', depositThickness: 3.6 }, { process: '111', depositThickness: 8 }], form: 'pipe', weld: 'groove', fillerGroup: 1, fillerType: 'B', couponThickness: 12, outsideDiameter: 168.3, positions: ['H-L045'], details: 'ss nb' }))
      .toBe('ISO 9606-1 141/111 T BW FM1 B s3,6/s8 D168,3 H-L045 ss nb')
  })
  it('what was not recorded is a "?", never a guess (house rule: never a false yes)', () => {
    expect(designation({ processes: [{ process: '111' }], form: 'plate', weld: 'groove', positions: [] })).toBe('ISO 9606-1 111 P BW FM? ? t? ?')
  })
})

// Property (house rule): one essential variable of clause 5 changed to a value the test does not qualify never
// leaves "covered". Test: 135 P BW FM1 S s10 PF ss nb (S2-style); values outside its ranges per Tables 6, 9, 5.2, 5.5.
describe('ISO 9606-1 covers: one unqualified variable never leaves "yes"', () => {
  const test = { process: '135', form: 'plate', weld: 'groove', testPositions: ['PF'], depositThickness: 10, fNumber: 1, fillerType: 'S', sides: 'single', backing: false }
  const good = { code: 'iso-9606-1', process: '135', form: 'plate', weld: 'groove', position: 'PA', thickness: 12, fNumber: 2, fillerType: 'M', sides: 'both', backing: true }
  const covers = (production: Record<string, unknown>) => ok({ code: 'iso-9606-1', check: 'covers', unit: 'mm', input: { test, production } })
  it('the base production weld is covered (Table 6: 3 to 20 mm; Table 9: PF → PA, PF; 5.5 FM1 → FM2; 5.9 ss nb → bs)', () => {
    expect(covers(good).answer).toBe('covered')
  })
  it('property', () => {
    const bad = fc.oneof(
      fc.constantFrom('111', '141', '136').map(process => ({ process })), // 5.2: 135 covers 135 and 138 only
      fc.constantFrom('PC', 'PE', 'PG', 'PH').map(position => ({ position })), // Table 9: PF → PA, PF
      fc.double({ min: 20.01, max: 200, noNaN: true }).map(thickness => ({ thickness })), // Table 6: 2s = 20 mm
      fc.double({ min: 0.5, max: 2.99, noNaN: true }).map(thickness => ({ thickness })), // Table 6: from 3 mm
      fc.constantFrom(3, 4, 5, 6).map(fNumber => ({ fNumber })), // 5.5: FM1 → FM1, FM2 (from memory)
      fc.constantFrom('asme-ix', 'aws-d1.1').map(code => ({ code })), // the code itself
      fc.constant({ weld: 'fillet', position: 'PB' }), // 5.4: a butt test does not cover fillets alone
    )
    fc.assert(fc.property(bad, (change) => {
      expect(covers({ ...good, ...change }).answer).not.toBe('covered')
    }))
  })
})
