import type { WelderTestInput } from '../inputs'
import type { Undetermined, WelderRangesResult } from '../results'
import type { Reason, RuleContext } from '../types'
import { testLayers, testProcess } from '../layers'
import { refuse } from '../refusal'
import { formatRange, fromMicro, scale, toMicro } from '../units'
import { buttPositions, filletPositions } from './positions'

/** ISO 4063 process numbers accepted in ISO 9606-1 tests. */
export const isoProcesses = ['111', '114', '121', '125', '131', '135', '136', '138', '141', '142', '143', '145', '15', '311'] as const

const mm = (value: number) => toMicro(value)

export function isoProcess(process: string): string {
  const found = isoProcesses.find(p => p === process.trim())
  if (!found) refuse(`process: "${process}" is not an ISO 4063 process number carried for ISO 9606-1 (${isoProcesses.join(', ')})`)
  return found
}

/** Processes a test qualifies (summary sheet): 135 covers 138; 141, 143 and 145 cover each other. */
export function processesCovered(process: string): string[] {
  if (process === '135') return ['135', '138']
  if (['141', '143', '145'].includes(process)) return ['141', '143', '145']
  return [process]
}

/**
 * Filler material groups a test qualifies (Table 3 as remembered; FM1 → FM1, FM2 read on a summary
 * sheet): FM1 and FM2 each other; FM3 → FM1–FM3; FM4 → FM1, FM2, FM4; FM5 and FM6 themselves only.
 */
export function fillerGroupsQualified(fm: number): number[] {
  if (fm === 1 || fm === 2) return [1, 2]
  if (fm === 3) return [1, 2, 3]
  if (fm === 4) return [1, 2, 4]
  if (fm === 5 || fm === 6) return [fm]
  return refuse(`fNumber: FM${fm} is not an ISO 9606-1 filler material group (FM1 to FM6)`)
}

/** Upper end of the Table 6 range for a deposit s (null: no upper limit). */
export function isoButtMax(s: number, process: string): number | null {
  if (s >= 12) return process === '311' ? s * 1.5 : null
  return fromMicro(scale(mm(s), process === '311' ? 3 : 4, 2))
}

/**
 * What an ISO 9606-1 welder test qualifies. All of these ranges come from summary sheets and
 * worked designation examples of DIN EN ISO 9606-1:2013 or from memory, not from the standard's
 * text: each reason says which.
 */
export function welderRanges(input: WelderTestInput, context: RuleContext): WelderRangesResult {
  if (context.unit !== 'mm') refuse('unit: ISO 9606-1 prints its ranges in millimetres: send "unit": "mm"')
  const process = isoProcess(testProcess(input))
  const reasons: Reason[] = []
  const pipe = input.form === 'pipe'
  const result: WelderRangesResult = { positions: { groove: [], fillet: [] }, reasons }
  result.processes = processesCovered(process)
  reasons.push({ clause: 'ISO 9606-1 process and transfer (summary sheet)', text: `Process ${process} qualifies ${result.processes.join(', ')}.`, basis: 'partial' })
  if (input.transfer !== undefined) {
    const short = input.transfer === 'short-circuit' && ['131', '135', '138'].includes(process)
    result.transfers = short ? ['short-circuit', 'globular', 'spray', 'pulse'] : [input.transfer]
    reasons.push({ clause: 'ISO 9606-1 process and transfer (summary sheet)', text: short ? 'Short-circuit transfer (D) qualifies all other transfer modes.' : `${input.transfer} transfer qualifies that mode only.`, basis: 'partial' })
  }

  const undetermined: Undetermined[] = []
  const layers = testLayers(input)
  const deposits = layers.map(l => l.depositThickness)
  const total = input.processes ? (deposits.every(d => d !== undefined) ? deposits.reduce<number>((a, d) => a + (d ?? 0), 0) : undefined) : input.depositThickness ?? input.couponThickness
  if (input.weld === 'groove' && total === undefined) {
    undetermined.push({ field: input.processes ? 'processes[].depositThickness' : 'depositThickness', needed: 'ISO 9606-1 Table 6: a butt weld is ranged by its deposited thickness s (per process s1, s2; the combination by s1 + s2)' })
    result.positions.groove = buttPositions(input.testPositions, pipe)
    reasons.push({ clause: 'ISO 9606-1 Table 9', text: `Butt weld positions: ${result.positions.groove.join(', ')}.`, basis: 'partial' })
  }
  if (input.weld === 'groove' && total !== undefined) {
    const given = total
    const s = mm(given)
    const gas = process === '311'
    const k = gas ? 3 : 4 // factor ×1.5 for gas welding (311), ×2 otherwise, as halves
    const three = mm(3)
    let min: number
    let max: number | null
    if (s < mm(12)) {
      min = s < three ? s : three
      max = scale(s, k, 2)
    }
    else {
      if (gas) refuse('depositThickness: the Table 6 range for gas welding (311) at s of 12 mm and over is not carried')
      min = three
      max = null
    }
    result.thickness = { min: fromMicro(min), max: max === null ? null : fromMicro(max) }
    reasons.push({ clause: 'ISO 9606-1 Table 6', text: `Butt weld, deposit s = ${given} mm: ${formatRange(min, max, 'mm')} (${gas ? 'factor 1.5 for gas welding' : 'factor 2'}; s of 12 mm and over: 3 mm and over, from one worked example).`, basis: 'partial' })
    result.positions.groove = buttPositions(input.testPositions, pipe)
    reasons.push({ clause: 'ISO 9606-1 Table 9', text: `Butt weld positions: ${result.positions.groove.join(', ')}.`, basis: 'partial' })
    reasons.push({ clause: 'ISO 9606-1 butt and fillet welds (summary sheet)', text: 'A butt-weld test qualifies fillet welds only with a supplementary fillet test (10 mm plate or the minimum thickness, single layer, PB).', basis: 'partial' })
  }
  else if (input.weld === 'fillet' && input.couponThickness === undefined) {
    undetermined.push({ field: 'couponThickness', needed: 'ISO 9606-1 Table 7: a fillet test is ranged by the plate thickness t' })
    const fp = filletPositions(input.testPositions)
    result.positions.fillet = fp.positions
    reasons.push({ clause: 'ISO 9606-1 Table 10', text: `Fillet positions: ${fp.positions.join(', ')}.`, basis: fp.fromMemory ? 'memory' : 'partial' })
  }
  else if (input.couponThickness !== undefined) {
    const t = mm(input.couponThickness)
    const three = mm(3)
    result.thickness = t < three ? { min: fromMicro(t), max: 3 } : { min: 3, max: null }
    reasons.push({ clause: 'ISO 9606-1 Table 7', text: t < three ? `Fillet test on t = ${input.couponThickness} mm: t to 3 mm.` : `Fillet test on t = ${input.couponThickness} mm: 3 mm and over.`, basis: t < three ? 'memory' : 'partial' })
    const fp = filletPositions(input.testPositions)
    result.positions.fillet = fp.positions
    reasons.push({ clause: 'ISO 9606-1 Table 10', text: `Fillet positions: ${fp.positions.join(', ')}.`, basis: fp.fromMemory ? 'memory' : 'partial' })
  }

  if (pipe && input.outsideDiameter === undefined) undetermined.push({ field: 'outsideDiameter', needed: 'ISO 9606-1 Table 8: the pipe outside diameter D' })
  if (pipe && input.outsideDiameter !== undefined) {
    const D = mm(input.outsideDiameter)
    const d25 = mm(25)
    const min = D <= d25 ? D : Math.max(scale(D, 1, 2), d25)
    const max = D <= d25 ? 2 * D : null
    result.diameter = { min: fromMicro(min), max: max === null ? null : fromMicro(max) }
    reasons.push({ clause: 'ISO 9606-1 Table 8', text: `Pipe D = ${input.outsideDiameter} mm: ${formatRange(min, max, 'mm')}${D > d25 ? '; a pipe over 25 mm also covers plate' : ''}.`, basis: 'verified' })
  }
  else if (!pipe) {
    const key = input.weld === 'groove' ? 'groovePipeMinDiameter' : 'filletPipeMinDiameter'
    result.positions[key] = 500
    reasons.push({ clause: 'ISO 9606-1 5.3', text: 'A plate test covers pipe over 500 mm (one summary sheet reads 500 mm and over), and rotating pipe over 75 mm in PA, PB, PC and PD.', basis: 'partial' })
  }

  const fm = layers[0]?.fNumber
  if (fm !== undefined) {
    const groups = fillerGroupsQualified(fm)
    result.fillerGroups = groups.map(g => `FM${g}`)
    reasons.push({ clause: 'ISO 9606-1 filler groups', text: `Filler group FM${fm} qualifies ${result.fillerGroups.join(', ')}.`, basis: fm === 1 ? 'partial' : 'memory' })
  }
  if (input.processes) {
    result.deposits = layers.map(l => ({ process: l.process, ...(l.transfer ? { transfer: l.transfer } : {}), ...(l.depositThickness === undefined ? {} : { depositMax: isoButtMax(l.depositThickness, l.process) }), clause: 'ISO 9606-1 Table 6 (per process s)' }))
    if (total !== undefined) result.combinedDepositMax = isoButtMax(total, layers[0]!.process)
  }
  if (undetermined.length) result.undetermined = undetermined
  return result
}
