import { operatorRangesOf } from '#shared/qualification/operator-ranges'
import { operatorWords, type OperatorVariables } from '#shared/schemas/operator'
import type { SheetBlock } from './model'
import { reasonsBlock } from './common'
import { yesNo } from './format'

/**
 * The WPQ's part for a welding operator (ASME IX QW-360, QW-361; a form such as QW-484B): the operator's variables as
 * tested and what they qualify. Nothing for a welder's test, so welder sheets print as before.
 */
export function operatorBlocks(t: { code: string, process: string, backing: boolean, form: string, weld: string, positions: string[], qualifiedAs: string, operator: unknown }): SheetBlock[] {
  if (t.qualifiedAs !== 'welding-operator') return []
  const v = t.operator as OperatorVariables | null
  const result = operatorRangesOf({ ...t, operator: v })
  const variables: SheetBlock = {
    heading: 'Welding operator (machine or automatic welding)', clause: t.code === 'asme-ix' ? 'QW-361' : t.code === 'aws-d1.1' ? 'AWS D1.1 Clause 6' : undefined,
    fields: v
      ? [
          { label: 'Welding', value: operatorWords.mode[v.mode] },
          { label: 'Visual control', value: operatorWords.visualControl[v.visualControl] },
          { label: 'Automatic arc voltage control', value: yesNo(v.arcVoltageControl, 'yes', 'no') },
          { label: 'Automatic joint tracking', value: yesNo(v.jointTracking, 'yes', 'no') },
          { label: 'Consumable inserts', value: yesNo(v.consumableInserts, 'yes', 'no') },
          { label: 'Passes per side', value: operatorWords.passesPerSide[v.passesPerSide] },
        ]
      : [{ label: 'Operator variables', value: 'not recorded' }],
  }
  return [variables, result.ranges
    ? reasonsBlock('Qualified as a welding operator', result.ranges.reasons, t.code === 'asme-ix' ? 'QW-361' : 'AWS D1.1 Clause 6')
    : { heading: 'Qualified as a welding operator', fields: [{ label: 'Ranges', value: result.byHand ?? 'check by hand' }] }]
}
