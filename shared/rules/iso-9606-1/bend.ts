import type { BendInput } from '../inputs'
import type { BendResult, BendSpecimenResult } from '../results'
import type { Reason, RuleContext } from '../types'
import { fromMicro, toMicro } from '../units'

/**
 * ISO 9606-1, 7 (acceptance of test pieces; from memory): a bend specimen shows no single imperfection over 3 mm in any
 * direction; imperfections at the corners during testing are disregarded unless they come from an imperfection of the
 * weld. The imperfection levels of ISO 5817 for the other tests are not judged here: check by hand.
 */
export function bend(input: BendInput, _context: RuleContext): BendResult {
  const limit = toMicro(3)
  const specimens: BendSpecimenResult[] = input.specimens.map((specimen) => {
    const counted = specimen.indications.filter(i => !i.atCorner || i.fromInternalDefect)
    const worst = counted.reduce((max, i) => Math.max(max, toMicro(i.size)), 0)
    if (worst > limit) return { accepted: false, reason: `${specimen.type} bend: an imperfection of ${fromMicro(worst)} mm exceeds 3 mm.` }
    return { accepted: true, reason: counted.length ? `${specimen.type} bend: largest imperfection ${fromMicro(worst)} mm, not over 3 mm.` : `${specimen.type} bend: no counted imperfection.` }
  })
  const reasons: Reason[] = [
    { clause: 'ISO 9606-1, 7', text: 'No single imperfection over 3 mm in any direction on a bend specimen; corner imperfections count only when they come from the weld.', basis: 'memory' },
    { clause: 'ISO 9606-1, 7 and ISO 5817', text: 'Visual, radiographic and fracture results against ISO 5817 levels are judged by the examiner: check by hand.', basis: 'memory' },
  ]
  return { accepted: specimens.length > 0 && specimens.every(s => s.accepted), specimens, reasons }
}
