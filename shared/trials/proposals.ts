import type { Range, Unit } from '../rules/types'
import type { TrialBead, TrialSeries } from '../schemas/trials'
import type { BeadHeatInput, BeadVerdict } from './beads'
import { beadTravelSpeed } from './beads'
import { convexHull, hullCentre } from './hull'
import { wireSize } from './words'

/** A bead as the proposals read it: its number, values, verdict and heat input. */
export type JudgedBead = Pick<TrialBead, 'volts' | 'wireFeed' | 'amps' | 'ctwd' | 'travelSpeed' | 'beadLength' | 'arcTime' | 'gasFlow'> & {
  number: number
  verdict: BeadVerdict['kind']
  heat: BeadHeatInput
}

/** One proposed value and where it came from, shown beside it before anything is created. */
export interface Proposed {
  field: string
  label: string
  value: number | string | null
  unit: string
  source: string
}

export interface PqrProposal {
  /** The accepted bead whose values the coupon is welded at. */
  bead: number
  values: Proposed[]
  layer: {
    volts: number
    wireFeed: number
    amps: number | null
    ctwd: number | null
    travelSpeed: number | null
    heatInput: number | null
    gasFlow: number | null
  }
}

const accepted = (beads: readonly JudgedBead[]) => beads.filter(b => b.verdict === 'accepted')

/**
 * The values to weld the PQR coupon at: those of the accepted bead nearest the centre of the accepted region in the
 * volts × wire feed plane (each axis scaled by the span of the accepted beads, so volts and in/min weigh alike), so
 * the window later drawn around the coupon has room on every side. Null when no bead is accepted.
 */
export function proposePqr(series: Pick<TrialSeries, 'unit' | 'wireDiameter' | 'wireClass' | 'gas' | 'gasFlow' | 'thickness' | 'baseMetal' | 'position'>, beads: readonly JudgedBead[]): PqrProposal | null {
  const good = accepted(beads)
  if (!good.length) return null
  const centre = hullCentre(convexHull(good.map(b => ({ x: b.volts, y: b.wireFeed }))))!
  const span = (values: number[]) => (Math.max(...values) - Math.min(...values)) || 1
  const sx = span(good.map(b => b.volts))
  const sy = span(good.map(b => b.wireFeed))
  const distance = (b: JudgedBead) => Math.hypot((b.volts - centre.x) / sx, (b.wireFeed - centre.y) / sy)
  const bead = [...good].sort((a, b) => distance(a) - distance(b) || a.number - b.number)[0]!
  const u = series.unit
  const from = `bead ${bead.number} (the accepted bead nearest the centre of the accepted region)`
  const heat = bead.heat.kind === 'value' ? bead.heat.heatInput : null
  const travel = beadTravelSpeed(bead)
  const gasFlow = bead.gasFlow ?? series.gasFlow
  const values: Proposed[] = [
    { field: 'volts', label: 'Voltage', value: bead.volts, unit: 'V', source: from },
    { field: 'wireFeed', label: 'Wire feed speed', value: bead.wireFeed, unit: `${u}/min`, source: from },
    { field: 'amps', label: 'Current', value: bead.amps, unit: 'A', source: bead.amps === null ? 'not read on that bead: record it on the coupon' : from },
    { field: 'ctwd', label: 'CTWD', value: bead.ctwd, unit: u, source: bead.ctwd === null ? 'not recorded on that bead' : from },
    { field: 'travelSpeed', label: 'Travel speed', value: travel, unit: `${u}/min`, source: travel === null ? 'not recorded on that bead' : bead.travelSpeed === null ? `${from}: bead length × 60 / arc time` : from },
    { field: 'heatInput', label: 'Heat input', value: heat, unit: u === 'in' ? 'J/in' : 'J/mm', source: bead.heat.kind === 'value' ? `${from}, ${bead.heat.reasons[0]?.clause ?? 'QW-409.1'}` : `cannot tell: ${bead.heat.because}` },
    { field: 'gasFlow', label: 'Gas flow', value: gasFlow, unit: u === 'in' ? 'ft³/h' : 'L/min', source: bead.gasFlow !== null ? from : 'the series header' },
    { field: 'gas', label: 'Gas', value: series.gas, unit: '', source: 'the series header' },
    { field: 'filler', label: 'Wire', value: `${series.wireClass} × ${wireSize(series.wireDiameter, u)}`, unit: '', source: 'the series header' },
    { field: 'couponThickness', label: 'Coupon thickness', value: series.thickness, unit: u, source: 'the series header (the sheet the trials were run on)' },
    { field: 'position', label: 'Position', value: series.position, unit: '', source: 'the series header' },
  ]
  return { bead: bead.number, values, layer: { volts: bead.volts, wireFeed: bead.wireFeed, amps: bead.amps, ctwd: bead.ctwd, travelSpeed: travel, heatInput: heat, gasFlow } }
}

/** What the certified PQR qualifies and was welded at, as the WPS proposal clips to it (lengths in the series' unit). */
export interface PqrLimits {
  number: string
  /** Base-metal thickness qualified (from the rules for the PQR's code, e.g. ASME IX Table QW-451.1). */
  thickness: Range
  thicknessSource: string
  depositMax: number | null
  /** Heat input of the coupon; with toughness tests it is the WPS's limit (ASME IX QW-409.1, supplementary essential). */
  heatInput: number | null
  toughness: boolean
  volts: number | null
  wireFeed: number | null
  ctwd: number | null
  travelSpeed: number | null
  amps: number | null
}

export interface Window {
  min: number | null
  max: number | null
  setPoint: number | null
}

export interface WpsProposal {
  beads: number[]
  dropped: { bead: number, because: string }[]
  volts: Window
  wireFeed: Window
  amps: Window
  ctwd: Window
  travelSpeed: Window
  heatInputMax: number | null
  thickness: Range
  depositMax: number | null
  values: Proposed[]
}

const round = (v: number) => Math.round(v * 1e4) / 1e4

/** A window from the values of the kept beads, with the PQR's value as set point (the window widened to hold it). */
function windowOf(values: (number | null)[], setPoint: number | null): Window {
  const given = values.filter((v): v is number => v !== null)
  if (setPoint !== null) given.push(setPoint)
  if (!given.length) return { min: null, max: null, setPoint: null }
  return { min: round(Math.min(...given)), max: round(Math.max(...given)), setPoint }
}

/**
 * The WPS window from the accepted region, clipped to what the certified PQR qualifies: with toughness tests, beads
 * whose heat input exceeds the coupon's (or cannot be told) are left out and the coupon's heat input is the limit
 * (ASME IX QW-409.1, supplementary essential); the thickness is the range the PQR qualifies; each electrical window
 * spans the kept accepted beads and holds the PQR's value as its set point. Null when no bead is accepted.
 */
export function proposeWpsWindow(unit: Unit, beads: readonly JudgedBead[], pqr: PqrLimits): WpsProposal | null {
  const good = accepted(beads)
  if (!good.length) return null
  const dropped: WpsProposal['dropped'] = []
  const kept = good.filter((b) => {
    if (!pqr.toughness) return true
    if (b.heat.kind !== 'value') {
      dropped.push({ bead: b.number, because: `heat input cannot be told (${b.heat.because}); with toughness tests it may not exceed ${pqr.number}'s` })
      return false
    }
    if (pqr.heatInput !== null && b.heat.heatInput > pqr.heatInput) {
      dropped.push({ bead: b.number, because: `heat input ${b.heat.heatInput} is above ${pqr.number}'s ${pqr.heatInput} (QW-409.1, toughness tested)` })
      return false
    }
    return true
  })
  const region = `accepted beads ${kept.map(b => b.number).join(', ')}`
  const heats = kept.map(b => (b.heat.kind === 'value' ? b.heat.heatInput : null))
  const allHeat = heats.every(h => h !== null) && heats.length > 0
  const heatInputMax = pqr.toughness
    ? pqr.heatInput
    : allHeat ? Math.max(...(heats as number[])) : null
  const heatSource = pqr.toughness
    ? `${pqr.number}'s heat input (QW-409.1: toughness tested, the WPS may not exceed it)`
    : allHeat ? `the highest heat input among the ${region}` : 'cannot tell: a kept bead has no heat input; record amps and travel speed'
  const proposal: WpsProposal = {
    beads: kept.map(b => b.number),
    dropped,
    volts: windowOf(kept.map(b => b.volts), pqr.volts),
    wireFeed: windowOf(kept.map(b => b.wireFeed), pqr.wireFeed),
    amps: windowOf(kept.map(b => b.amps), pqr.amps),
    ctwd: windowOf(kept.map(b => b.ctwd), pqr.ctwd),
    travelSpeed: windowOf(kept.map(b => beadTravelSpeed(b)), pqr.travelSpeed),
    heatInputMax,
    thickness: pqr.thickness,
    depositMax: pqr.depositMax,
    values: [],
  }
  const w = (label: string, field: string, win: Window, u: string) => ({
    field, label, value: win.min === null ? null : `${win.min} – ${win.max}${win.setPoint === null ? '' : ` (set ${win.setPoint})`}`, unit: u,
    source: win.min === null ? 'not recorded on the kept beads' : `${region}; set point from ${pqr.number}`,
  })
  proposal.values = [
    w('Voltage', 'volts', proposal.volts, 'V'),
    w('Wire feed speed', 'wireFeed', proposal.wireFeed, `${unit}/min`),
    w('Current', 'amps', proposal.amps, 'A'),
    w('CTWD', 'ctwd', proposal.ctwd, unit),
    w('Travel speed', 'travelSpeed', proposal.travelSpeed, `${unit}/min`),
    { field: 'heatInputMax', label: 'Heat input limit', value: heatInputMax, unit: unit === 'in' ? 'J/in' : 'J/mm', source: heatSource },
    { field: 'thickness', label: 'Base metal thickness', value: `${pqr.thickness.min ?? '…'} – ${pqr.thickness.max ?? 'no limit'}`, unit, source: pqr.thicknessSource },
    { field: 'depositMax', label: 'Deposit maximum', value: pqr.depositMax, unit, source: pqr.depositMax === null ? 'no deposit limit from the PQR' : `${pqr.number} qualifies it` },
  ]
  return proposal
}
