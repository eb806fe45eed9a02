import type { SpecimenSetInput } from '../inputs'
import type { SpecimenCountSet, SpecimenSetResult } from '../results'
import type { Reason, RuleContext } from '../types'
import { countSpecimens, matchSpecimens, specimensUndetermined } from '../specimens'
import { pick, toMicro } from '../units'
import { d11Tables } from './editions'
import { d11 } from './limits'
import { welderRanges } from './welder-ranges'

/**
 * Welder test bend specimens: plate Table 6.11 (4.11 in 2015; 3/8 in: 1 face + 1 root or 2 side,
 * from memory with the side-for-face-and-root substitution at 10 mm read in the 2010 metric footnote;
 * over 3/8 in: 2 side) and pipe Table 10.13 (read). Fillet tests are not carried: cannot tell.
 */
export function specimens(input: SpecimenSetInput, context: RuleContext): SpecimenSetResult {
  const tables = d11Tables(context.edition)
  const test = input.test
  const given = countSpecimens(input.specimens)
  const reasons: Reason[] = []
  if (test.weld === 'fillet') {
    reasons.push({ clause: tables.plateThickness, text: 'The specimens of a D1.1 fillet test are not carried: check them by hand.', basis: 'convention' })
    return specimensUndetermined([{ field: 'test.weld', needed: 'the D1.1 fillet test specimen table (not carried)' }], reasons, given)
  }
  const ranges = welderRanges(test, context)
  const count = ranges.bendSpecimens
  if (!count) return specimensUndetermined(ranges.undetermined ?? [{ field: 'test', needed: 'the coupon size and thickness' }], reasons, given)
  const clause = test.form === 'plate' ? tables.plateThickness : tables.pipeRanges
  const atThreeEighths = test.couponThickness !== undefined && toMicro(test.couponThickness) === pick(d11.t3_8, context.unit)
  const allowed: SpecimenCountSet[] = count.side > 0
    ? [{ side: count.side }]
    : atThreeEighths ? [{ face: count.face, root: count.root }, { side: count.total }] : [{ face: count.face, root: count.root }]
  reasons.push({ clause, text: `Bends required: ${count.side > 0 ? `${count.side} side` : `${count.face} face and ${count.root} root${atThreeEighths ? ` (or ${count.total} side at 3/8 in)` : ''}`}.`, basis: test.form === 'plate' ? 'memory' : 'verified' })
  return matchSpecimens(allowed, input.specimens, reasons)
}
