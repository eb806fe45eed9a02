import { convertLength } from '../rules/units'
import type { Unit } from '../rules/types'
import type { StartingPoint, TrialBead, TrialSeries } from '../schemas/trials'

export type StartingRow = StartingPoint & { id: number }

export interface NearestStart {
  row: StartingRow
  /** What matched and what differs, in plain words. */
  notes: string[]
}

const same = (a: string | null, b: string | null) => (a ?? '').trim().toLowerCase() === (b ?? '').trim().toLowerCase()

/**
 * The shop's starting row nearest a series: the same process (and transfer when both state one), then the smallest
 * relative difference of wire diameter and thickness (each |a − b| / b, in inches), a different gas counting as a
 * quarter. Null when no row is for the process. A starting point is a place to begin the trials, never a qualified value.
 */
export function nearestStartingPoint(series: Pick<TrialSeries, 'process' | 'transfer' | 'wireDiameter' | 'thickness' | 'gas' | 'unit'>, rows: readonly StartingRow[]): NearestStart | null {
  const inInches = (value: number, unit: Unit) => convertLength(value, unit, 'in')
  const wire = inInches(series.wireDiameter, series.unit)
  const thick = inInches(series.thickness, series.unit)
  const candidates = rows.filter(r => r.process === series.process && (!r.transfer || !series.transfer || r.transfer === series.transfer))
  let best: { row: StartingRow, score: number } | null = null
  for (const row of candidates) {
    const rowWire = inInches(row.wireDiameter, row.unit)
    const rowThick = inInches(row.thickness, row.unit)
    const score = Math.abs(rowWire - wire) / wire + Math.abs(rowThick - thick) / thick + (same(row.gas, series.gas) ? 0 : 0.25)
    if (!best || score < best.score || (score === best.score && row.id < best.row.id)) best = { row, score }
  }
  if (!best) return null
  const { row } = best
  const notes: string[] = []
  if (inInches(row.wireDiameter, row.unit) !== wire) notes.push(`its wire is ${row.wireDiameter} ${row.unit}, the series' ${series.wireDiameter} ${series.unit}`)
  if (inInches(row.thickness, row.unit) !== thick) notes.push(`its thickness is ${row.thickness} ${row.unit}, the series' ${series.thickness} ${series.unit}`)
  if (!same(row.gas, series.gas)) notes.push(`its gas is ${row.gas ?? 'not stated'}`)
  return { row, notes }
}

/** The first bead offered from a starting row, converted into the series' unit. */
export function firstBeadFrom(row: StartingRow, unit: Unit): Pick<TrialBead, 'volts' | 'wireFeed' | 'amps' | 'ctwd' | 'travelSpeed'> {
  const length = (v: number | null) => (v === null ? null : Math.round(convertLength(v, row.unit, unit) * 1000) / 1000)
  return { volts: row.volts, wireFeed: length(row.wireFeed)!, amps: row.amps, ctwd: length(row.ctwd), travelSpeed: length(row.travelSpeed) }
}

export interface FarOutside {
  field: 'amps' | 'volts' | 'wireFeed'
  text: string
  basis: 'common practice' | 'Rootface threshold'
}

/**
 * Flags for a bead far from where the trials would be expected to be. For short-circuit GMAW the rule of thumb is
 * about 1 A per 0.001 in of thickness (common practice); "far" is below half or above twice that current, a threshold
 * Rootface chose to prompt a look, not a limit. Against the starting row: more than 2 V or more than 40 % of its wire
 * feed speed away (Rootface threshold). These are prompts, never a verdict on the bead.
 */
export function farOutside(bead: Pick<TrialBead, 'volts' | 'wireFeed' | 'amps'>, series: Pick<TrialSeries, 'process' | 'transfer' | 'thickness' | 'unit'>, start: StartingRow | null): FarOutside[] {
  const flags: FarOutside[] = []
  if (series.process === 'GMAW' && series.transfer === 'short-circuit' && bead.amps !== null) {
    const thousandths = convertLength(series.thickness, series.unit, 'in') * 1000
    const thumb = Math.round(thousandths)
    if (bead.amps < thumb / 2 || bead.amps > thumb * 2) {
      flags.push({ field: 'amps', basis: 'common practice', text: `${bead.amps} A is far from the rule of thumb of about 1 A per 0.001 in of thickness (about ${thumb} A here): look again at the settings.` })
    }
  }
  if (start) {
    const wfs = Math.round(convertLength(start.wireFeed, start.unit, series.unit) * 1000) / 1000
    if (Math.abs(bead.volts - start.volts) > 2) flags.push({ field: 'volts', basis: 'Rootface threshold', text: `${bead.volts} V is more than 2 V from the starting point's ${start.volts} V.` })
    if (Math.abs(bead.wireFeed - wfs) > 0.4 * wfs) flags.push({ field: 'wireFeed', basis: 'Rootface threshold', text: `${bead.wireFeed} ${series.unit}/min is more than 40 % from the starting point's ${wfs} ${series.unit}/min.` })
  }
  return flags
}
