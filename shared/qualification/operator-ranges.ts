import { operatorRanges, type OperatorRanges } from '../rules/asme-ix/operator-ranges'
import { d11OperatorRanges, type D11OperatorRanges } from '../rules/aws-d1.1/operator-ranges'
import type { OperatorVariables } from '../schemas/operator'
import type { Form, WeldType } from '../rules/types'

/** Said wherever an ISO 9606-1 record is marked as a welding operator's: operators are qualified under another standard. */
export const isoOperatorByHand = 'Welding operators are qualified under ISO 14732, not ISO 9606-1: Rootface does not compute their ranges. Check by hand against ISO 14732.'

/**
 * What a welding operator's test qualifies, for the screens and the sheet: ASME IX (QW-361) and AWS D1.1 (plate
 * positions, process, backing, progression, electrodes; thickness by hand) where the test is under one of them; for
 * another code Rootface does not compute operator ranges and says so (check by hand), never "covered".
 */
export function operatorRangesOf(test: { code: string, edition?: string, process: string, backing: boolean, form: string, weld: string, positions: string[], progression?: string | null, operator: OperatorVariables | null }): { ranges: OperatorRanges | D11OperatorRanges | null, byHand: string | null } {
  if (test.code === 'iso-9606-1') return { ranges: null, byHand: isoOperatorByHand }
  if (!test.operator) return { ranges: null, byHand: 'Cannot tell: record the welding operator\'s variables.' }
  try {
    if (test.code === 'aws-d1.1') {
      const progression = test.progression === 'uphill' || test.progression === 'downhill' ? test.progression : null
      const ranges = d11OperatorRanges({ edition: test.edition, process: test.process, backing: test.backing, form: test.form as Form, weld: test.weld as WeldType, positions: test.positions, progression })
      return { ranges, byHand: ranges.byHand.join(' ') }
    }
    if (test.code !== 'asme-ix') return { ranges: null, byHand: 'Rootface does not compute welding-operator ranges for this code: check by hand against the code\'s welding operator table.' }
    return { ranges: operatorRanges({ ...test.operator, process: test.process, backing: test.backing, form: test.form as Form, weld: test.weld as WeldType, positions: test.positions }), byHand: null }
  }
  catch (error) {
    return { ranges: null, byHand: `Cannot tell: ${(error as Error).message}` }
  }
}
