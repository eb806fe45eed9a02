/**
 * Reading a length as the trade writes it: decimals (0.375, .375, 9,5), fractions (3/8), mixed numbers (1-1/2, 1 1/2)
 * and a unit written after the number (in, ", mm). A number with the other unit than the field's is not taken as
 * typed: the answer says so, with the converted value, so the form can ask before it changes anything.
 */
export type LengthUnit = 'in' | 'mm'

export type LengthReading
  = | { kind: 'empty' }
    | { kind: 'length', value: number }
    | { kind: 'other-unit', typed: number, typedUnit: LengthUnit, value: number }
    | { kind: 'unreadable', message: string }

const unitWords: Record<string, LengthUnit> = { 'in': 'in', 'inch': 'in', 'inches': 'in', '"': 'in', '″': 'in', 'mm': 'mm' }

/** "3/8" → 0.375, "1-1/2" and "1 1/2" → 1.5, "0.375", ".375", "9,5" → 9.5; anything else → null. */
function readNumber(text: string): number | null {
  const decimal = /^(\d+(?:[.,]\d*)?|[.,]\d+)$/.exec(text)
  if (decimal) return Number(decimal[1]!.replace(',', '.'))
  const fraction = /^(?:(\d+)(?:\s+|-))?(\d+)\/(\d+)$/.exec(text)
  if (fraction) {
    const whole = fraction[1] === undefined ? 0 : Number(fraction[1])
    const numerator = Number(fraction[2])
    const denominator = Number(fraction[3])
    if (denominator === 0) return null
    return whole + numerator / denominator
  }
  return null
}

/**
 * Converts to the field's unit, rounded to what that unit prints (2 decimals of a millimetre, 4 of an inch). The scale
 * is applied with whole factors (in → mm × 2540 / 100), so 3/8 in gives 952.5 hundredths exactly and rounds to 9.53.
 */
function converted(value: number, to: LengthUnit): number {
  return to === 'mm' ? Math.round(value * 2540) / 100 : Math.round(value * 100_000 / 254) / 10_000
}

export function readLength(input: string, fieldUnit: LengthUnit): LengthReading {
  const text = input.trim().replace(/\s+/g, ' ')
  if (text === '') return { kind: 'empty' }
  const match = /^(.*?)\s*(mm|inches|inch|in|"|″)?$/i.exec(text)
  const numberText = (match?.[1] ?? text).trim()
  const unitText = match?.[2]?.toLowerCase()
  const value = readNumber(numberText)
  if (value === null || !Number.isFinite(value)) {
    return { kind: 'unreadable', message: `"${input.trim()}" is not a length: write a decimal (0.375), a fraction (3/8) or a mixed number (1-1/2)` }
  }
  const typedUnit = unitText === undefined ? fieldUnit : unitWords[unitText]!
  if (typedUnit === fieldUnit) return { kind: 'length', value }
  return { kind: 'other-unit', typed: value, typedUnit, value: converted(value, fieldUnit) }
}
