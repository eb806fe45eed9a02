import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { d11WelderVariables } from '../../../../shared/rules/aws-d1.1/variables'
import { d13WelderVariables } from '../../../../shared/rules/aws-d1.3/variables'
import { isoWelderVariables } from '../../../../shared/rules/iso-9606-1/variables'
import { ok } from './helpers'

type Obj = Record<string, unknown>
type Covers = { covered: boolean, answer: string, record: string[], reasons: { variable?: string, state?: string }[] }
const covers = (code: string, unit: 'in' | 'mm', test: unknown, production: Obj) =>
  ok({ code, check: 'covers', unit, input: { test, production } }) as unknown as Covers

describe('AWS D1.1 welder variables (WPQ essential-variable table: from memory; positions and thickness: Tables 6.10/6.11, read)', () => {
  const d11 = (test: unknown, production: Obj) => covers('aws-d1.1', 'in', test, production)
  const plate = { process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['3G'], couponThickness: 1, fNumber: 4, backing: true, progression: 'uphill' }
  const joint = { code: 'aws-d1.1', form: 'plate', weld: 'groove', positions: ['F', 'V'], process: 'SMAW', thickness: 1.5, fNumber: 3, backing: true, progression: 'uphill' }
  it('covers when every variable is qualified', () => expect(d11(plate, joint).answer).toBe('covered'))
  it.each([
    ['code', { code: 'asme-ix' }], // a D1.1 test never covers an ASME joint (convention)
    ['progression', { progression: 'downhill' }], // WPQ essential variables (5), from memory
    ['backing', { backing: false }], // WPQ essential variables (6), from memory
    ['f-number', { fNumber: 5 }], // electrode groups: F4 qualifies F1–F4, from memory
    ['position', { positions: ['F', 'V', 'O'] }], // Table 6.10: 3G → F, H, V, read
    ['process', { process: 'FCAW' }],
  ])('%s: an unqualified value is not covered', (variable, change) => {
    const r = d11(plate, { ...joint, ...change })
    expect(r.answer).toBe('not-covered')
    expect(r.reasons).toContainEqual(expect.objectContaining({ variable, state: 'not-met' }))
  })
  it('GMAW-S is a process of its own for welders: spray does not cover short-circuit (from memory)', () => {
    const spray = { ...plate, process: 'GMAW', transfer: 'spray', fNumber: undefined }
    expect(d11(spray, { ...joint, process: 'GMAW', fNumber: undefined, transfer: 'short-circuit' }).answer).toBe('not-covered')
    expect(d11(spray, { ...joint, process: 'GMAW', fNumber: undefined }).answer).toBe('cannot-tell')
  })
  it('a vertical joint whose progression the test did not record: cannot tell, record it', () => {
    const { progression: _p, ...unrecorded } = plate
    expect(d11(unrecorded, joint).record).toEqual(['test.progression'])
  })
  it('the table lists every variable it compares', () => {
    expect(d11WelderVariables.map(v => v.id)).toEqual(expect.arrayContaining(['process', 'transfer', 'f-number', 'position', 'thickness', 'diameter', 'progression', 'backing', 'code']))
  })
})

describe('AWS D1.3 welder variables (thickness, F-No., position, joint type, process, coating, progression: read on a WPQR guide)', () => {
  const d13 = (test: unknown, production: Obj) => covers('aws-d1.3', 'in', test, production)
  const sheet = { process: 'GMAW', form: 'plate', weld: 'fillet', joint: 'fillet', testPositions: ['3F'], couponThickness: 0.06, coating: 'galvanized', progression: 'downhill' }
  const joint = { form: 'plate', weld: 'fillet', joint: 'fillet', positions: ['H', 'V'], process: 'GMAW', thickness: 0.1, coating: 'galvanized', progression: 'downhill' }
  it('covers when every variable is qualified (4.7.2: fillet tests on the thinnest sheet, to the 3/16 in scope)', () => expect(d13(sheet, joint).answer).toBe('covered'))
  it.each([
    ['coating', { coating: 'none' }],
    ['progression', { progression: 'uphill' }],
    ['position', { positions: ['O'] }],
    ['thickness', { thickness: 0.05 }],
    ['code', { code: 'aws-d1.1' }],
  ])('%s: an unqualified value is not covered', (variable, change) => {
    const r = d13(sheet, { ...joint, ...change })
    expect(r.answer).toBe('not-covered')
    expect(r.reasons).toContainEqual(expect.objectContaining({ variable, state: 'not-met' }))
  })
  it('the table lists the seven variables the guide names', () => {
    expect(d13WelderVariables.map(v => v.id)).toEqual(expect.arrayContaining(['thickness', 'f-number', 'position', 'joint', 'process', 'coating', 'progression']))
  })
})

describe('ISO 9606-1 clause 5 variables (summary sheets of DIN EN ISO 9606-1:2013, or from memory as marked)', () => {
  const iso = (test: unknown, production: Obj) => covers('iso-9606-1', 'mm', test, production)
  const butt = { process: '135', transfer: 'spray', form: 'plate', weld: 'groove', testPositions: ['PF'], depositThickness: 10, fNumber: 1, fillerType: 'S', sides: 'single', backing: true }
  const joint = { code: 'iso-9606-1', form: 'plate', weld: 'groove', positions: ['PA', 'PF'], process: '135', transfer: 'spray', thickness: 15, fNumber: 2, fillerType: 'M', sides: 'both' }
  it('covers when every variable is qualified (Table 6: 10 mm → 3 to 20 mm; FM1 → FM2; ss mb → bs)', () => expect(iso(butt, joint).answer).toBe('covered'))
  it.each([
    ['transfer', { transfer: 'short-circuit' }], // 5.2: only short-circuit covers the other modes
    ['position', { positions: ['PG'] }], // Table 9: PF → PA, PF
    ['thickness', { thickness: 21 }],
    ['filler-group', { fNumber: 5 }], // from memory
    ['filler-type', { fillerType: 'B' }], // from memory
    ['details', { sides: 'single', backing: false }], // 5.9: ss mb does not cover ss nb
    ['process', { process: '141' }],
  ])('%s: an unqualified value is not covered', (variable, change) => {
    const r = iso(butt, { ...joint, ...change })
    expect(r.answer).toBe('not-covered')
    expect(r.reasons).toContainEqual(expect.objectContaining({ variable, state: 'not-met' }))
  })
  it('a combination butt weld: each process its own s; the combination s1 + s2 (Table 6)', () => {
    const combo = { form: 'plate', weld: 'groove', testPositions: ['PA'], processes: [{ process: '141', depositThickness: 3 }, { process: '111', depositThickness: 9 }] }
    expect(iso(combo, { form: 'plate', weld: 'groove', position: 'PA', processes: [{ process: '141', depositThickness: 5 }, { process: '111', depositThickness: 15 }] }).answer).toBe('covered')
    expect(iso(combo, { form: 'plate', weld: 'groove', position: 'PA', processes: [{ process: '141', depositThickness: 7 }, { process: '111', depositThickness: 10 }] }).answer).toBe('not-covered')
  })
  it('the table lists the clause 5 variables', () => {
    expect(isoWelderVariables.map(v => v.id)).toEqual(expect.arrayContaining(['process', 'transfer', 'product', 'weld', 'filler-group', 'filler-type', 'thickness', 'diameter', 'position', 'details', 'layering']))
  })
})

// Metamorphic property per code: from a covered pair, change ONE variable of production to an unqualified value.
describe('changing one essential variable to an unqualified value never stays "covered" (fast-check)', () => {
  const check = (code: string, unit: 'in' | 'mm', test: Obj, production: Obj, changes: Obj[]) => {
    fc.assert(fc.property(fc.constantFrom(...changes), (change) => {
      expect(covers(code, unit, test, production).answer).toBe('covered')
      const r = covers(code, unit, test, { ...production, ...change })
      expect(r.covered, JSON.stringify(change)).toBe(false)
    }), { numRuns: changes.length * 4 })
  }
  it('AWS D1.1', () => {
    fc.assert(fc.property(fc.constantFrom('1G', '2G', '3G', '4G'), fc.boolean(), fc.integer({ min: 25, max: 64 }).map(n => n / 16), (position, uphill, thickness) => {
      const letters: Record<string, string[]> = { '1G': ['F'], '2G': ['F', 'H'], '3G': ['F', 'H', 'V'], '4G': ['F', 'O'] }
      const progression = uphill ? 'uphill' : 'downhill'
      const test = { process: 'SMAW', form: 'plate', weld: 'groove', testPositions: [position], couponThickness: 1, fNumber: 4, backing: true, progression }
      const production = { code: 'aws-d1.1', form: 'plate', weld: 'groove', positions: letters[position], process: 'SMAW', thickness, fNumber: 4, backing: true, progression }
      const unqualified = ['F', 'H', 'V', 'O'].filter(p => !letters[position]!.includes(p))
      check('aws-d1.1', 'in', test, production, [
        { code: 'asme-ix' }, { process: 'GTAW' }, { fNumber: 5 }, { backing: false }, { positions: [...letters[position]!, unqualified[0]!] },
        { thickness: 1 / 16 }, ...(letters[position]!.includes('V') ? [{ progression: uphill ? 'downhill' : 'uphill' }] : []),
      ])
    }), { numRuns: 20 })
  })
  it('AWS D1.3', () => {
    const test = { process: 'GMAW', form: 'plate', weld: 'fillet', joint: 'fillet', testPositions: ['3F'], couponThickness: 0.06, coating: 'none', progression: 'uphill' }
    const production = { code: 'aws-d1.3', form: 'plate', weld: 'fillet', joint: 'fillet', positions: ['F', 'V'], process: 'GMAW', thickness: 0.1, coating: 'none', progression: 'uphill' }
    check('aws-d1.3', 'in', test, production, [{ code: 'asme-ix' }, { process: 'SMAW' }, { coating: 'galvanized' }, { progression: 'downhill' }, { positions: ['O'] }, { thickness: 0.03 }, { form: 'pipe' }])
  })
  it('ISO 9606-1', () => {
    fc.assert(fc.property(fc.integer({ min: 3, max: 11 }), fc.constantFrom('PA', 'PC', 'PE', 'PF'), (s, position) => {
      const test = { process: '135', transfer: 'spray', form: 'plate', weld: 'groove', testPositions: [position], depositThickness: s, fNumber: 1, fillerType: 'S', sides: 'single', backing: true }
      const production = { code: 'iso-9606-1', form: 'plate', weld: 'groove', positions: ['PA'], process: '135', transfer: 'spray', thickness: s, fNumber: 1, fillerType: 'S', sides: 'single', backing: true }
      check('iso-9606-1', 'mm', test, production, [
        { code: 'aws-d1.1' }, { process: '111' }, { transfer: 'short-circuit' }, { fNumber: 5 }, { fillerType: 'B' }, { backing: false },
        { positions: ['PA', 'PG'] }, { thickness: 2 * s + 1 }, { weld: 'fillet' },
      ])
    }), { numRuns: 10 })
  })
})
