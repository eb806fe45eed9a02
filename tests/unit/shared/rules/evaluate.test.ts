import { describe, expect, it } from 'vitest'
import { evaluate, getRuleSet, codes } from '../../../../shared/rules/index'
import { refused } from './helpers'

describe('evaluate(): validation and dispatch', () => {
  it('every code module implements the one interface', () => {
    for (const code of codes) {
      const set = getRuleSet(code)
      expect(set.code).toBe(code)
      expect(set.editions).toContain(set.defaultEdition)
      expect(typeof set.welderRanges).toBe('function')
      expect(typeof set.continuity).toBe('function')
    }
  })
  it('gives field-level messages for bad requests and never throws', () => {
    expect(refused(null)).toContain('Expected object')
    expect(refused({ code: 'asme', check: 'continuity', unit: 'in', input: {} })).toContain('code must be one of')
    expect(refused({ code: 'asme-ix', check: 'nope', unit: 'in', input: {} })).toContain('check must be one of')
    expect(refused({ code: 'asme-ix', check: 'gauge', unit: 'cm', input: {} })).toContain('unit must be')
    expect(refused({ code: 'asme-ix', check: 'procedure-ranges', unit: 'in', input: { process: 'SMAW' } })).toContain('input.couponThickness: couponThickness is required')
    expect(refused({ code: 'asme-ix', check: 'procedure-ranges', unit: 'in', input: { process: 'SMAW', couponThickness: -1 } })).toContain('more than 0')
    expect(refused({ code: 'asme-ix', check: 'procedure-ranges', unit: 'in', input: { process: 'SMAW', couponThickness: 1, colour: 'red' } })).toContain('unknown field colour')
    expect(refused({ code: 'asme-ix', check: 'procedure-ranges', unit: 'in', input: { process: 'SMAW', couponThickness: '1' } })).toContain('must be a number')
  })
  it('refuses an edition the code module does not carry', () => {
    expect(refused({ code: 'asme-ix', edition: '2018', check: 'continuity', unit: 'in', input: { lastUse: '2026-01-15', on: '2026-02-01' } })).toContain('2019')
  })
  it('every successful result names code, edition, unit, reasons with clauses, and the caution', () => {
    const r = evaluate({ code: 'aws-d1.1', check: 'welder-ranges', unit: 'in', input: { process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['3G'], couponThickness: 1 } })
    expect(r).toMatchObject({ code: 'aws-d1.1', edition: '2020', unit: 'in' })
    expect('reasons' in r && r.reasons.length).toBeGreaterThan(0)
    expect('caution' in r && r.caution).toContain('quality manual')
  })
})
