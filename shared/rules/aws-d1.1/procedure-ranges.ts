import type { ProcedureRangesInput } from '../inputs'
import type { ProcedureRangesResult, Specimens } from '../results'
import type { Reason, RuleContext } from '../types'
import { refuse } from '../refusal'
import { formatLength, formatRange, fromMicro, pick, printed, toMicro } from '../units'
import { clause4 } from './editions'
import { d11 } from './limits'

const t5_8 = printed('5/8', 16)

/** D1.1 qualification of a WPS by test names its tables per edition (2015 Clause 4; 2020 and later Clause 6). */
export function d11ProcedureTables(edition: string) {
  const old = clause4(edition)
  return {
    // From memory: the PQR specimens and thickness table (Table 4.2 in 2015), the CVN table (Table 4.6 line 2 in 2015,
    // quoted on weldinginspections.net), the WPS positions table (Table 4.1) and the essential-variable tables (4.5, 4.6).
    thickness: old ? 'Table 4.2' : 'Clause 6 PQR thickness table (Table 4.2 in 2015)',
    toughness: old ? 'Table 4.6' : 'Clause 6 CVN table (Table 4.6 in 2015)',
    positions: old ? 'Table 4.1' : 'Clause 6 WPS positions table (Table 4.1 in 2015)',
    essentials: old ? 'Table 4.5' : 'Clause 6 PQR essential variables table (Table 4.5 in 2015)',
  }
}

const processes = ['SMAW', 'SAW', 'GMAW', 'FCAW', 'GTAW']
const letters = ['F', 'H', 'V', 'O'] as const
/** A plate or pipe groove test position qualifies its own position for the WPS (from memory; the least Table 4.1 can mean). */
export const positionOf: Record<string, string[]> = { '1G': ['F'], '2G': ['H'], '3G': ['V'], '4G': ['O'], '5G': ['F', 'V', 'O'], '6G': ['F', 'H', 'V', 'O'], '6GR': ['F', 'H', 'V', 'O'] }

/** Changes that need a new PQR (Tables 4.5/4.6 in 2015), from memory: listed for the WPS writer, not computed. */
export const d11Requalification = [
  'a change of process, or of GMAW transfer to or from short-circuit',
  'a change of electrode or electrode–flux classification not covered by the PQR, or an increase in electrode diameter',
  'a base metal group not qualified by the PQR\'s group',
  'a change in current or polarity, or amperage, voltage or travel speed outside the tolerances of the table',
  'a decrease of preheat or interpass temperature, or a change in PWHT',
  'a change of position or of vertical progression not qualified by the position table',
  'omitting backing or backgouging of a CJP groove weld',
]

/**
 * What a D1.1 CJP groove-weld PQR on plate qualifies for a WPS (Table 4.2 in 2015, Clause 6 from 2020; from memory):
 * T from 1/8 in up to 3/8 in and over 3/8 under 1 in: 1/8 in to 2T; 1 in and over: 1/8 in to unlimited. With CVN testing
 * the minimum is T or 5/8 in, whichever is less, but 1/8 in when T is under 1/4 in (Table 4.6, quoted on a public page).
 */
export function procedureRanges(input: ProcedureRangesInput & { testPositions?: string[] }, context: RuleContext): ProcedureRangesResult & { positions?: string[], requalification: string[] } {
  const u = context.unit
  const f = (m: number) => formatLength(m, u)
  const tables = d11ProcedureTables(context.edition)
  const process = input.process.toUpperCase()
  if (!processes.includes(process)) refuse(`process: AWS D1.1 qualification of a ${input.process} WPS by test is not carried (carried: ${processes.join(', ')}); ESW and EGW have their own limits`)
  const T = toMicro(input.couponThickness)
  const eighth = pick(d11.t1_8, u)
  const one = pick(d11.t1, u)
  if (T < eighth) refuse(`couponThickness: ${tables.thickness} starts at ${f(eighth)}; sheet under it is welded to AWS D1.3`)
  const reasons: Reason[] = []
  const max = T >= one ? null : 2 * T
  let min = eighth
  reasons.push({ clause: tables.thickness, text: `A CJP groove PQR on ${f(T)} plate qualifies ${formatRange(eighth, max, u)} (${T >= one ? '1 in and over: unlimited' : '2T'}).`, basis: 'memory' })
  if (input.toughness) {
    const quarter = pick(d11.t1_4, u)
    min = T < quarter ? eighth : Math.min(T, pick(t5_8, u))
    reasons.push({ clause: tables.toughness, text: `With CVN testing the minimum is T or ${f(pick(t5_8, u))}, whichever is less (${f(eighth)} when T is under ${f(quarter)}): ${f(min)}.`, basis: 'partial' })
  }
  const specimens: Specimens = T <= pick(d11.t3_8, u) ? { tension: 2, face: 2, root: 2, side: 0 } : { tension: 2, face: 0, root: 0, side: 4 }
  reasons.push({ clause: tables.thickness, text: `Specimens: 2 reduced-section tension, ${specimens.side ? '4 side bends' : '2 face and 2 root bends (4 side bends may replace them at 3/8 in)'}; the plate is also examined by RT or UT.`, basis: 'memory' })
  if (process === 'GMAW' && input.transfer === 'short-circuit') {
    reasons.push({ clause: tables.essentials, text: 'GMAW short-circuit is never prequalified: this PQR qualifies GMAW-S only.', basis: 'memory' })
  }
  const result: ProcedureRangesResult & { positions?: string[], requalification: string[] } = {
    baseMetal: { min: fromMicro(min), max: max === null ? null : fromMicro(max) },
    depositMax: null,
    specimens,
    reasons,
    requalification: d11Requalification,
  }
  if (input.testPositions?.length) {
    const set = new Set<string>()
    for (const p of input.testPositions) {
      const found = positionOf[p.toUpperCase()]
      if (!found) refuse(`testPositions: ${p} is not a groove test position carried for D1.1 procedures (${Object.keys(positionOf).join(', ')})`)
      found.forEach(x => set.add(x))
    }
    result.positions = letters.filter(l => set.has(l))
    reasons.push({ clause: tables.positions, text: `Tested in ${input.testPositions.join(' + ')}: the WPS is qualified in ${result.positions.map(p => (p === 'O' ? 'OH' : p)).join(', ')} (each test its own position; a wider reading of the table is checked by hand).`, basis: 'memory' })
  }
  reasons.push({ clause: tables.essentials, text: `Requalification is needed for: ${d11Requalification.join('; ')}.`, basis: 'memory' })
  return result
}
