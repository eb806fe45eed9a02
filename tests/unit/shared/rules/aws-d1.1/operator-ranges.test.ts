import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { d11OperatorCovers, d11OperatorRanges, type D11OperatorJoint, type D11OperatorTest } from '../../../../../shared/rules/aws-d1.1/operator-ranges'
import { isoOperatorByHand, operatorRangesOf } from '../../../../../shared/qualification/operator-ranges'

// AWS D1.1 welding operators. Positions: AWS D1.1/D1.1M:2020 Table 6.10 "Welder and Welding Operator Qualification:
// Production Welding Positions Qualified by Plate Tests" (read, SOURCES F-B). Process, backing, vertical progression and
// single/multiple electrodes: the welding-personnel essential-variable table (D1.1:2015 Table 4.12), from memory.
// Thickness for operators: no source: always "check by hand".
const test: D11OperatorTest = { edition: '2020', process: 'SAW', form: 'plate', weld: 'groove', positions: ['1G'], backing: true, electrodes: 'single' }
const joint: D11OperatorJoint = { process: 'SAW', form: 'plate', weld: 'groove', position: 'F', backing: true, progression: null, electrodes: 'single', thickness: 1 }

describe('welding operator ranges under AWS D1.1', () => {
  it('1G plate: groove F, fillet F and H (D1.1:2020 Table 6.10, read)', () => {
    const r = d11OperatorRanges(test)
    expect(r.groove).toEqual(['F'])
    expect(r.fillet).toEqual(['F', 'H'])
    expect(r.reasons.find(x => x.clause === 'Table 6.10')?.basis).toBe('verified')
  })

  it('3G plate: groove F, H, V, and 4G: groove F, OH (D1.1:2020 Table 6.10, read)', () => {
    expect(d11OperatorRanges({ ...test, positions: ['3G'], progression: 'uphill' }).groove).toEqual(['F', 'H', 'V'])
    expect(d11OperatorRanges({ ...test, positions: ['4G'] }).groove).toEqual(['F', 'O'])
    expect(d11OperatorRanges({ ...test, positions: ['3G', '4G'], progression: 'uphill' }).groove).toEqual(['F', 'H', 'V', 'O'])
  })

  it('the 2015 edition names Table 4.10 (D1.1:2015 Clause 4; SOURCES: tables 4.10/4.11 in 2015)', () => {
    expect(d11OperatorRanges({ ...test, edition: '2015' }).reasons.some(r => r.clause === 'Table 4.10')).toBe(true)
  })

  it('the joint welded as tested is still "cannot tell", never "covered": the thickness is checked by hand', () => {
    const c = d11OperatorCovers(test, joint)
    expect(c.answer).toBe('cannot-tell')
    expect(c.covered).toBe(false)
    expect(c.reasons.find(r => r.variable === 'thickness')).toMatchObject({ state: 'not-checked', text: expect.stringContaining('check by hand') })
  })

  it('a position outside Table 6.10\'s row is not covered (1G does not qualify groove V; D1.1:2020 Table 6.10)', () => {
    expect(d11OperatorCovers(test, { ...joint, position: 'V', progression: 'uphill' }).answer).toBe('not-covered')
  })

  it('omission of backing needs a new test; a test without backing covers either (from memory, D1.1:2015 Table 4.12)', () => {
    expect(d11OperatorCovers(test, { ...joint, backing: false }).answer).toBe('not-covered')
    expect(d11OperatorRanges({ ...test, backing: false }).backing).toEqual([false, true])
  })

  it('single to multiple electrodes needs a new test, not the reverse (from memory, D1.1:2015 Table 4.12)', () => {
    expect(d11OperatorCovers(test, { ...joint, electrodes: 'multiple' }).answer).toBe('not-covered')
    expect(d11OperatorRanges({ ...test, electrodes: 'multiple' }).electrodes).toEqual(['single', 'multiple'])
  })

  it('vertical progression: only as tested; unrecorded on the test, it is "check by hand" (from memory, Table 4.12)', () => {
    const vertical = { ...test, positions: ['3G'], progression: 'uphill' as const }
    expect(d11OperatorCovers(vertical, { ...joint, position: 'V', progression: 'downhill' }).answer).toBe('not-covered')
    const unrecorded = d11OperatorCovers({ ...vertical, progression: null }, { ...joint, position: 'V', progression: 'uphill' })
    expect(unrecorded.answer).toBe('cannot-tell')
    expect(unrecorded.reasons.find(r => r.variable === 'progression')?.state).toBe('not-checked')
  })

  it('another process is not covered; SMAW is a welder\'s test, refused for an operator (D1.1: SMAW is manual, common practice)', () => {
    expect(d11OperatorCovers(test, { ...joint, process: 'FCAW' }).answer).toBe('not-covered')
    expect(() => d11OperatorRanges({ ...test, process: 'SMAW' })).toThrow(/welded by hand/)
  })

  it('pipe tests, electroslag and electrogas: positions by hand, never covered (no source in hand)', () => {
    const pipe = d11OperatorCovers({ ...test, form: 'pipe', positions: ['1G'] }, { ...joint, form: 'pipe' })
    expect(pipe.answer).toBe('cannot-tell')
    expect(pipe.reasons.find(r => r.variable === 'position')?.state).toBe('not-checked')
    expect(d11OperatorRanges({ ...test, process: 'ESW' }).byHand[0]).toContain('check by hand')
  })

  it('a joint missing a variable says what to record', () => {
    const c = d11OperatorCovers(test, { ...joint, backing: null })
    expect(c.answer).toBe('cannot-tell')
    expect(c.record).toContain('joint.backing')
  })
})

describe('operator ranges for the screens: ISO 9606-1 and unknown codes say "check by hand"', () => {
  const operator = { mode: 'machine' as const, visualControl: 'direct' as const, arcVoltageControl: false, jointTracking: false, consumableInserts: false, passesPerSide: 'single' as const }
  const record = { process: 'SAW', backing: true, form: 'plate', weld: 'groove', positions: ['1G'], operator }

  it('ISO 9606-1 names ISO 14732 (ISO 9606-1:2017 clause 1 scope: welders; operators are under ISO 14732, from memory)', () => {
    const r = operatorRangesOf({ ...record, code: 'iso-9606-1', process: '121' })
    expect(r.ranges).toBeNull()
    expect(r.byHand).toBe(isoOperatorByHand)
    expect(r.byHand).toContain('ISO 14732')
    expect(r.byHand).toContain('Check by hand')
  })

  it('AWS D1.3 is not computed: check by hand', () => {
    expect(operatorRangesOf({ ...record, code: 'aws-d1.3' })).toMatchObject({ ranges: null, byHand: expect.stringContaining('check by hand') })
  })

  it('AWS D1.1 gives its ranges and what is left to check by hand (thickness always)', () => {
    const r = operatorRangesOf({ ...record, code: 'aws-d1.1', edition: '2020' })
    expect(r.ranges?.reasons.length).toBeGreaterThan(0)
    expect(r.byHand).toContain('thickness')
  })
})

describe('property: AWS D1.1 operator coverage never says "covered", and an unqualified variable never leaves a yes', () => {
  const arbTest = fc.record({
    edition: fc.constantFrom('2015', '2020', '2025'),
    process: fc.constantFrom('SAW', 'GMAW', 'FCAW', 'GTAW'),
    form: fc.constant('plate' as const),
    weld: fc.constant('groove' as const),
    positions: fc.subarray(['1G', '2G', '3G', '4G'], { minLength: 1 }),
    backing: fc.boolean(),
    progression: fc.constantFrom('uphill' as const, 'downhill' as const, null),
    electrodes: fc.constantFrom('single' as const, 'multiple' as const, null),
  })
  const arbJoint = fc.record({
    process: fc.constantFrom('SAW', 'GMAW', 'FCAW', 'GTAW', null),
    form: fc.constantFrom('plate' as const, 'pipe' as const, null),
    weld: fc.constantFrom('groove' as const, 'fillet' as const, null),
    position: fc.constantFrom('F' as const, 'H' as const, 'V' as const, 'O' as const, null),
    backing: fc.constantFrom(true, false, null),
    progression: fc.constantFrom('uphill' as const, 'downhill' as const, null),
    electrodes: fc.constantFrom('single' as const, 'multiple' as const, null),
    thickness: fc.constantFrom(0.25, 1, 4, null),
  })

  it('no test and joint is ever "covered"', () => {
    fc.assert(fc.property(arbTest, arbJoint, (t, j) => d11OperatorCovers(t, j).answer !== 'covered'))
  })

  it('a joint changed to a process, backing or electrode count the test does not qualify is "not covered"', () => {
    fc.assert(fc.property(arbTest, arbJoint, fc.constantFrom('process', 'backing', 'electrodes'), (t, j, change) => {
      const r = d11OperatorRanges(t)
      const bad: D11OperatorJoint = change === 'process'
        ? { ...j, process: r.process === 'SAW' ? 'GMAW' : 'SAW' }
        : change === 'backing'
          ? { ...j, backing: t.backing ? false : j.backing }
          : { ...j, electrodes: t.electrodes === 'single' ? 'multiple' : j.electrodes }
      const unqualified = change === 'process' || (change === 'backing' && t.backing) || (change === 'electrodes' && t.electrodes === 'single')
      const answer = d11OperatorCovers(t, bad).answer
      return unqualified ? answer === 'not-covered' : answer !== 'covered'
    }))
  })
})
