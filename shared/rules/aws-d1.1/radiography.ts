import type { RadiographyInput } from '../inputs'
import type { RadiographyResult } from '../results'
import type { Reason, RuleContext } from '../types'
import { refuse } from '../refusal'
import { clause4 } from './editions'

/**
 * AWS D1.1 radiography in place of guided bends for a welder or welding operator test coupon (4.31.3 in 2015, from
 * memory; Clause 6 from 2020): not for GMAW short-circuit (read on a public summary of Table 6.11). A crack, incomplete
 * fusion or incomplete penetration rejects the weld. Slag and porosity are judged on the code's discontinuity figures
 * (the cyclically loaded nontubular limits, from memory), which Rootface does not carry: such a film is refused here,
 * so the test stays open until the inspector judges it by hand, never accepted by the program.
 */
export function radiography(input: RadiographyInput, context: RuleContext): RadiographyResult {
  const clause = clause4(context.edition) ? '4.31.3' : 'Clause 6 RT acceptance (4.31.3 in 2015)'
  const reasons: Reason[] = []
  if (input.process?.toUpperCase() === 'GMAW' && input.transfer === 'short-circuit') {
    const reason = 'GMAW short-circuit: radiography may not replace the bend tests; record bends instead.'
    reasons.push({ clause, text: reason, basis: 'partial' })
    return { accepted: false, reason, chartCheckRequired: false, reasons }
  }
  const planar = input.indications.find(i => i.kind === 'crack' || i.kind === 'incomplete-fusion' || i.kind === 'incomplete-penetration')
  if (planar) {
    const reason = `A ${planar.kind.replace('-', ' ')} indication rejects the weld.`
    reasons.push({ clause, text: reason, basis: 'memory' })
    return { accepted: false, reason, chartCheckRequired: false, reasons }
  }
  const others = input.indications.filter(i => i.kind === 'slag' || i.kind === 'rounded')
  if (others.length) {
    refuse(`${clause}: slag and porosity on a D1.1 film are judged on the code's discontinuity figures, which Rootface does not carry: judge the ${others.length} indication${others.length === 1 ? '' : 's'} by hand`)
  }
  const reason = 'No crack, incomplete fusion, incomplete penetration, slag or porosity recorded on the film: acceptable.'
  reasons.push({ clause, text: reason, basis: 'memory' })
  return { accepted: true, reason, chartCheckRequired: false, reasons }
}
