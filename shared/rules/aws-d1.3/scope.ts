import type { Unit } from '../types'
import { formatLength, pick, printed, toMicro } from '../units'

/** AWS D1.3 covers sheet steel of 3/16 in (4.8 mm) or less; D1.1 sends metal under 1/8 in here. */
export const d13ScopeMax = printed('3/16', 4.8)

export function withinD13Scope(thickness: number, unit: Unit): boolean {
  return toMicro(thickness) <= pick(d13ScopeMax, unit)
}

export function scopeText(thickness: number, unit: Unit): string {
  return `${thickness} ${unit} is over ${formatLength(pick(d13ScopeMax, unit), unit)}, outside AWS D1.3 (sheet steel): qualify it under AWS D1.1 (code "aws-d1.1")`
}
