import type { Reason, RuleContext } from './types'

export interface TensileInput {
  width: number
  thickness: number
  load: number
  minimumStrength: number
}

export interface TensileResult {
  strength: number
  area: number
  accepted: boolean
  reasons: Reason[]
}

/** Decimal inputs as exact integers scaled by 1e6, for a comparison free of float error. */
function scaled(value: number): bigint {
  return BigInt(Math.round(value * 1e6))
}

/**
 * Tensile strength of a reduced-section specimen = load / (width × thickness): lbf/in² (psi)
 * or N/mm² (MPa). ASME IX QW-153.1 (from memory): the specimen passes when its strength is not
 * less than the specified minimum tensile strength of the base metal.
 */
export function tensileStrength(input: TensileInput, context: RuleContext): TensileResult {
  const area = input.width * input.thickness
  const strength = Math.round((input.load / area) * 1000) / 1000
  // load / (w × t) >= min  ⇔  load × 1e12 >= min × w × t, all scaled by 1e6.
  const accepted = scaled(input.load) * BigInt(1e12) // a call, not a literal: the browser build targets ES2019
    >= scaled(input.minimumStrength) * scaled(input.width) * scaled(input.thickness)
  const stress = context.unit === 'in' ? 'psi' : 'MPa'
  const force = context.unit === 'in' ? 'lbf' : 'N'
  const u = context.unit
  const asme = context.code === 'asme-ix'
  return {
    strength,
    area: Math.round(area * 1e9) / 1e9,
    accepted,
    reasons: [
      {
        clause: 'strength = load / (width × thickness)',
        text: `${input.load} ${force} / (${input.width} ${u} × ${input.thickness} ${u}) = ${strength} ${stress}.`,
        basis: 'convention',
      },
      {
        clause: asme ? 'QW-153.1' : 'specified minimum tensile strength (common practice)',
        text: accepted
          ? `${strength} ${stress} is not less than the specified minimum of ${input.minimumStrength} ${stress}: accepted.`
          : `${strength} ${stress} is below the specified minimum of ${input.minimumStrength} ${stress}: rejected.`,
        basis: asme ? 'memory' : 'convention',
      },
    ],
  }
}
