import type { CodeId, Unit } from '../rules/types'
import { mustEvaluate } from './evaluate'

/** Tensile strength from load and cross-section, against the base metal's specified minimum. */
export function tensileOf(input: { width: number, thickness: number, load: number, minimumStrength: number, unit: Unit, code?: CodeId }) {
  const { width, thickness, load, minimumStrength } = input
  return mustEvaluate<{ strength: number, accepted: boolean }>(input.code ?? 'asme-ix', 'tensile', input.unit, undefined, { width, thickness, load, minimumStrength })
}
