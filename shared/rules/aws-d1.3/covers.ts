import type { CoversInput, ProductionWeld, WelderTestInput } from '../inputs'
import type { CoverReason, CoversResult } from '../results'
import type { RuleContext } from '../types'
import { coversAny, finding, inRange, rangeText } from '../coverage'
import { productionPositions, testProcess } from '../layers'
import { refuse } from '../refusal'
import { scopeText, withinD13Scope } from './scope'
import { d13Joint, welderRanges } from './welder-ranges'

function one(test: WelderTestInput, production: ProductionWeld, context: RuleContext): CoverReason[] {
  const u = context.unit
  if (production.thickness === undefined) refuse('production.thickness: AWS D1.3 coverage depends on the sheet thickness')
  if (!withinD13Scope(production.thickness, u)) return [finding(false, 'D1.3 scope', scopeText(production.thickness, u), 'verified')]
  const ranges = welderRanges(test, context)
  const reasons: CoverReason[] = []
  if (production.form !== 'plate') reasons.push(finding(false, 'D1.3 scope', 'AWS D1.3 covers sheet steel, not pipe.', 'verified'))
  const testJoint = d13Joint(test)
  const joint = d13Joint(production)
  reasons.push(finding(joint === testJoint, 'D1.3 4.7 (joint type)', joint === testJoint ? `Joint ${joint} was tested.` : `The test was ${testJoint}; ${joint} is a different joint type and needs its own test.`, 'verified'))
  if (production.process !== undefined) {
    const same = production.process.toUpperCase() === testProcess(test).toUpperCase()
    reasons.push(finding(same, 'D1.3 4.7 (process)', same ? `Process ${test.process} was tested.` : `The test was ${test.process}; ${production.process} needs its own test.`, 'verified'))
  }
  const position = productionPositions(production)[0]!.toUpperCase().replace('OH', 'O')
  const qualified = production.weld === 'groove' ? ranges.positions.groove : ranges.positions.fillet
  reasons.push(finding(qualified.includes(position), 'D1.3 Table 4.4', `Position ${production.position}: the test qualifies ${qualified.map(p => (p === 'O' ? 'OH' : p)).join(', ') || 'none for this weld type'}.`, 'verified'))
  if (ranges.thickness) {
    reasons.push(finding(inRange(production.thickness, ranges.thickness), 'D1.3 4.7.2', `Sheet ${production.thickness} ${u}: qualified ${rangeText(ranges.thickness, u)}.`, 'verified'))
  }
  return reasons
}

/** Does an AWS D1.3 welder test cover a production sheet weld? Thicker work is sent to D1.1. */
export function covers(input: CoversInput, context: RuleContext): CoversResult {
  return coversAny(input, (test, production) => one(test, production, context))
}
