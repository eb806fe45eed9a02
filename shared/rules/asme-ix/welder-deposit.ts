import type { BendSpecimenCount } from '../results'
import type { Reason, Unit } from '../types'
import { formatLength, pick, scale } from '../units'
import { asme } from './limits'

/**
 * QW-452.1(b): deposit qualified per welder, process and F-No.: 2t; a coupon of 1/2 in (13 mm)
 * or more welded in at least 3 layers qualifies the maximum to be welded (null).
 * QW-404.32 (GMAW-S welders, all editions): t under 1/2 in qualifies 1.1t.
 */
export function welderDeposit(t: number, layers: number | undefined, shortCircuit: boolean, unit: Unit): { max: number | null, reasons: Reason[] } {
  const half = pick(asme.t1_2, unit)
  const f = (m: number) => formatLength(m, unit)
  if (shortCircuit && t < half) {
    return { max: scale(t, 11, 10), reasons: [{ clause: 'QW-404.32', text: `Short-circuit GMAW with a deposit under ${f(half)}: up to 1.1t = ${f(scale(t, 11, 10))}.`, basis: 'verified' }] }
  }
  if (t >= half && layers !== undefined && layers >= 3) {
    return { max: null, reasons: [{ clause: 'QW-452.1(b)', text: `Deposit of ${f(t)} (${f(half)} or more) in ${layers} layers: the maximum to be welded.`, basis: 'verified' }] }
  }
  const reasons: Reason[] = [{ clause: 'QW-452.1(b)', text: `Deposit of ${f(t)}: up to 2t = ${f(2 * t)}.`, basis: 'verified' }]
  if (t >= half) {
    reasons.push({ clause: 'QW-452.1(b)', text: `A deposit of ${f(half)} or more qualifies the maximum to be welded only when welded in at least 3 layers; ${layers === undefined ? 'no layer count was given' : `${layers} layers were welded`}.`, basis: 'verified' })
  }
  return { max: 2 * t, reasons }
}

/**
 * QW-452.1(a): bend specimens by weld metal thickness. Under 3/8 in (10 mm): 1 face + 1 root;
 * 3/8 to under 3/4 in: 2 side (1 face + 1 root may replace them); 3/4 in and over: 2 side.
 * Pipe in 5G or 6G: 4 in all; 2G and 5G on one coupon: 6 (split evenly between the two types: common practice).
 */
export function welderBends(t: number, testPositions: string[], form: string, unit: Unit): { count: BendSpecimenCount, reasons: Reason[] } {
  const upper = testPositions.map(p => p.toUpperCase())
  const both = form === 'pipe' && upper.includes('2G') && upper.includes('5G')
  const total = both ? 6 : form === 'pipe' && (upper.includes('5G') || upper.includes('6G')) ? 4 : 2
  const f = (m: number) => formatLength(m, unit)
  const thin = t < pick(asme.t3_8, unit)
  const count: BendSpecimenCount = thin
    ? { face: total / 2, root: total / 2, side: 0, total }
    : { face: 0, root: 0, side: total, total }
  const reasons: Reason[] = [{
    clause: 'QW-452.1(a)',
    text: thin
      ? `Weld metal under ${f(pick(asme.t3_8, unit))}: ${count.face} face and ${count.root} root bends.`
      : `Weld metal of ${f(t)}: ${count.side} side bends${t < pick(asme.t3_4, unit) ? ' (face and root bends in equal numbers may replace them)' : ''}.`,
    basis: 'verified',
  }]
  if (total > 2) reasons.push({ clause: 'QW-452.1(a)', text: both ? '2G and 5G on one coupon: 6 bend specimens in all.' : 'Pipe welded in 5G or 6G: 4 bend specimens in all.', basis: 'verified' })
  return { count, reasons }
}
