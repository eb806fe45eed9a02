import type { Unit } from '../types'
import { formatLength, pick } from '../units'
import { asme } from './limits'

export interface DiameterBand {
  min: number
  max: null
  text: string
}

/**
 * QW-452.3 (groove) and QW-452.4 (small-diameter fillet): the same three OD bands.
 * The table reads "under 1 in", "1 to 2-7/8 in" and "over 2-7/8 in": an OD of exactly 2-7/8 in
 * is in the middle band and qualifies down to 1 in.
 */
export function diameterBand(od: number, unit: Unit): DiameterBand {
  const one = pick(asme.od1, unit)
  const two78 = pick(asme.od2_7_8, unit)
  const f = (m: number) => formatLength(m, unit)
  if (od < one) return { min: od, max: null, text: `OD ${f(od)} is under ${f(one)}: the size welded and over` }
  if (od <= two78) return { min: one, max: null, text: `OD ${f(od)} is in the ${f(one)} to ${f(two78)} band: ${f(one)} OD and over` }
  return { min: two78, max: null, text: `OD ${f(od)} is over ${f(two78)}: ${f(two78)} OD and over` }
}
