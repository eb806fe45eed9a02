import type { PqrRecord, WpsSupportInput } from '../inputs'
import type { CoverReason, WpsSupportResult } from '../results'
import type { RuleContext } from '../types'
import { finding } from '../coverage'
import { pqrLayers, wpsLayers } from '../layers'
import { refuse } from '../refusal'
import { formatLength, formatRange, toMicro } from '../units'
import { asmeProcess, isShortCircuit } from './processes'
import { procedureRanges } from './procedure-ranges'

type Interval = [number, number]

/** Join intervals that overlap or touch. */
function union(intervals: Interval[]): Interval[] {
  const sorted = [...intervals].sort((a, b) => a[0] - b[0])
  const joined: Interval[] = []
  for (const [low, high] of sorted) {
    const last = joined[joined.length - 1]
    if (last && low <= last[1]) last[1] = Math.max(last[1], high)
    else joined.push([low, high])
  }
  return joined
}

const label = (pqr: PqrRecord, i: number) => pqr.id ?? `PQR ${i + 1}`

/** Does a WPS draft stay inside what its supporting PQRs qualify? Variable by variable, with the clause of each. */
export function wpsSupport(input: WpsSupportInput, context: RuleContext): WpsSupportResult {
  const u = context.unit
  const f = (m: number) => formatLength(m, u)
  const wps = input.wps
  const process = asmeProcess(wpsLayers(wps)[0]!.process)
  if (input.pqrs.length === 0) refuse('pqrs: give at least one supporting PQR')
  const reasons: CoverReason[] = []
  const sameProcess = input.pqrs.map((pqr, i) => ({ pqr, i })).filter(({ pqr }) => asmeProcess(pqrLayers(pqr)[0]!.process) === process)
  reasons.push(finding(sameProcess.length > 0, 'QW-200.2', sameProcess.length > 0
    ? `${process} is qualified by ${sameProcess.map(({ pqr, i }) => label(pqr, i)).join(', ')}.`
    : `No supporting PQR was welded with ${process}.`, 'memory'))

  // QW-409.2 (from memory): short-circuiting transfer and the other GMAW modes qualify each other not.
  const wpsShort = isShortCircuit(process, wps.transfer)
  const matching = sameProcess.filter(({ pqr }) => process !== 'GMAW' || isShortCircuit(pqrLayers(pqr)[0]!.process, pqr.transfer) === wpsShort)
  if (process === 'GMAW') {
    reasons.push(finding(matching.length > 0, 'QW-409.2', matching.length > 0
      ? `${wpsShort ? 'Short-circuiting' : 'Spray, globular or pulsed'} transfer is qualified by ${matching.map(({ pqr, i }) => label(pqr, i)).join(', ')}.`
      : `No ${process} PQR used ${wpsShort ? 'short-circuiting' : 'spray, globular or pulsed'} transfer.`, 'memory'))
  }

  // QW-403.6 (supplementary essential): toughness on the WPS needs PQRs tested for toughness.
  const usable = wps.toughness ? matching.filter(({ pqr }) => pqr.toughness) : matching
  if (wps.toughness) {
    reasons.push(finding(usable.length > 0, 'QW-403.6', usable.length > 0
      ? `Toughness is qualified by ${usable.map(({ pqr, i }) => label(pqr, i)).join(', ')}.`
      : 'The WPS requires toughness but no matching PQR was toughness-tested.', 'verified'))
  }

  // QW-403.8 → Table QW-451.1 (and QW-403.6/.9/.10): base metal thickness.
  const ranges = usable.map(({ pqr, i }) => ({ id: label(pqr, i), pqr, r: procedureRanges({ ...pqr, process: pqrLayers(pqr)[0]!.process, toughness: wps.toughness ?? false }, context) }))
  const joined = union(ranges.map(({ r }) => [toMicro(r.baseMetal.min ?? 0), r.baseMetal.max === null ? Infinity : toMicro(r.baseMetal.max)]))
  const wMin = wps.thickness.min === null ? null : toMicro(wps.thickness.min)
  const wMax = wps.thickness.max === null ? null : toMicro(wps.thickness.max)
  if (wMin === null || wMax === null) {
    reasons.push(finding(false, 'QW-403.8', 'A WPS thickness range must have a minimum and a maximum: QW-451.1 never qualifies an unlimited range.', 'verified'))
  }
  else {
    if (wMin > wMax) refuse('wps.thickness: the minimum is above the maximum')
    const inside = joined.some(([low, high]) => wMin >= low && wMax <= high)
    const qualified = joined.map(([low, high]) => formatRange(low, high, u)).join(' and ')
    reasons.push(finding(inside, 'QW-403.8, QW-451.1', inside
      ? `Base metal ${formatRange(wMin, wMax, u)} lies within ${qualified}.`
      : `Base metal ${formatRange(wMin, wMax, u)} is outside what the PQRs qualify (${qualified || 'nothing'}).`, 'verified'))
  }

  // QW-404.30 (from memory) → Table QW-451.1 column t: deposited weld metal.
  if (wps.depositMax !== undefined) {
    const best = ranges.reduce<number | null | undefined>((max, { r }) => {
      if (max === null || r.depositMax === null) return null
      if (r.depositMax === undefined) return max
      return Math.max(max ?? 0, toMicro(r.depositMax))
    }, undefined)
    const ok = best === null || (best !== undefined && wps.depositMax !== null && toMicro(wps.depositMax) <= best)
    reasons.push(finding(ok, 'QW-404.30, QW-451.1', `Deposit up to ${wps.depositMax === null ? 'unlimited' : f(toMicro(wps.depositMax))}: the PQRs qualify up to ${best === undefined ? 'nothing' : best === null ? 'unlimited' : f(best)}.`, 'memory'))
  }

  // QW-409.1 (supplementary essential when toughness is required): heat input not above the PQR's.
  if (wps.toughness && wps.heatInputMax !== undefined) {
    const recorded = usable.filter(({ pqr }) => pqr.heatInput !== undefined)
    const ok = recorded.some(({ pqr }) => (pqr.heatInput ?? 0) >= (wps.heatInputMax ?? Infinity))
    const per = u === 'in' ? 'J/in' : 'J/mm'
    reasons.push(finding(ok, 'QW-409.1', recorded.length === 0
      ? 'Heat input is limited when toughness is required, but no PQR records its heat input.'
      : `Heat input up to ${wps.heatInputMax} ${per}: the PQRs recorded ${recorded.map(({ pqr, i }) => `${label(pqr, i)} ${pqr.heatInput} ${per}`).join(', ')}.`, 'verified'))
  }

  // QW-404.4 (from memory): a change of F-Number needs a new PQR.
  if (wps.fNumber !== undefined) {
    const withF = usable.filter(({ pqr }) => pqr.fNumber === wps.fNumber)
    reasons.push(finding(withF.length > 0, 'QW-404.4', withF.length > 0
      ? `F-No. ${wps.fNumber} was used in ${withF.map(({ pqr, i }) => label(pqr, i)).join(', ')}.`
      : `No supporting PQR used F-No. ${wps.fNumber}.`, 'memory'))
  }

  const violations = reasons.filter(r => !r.met).map(({ clause, text, basis }) => ({ clause, text, basis }))
  return { supported: violations.length === 0, answer: violations.length === 0 ? 'supported' : 'not-supported', violations, reasons, layers: [], procedure: [], byHand: [], record: [], undetermined: [] }
}
