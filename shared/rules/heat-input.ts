import type { Basis, Reason, RuleContext } from './types'
import { refuse } from './refusal'

export interface HeatInputInput {
  volts?: number
  amps?: number
  travelSpeed?: number
  energy?: number
  power?: number
  arcTime?: number
  weldLength?: number
}

export type HeatInputMethod = 'volts-amps' | 'energy' | 'power'

export interface HeatInputResult {
  heatInput: number
  perUnit: 'J/in' | 'J/mm'
  method: HeatInputMethod
  reasons: Reason[]
}

/** The clause a code gives for heat input; null where the code carries no formula of its own. */
export interface HeatInputClauses {
  voltsAmps: string
  energyOrPower: string
  basis: Basis
}

export const asmeHeatInputClauses: HeatInputClauses = {
  // ASME IX QW-409.1(a): J/in = V × A × 60 / travel speed (in/min); no arc-efficiency factor.
  voltsAmps: 'QW-409.1(a)',
  // ASME IX QW-409.1(c): J/in = energy / weld length, or power × arc time / weld length.
  energyOrPower: 'QW-409.1(c)',
  basis: 'verified',
}

export const arcEnergyClauses: HeatInputClauses = {
  voltsAmps: 'arc energy, V × A × 60 / travel speed (common practice; no thermal efficiency factor)',
  energyOrPower: 'arc energy, energy / weld length (common practice; no thermal efficiency factor)',
  basis: 'convention',
}

function roundMicro(value: number): number {
  return Math.round(value * 1e6) / 1e6
}

export function heatInput(input: HeatInputInput, context: RuleContext, clauses: HeatInputClauses): HeatInputResult {
  const perUnit = context.unit === 'in' ? 'J/in' : 'J/mm'
  const u = context.unit
  const { volts, amps, travelSpeed, energy, power, arcTime, weldLength } = input
  if (volts !== undefined && amps !== undefined && travelSpeed !== undefined) {
    const value = roundMicro((volts * amps * 60) / travelSpeed)
    return {
      heatInput: value,
      perUnit,
      method: 'volts-amps',
      reasons: [{
        clause: clauses.voltsAmps,
        text: `${volts} V × ${amps} A × 60 / ${travelSpeed} ${u}/min = ${value} ${perUnit}.`,
        basis: clauses.basis,
      }],
    }
  }
  if (energy !== undefined && weldLength !== undefined) {
    const value = roundMicro(energy / weldLength)
    return {
      heatInput: value,
      perUnit,
      method: 'energy',
      reasons: [{
        clause: clauses.energyOrPower,
        text: `${energy} J / ${weldLength} ${u} = ${value} ${perUnit} (energy method, for waveform-controlled welding).`,
        basis: clauses.basis,
      }],
    }
  }
  if (power !== undefined && arcTime !== undefined && weldLength !== undefined) {
    const value = roundMicro((power * arcTime) / weldLength)
    return {
      heatInput: value,
      perUnit,
      method: 'power',
      reasons: [{
        clause: clauses.energyOrPower,
        text: `${power} W × ${arcTime} s / ${weldLength} ${u} = ${value} ${perUnit} (power method).`,
        basis: clauses.basis,
      }],
    }
  }
  return refuse('heat-input: give volts, amps and travelSpeed; or energy and weldLength; or power, arcTime and weldLength')
}
