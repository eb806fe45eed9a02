import type { Range, Reason, Unit } from './types'
import { refuse } from './refusal'
import { toMicro } from './units'

/** The production settings a WPS states as a window and a welder's reading is checked against. */
export const readingParameters = ['volts', 'amps', 'wireFeedSpeed', 'travelSpeed', 'ctwd', 'gasFlow'] as const
export type ReadingParameter = typeof readingParameters[number]

export type ReadingWindow = Partial<Record<ReadingParameter, Range>>
export type ReadingValues = Partial<Record<ReadingParameter, number>>

export interface ReadingsInput {
  window: ReadingWindow
  readings: ReadingValues
}

export interface ReadingCheck {
  parameter: ReadingParameter
  value: number
  limit: Range
  within: boolean
  text: string
}

export interface ReadingsResult {
  within: boolean
  checks: ReadingCheck[]
  reasons: Reason[]
}

const names: Record<ReadingParameter, string> = {
  volts: 'Arc voltage',
  amps: 'Current',
  wireFeedSpeed: 'Wire feed speed',
  travelSpeed: 'Travel speed',
  ctwd: 'Contact-tip-to-work distance',
  gasFlow: 'Shielding gas flow',
}

function unitOf(parameter: ReadingParameter, unit: Unit): string {
  switch (parameter) {
    case 'volts': return 'V'
    case 'amps': return 'A'
    case 'wireFeedSpeed':
    case 'travelSpeed': return `${unit}/min`
    case 'ctwd': return unit
    case 'gasFlow': return unit === 'in' ? 'ft³/h' : 'L/min'
  }
}

function describe(limit: Range, label: string): string {
  if (limit.min !== null && limit.max !== null) return `${limit.min} to ${limit.max} ${label}`
  if (limit.min !== null) return `at least ${limit.min} ${label}`
  if (limit.max !== null) return `at most ${limit.max} ${label}`
  return 'no limit'
}

/** Production readings against the WPS window: each reading in or out, with the limit it was held to. */
export function checkReadings(input: ReadingsInput, unit: Unit): ReadingsResult {
  const checks: ReadingCheck[] = []
  for (const parameter of readingParameters) {
    const value = input.readings[parameter]
    if (value === undefined) continue
    const limit = input.window[parameter]
    if (!limit) refuse(`readings: the WPS window gives no ${names[parameter].toLowerCase()} to check ${value} against`)
    const v = toMicro(value)
    // Compared in micro-units so 18.0 V against an 18 V limit is exact.
    const within = (limit.min === null || v >= toMicro(limit.min)) && (limit.max === null || v <= toMicro(limit.max))
    const label = unitOf(parameter, unit)
    const range = describe(limit, label)
    checks.push({
      parameter,
      value,
      limit,
      within,
      text: within
        ? `${names[parameter]} ${value} ${label} is within the WPS window (${range}).`
        : `${names[parameter]} ${value} ${label} is outside the WPS window (${range}): a nonconformance.`,
    })
  }
  if (checks.length === 0) refuse('readings: give at least one reading')
  const within = checks.every(check => check.within)
  return {
    within,
    checks,
    reasons: checks.map(check => ({ clause: 'WPS', text: check.text, basis: 'convention' as const })),
  }
}
