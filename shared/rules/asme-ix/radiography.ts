import type { RadiographyInput } from '../inputs'
import type { RadiographyResult } from '../results'
import type { Reason, RuleContext } from '../types'
import { formatLength, pick, scale, toMicro } from '../units'
import { asme } from './limits'
import { isShortCircuit } from './processes'

/** QW-191.1.2.2: radiographic acceptance for welder and welding operator tests. */
export function radiography(input: RadiographyInput, context: RuleContext): RadiographyResult {
  const u = context.unit
  const f = (m: number) => formatLength(m, u)
  const t = toMicro(input.thickness)
  const reasons: Reason[] = []
  const rejectWith = (reason: string, clause: string): RadiographyResult => {
    reasons.push({ clause, text: reason, basis: 'verified' })
    return { accepted: false, reason, chartCheckRequired: false, reasons }
  }

  if (input.process !== undefined && isShortCircuit(input.process, input.transfer)) {
    // QW-304: a GMAW-S welder cannot be qualified by radiography; bend tests are required.
    return rejectWith('Short-circuit GMAW: a welder cannot be qualified by radiography; bend tests are required.', 'QW-304')
  }

  // Linear indications: (a) any crack or zone of incomplete fusion or penetration.
  const planar = input.indications.find(i => i.kind === 'crack' || i.kind === 'incomplete-fusion' || i.kind === 'incomplete-penetration')
  if (planar) {
    const words = planar.kind.replace('-', ' ')
    return rejectWith(`${/^[aeiou]/.test(words) ? 'An' : 'A'} ${words} indication rejects the weld.`, 'QW-191.1.2.2(b)(1)')
  }

  // (b) elongated slag: 1/8 in (3 mm) for t up to 3/8 in (10 mm); t/3 up to 2-1/4 in (57 mm); 3/4 in (19 mm) over that.
  const slagLimitText = t <= pick(asme.t3_8, u)
    ? f(pick(asme.t1_8, u))
    : t <= pick(asme.t2_1_4, u) ? `t/3 = ${f(scale(t, 1, 3))}` : f(pick(asme.t3_4, u))
  const slagTooLong = (length: number) => {
    if (t <= pick(asme.t3_8, u)) return length > pick(asme.t1_8, u)
    if (t <= pick(asme.t2_1_4, u)) return 3 * length > t
    return length > pick(asme.t3_4, u)
  }
  const slag = input.indications.filter(i => i.kind === 'slag')
  const longSlag = slag.find(i => slagTooLong(toMicro(i.length)))
  if (longSlag) return rejectWith(`An elongated slag inclusion of ${f(toMicro(longSlag.length))} is longer than ${slagLimitText} for t = ${f(t)}.`, 'QW-191.1.2.2(b)(2)')
  reasons.push({ clause: 'QW-191.1.2.2(b)(2)', text: `Elongated slag up to ${slagLimitText} for t = ${f(t)}: ${slag.length === 0 ? 'none recorded' : 'every inclusion is within it'}.`, basis: 'verified' })
  if (slag.length > 1) {
    reasons.push({ clause: 'QW-191.1.2.2(b)(3)', text: 'Slag inclusions in line must not total more than t in a length of 12t unless the gaps exceed 6L: judge their spacing on the film.', basis: 'verified' })
  }

  // Rounded indications: largest 20% of t or 1/8 in (3 mm), whichever is smaller; under 1/32 in (0.8 mm) not counted.
  const rounded = input.indications.filter(i => i.kind === 'rounded' && toMicro(i.length) >= pick(asme.t1_32, u))
  const largest = Math.min(scale(t, 1, 5), pick(asme.t1_8, u))
  const big = rounded.find(i => toMicro(i.length) > largest)
  if (big) return rejectWith(`A rounded indication of ${f(toMicro(big.length))} is larger than ${f(largest)} (20% of t or ${f(pick(asme.t1_8, u))}, whichever is smaller).`, 'QW-191.1.2.2(b)(4)')
  // Every counted indication (1/32 in and over) is larger than 20% of t when t is under 5/32 in, so the
  // count limit for t under 1/8 in (12 per 6 in of weld) can never be the deciding rule once sizes pass.
  const chartCheckRequired = rounded.length > 0
  if (chartCheckRequired) {
    reasons.push({ clause: 'Figure QW-191.1.2.2(b)(4)', text: `Rounded indications on t of ${f(pick(asme.t1_8, u))} and over must also be judged against the charts: not computed here.`, basis: 'verified' })
  }
  reasons.push({ clause: 'QW-191.1.2.2(b)(4)', text: `Rounded indications up to ${f(largest)}; under ${f(pick(asme.t1_32, u))} not counted.`, basis: 'verified' })
  const reason = chartCheckRequired
    ? 'No indication exceeds the QW-191.1.2.2 limits; confirm the rounded indications on the charts.'
    : 'No indication exceeds the QW-191.1.2.2 limits.'
  return { accepted: true, reason, chartCheckRequired, reasons }
}
