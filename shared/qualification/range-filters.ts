import { convertLength, pick, toMicro } from '../rules/units'
import type { CodeId, Unit } from '../rules/types'
import { asme } from '../rules/asme-ix/limits'
import { asmeProcess } from '../rules/asme-ix/processes'
import { listsVariable } from '../rules/asme-ix/variables'
import { jointPositions } from '../schemas/coverage'
import type { ResolvedJoint } from './joint-coverage'

/** A column of qualified_ranges that a drop condition reads. */
export type RangeColumn = 'weld' | 'positions_groove' | 'positions_groove_pipe' | 'positions_fillet' | 'deposit_max_micro' | 'thickness_min_micro'
  | 'thickness_max_micro' | 'diameter_min_micro' | 'f_numbers' | 'backing' | 'transfer' | 'progression'

/**
 * One reason a stored test cannot cover the joint: the covers rule of its code finds that variable not met. A row is dropped
 * only when the column is stated (not null) and the comparison holds; `unit` limits the condition to tests recorded in
 * that unit (the joint's lengths are converted to it exactly as the rules convert them), `weld` to tests of that kind.
 * - `always`: every test of the code (the joint is welded to another code)
 * - `lacks`: the column (a list) does not hold every value
 * - `excludes`: the column (a list) does not hold the value
 * - `above`: the value is above the column; `below`: the value is below the column
 * - `eq` / `ne`: the column equals / differs from the value
 */
export type DropCondition = { op: 'always' } | {
  op: 'lacks' | 'excludes' | 'above' | 'below' | 'eq' | 'ne'
  column: RangeColumn
  value: string | number | boolean | string[]
  unit?: Unit
  weld?: 'groove' | 'fillet'
}

/** The drop conditions of one code for one joint; a code without a plan keeps every test a candidate. */
export type RangeFilterPlan = Partial<Record<CodeId, DropCondition[]>>

const units: Unit[] = ['in', 'mm']

/**
 * ASME IX (the covers rule in shared/rules/asme-ix/covers.ts), only where one finding is "not met" whatever else the test
 * records: the joint's code (QW-301), groove joint on a fillet test (QW-452.5), positions per QW-461.9 column (groove on
 * plate or pipe over 24 in OD: column A; pipe of 24 in OD or less: column B; fillet), diameter (QW-403.16 with QW-452.3,
 * QW-452.4, plate tests 2-7/8 in and over), deposit (QW-404.30, QW-452.1(b), QW-404.32), fillet-test base metal
 * thickness (QW-452.5), F-No. (QW-433), transfer (QW-409.2), vertical progression (QW-405.3) and backing (QW-402.4).
 * What the joint leaves out is never filtered on.
 */
function asmePlan(joint: ResolvedJoint): DropCondition[] {
  if (joint.code !== undefined && joint.code !== 'asme-ix') return [{ op: 'always' }]
  let process: string
  try {
    process = asmeProcess(joint.process)
  }
  catch {
    return [] // the rules refuse the joint's process for every test: nothing is dropped
  }
  const letters = jointPositions(joint)
  const plan: DropCondition[] = []
  const groove = joint.weld === 'groove'
  const inUnit = (v: number, u: Unit) => toMicro(convertLength(v, joint.unit, u))
  if (groove) plan.push({ op: 'eq', column: 'weld', value: 'fillet' })
  if (!groove) plan.push({ op: 'lacks', column: 'positions_fillet', value: letters })
  for (const u of units) {
    if (groove) {
      const od = joint.outsideDiameter === undefined ? undefined : inUnit(joint.outsideDiameter, u)
      if (joint.form === 'plate' || od !== undefined) {
        const columnA = joint.form === 'plate' || (od !== undefined && od > pick(asme.od24, u))
        plan.push({ op: 'lacks', column: columnA ? 'positions_groove' : 'positions_groove_pipe', value: letters, unit: u, weld: 'groove' })
      }
      if (joint.thickness !== undefined && listsVariable(process, 'deposit')) plan.push({ op: 'above', column: 'deposit_max_micro', value: inUnit(joint.thickness, u), unit: u })
    }
    else if (joint.thickness !== undefined) {
      plan.push({ op: 'below', column: 'thickness_min_micro', value: inUnit(joint.thickness, u), unit: u, weld: 'fillet' })
      plan.push({ op: 'above', column: 'thickness_max_micro', value: inUnit(joint.thickness, u), unit: u, weld: 'fillet' })
    }
    if (joint.form === 'pipe' && joint.outsideDiameter !== undefined) {
      // A groove test qualifies fillet welds of all diameters (QW-452.6): for a fillet joint only fillet tests are limited.
      plan.push({ op: 'below', column: 'diameter_min_micro', value: inUnit(joint.outsideDiameter, u), unit: u, ...(groove ? {} : { weld: 'fillet' as const }) })
    }
  }
  if (joint.fNumber !== undefined) plan.push({ op: 'excludes', column: 'f_numbers', value: joint.fNumber })
  if (joint.transfer !== undefined && listsVariable(process, 'transfer')) {
    plan.push(joint.transfer === 'short-circuit' ? { op: 'ne', column: 'transfer', value: 'short-circuit' } : { op: 'eq', column: 'transfer', value: 'short-circuit' })
  }
  if (joint.progression !== undefined && listsVariable(process, 'progression') && letters.includes('V')) plan.push({ op: 'ne', column: 'progression', value: joint.progression })
  if (groove && joint.backing === false && listsVariable(process, 'backing')) plan.push({ op: 'eq', column: 'backing', value: true })
  return plan
}

/**
 * For each code whose covers rule has been mapped onto the stored ranges, the conditions under which that rule answers
 * "not covered" for this joint. Codes not listed here (yet) keep every test a candidate, judged by the rules in full.
 */
export function rangeFilterPlan(joint: ResolvedJoint): RangeFilterPlan {
  return { 'asme-ix': asmePlan(joint) }
}
