import type { Unit } from '../rules/types'

/** A wire diameter as the trade writes it: three decimals of an inch (0.030 in), one or two of a millimetre (0.8 mm). */
export function wireSize(diameter: number, unit: Unit | string): string {
  return unit === 'in' ? `${diameter.toFixed(3)} in` : `${diameter} mm`
}
