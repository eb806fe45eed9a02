import type { SpecimenSetInput } from './inputs'
import type { SpecimenSetResult } from './results'
import type { RuleContext } from './types'
import { countSpecimens, specimensUndetermined } from './specimens'

/** Codes whose specimen table is not carried: the answer is "cannot tell: check by hand", never "complete". */
export function specimensByHand(title: string, clause: string) {
  return (input: SpecimenSetInput, _context: RuleContext): SpecimenSetResult =>
    specimensUndetermined([{ field: 'specimens', needed: `${clause}: the ${title} specimen table is not carried by Rootface: check the specimen set by hand` }],
      [{ clause, text: `The ${title} specimen table is not carried: check the specimen set by hand.`, basis: 'convention' }], countSpecimens(input.specimens))
}
