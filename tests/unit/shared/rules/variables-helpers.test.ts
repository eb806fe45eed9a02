import { describe, expect, it } from 'vitest'
import { continuity } from '../../../../shared/rules/continuity-lapse'
import { answerOf, categorical, reason, recordOf, undeterminedOf } from '../../../../shared/rules/variables'

// The shared helpers every code's coverage answer goes through. The rule is Rootface's own (never a false yes): one
// finding not met → not covered; otherwise one not recorded or not checked → cannot tell; only all met → covered.
// Backing as the example variable: ASME BPVC IX QW-402.4 (from memory): a test without backing qualifies both.
const met = reason('met', 'a', 'c1', 'ok', 'verified')
const unmet = reason('not-met', 'b', 'c2', 'no', 'verified')
const unknown = (record: string) => reason('not-recorded', 'c', 'c3', 'record it', 'memory', { record })
const backing = (test: boolean | undefined, production: boolean | undefined, process?: string) => categorical({
  variable: 'backing', clause: 'QW-402.4', basis: 'memory', field: 'backing', test, production, ...(process ? { process } : {}),
  qualifies: (a, b) => !a || b, qualifiesAll: a => !a, qualifiedByAll: b => b, show: v => (v ? 'with backing' : 'without backing'),
})

describe('answers from findings', () => {
  it('not met wins, then not recorded or not checked, then covered; a finding with no state counts by met', () => {
    expect(answerOf([met, unknown('x'), unmet])).toBe('not-covered')
    expect(answerOf([met, { met: false, variable: 'old', clause: 'c', text: 't', basis: 'memory' }])).toBe('not-covered')
    expect(answerOf([met, unknown('x')])).toBe('cannot-tell')
    expect(answerOf([met, reason('not-checked', 'd', 'c4', 'check by hand', 'memory')])).toBe('cannot-tell')
    expect(answerOf([met, { met: true, variable: 'old', clause: 'c', text: 't', basis: 'memory' }])).toBe('covered')
  })
  it('lists each field to record once, only from findings not recorded', () => {
    const withRecord = { ...met, record: 'test.x' }
    expect(recordOf([unknown('test.a'), withRecord, unknown('test.a'), unknown('production.b'), reason('not-recorded', 'e', 'c5', 'no field', 'memory')])).toEqual(['test.a', 'production.b'])
    expect(undeterminedOf([unknown('test.a'), withRecord, unknown('test.a'), unknown('production.b')])).toEqual([
      { field: 'test.a', needed: 'c3: record it' },
      { field: 'production.b', needed: 'c3: record it' },
    ])
    expect(undeterminedOf([met, unmet])).toEqual([])
  })
})

describe('a variable compared both ways (categorical)', () => {
  it('both stated: met or not, with both values in the words; the process is kept only when given', () => {
    expect(backing(false, true)).toEqual({ met: true, state: 'met', variable: 'backing', clause: 'QW-402.4', basis: 'memory', text: 'Production with backing: qualified by the test (without backing).' })
    expect(backing(true, false, 'SMAW')).toEqual({ met: false, state: 'not-met', variable: 'backing', clause: 'QW-402.4', basis: 'memory', process: 'SMAW', text: 'Production without backing: the test (with backing) does not qualify it.' })
  })
  it('one side unstated: met when the other qualifies every value or is qualified by any; otherwise record it', () => {
    expect(backing(undefined, true)).toMatchObject({ state: 'met', text: 'Production with backing: qualified by any test.' })
    expect(backing(undefined, false)).toMatchObject({ state: 'not-recorded', record: 'test.backing', text: 'Production is without backing; the test did not record its backing: cannot tell, record it.' })
    expect(backing(false, undefined)).toMatchObject({ state: 'met', text: 'The test (without backing) qualifies every backing.' })
    expect(backing(true, undefined)).toMatchObject({ state: 'not-recorded', record: 'production.backing' })
    expect(backing(undefined, undefined)).toBeNull()
  })
})

describe('continuity refusals name the field', () => {
  it('lastUse and on are named in the refusal', () => {
    const rule = { clause: 'x', ruleText: 'y', basis: 'verified' as const, convention: 'lapses-on-anniversary' as const }
    expect(() => continuity({ lastUse: '2026-02-30', on: '2026-03-01' }, rule)).toThrow('lastUse: 2026-02-30 is not a calendar date')
    expect(() => continuity({ lastUse: '2026-02-01', on: '2026-03-32' }, rule)).toThrow('on: 2026-03-32 is not a calendar date')
  })
})
