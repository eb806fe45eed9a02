import { operatorRanges, type OperatorRanges } from '../rules/asme-ix/operator-ranges'
import type { OperatorVariables } from '../schemas/operator'
import type { Form, WeldType } from '../rules/types'

/**
 * What a welding operator's test qualifies, for the screens and the sheet: the ASME IX rules (QW-361) where the test is
 * under ASME IX; for another code Rootface does not compute operator ranges and says so (check by hand), never "covered".
 */
export function operatorRangesOf(test: { code: string, process: string, backing: boolean, form: string, weld: string, positions: string[], operator: OperatorVariables | null }): { ranges: OperatorRanges | null, byHand: string | null } {
  if (!test.operator) return { ranges: null, byHand: 'Cannot tell: record the welding operator\'s variables.' }
  if (test.code !== 'asme-ix') return { ranges: null, byHand: 'Rootface does not compute welding-operator ranges for this code: check by hand against the code\'s welding operator table.' }
  try {
    return { ranges: operatorRanges({ ...test.operator, process: test.process, backing: test.backing, form: test.form as Form, weld: test.weld as WeldType, positions: test.positions }), byHand: null }
  }
  catch (error) {
    return { ranges: null, byHand: `Cannot tell: ${(error as Error).message}` }
  }
}
