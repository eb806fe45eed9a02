import type { ToughnessInput } from './inputs'
import type { CoverReason, ToughnessResult } from './results'
import type { RuleContext } from './types'
import { answerOf, reason, undeterminedOf } from './variables'

/**
 * Charpy V-notch results of a PQR judged against the acceptance values the user entered from the
 * construction code (ASME IX QW-171 says how the test is made; the values come from the
 * construction code, not from Section IX). Energy in ft·lbf ("in") or J ("mm"); lateral expansion
 * in mils ("in") or mm ("mm"); temperatures in °F or °C.
 */
export function toughness(input: ToughnessInput, context: RuleContext): ToughnessResult {
  const energyUnit = context.unit === 'in' ? 'ft·lbf' : 'J'
  const leUnit = context.unit === 'in' ? 'mils' : 'mm'
  const degrees = context.unit === 'in' ? '°F' : '°C'
  const clause = context.code === 'asme-ix' ? 'QW-171, construction code' : 'construction code (impact test acceptance)'
  const energies = input.specimens.map(s => s.energy)
  const average = energies.reduce((a, e) => a + e, 0) / energies.length
  const minimum = Math.min(...energies)
  const expansions = input.specimens.map(s => s.lateralExpansion)
  const recorded = expansions.filter((e): e is number => e !== undefined)
  const minLe = recorded.length ? Math.min(...recorded) : null
  const a = input.acceptance
  const reasons: CoverReason[] = []
  if (a.averageEnergy === undefined && a.singleEnergy === undefined && a.lateralExpansion === undefined) {
    reasons.push(reason('not-recorded', 'acceptance', clause, 'No acceptance value was entered: enter the construction code\'s minimum energy (average and single) or lateral expansion.', 'convention', { record: 'acceptance.averageEnergy' }))
  }
  if (a.averageEnergy !== undefined) {
    const ok = average >= a.averageEnergy
    reasons.push(reason(ok ? 'met' : 'not-met', 'average-energy', clause, `Average energy ${round(average)} ${energyUnit} of ${energies.length} specimens: at least ${a.averageEnergy} ${energyUnit} required.`, 'convention'))
  }
  if (a.singleEnergy !== undefined) {
    const ok = minimum >= a.singleEnergy
    reasons.push(reason(ok ? 'met' : 'not-met', 'single-energy', clause, `Lowest single energy ${minimum} ${energyUnit}: at least ${a.singleEnergy} ${energyUnit} required.`, 'convention'))
  }
  if (a.lateralExpansion !== undefined) {
    if (recorded.length < expansions.length) {
      reasons.push(reason('not-recorded', 'lateral-expansion', clause, `Lateral expansion is required (at least ${a.lateralExpansion} ${leUnit}) but ${expansions.length - recorded.length} specimen(s) have none recorded.`, 'convention', { record: 'specimens[].lateralExpansion' }))
    }
    else {
      const ok = (minLe ?? 0) >= a.lateralExpansion
      reasons.push(reason(ok ? 'met' : 'not-met', 'lateral-expansion', clause, `Lowest lateral expansion ${minLe} ${leUnit}: at least ${a.lateralExpansion} ${leUnit} required.`, 'convention'))
    }
  }
  if (a.temperatureMax !== undefined) {
    if (input.temperature === undefined) reasons.push(reason('not-recorded', 'temperature', clause, `The test temperature was not recorded (at most ${a.temperatureMax} ${degrees} required).`, 'convention', { record: 'temperature' }))
    else {
      const ok = input.temperature <= a.temperatureMax
      reasons.push(reason(ok ? 'met' : 'not-met', 'temperature', clause, `Tested at ${input.temperature} ${degrees}: at most ${a.temperatureMax} ${degrees} required.`, 'convention'))
    }
  }
  const answer = answerOf(reasons)
  const mapped = answer === 'covered' ? 'accepted' : answer === 'not-covered' ? 'rejected' : 'cannot-tell'
  return { answer: mapped, accepted: mapped === 'accepted', averageEnergy: round(average), minimumEnergy: minimum, minimumLateralExpansion: minLe, undetermined: undeterminedOf(reasons), reasons }
}

function round(v: number): number {
  return Math.round(v * 1000) / 1000
}
