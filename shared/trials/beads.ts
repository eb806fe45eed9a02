import { asmeHeatInputClauses, heatInput } from '../rules/heat-input'
import { RuleRefusal } from '../rules/refusal'
import type { Reason, Unit } from '../rules/types'
import type { TrialBead } from '../schemas/trials'
import { trialDefectItems, trialScaleItems } from '../vocabulary/trial-results'

/** How a bead came out: accepted, rejected (with what was wrong), or not judged yet (nothing recorded to judge by). */
export type BeadVerdict = { kind: 'accepted' } | { kind: 'rejected', because: string[] } | { kind: 'not-judged', because: string }

/**
 * A bead is accepted when every scale recorded is good or fair, at least one scale is recorded, and no discontinuity
 * is ticked; a required full back penetration that is partial or none rejects it too. A bead with nothing recorded is
 * "not judged": never counted as accepted (Rootface's own rule for trials; the code's acceptance of the coupon is the
 * PQR's tests).
 */
export function beadVerdict(bead: Pick<TrialBead, 'wetting' | 'spatter' | 'arcSound' | 'porosity' | 'undercut' | 'meltThrough' | 'lackOfFusion' | 'backPenetration'>, needsBackPenetration = false): BeadVerdict {
  const because: string[] = []
  for (const item of trialScaleItems) if (bead[item.key] === 'poor') because.push(`${item.label.toLowerCase()} poor`)
  for (const item of trialDefectItems) if (bead[item.key]) because.push(item.label.toLowerCase())
  if (needsBackPenetration && (bead.backPenetration === 'partial' || bead.backPenetration === 'none')) because.push(`back penetration ${bead.backPenetration}`)
  if (because.length) return { kind: 'rejected', because }
  const judged = trialScaleItems.some(item => bead[item.key] !== null)
  if (!judged) return { kind: 'not-judged', because: 'record wetting, spatter or arc sound' }
  if (needsBackPenetration && bead.backPenetration === null) return { kind: 'not-judged', because: 'record the back penetration' }
  return { kind: 'accepted' }
}

export type BeadHeatInput
  = | { kind: 'value', heatInput: number, perUnit: 'J/in' | 'J/mm', method: 'volts-amps' | 'energy' | 'power', travelSpeed: number | null, reasons: Reason[] }
    | { kind: 'cannot-tell', because: string }

const round = (v: number, places: number) => Math.round(v * 10 ** places) / 10 ** places

/**
 * Travel speed in the series' unit per minute: as read, or from the bead length and its arc time (length × 60 / s).
 * Null when neither is recorded.
 */
export function beadTravelSpeed(bead: Pick<TrialBead, 'travelSpeed' | 'beadLength' | 'arcTime'>): number | null {
  if (bead.travelSpeed !== null) return bead.travelSpeed
  if (bead.beadLength !== null && bead.arcTime !== null) return round((bead.beadLength * 60) / bead.arcTime, 4)
  return null
}

/**
 * Heat input of one bead (ASME IX QW-409.1): method (c) when the power source gives the arc energy (J) or the arc
 * power (W) and the bead length is measured, since it also holds for waveform-controlled welding; otherwise method (a)
 * from volts, amps and the travel speed (read, or bead length over arc time). Without amps or a length the answer is
 * "cannot tell", naming what to record.
 */
export function beadHeatInput(bead: Pick<TrialBead, 'volts' | 'amps' | 'travelSpeed' | 'beadLength' | 'arcTime' | 'energy' | 'power'>, unit: Unit): BeadHeatInput {
  const context = { code: 'asme-ix' as const, edition: '2023', unit }
  const travel = beadTravelSpeed(bead)
  const attempt = (input: Parameters<typeof heatInput>[0]) => {
    try {
      const r = heatInput(input, context, asmeHeatInputClauses)
      return { kind: 'value' as const, heatInput: round(r.heatInput, 1), perUnit: r.perUnit, method: r.method, travelSpeed: travel, reasons: r.reasons }
    }
    catch (e) {
      if (e instanceof RuleRefusal) return null
      throw e
    }
  }
  if (bead.energy !== null && bead.beadLength !== null) return attempt({ energy: bead.energy, weldLength: bead.beadLength })!
  if (bead.power !== null && bead.arcTime !== null && bead.beadLength !== null) return attempt({ power: bead.power, arcTime: bead.arcTime, weldLength: bead.beadLength })!
  if (bead.amps !== null && travel !== null) return attempt({ volts: bead.volts, amps: bead.amps, travelSpeed: travel })!
  if (bead.amps === null && bead.energy === null && bead.power === null) return { kind: 'cannot-tell', because: 'record the amps (or the arc energy or power from the power source)' }
  return { kind: 'cannot-tell', because: 'record the travel speed, or the bead length and its arc time' }
}
