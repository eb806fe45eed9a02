import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { operatorCovers, operatorRanges, type OperatorJoint, type OperatorTest } from '../../../../../shared/rules/asme-ix/operator-ranges'

// ASME BPVC IX QW-361.1 (automatic) and QW-361.2 (machine) welding operator essential variables, from memory;
// positions through QW-461.9 (the welder table, QW-303).
const test: OperatorTest = {
  mode: 'machine', process: 'GTAW', visualControl: 'direct', arcVoltageControl: true, jointTracking: false, consumableInserts: false,
  backing: true, passesPerSide: 'single', form: 'plate', weld: 'groove', positions: ['1G'],
}
// The same joint as the test, stated in full
const joint: OperatorJoint = {
  mode: 'machine', process: 'GTAW', visualControl: 'direct', arcVoltageControl: true, jointTracking: false, consumableInserts: false,
  backing: true, passesPerSide: 'single', form: 'plate', weld: 'groove', position: 'F',
}

describe('welding operator ranges (ASME IX QW-361)', () => {
  it('a joint welded as tested is covered', () => {
    expect(operatorCovers(test, joint).answer).toBe('covered')
  })

  it('deleting automatic arc voltage control needs a new test, adding it does not (QW-361.2(c), from memory)', () => {
    expect(operatorCovers(test, { ...joint, arcVoltageControl: false }).answer).toBe('not-covered')
    expect(operatorRanges({ ...test, arcVoltageControl: false }).arcVoltageControl).toEqual([false, true])
  })

  it('adding joint tracking is allowed; a test with tracking does not cover a joint without it (QW-361.2(d), from memory)', () => {
    expect(operatorCovers(test, { ...joint, jointTracking: true }).answer).toBe('covered')
    expect(operatorCovers({ ...test, jointTracking: true }, joint).answer).toBe('not-covered')
  })

  it('direct and remote visual control each need their own test (QW-361.2(b), from memory)', () => {
    expect(operatorCovers(test, { ...joint, visualControl: 'remote' }).answer).toBe('not-covered')
    expect(operatorCovers({ ...test, visualControl: 'remote' }, joint).answer).toBe('not-covered')
  })

  it('single pass per side does not cover multiple; multiple covers single (QW-361.2(h), from memory)', () => {
    expect(operatorCovers(test, { ...joint, passesPerSide: 'multiple' }).answer).toBe('not-covered')
    expect(operatorCovers({ ...test, passesPerSide: 'multiple' }, joint).answer).toBe('covered')
  })

  it('a test with backing does not cover a joint without; a test without covers both (QW-361.2(g), from memory)', () => {
    expect(operatorCovers(test, { ...joint, backing: false }).answer).toBe('not-covered')
    expect(operatorCovers({ ...test, backing: false }, joint).answer).toBe('covered')
  })

  it('a test with consumable inserts also covers a joint with backing and no inserts (QW-361.2(f), from memory)', () => {
    const withInserts = { ...test, consumableInserts: true, backing: false }
    expect(operatorCovers(withInserts, { ...joint, consumableInserts: false, backing: true }).answer).toBe('covered')
    expect(operatorCovers(withInserts, { ...joint, consumableInserts: false, backing: false }).answer).toBe('not-covered')
  })

  it('machine does not cover automatic, nor another process (QW-361.1(a), QW-361.2(a), from memory)', () => {
    expect(operatorCovers(test, { ...joint, mode: 'automatic' }).answer).toBe('not-covered')
    expect(operatorCovers(test, { ...joint, process: 'SAW' }).answer).toBe('not-covered')
  })

  it('a 1G plate test covers flat grooves only; 3G covers F and V (ASME IX QW-461.9)', () => {
    expect(operatorCovers(test, { ...joint, position: 'V' }).answer).toBe('not-covered')
    expect(operatorCovers({ ...test, positions: ['3G'] }, { ...joint, position: 'V' }).answer).toBe('covered')
  })

  it('a variable the joint does not state is "cannot tell", never covered', () => {
    const r = operatorCovers(test, { ...joint, jointTracking: null })
    expect(r.answer).toBe('cannot-tell')
    expect(r.record).toEqual(['joint.jointTracking'])
  })

  it('a pipe groove from a plate groove test is checked by hand (QW-461.9 column B dagger)', () => {
    expect(operatorCovers(test, { ...joint, form: 'pipe' }).answer).toBe('cannot-tell')
  })
})

// Property: a joint that matches the test in every variable but one, with that one set to a value the test does not
// qualify, is never "covered" (a changed essential variable needs requalification, QW-361).
describe('property: one essential variable unqualified never leaves "yes"', () => {
  const arbTest = fc.record({
    mode: fc.constantFrom('machine' as const, 'automatic' as const),
    process: fc.constantFrom('GTAW', 'GMAW', 'SAW', 'FCAW'),
    visualControl: fc.constantFrom('direct' as const, 'remote' as const),
    arcVoltageControl: fc.boolean(),
    jointTracking: fc.boolean(),
    consumableInserts: fc.boolean(),
    backing: fc.boolean(),
    passesPerSide: fc.constantFrom('single' as const, 'multiple' as const),
    form: fc.constant('plate' as const),
    weld: fc.constant('groove' as const),
    positions: fc.constantFrom(['1G'], ['2G'], ['3G'], ['4G'], ['3G', '4G']),
  })
  // For each variable, the values outside what the test qualifies (read from the clauses, not from operatorRanges).
  const unqualified = (t: OperatorTest): Partial<OperatorJoint>[] => [
    { mode: t.mode === 'machine' ? 'automatic' : 'machine' },
    { process: t.process === 'GTAW' ? 'SAW' : 'GTAW' },
    { visualControl: t.visualControl === 'direct' ? 'remote' : 'direct' },
    ...(t.arcVoltageControl ? [{ arcVoltageControl: false }] : []),
    ...(t.jointTracking ? [{ jointTracking: false }] : []),
    // without inserts, on a groove without backing (the QW-361.2(f) exception does not apply)
    ...(t.consumableInserts ? [{ consumableInserts: false, backing: false }] : []),
    ...(t.backing && !t.consumableInserts ? [{ backing: false }] : []),
    ...(t.passesPerSide === 'single' ? [{ passesPerSide: 'multiple' as const }] : []),
    ...(t.positions.includes('4G') ? [] : [{ position: 'O' as const }]),
  ]
  it('holds for every operator test and every single unqualified change', () => {
    fc.assert(fc.property(arbTest, fc.nat(), (t, pick) => {
      const base: OperatorJoint = { mode: t.mode, process: t.process, visualControl: t.visualControl, arcVoltageControl: t.arcVoltageControl, jointTracking: t.jointTracking, consumableInserts: t.consumableInserts, backing: t.backing, passesPerSide: t.passesPerSide, form: 'plate', weld: 'groove', position: 'F' }
      const choices = unqualified(t)
      const change = choices[pick % choices.length]!
      const answer = operatorCovers(t, { ...base, ...change }).answer
      return answer !== 'covered'
    }), { numRuns: 500 })
  })

  it('and the same joint unchanged (flat position) is covered when the test positions include flat', () => {
    fc.assert(fc.property(arbTest, (t) => {
      const base: OperatorJoint = { mode: t.mode, process: t.process, visualControl: t.visualControl, arcVoltageControl: t.arcVoltageControl, jointTracking: t.jointTracking, consumableInserts: t.consumableInserts, backing: t.backing, passesPerSide: t.passesPerSide, form: 'plate', weld: 'groove', position: 'F' }
      return operatorCovers(t, base).answer === 'covered'
    }), { numRuns: 200 })
  })
})
