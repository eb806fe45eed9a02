import type { WelderTestInput } from '../inputs'
import type { WelderRangesResult } from '../results'
import type { Range, Reason, RuleContext } from '../types'
import { testProcess } from '../layers'
import { refuse } from '../refusal'
import { formatLength, fromMicro, pick, toMicro } from '../units'
import { qw4231 } from './base-metals'
import { diameterBand } from './diameter'
import { qw433 } from './f-numbers'
import { asme } from './limits'
import { describeLetters, qw4619 } from './positions'
import { asmeProcess, isShortCircuit } from './processes'
import { welderBends, welderDeposit } from './welder-deposit'

const out = (m: number | null) => (m === null ? null : fromMicro(m))
const range = (min: number | null, max: number | null): Range => ({ min: out(min), max: out(max) })

/** What a welder performance test qualifies under ASME BPVC IX (QW-452, QW-461.9, QW-423.1, QW-433). */
export function welderRanges(input: WelderTestInput, context: RuleContext): WelderRangesResult {
  const u = context.unit
  const f = (m: number) => formatLength(m, u)
  const process = asmeProcess(testProcess(input))
  const reasons: Reason[] = []
  const pos = qw4619(input.form, input.weld, input.testPositions)
  const two78 = pick(asme.od2_7_8, u)
  const result: WelderRangesResult = { positions: { groove: pos.groove, fillet: pos.fillet }, reasons }
  const od = input.outsideDiameter === undefined ? undefined : toMicro(input.outsideDiameter)
  if (input.form === 'pipe' && od === undefined) refuse('outsideDiameter: a pipe test needs its outside diameter (QW-452.3, QW-452.4)')

  if (input.weld === 'groove') {
    const given = input.depositThickness ?? input.couponThickness
    if (given === undefined) refuse('depositThickness or couponThickness: a groove test needs the weld metal thickness (QW-452.1)')
    const t = toMicro(given)
    if (input.depositThickness === undefined) {
      reasons.push({ clause: 'QW-452.1(b) Note 1', text: 'No deposit thickness given: t is taken as the coupon thickness (one welder, one process).', basis: 'convention' })
    }
    const deposit = welderDeposit(t, input.layers, isShortCircuit(process, input.transfer), u)
    result.depositMax = out(deposit.max)
    reasons.push(...deposit.reasons)
    const bends = welderBends(t, input.testPositions, input.form, u)
    result.bendSpecimens = bends.count
    reasons.push(...bends.reasons)
    result.positions.groovePipe = pos.groovePipe
    if (input.form === 'pipe' && od !== undefined) {
      const band = diameterBand(od, u)
      result.diameter = range(band.min, band.max)
      reasons.push({ clause: 'QW-452.3', text: `${band.text}, for groove welds.`, basis: 'verified' })
    }
    else {
      result.positions.groovePipeMinDiameter = fromMicro(two78)
      result.diameter = range(two78, null)
      reasons.push({ clause: 'QW-461.9 †', text: `A plate groove test qualifies groove welds on pipe of ${f(pick(asme.od24, u))} OD or less only in ${describeLetters(pos.groovePipe)}, and only on pipe of ${f(two78)} OD and over.`, basis: 'verified' })
    }
    reasons.push({ clause: 'QW-461.9', text: `Groove welds on plate and on pipe over ${f(pick(asme.od24, u))} OD: ${describeLetters(pos.groove)}; on pipe of ${f(pick(asme.od24, u))} OD or less: ${describeLetters(pos.groovePipe)}.`, basis: 'verified' })
    reasons.push({ clause: 'QW-452.6, QW-303.1', text: `The groove test also qualifies fillet welds of all sizes on all base metal thicknesses and all diameters, in ${describeLetters(pos.fillet)}.`, basis: 'verified' })
  }
  else {
    if (input.couponThickness === undefined) refuse('couponThickness: a fillet test needs the test coupon thickness (QW-452.5)')
    const T = toMicro(input.couponThickness)
    const split = pick(asme.t3_16, u)
    if (T >= split) {
      result.thickness = range(null, null)
      result.filletSizeMax = null
      reasons.push({ clause: 'QW-452.5', text: `Fillet test coupon of ${f(T)} (${f(split)} or more): all base metal thicknesses and all fillet sizes; tests: 1 macro (QW-184) and 1 fracture (QW-182).`, basis: 'partial' })
    }
    else {
      result.thickness = range(T, 2 * T)
      result.filletSizeMax = out(T)
      reasons.push({ clause: 'QW-452.5', text: `Fillet test coupon of ${f(T)} (under ${f(split)}): base metal T to 2T (${f(T)} to ${f(2 * T)}) and fillet sizes up to T; test: 1 macro.`, basis: 'memory' })
    }
    if (input.form === 'pipe' && od !== undefined) {
      const band = diameterBand(od, u)
      result.diameter = range(band.min, band.max)
      reasons.push({ clause: 'QW-452.4', text: `${band.text}, for fillet welds.`, basis: 'verified' })
    }
    else {
      result.diameter = range(two78, null)
      result.positions.filletPipeMinDiameter = fromMicro(two78)
      reasons.push({ clause: 'QW-452.5, QW-461.9 †', text: `A plate fillet test qualifies fillet welds on pipe of ${f(two78)} OD and over.`, basis: 'verified' })
    }
    reasons.push({ clause: 'QW-461.9', text: `Fillet welds: ${describeLetters(pos.fillet)}. A fillet test qualifies no groove welds.`, basis: pos.fromMemory ? 'memory' : 'verified' })
  }

  if (input.fNumber !== undefined) {
    if (input.backing === undefined) refuse('backing: say whether the test was welded with backing, to qualify F-Numbers (QW-433, QW-402.4)')
    result.fNumbers = qw433(input.fNumber, input.backing, context.edition)
    reasons.push({ clause: 'QW-433, QW-402.4', text: `F-No. ${input.fNumber} ${input.backing ? 'with' : 'without'} backing qualifies F-No. ${result.fNumbers.numbers.join(', ')} ${input.backing ? 'with backing only' : 'with and without backing'}.`, basis: 'memory' })
  }
  if (input.pNumber !== undefined) {
    const p = qw4231(input.pNumber, context.edition)
    result.pNumbers = p.groups
    reasons.push({ clause: p.clause, text: `P-No. ${input.pNumber} (${context.edition} edition) qualifies ${p.groups.join('; ')}.`, basis: p.basis })
  }
  return result
}
