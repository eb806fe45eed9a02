import { describe, expect, it } from 'vitest'
import { ok } from './helpers'
import { union } from '../../../../shared/rules/pqr-pool'
import { matchSpecimens } from '../../../../shared/rules/specimens'
import { toughness } from '../../../../shared/rules/toughness'

// Charpy results judged against the acceptance values the user enters: ASME IX QW-171 says how the test is made, the
// construction code gives the values (from memory); the average, the lowest single value and the comparisons "at least"
// and "at most" are common practice. Arithmetic checked by hand. Sentences are Rootface's.
type Row = { variable: string, state: string, clause: string, text: string, record?: string }
const judge = (input: unknown, code = 'asme-ix', unit: 'in' | 'mm' = 'in') => ok({ code, check: 'toughness', unit, input })
const rows = (r: Record<string, unknown>) => (r.reasons as Row[]).map(x => [x.variable, x.state, x.clause, x.text, x.record ?? ''])
const three = [{ energy: 25, lateralExpansion: 18 }, { energy: 16, lateralExpansion: 16 }, { energy: 22, lateralExpansion: 14 }] // average 21

describe('Charpy toughness against the values entered (QW-171, construction code)', () => {
  it('a whole accepted answer in inch units: every value at its limit passes', () => {
    const r = judge({ specimens: three, temperature: -20, acceptance: { averageEnergy: 21, singleEnergy: 16, lateralExpansion: 14, temperatureMax: -20 } })
    expect([r.answer, r.accepted, r.averageEnergy, r.minimumEnergy, r.minimumLateralExpansion, r.undetermined]).toEqual(['accepted', true, 21, 16, 14, []])
    expect(rows(r)).toEqual([
      ['average-energy', 'met', 'QW-171, construction code', 'Average energy 21 ft·lbf of 3 specimens: at least 21 ft·lbf required.', ''],
      ['single-energy', 'met', 'QW-171, construction code', 'Lowest single energy 16 ft·lbf: at least 16 ft·lbf required.', ''],
      ['lateral-expansion', 'met', 'QW-171, construction code', 'Lowest lateral expansion 14 mils: at least 14 mils required.', ''],
      ['temperature', 'met', 'QW-171, construction code', 'Tested at -20 °F: at most -20 °F required.', ''],
    ])
  })
  it('just above each limit it is rejected, each row on its own', () => {
    const r = judge({ specimens: three, temperature: -19, acceptance: { averageEnergy: 21.1, singleEnergy: 16.1, lateralExpansion: 14.1, temperatureMax: -20 } })
    expect([r.answer, r.accepted]).toEqual(['rejected', false])
    expect(rows(r).map(x => [x[0], x[1]])).toEqual([['average-energy', 'not-met'], ['single-energy', 'not-met'], ['lateral-expansion', 'not-met'], ['temperature', 'not-met']])
  })
  it('metric units and another code: J, mm, °C and the construction code named alone; the average rounded to 3 places', () => {
    // Only the ASME IX rules offer this check today; the function itself words other codes and SI units.
    const r = toughness({ specimens: [{ energy: 27 }, { energy: 27 }, { energy: 28 }], temperature: 0, acceptance: { averageEnergy: 27, temperatureMax: 0 } }, { code: 'aws-d1.1', edition: '2020', unit: 'mm' }) as unknown as Record<string, unknown>
    expect(r.averageEnergy).toBe(27.333)
    expect(rows(r)).toEqual([
      ['average-energy', 'met', 'construction code (impact test acceptance)', 'Average energy 27.333 J of 3 specimens: at least 27 J required.', ''],
      ['temperature', 'met', 'construction code (impact test acceptance)', 'Tested at 0 °C: at most 0 °C required.', ''],
    ])
    const le = judge({ specimens: [{ energy: 30, lateralExpansion: 0.38 }], acceptance: { lateralExpansion: 0.38 } }, 'asme-ix', 'mm')
    expect(rows(le)[0]![3]).toBe('Lowest lateral expansion 0.38 mm: at least 0.38 mm required.')
  })
  it('gaps: no acceptance value, a specimen without lateral expansion, no test temperature: cannot tell, with what to record', () => {
    const none = judge({ specimens: three, acceptance: {} })
    expect([none.answer, none.accepted]).toEqual(['cannot-tell', false])
    expect(rows(none)).toEqual([['acceptance', 'not-recorded', 'QW-171, construction code', 'No acceptance value was entered: enter the construction code\'s minimum energy (average and single) or lateral expansion.', 'acceptance.averageEnergy']])
    const gaps = judge({ specimens: [...three, { energy: 30 }, { energy: 31 }], acceptance: { lateralExpansion: 10, temperatureMax: -20 } })
    expect(rows(gaps)).toEqual([
      ['lateral-expansion', 'not-recorded', 'QW-171, construction code', 'Lateral expansion is required (at least 10 mils) but 2 specimen(s) have none recorded.', 'specimens[].lateralExpansion'],
      ['temperature', 'not-recorded', 'QW-171, construction code', 'The test temperature was not recorded (at most -20 °F required).', 'temperature'],
    ])
    expect(gaps.undetermined).toEqual([
      { field: 'specimens[].lateralExpansion', needed: 'QW-171, construction code: Lateral expansion is required (at least 10 mils) but 2 specimen(s) have none recorded.' },
      { field: 'temperature', needed: 'QW-171, construction code: The test temperature was not recorded (at most -20 °F required).' },
    ])
    expect(gaps.minimumLateralExpansion).toBe(14)
    expect(judge({ specimens: [{ energy: 30 }], acceptance: { singleEnergy: 20 } }).minimumLateralExpansion).toBeNull()
  })
  it('a rejected row wins over a gap', () => {
    expect(judge({ specimens: three, acceptance: { averageEnergy: 30, temperatureMax: 0 } }).answer).toBe('rejected')
  })
})

// Codes whose specimen table Rootface does not carry answer "cannot tell: check by hand" (never a guessed "complete").
describe('specimen sets of AWS D1.3 and ISO 9606-1: check by hand', () => {
  it.each([
    ['aws-d1.3', 'AWS D1.3', 'D1.3 4.7'],
    ['iso-9606-1', 'ISO 9606-1', 'ISO 9606-1, 6.4'],
  ])('%s', (code, title, clause) => {
    const test = { process: code === 'iso-9606-1' ? '111' : 'GMAW', form: 'plate', weld: 'fillet', testPositions: [code === 'iso-9606-1' ? 'PB' : '2F'], couponThickness: 0.0747 }
    const r = ok({ code, check: 'specimens', unit: code === 'iso-9606-1' ? 'mm' : 'in', input: { test, specimens: [{ type: 'face' }, { type: 'root' }, { type: 'face' }] } })
    expect(r).toMatchObject({ answer: 'cannot-tell', complete: false, allowed: [], given: { face: 2, root: 1 }, missing: [] })
    expect(r.undetermined).toEqual([{ field: 'specimens', needed: `${clause}: the ${title} specimen table is not carried by Rootface: check the specimen set by hand` }])
    expect(r.reasons).toEqual([{ clause, text: `The ${title} specimen table is not carried: check the specimen set by hand.`, basis: 'convention' }])
  })
})

describe('matching a specimen set (common practice: each type of a set in at least its number)', () => {
  it('the nearest set is the one missing fewest specimens; the reason keeps the first reason\'s clause and basis', () => {
    const r = matchSpecimens([{ side: 4 }, { face: 2, root: 2 }], [{ type: 'face' }, { type: 'root' }, { type: 'root' }], [{ clause: 'X-1', text: 'table', basis: 'verified' }])
    expect(r).toMatchObject({ answer: 'incomplete', complete: false, missing: ['1 face'], given: { face: 1, root: 2 } })
    expect(r.reasons[1]).toEqual({ clause: 'X-1', text: 'Incomplete: the table asks for 4 side, or 2 face + 2 root; given 1 face + 2 root (missing 1 face).', basis: 'verified' })
  })
  it('the first of two equally near sets is named; an empty set given reads "none"', () => {
    const r = matchSpecimens([{ macro: 1, fracture: 1 }, { face: 1, root: 1 }], [], [])
    expect(r.missing).toEqual(['1 macro', '1 fracture'])
    expect(r.reasons).toEqual([{ clause: 'specimens', text: 'Incomplete: the table asks for 1 macro + 1 fracture, or 1 face + 1 root; given none (missing 1 macro, 1 fracture).', basis: 'memory' }])
  })
  it('more specimens than the set asks still complete it, naming the set reached', () => {
    const r = matchSpecimens([{ side: 2 }, { face: 1, root: 1 }], [{ type: 'face' }, { type: 'root' }, { type: 'side' }], [])
    expect(r).toMatchObject({ answer: 'complete', complete: true, missing: [] })
    expect(r.reasons[0]!.text).toBe('The specimens (1 face + 1 root + 1 side) make the set 1 face + 1 root.')
  })
})

describe('joining the ranges of several PQRs (QW-200.4: ranges that overlap or touch join)', () => {
  it('overlapping and touching intervals join; a gap keeps them apart; order does not matter', () => {
    expect(union([[5, 8], [1, 3], [3, 4], [2, 2.5]])).toEqual([[1, 4], [5, 8]])
    expect(union([[1, 10], [2, 3]])).toEqual([[1, 10]])
    expect(union([[1, 2], [2.0001, 3]])).toEqual([[1, 2], [2.0001, 3]])
    expect(union([])).toEqual([])
  })
})
