import { evaluate } from '../rules'
import type { BendResult, RadiographyResult, SpecimenSetResult, WelderRangesResult } from '../rules/results'
import type { CodeId, Reason, Unit } from '../rules/types'
import { bendAcceptance, type BendRecord } from './bend-acceptance'
import { qualifiedRangesOf, specimenSetOf, type WelderTestVariables } from './test-ranges'

export type Outcome = 'pending' | 'passed' | 'failed'

export interface OutcomeStep {
  step: 'visual' | 'bend' | 'radiography' | 'macro-fracture'
  state: Outcome
  text: string
  clause: string
}

export interface TestRecord extends WelderTestVariables {
  visualAccepted: boolean | null
  visualNotes?: string | null
  examination: 'bend' | 'radiography' | 'macro-fracture'
  bends: BendRecord[]
  radiography: { indications: { kind: string, length: number }[] } | null
  macro: { accepted: boolean, notes?: string | null } | null
}

export interface TestOutcome {
  outcome: Outcome
  steps: OutcomeStep[]
  /** What the coupon qualifies when it passes (computed whatever the outcome, so the page can explain it). */
  ranges: (WelderRangesResult & { caution: string, reasons: Reason[] }) | null
  rangesError: string | null
  bend: (BendResult & { caution: string }) | null
  radiography: (RadiographyResult & { caution: string }) | null
  /** The specimen set against the code's table (bend examination); incomplete keeps the test pending. */
  specimenSet?: SpecimenSetResult | null
}

const visualClause: Record<CodeId, string> = {
  'asme-ix': 'QW-302.4', 'aws-d1.1': 'Table 6.9 (visual)', 'aws-d1.3': 'visual inspection', 'iso-9606-1': 'ISO 9606-1, 6.4',
}

/**
 * The result of a welder test from its record: visual examination first (a rejected visual ends the test);
 * then the bend specimens, the radiograph or the macro/fracture result, each judged by its code's rule.
 * A test with no judgement yet is pending; the inspector's certification then freezes it.
 */
export function testOutcome(test: TestRecord): TestOutcome {
  const steps: OutcomeStep[] = []
  const rangesResult = qualifiedRangesOf(test)
  const ranges = 'error' in rangesResult ? null : rangesResult as unknown as TestOutcome['ranges']
  const rangesError = 'error' in rangesResult ? String(rangesResult.error) : null
  const done = (outcome: Outcome, extra: Partial<TestOutcome> = {}): TestOutcome =>
    ({ outcome, steps, ranges, rangesError, bend: null, radiography: null, ...extra })

  const vClause = visualClause[test.code]
  if (test.visualAccepted === null) {
    steps.push({ step: 'visual', state: 'pending', text: 'Visual examination not recorded yet; it comes before any mechanical test.', clause: vClause })
    return done('pending')
  }
  if (!test.visualAccepted) {
    steps.push({ step: 'visual', state: 'failed', text: `Visual examination rejected${test.visualNotes ? `: ${test.visualNotes}` : ''}. No mechanical test is needed.`, clause: vClause })
    return done('failed')
  }
  steps.push({ step: 'visual', state: 'passed', text: `Visual examination accepted${test.visualNotes ? ` (${test.visualNotes})` : ''}.`, clause: vClause })

  if (test.examination === 'bend') return bendStep(test, steps, ranges, done)
  if (test.examination === 'radiography') return radiographyStep(test, steps, done)
  if (!test.macro) {
    steps.push({ step: 'macro-fracture', state: 'pending', text: 'Macro-etch or fracture result not recorded yet.', clause: test.code === 'asme-ix' ? 'QW-181, QW-182, QW-184' : 'macro / fracture test' })
    return done('pending')
  }
  steps.push({
    step: 'macro-fracture', state: test.macro.accepted ? 'passed' : 'failed', clause: test.code === 'asme-ix' ? 'QW-181, QW-182, QW-184' : 'macro / fracture test',
    text: `${test.macro.accepted ? 'Accepted' : 'Rejected'} by the inspector${test.macro.notes ? `: ${test.macro.notes}` : ''}.`,
  })
  return done(test.macro.accepted ? 'passed' : 'failed')
}

function bendStep(test: TestRecord, steps: OutcomeStep[], ranges: TestOutcome['ranges'], done: (o: Outcome, e?: Partial<TestOutcome>) => TestOutcome) {
  const required = ranges?.bendSpecimens?.total ?? 1
  const clause = test.code === 'asme-ix' ? 'QW-163' : test.code === 'aws-d1.1' ? 'AWS D1.1 bend acceptance' : 'bend acceptance'
  if (!test.bends.length) {
    steps.push({ step: 'bend', state: 'pending', text: `No bend specimen recorded yet; ${required} required.`, clause })
    return done('pending')
  }
  let bend: BendResult & { caution: string }
  try {
    bend = bendAcceptance(test.code, test.unit, test.bends) as BendResult & { caution: string }
  }
  catch (error) {
    steps.push({ step: 'bend', state: 'pending', text: `The rules cannot judge these specimens: ${error instanceof Error ? error.message : String(error)}`, clause })
    return done('pending')
  }
  if (!bend.accepted) {
    const rejected = bend.specimens.filter(s => !s.accepted).length
    steps.push({ step: 'bend', state: 'failed', text: `${rejected} of ${bend.specimens.length} bend specimens rejected; one rejected specimen fails the test.`, clause })
    return done('failed', { bend })
  }
  if (test.bends.length < required) {
    steps.push({ step: 'bend', state: 'pending', text: `${test.bends.length} of ${required} bend specimens recorded; every one so far is acceptable.`, clause })
    return done('pending', { bend })
  }
  const set = specimenSetOf(test, test.bends.map(b => b.type))
  const specimenSet = 'error' in set ? null : set as unknown as SpecimenSetResult
  if (specimenSet?.answer === 'incomplete') {
    const tableClause = specimenSet.reasons[0]?.clause ?? clause
    steps.push({ step: 'bend', state: 'pending', text: `Incomplete: every specimen is acceptable, but the set is not the one the table asks for (${specimenSet.allowed.map(s => Object.entries(s).map(([k, n]) => `${n} ${k}`).join(' + ')).join(', or ')}); missing ${specimenSet.missing.join(', ')}.`, clause: tableClause })
    return done('pending', { bend, specimenSet })
  }
  if (specimenSet === null || specimenSet.answer === 'cannot-tell') {
    const why = specimenSet === null ? String((set as { error: unknown }).error) : specimenSet.undetermined.map(u => u.needed).join('; ')
    steps.push({ step: 'bend', state: 'passed', text: `All ${test.bends.length} bend specimens acceptable. The specimen set is not checked by Rootface here (${why}): the inspector checks it by hand.`, clause })
    return done('passed', { bend, specimenSet })
  }
  steps.push({ step: 'bend', state: 'passed', text: `All ${test.bends.length} bend specimens acceptable; the set (${Object.entries(specimenSet.given).map(([k, n]) => `${n} ${k}`).join(' + ')}) is the one the table asks for.`, clause })
  return done('passed', { bend, specimenSet })
}

function radiographyStep(test: TestRecord, steps: OutcomeStep[], done: (o: Outcome, e?: Partial<TestOutcome>) => TestOutcome) {
  const clause = test.code === 'asme-ix' ? 'QW-191.1.2.2' : 'radiographic acceptance'
  if (test.process.toUpperCase() === 'GMAW' && test.transfer === 'short-circuit') {
    steps.push({ step: 'radiography', state: 'pending', text: 'Short-circuit GMAW is qualified by bend tests, not radiography: record bends instead.', clause: test.code === 'asme-ix' ? 'QW-304' : clause })
    return done('pending')
  }
  if (!test.radiography) {
    steps.push({ step: 'radiography', state: 'pending', text: 'Radiograph not interpreted yet.', clause })
    return done('pending')
  }
  const result = evaluate({
    code: test.code, check: 'radiography', unit: test.unit as Unit, edition: test.edition,
    input: { thickness: test.couponThickness ?? 0, indications: test.radiography.indications, process: test.process, ...(test.transfer ? { transfer: test.transfer } : {}) },
  })
  if ('error' in result) {
    steps.push({ step: 'radiography', state: 'pending', text: `The rules cannot judge this radiograph: ${result.error}`, clause })
    return done('pending')
  }
  const radiography = result as unknown as RadiographyResult & { caution: string }
  const chart = radiography.chartCheckRequired ? ' Rounded indications must also be judged on the charts.' : ''
  steps.push({ step: 'radiography', state: radiography.accepted ? 'passed' : 'failed', text: `${radiography.reason}${chart}`, clause })
  return done(radiography.accepted ? 'passed' : 'failed', { radiography })
}
