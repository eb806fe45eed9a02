import type { WelderTestInput } from '../inputs'
import type { ProcessDepositQualified, Undetermined, WelderRangesResult } from '../results'
import type { Range, Reason, RuleContext } from '../types'
import { testLayers, testProcess } from '../layers'
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
  const undetermined: Undetermined[] = []
  if (input.form === 'pipe' && od === undefined) undetermined.push({ field: 'outsideDiameter', needed: `${input.weld === 'groove' ? 'QW-452.3' : 'QW-452.4'}: the test pipe OD gives the diameters qualified` })
  const layers = testLayers(input)
  layers.forEach(l => asmeProcess(l.process))

  if (input.weld === 'groove') {
    result.positions.groovePipe = pos.groovePipe
    if (input.processes) {
      // QW-452.1(b) Note 1 and QW-306: each process qualifies its own deposit; the combination each within its own.
      const deposits = layers.map((l, i): ProcessDepositQualified => {
        if (l.depositThickness === undefined) {
          undetermined.push({ field: `processes[${i}].depositThickness`, needed: `QW-452.1(b) Note 1: the ${l.process} deposit gives the deposit that process qualifies` })
          return { process: l.process, ...(l.transfer ? { transfer: l.transfer } : {}), clause: 'QW-452.1(b) Note 1' }
        }
        const d = welderDeposit(toMicro(l.depositThickness), l.layers, isShortCircuit(l.process, l.transfer), u)
        reasons.push(...d.reasons.map(r => ({ ...r, text: `${l.process}: ${r.text}` })))
        return { process: l.process, ...(l.transfer ? { transfer: l.transfer } : {}), depositMax: out(d.max), clause: d.reasons[0]?.clause ?? 'QW-452.1(b)' }
      })
      result.deposits = deposits
      if (deposits.every(d => d.depositMax !== undefined)) {
        result.combinedDepositMax = deposits.some(d => d.depositMax === null) ? null : deposits.reduce((a, d) => a + (d.depositMax ?? 0), 0)
        reasons.push({ clause: 'QW-306', text: `The combination: each process within its own deposit (${deposits.map(d => `${d.process} ${d.depositMax === null ? 'maximum to be welded' : f(toMicro(d.depositMax ?? 0))}`).join(', ')}); the combined deposit up to ${result.combinedDepositMax === null ? 'the maximum to be welded' : f(toMicro(result.combinedDepositMax))}.`, basis: 'memory' })
      }
    }
    const sum = layers.every(l => l.depositThickness !== undefined) ? layers.reduce((a, l) => a + (l.depositThickness ?? 0), 0) : undefined
    const given = input.processes ? (sum ?? input.couponThickness) : input.depositThickness ?? input.couponThickness
    if (given === undefined) {
      undetermined.push({ field: 'depositThickness', needed: 'QW-452.1(a) and (b): the weld metal thickness gives the deposit qualified and the bend specimens' })
    }
    else {
      const t = toMicro(given)
      if (!input.processes) {
        if (input.depositThickness === undefined) {
          reasons.push({ clause: 'QW-452.1(b) Note 1', text: 'No deposit thickness given: t is taken as the coupon thickness (one welder, one process).', basis: 'convention' })
        }
        const deposit = welderDeposit(t, input.layers, isShortCircuit(process, input.transfer), u)
        result.depositMax = out(deposit.max)
        reasons.push(...deposit.reasons)
      }
      const bends = welderBends(t, input.testPositions, input.form, u)
      result.bendSpecimens = bends.count
      reasons.push(...bends.reasons)
    }
    if (input.form === 'pipe' && od !== undefined) {
      const band = diameterBand(od, u)
      result.diameter = range(band.min, band.max)
      reasons.push({ clause: 'QW-452.3', text: `${band.text}, for groove welds.`, basis: 'verified' })
    }
    else if (input.form === 'plate') {
      result.positions.groovePipeMinDiameter = fromMicro(two78)
      result.diameter = range(two78, null)
      reasons.push({ clause: 'QW-461.9 †', text: `A plate groove test qualifies groove welds on pipe of ${f(pick(asme.od24, u))} OD or less only in ${describeLetters(pos.groovePipe)}, and only on pipe of ${f(two78)} OD and over.`, basis: 'verified' })
    }
    reasons.push({ clause: 'QW-461.9', text: `Groove welds on plate and on pipe over ${f(pick(asme.od24, u))} OD: ${describeLetters(pos.groove)}; on pipe of ${f(pick(asme.od24, u))} OD or less: ${describeLetters(pos.groovePipe)}.`, basis: 'verified' })
    reasons.push({ clause: 'QW-452.6, QW-303.1', text: `The groove test also qualifies fillet welds of all sizes on all base metal thicknesses and all diameters, in ${describeLetters(pos.fillet)}.`, basis: 'verified' })
  }
  else {
    if (input.couponThickness === undefined) undetermined.push({ field: 'couponThickness', needed: 'QW-452.5: the fillet test coupon thickness gives the thicknesses and fillet sizes qualified' })
  }
  if (input.weld === 'fillet' && input.couponThickness !== undefined) {
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
    else if (input.form === 'plate') {
      result.diameter = range(two78, null)
      result.positions.filletPipeMinDiameter = fromMicro(two78)
      reasons.push({ clause: 'QW-452.5, QW-461.9 †', text: `A plate fillet test qualifies fillet welds on pipe of ${f(two78)} OD and over.`, basis: 'verified' })
    }
  }
  if (input.weld === 'fillet') {
    reasons.push({ clause: 'QW-461.9', text: `Fillet welds: ${describeLetters(pos.fillet)}. A fillet test qualifies no groove welds.`, basis: pos.fromMemory ? 'memory' : 'verified' })
  }

  const fLayer = layers.find(l => l.fNumber !== undefined)
  if (fLayer?.fNumber !== undefined) {
    if (input.backing === undefined) {
      undetermined.push({ field: 'backing', needed: 'QW-433, QW-402.4: whether the test had backing says whether the F-Nos. are qualified without backing (given here with backing only)' })
      result.fNumbers = { ...qw433(fLayer.fNumber, true, context.edition) }
    }
    else {
      result.fNumbers = qw433(fLayer.fNumber, input.backing, context.edition)
    }
    reasons.push({ clause: 'QW-433, QW-402.4', text: `F-No. ${fLayer.fNumber}${layers.length > 1 ? ` (${fLayer.process})` : ''} ${input.backing === undefined ? '(backing not recorded)' : input.backing ? 'with backing' : 'without backing'} qualifies F-No. ${result.fNumbers.numbers.join(', ')} ${result.fNumbers.withoutBacking ? 'with and without backing' : 'with backing only'}.`, basis: 'memory' })
  }
  if (input.pNumber !== undefined) {
    const p = qw4231(input.pNumber, context.edition)
    result.pNumbers = p.groups
    reasons.push({ clause: p.clause, text: `P-No. ${input.pNumber} (${context.edition} edition) qualifies ${p.groups.join('; ')}.`, basis: p.basis })
  }
  if (undetermined.length) result.undetermined = undetermined
  return result
}
