import type { CoversInput, ProductionWeld, WelderTestInput } from '../inputs'
import type { CoverReason, CoversResult } from '../results'
import type { RuleContext } from '../types'
import { coversAny, finding, inRange, rangeText } from '../coverage'
import { productionPositions, testProcess } from '../layers'
import { refuse } from '../refusal'
import { formatLength, pick, toMicro } from '../units'
import { qw4231 } from './base-metals'
import { asme } from './limits'
import { describeLetters } from './positions'
import { asmeProcess } from './processes'
import { welderRanges } from './welder-ranges'

function one(test: WelderTestInput, production: ProductionWeld, context: RuleContext): CoverReason[] {
  const u = context.unit
  const f = (m: number) => formatLength(m, u)
  const ranges = welderRanges(test, context)
  const reasons: CoverReason[] = []
  const position = productionPositions(production)[0]!.toUpperCase()
  if (!['F', 'H', 'V', 'O'].includes(position)) refuse(`production.position: "${production.position}" is not F, H, V or O (QW-461.1, QW-461.2)`)
  if (production.form === 'pipe' && production.outsideDiameter === undefined) refuse('production.outsideDiameter: a pipe weld needs its outside diameter')
  const od = production.outsideDiameter === undefined ? undefined : toMicro(production.outsideDiameter)

  if (production.process !== undefined) {
    const same = asmeProcess(production.process) === asmeProcess(testProcess(test))
    reasons.push(finding(same, 'QW-350', same ? `Process ${test.process} was tested.` : `The test was ${test.process}; ${production.process} needs its own test.`, 'partial'))
  }

  if (production.weld === 'groove') {
    const isGroove = test.weld === 'groove'
    reasons.push(finding(isGroove, isGroove ? 'QW-303.1' : 'QW-452.5', isGroove ? 'A groove test qualifies groove welds.' : 'A fillet test qualifies fillet welds only, not groove welds.', 'verified'))
    if (isGroove) {
      const over24 = production.form === 'plate' || (od !== undefined && od > pick(asme.od24, u))
      const column = over24 ? ranges.positions.groove : ranges.positions.groovePipe ?? []
      const where = over24 ? (production.form === 'plate' ? 'plate' : `pipe over ${f(pick(asme.od24, u))} OD`) : `pipe of ${f(pick(asme.od24, u))} OD or less`
      const ok = column.includes(position)
      reasons.push(finding(ok, 'QW-461.9', `Groove ${position} on ${where}: the test qualifies ${describeLetters(column)}.`, 'verified'))
      if (production.form === 'pipe' && production.outsideDiameter !== undefined && ranges.diameter) {
        const within = inRange(production.outsideDiameter, ranges.diameter)
        reasons.push(finding(within, test.form === 'plate' ? 'QW-461.9 †' : 'QW-452.3', `OD ${production.outsideDiameter} ${u}: qualified ${rangeText(ranges.diameter, u)}.`, 'verified'))
      }
      if (production.thickness !== undefined) {
        const max = ranges.depositMax
        const ok = max === null || max === undefined || toMicro(production.thickness) <= toMicro(max)
        reasons.push(finding(ok, test.transfer === 'short-circuit' && testProcess(test).toUpperCase() === 'GMAW' ? 'QW-404.32' : 'QW-452.1(b)',
          `Deposit ${production.thickness} ${u}: qualified up to ${max === null || max === undefined ? 'the maximum to be welded' : `${max} ${u}`}.`, 'verified'))
      }
    }
  }
  else {
    const column = ranges.positions.fillet
    const ok = column.includes(position)
    reasons.push(finding(ok, 'QW-461.9', `Fillet ${position}: the test qualifies ${describeLetters(column)}.`, 'verified'))
    if (test.weld === 'groove') {
      reasons.push(finding(true, 'QW-452.6', 'A groove test qualifies fillet welds of all sizes, thicknesses and diameters.', 'verified'))
    }
    else {
      if (production.form === 'pipe' && production.outsideDiameter !== undefined && ranges.diameter) {
        const within = inRange(production.outsideDiameter, ranges.diameter)
        reasons.push(finding(within, test.form === 'plate' ? 'QW-461.9 †' : 'QW-452.4', `OD ${production.outsideDiameter} ${u}: qualified ${rangeText(ranges.diameter, u)}.`, 'verified'))
      }
      if (production.thickness !== undefined && ranges.thickness) {
        const within = inRange(production.thickness, ranges.thickness)
        reasons.push(finding(within, 'QW-452.5', `Base metal ${production.thickness} ${u}: qualified ${rangeText(ranges.thickness, u)}.`, ranges.thickness.min === null ? 'partial' : 'memory'))
      }
    }
  }

  if (production.fNumber !== undefined) {
    if (!ranges.fNumbers) refuse('test.fNumber: give the test F-Number (and backing) to check the production F-Number')
    if (production.backing === undefined) refuse('production.backing: say whether the production weld has backing, to check F-Numbers (QW-433)')
    const inGroup = ranges.fNumbers.numbers.includes(production.fNumber)
    const backingOk = production.backing ? ranges.fNumbers.withBacking : ranges.fNumbers.withoutBacking
    reasons.push(finding(inGroup && backingOk, 'QW-433', `F-No. ${production.fNumber} ${production.backing ? 'with' : 'without'} backing: the test qualifies F-No. ${ranges.fNumbers.numbers.join(', ')} ${ranges.fNumbers.withoutBacking ? 'with and without backing' : 'with backing only'}.`, 'memory'))
  }
  else if (production.backing === false && test.backing === true) {
    reasons.push(finding(false, 'QW-402.4', 'The test had backing; welding without backing needs a test without backing.', 'memory'))
  }

  if (production.pNumber !== undefined) {
    if (test.pNumber === undefined) refuse('test.pNumber: give the test P-Number to check the production base metal')
    const p = qw4231(test.pNumber, context.edition)
    const ok = p.contains(production.pNumber)
    reasons.push(finding(ok, 'QW-423.1', `P-No. ${production.pNumber}: the test qualifies ${p.groups.join('; ')}.`, 'verified'))
  }
  return reasons
}

/** Does an ASME IX welder test (or set of tests) cover a production weld? */
export function covers(input: CoversInput, context: RuleContext): CoversResult {
  return coversAny(input, (test, production) => one(test, production, context))
}
