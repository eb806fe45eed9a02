import type { BendInput } from '../inputs'
import type { BendResult, BendSpecimenResult } from '../results'
import type { Reason, RuleContext } from '../types'
import { formatLength, pick, toMicro } from '../units'
import { asme } from './limits'

/**
 * QW-163 guided-bend acceptance: no open discontinuity in the weld or heat-affected zone may
 * exceed 1/8 in (3 mm) in any direction on the convex surface (exactly 1/8 in passes). Open
 * discontinuities at the corners are not counted unless there is definite evidence that they
 * come from lack of fusion, slag or other internal discontinuities. The limit is the one printed
 * for the unit: 3.1 mm passes in inches (1/8 in = 3.175 mm) and fails in SI (3 mm).
 */
export function bend(input: BendInput, context: RuleContext): BendResult {
  const u = context.unit
  const limit = pick(asme.t1_8, u)
  const f = (m: number) => formatLength(m, u)
  const specimens: BendSpecimenResult[] = input.specimens.map((specimen) => {
    const counted = specimen.indications.filter(i => !i.atCorner || i.fromInternalDefect)
    const worst = counted.reduce((max, i) => Math.max(max, toMicro(i.size)), 0)
    const ignored = specimen.indications.length - counted.length
    const corner = ignored > 0 ? ` ${ignored} corner indication${ignored > 1 ? 's' : ''} with no sign of an internal discontinuity not counted.` : ''
    if (worst > limit) {
      return { accepted: false, reason: `${specimen.type} bend: an open discontinuity of ${f(worst)} exceeds ${f(limit)}.${corner}` }
    }
    return { accepted: true, reason: counted.length === 0
      ? `${specimen.type} bend: no counted open discontinuity.${corner}`
      : `${specimen.type} bend: largest open discontinuity ${f(worst)}, not over ${f(limit)}.${corner}` }
  })
  const accepted = specimens.length > 0 && specimens.every(s => s.accepted)
  const reasons: Reason[] = [
    { clause: 'QW-163', text: `No open discontinuity over ${f(limit)} in any direction on the convex surface; corner discontinuities count only when they come from lack of fusion, slag or another internal discontinuity.`, basis: 'verified' },
    { clause: 'QW-163', text: 'The weld and heat-affected zone must lie wholly within the bent portion: confirm on the specimens.', basis: 'verified' },
  ]
  return { accepted, specimens, reasons }
}
