import type { BendInput } from '../inputs'
import type { BendResult, BendSpecimenResult } from '../results'
import type { RuleContext } from '../types'
import { formatLength, pick, toMicro } from '../units'
import { d11Tables } from './editions'
import { d11 } from './limits'

/**
 * AWS D1.1 guided-bend acceptance (4.9.3.3 in 2015): no discontinuity over 1/8 in (3 mm) on the
 * convex surface; the discontinuities over 1/32 in (1 mm) and up to 1/8 in must not add up to
 * more than 3/8 in (10 mm); a corner crack may reach 1/4 in (6 mm) unless it comes from slag or
 * another fusion-type discontinuity (then 1/8 in applies); a corner crack over 1/4 in with no
 * such evidence: the specimen is disregarded and replaced.
 */
export function bend(input: BendInput, context: RuleContext): BendResult {
  const u = context.unit
  const f = (m: number) => formatLength(m, u)
  const clause = d11Tables(context.edition).bend
  const eighth = pick(d11.t1_8, u)
  const quarter = pick(d11.t1_4, u)
  const small = pick(d11.t1_32, u)
  const sumLimit = pick(d11.t3_8, u)
  const specimens: BendSpecimenResult[] = input.specimens.map((specimen) => {
    const name = `${specimen.type} bend`
    const corners = specimen.indications.filter(i => i.atCorner && !i.fromInternalDefect).map(i => toMicro(i.size))
    const surface = specimen.indications.filter(i => !i.atCorner || i.fromInternalDefect).map(i => toMicro(i.size))
    const bigCorner = corners.find(size => size > quarter)
    const worst = surface.reduce((max, size) => Math.max(max, size), 0)
    if (worst > eighth) return { accepted: false, reason: `${name}: a discontinuity of ${f(worst)} exceeds ${f(eighth)}.` }
    const sum = surface.filter(size => size > small).reduce((total, size) => total + size, 0)
    if (sum > sumLimit) return { accepted: false, reason: `${name}: discontinuities over ${f(small)} add up to ${f(sum)}, more than ${f(sumLimit)}.` }
    if (bigCorner !== undefined) {
      return { accepted: false, replace: true, reason: `${name}: a corner crack of ${f(bigCorner)} exceeds ${f(quarter)} with no evidence of slag or lack of fusion: disregard the specimen and test a replacement.` }
    }
    return { accepted: true, reason: `${name}: largest ${f(worst)}, sum ${f(sum)}${corners.length > 0 ? `, corner cracks up to ${f(Math.max(...corners))}` : ''}: within the limits.` }
  })
  const accepted = specimens.length > 0 && specimens.every(s => s.accepted)
  return {
    accepted,
    specimens,
    reasons: [
      { clause, text: `No discontinuity over ${f(eighth)}; those over ${f(small)} up to ${f(eighth)} total at most ${f(sumLimit)}; corner cracks up to ${f(quarter)} unless from slag or a fusion-type discontinuity.`, basis: u === 'in' ? 'verified' : 'partial' },
    ],
  }
}
