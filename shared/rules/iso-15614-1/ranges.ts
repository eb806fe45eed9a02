import type { Range, Reason } from '../types'
import { fromMicro, scale, toMicro } from '../units'
import { refuse } from '../refusal'

/**
 * ISO 15614-1 (2017, with A1:2019): the range of approval a welding procedure test (WPQR) gives, for arc welding of
 * steels (level 2). Every value here is FROM MEMORY of clause 8 and its tables: no public copy was read; each reason says
 * "memory". Millimetres and °C. Heat input in kJ/mm.
 */
export interface WpqrTestPiece {
  /** ISO 4063 process number(s), root first. */
  processes: string[]
  form: 'plate' | 'pipe'
  /** Test piece thickness t (mm). */
  thickness: number
  /** Outside diameter D (mm), pipe only. */
  outsideDiameter?: number
  /** ISO 6947 positions welded. */
  positions: string[]
  /** ISO/TR 15608 group of the parent metal (e.g. "1.2", "8.1"). */
  materialGroup?: string
  /** Heat input used (kJ/mm): the highest and lowest of the test. */
  heatInputMax?: number
  heatInputMin?: number
  /** Impact tests required (and done) on the test piece. */
  impactTested?: boolean
  /** Hardness tests required (and done). */
  hardnessTested?: boolean
  /** Preheat used (°C) and the highest interpass temperature (°C). */
  preheat?: number
  interpassMax?: number
  /** Post-weld heat treatment: none, or its temperature (°C) and time (h). */
  pwht?: { done: boolean, temperature?: number, hours?: number }
  /** Filler designation (e.g. ISO 14341-A G 42 4 M21 3Si1) and ISO 9606-1 style group FM1–FM6. */
  filler?: string
}

export interface WpqrRanges {
  processes: string[]
  thickness: Range
  diameter: Range | null
  positions: string[] | 'all'
  materialGroups: string[] | null
  heatInput: Range | null
  preheatMin: number | null
  interpassMax: number | null
  pwht: WpqrTestPiece['pwht'] | null
  filler: string | null
  reasons: Reason[]
}

const m = (v: number) => toMicro(v)
const back = (v: number | null) => (v === null ? null : fromMicro(v))

/** ISO 15614-1 Table 6 (from memory): butt welds, test piece thickness t → range of approval. */
export function thicknessRange(t: number): Range {
  if (!(t > 0)) refuse('thickness: give the test piece thickness in mm')
  const tm = m(t)
  if (tm <= m(3)) return { min: back(scale(tm, 7, 10)), max: back(scale(tm, 13, 10)) }
  if (tm <= m(12)) return { min: 3, max: back(2 * tm) }
  if (tm <= m(100)) return { min: back(scale(tm, 1, 2)), max: back(2 * tm) }
  return { min: 50, max: back(2 * tm) }
}

/** ISO 15614-1 Table 7 (from memory): outside diameter D → range (D ≤ 25: 0.5D to 2D; D > 25: 0.5D and over, min 25). */
export function diameterRange(D: number): Range {
  const d = m(D)
  if (d <= m(25)) return { min: back(scale(d, 1, 2)), max: back(2 * d) }
  return { min: back(Math.max(scale(d, 1, 2), m(25))), max: null }
}

const allPositions = ['PA', 'PB', 'PC', 'PD', 'PE', 'PF', 'PG', 'PH', 'PJ', 'H-L045', 'J-L045']

/**
 * ISO 15614-1, 8.4.2 (from memory): welding in one position approves all positions, except that vertical-down (PG, PJ,
 * J-L045) approves only itself and is not approved by the others; with impact or hardness tests, the positions of the
 * highest and lowest heat input are to be tested (check by hand).
 */
export function positionRange(positions: string[]): string[] {
  const down = ['PG', 'PJ', 'J-L045']
  const upper = positions.map(p => p.toUpperCase())
  const set = new Set<string>()
  for (const p of upper) {
    if (!allPositions.includes(p)) refuse(`positions: ${p} is not an ISO 6947 position`)
    if (down.includes(p)) set.add(p)
    else allPositions.filter(x => !down.includes(x)).forEach(x => set.add(x))
  }
  return allPositions.filter(p => set.has(p))
}

/** What a WPQR test piece approves (ISO 15614-1 clause 8, all from memory). */
export function wpqrRanges(input: WpqrTestPiece): WpqrRanges {
  const reasons: Reason[] = []
  const thickness = thicknessRange(input.thickness)
  reasons.push({ clause: 'ISO 15614-1, 8.3.2.1, Table 6', text: `Test piece t = ${input.thickness} mm approves ${thickness.min} to ${thickness.max} mm (single run or impact-tested pieces narrow it: check by hand).`, basis: 'memory' })
  let diameter: Range | null = null
  if (input.form === 'pipe') {
    if (input.outsideDiameter === undefined) refuse('outsideDiameter: a pipe test piece needs its outside diameter')
    diameter = diameterRange(input.outsideDiameter)
    reasons.push({ clause: 'ISO 15614-1, 8.3.2.2, Table 7', text: `D = ${input.outsideDiameter} mm approves ${diameter.min} mm${diameter.max === null ? ' and over' : ` to ${diameter.max} mm`}; plate approves pipe over 500 mm (and over 150 mm in PA or PC rotated).`, basis: 'memory' })
  }
  const positions = positionRange(input.positions)
  reasons.push({ clause: 'ISO 15614-1, 8.4.2', text: `Positions approved: ${positions.join(', ')}.`, basis: 'memory' })
  reasons.push({ clause: 'ISO 15614-1, 8.4.1', text: `Each process approves itself only: ${input.processes.join(' + ')} in that order.`, basis: 'memory' })
  const materialGroups = input.materialGroup ? [input.materialGroup] : null
  reasons.push({ clause: 'ISO 15614-1, 8.3.1.1, Table 3', text: input.materialGroup ? `Parent metal group ${input.materialGroup}; the groups of Table 3 that it also approves are not computed: check by hand.` : 'Parent metal group not recorded: cannot tell.', basis: 'memory' })
  let heatInput: Range | null = null
  if (input.impactTested || input.hardnessTested) {
    heatInput = {
      min: input.hardnessTested && input.heatInputMin !== undefined ? back(scale(m(input.heatInputMin), 3, 4)) : null,
      max: input.impactTested && input.heatInputMax !== undefined ? back(scale(m(input.heatInputMax), 5, 4)) : null,
    }
    reasons.push({ clause: 'ISO 15614-1, 8.4.8', text: `With impact tests the upper limit is 25 % above the highest heat input used; with hardness tests the lower limit is 25 % below the lowest (${heatInput.min ?? '—'} to ${heatInput.max ?? '—'} kJ/mm).`, basis: 'memory' })
  }
  else reasons.push({ clause: 'ISO 15614-1, 8.4.8', text: 'No impact or hardness tests: heat input is not limited by the test.', basis: 'memory' })
  const preheatMin = input.preheat ?? null
  reasons.push({ clause: 'ISO 15614-1, 8.4.6', text: preheatMin === null ? 'Preheat not recorded: cannot tell.' : `Preheat not lower than the ${preheatMin} °C used.`, basis: 'memory' })
  const interpassMax = input.interpassMax === undefined ? null : input.interpassMax + 50
  reasons.push({ clause: 'ISO 15614-1, 8.4.7', text: interpassMax === null ? 'Interpass temperature not recorded: cannot tell.' : `Interpass not over ${interpassMax} °C (50 °C above the ${input.interpassMax} °C reached).`, basis: 'memory' })
  reasons.push({ clause: 'ISO 15614-1, 8.4.9', text: input.pwht ? (input.pwht.done ? `PWHT as tested (${input.pwht.temperature ?? '?'} °C, ${input.pwht.hours ?? '?'} h); adding or removing it needs a new test.` : 'As welded: a PWHT needs a new test.') : 'PWHT not recorded: cannot tell.', basis: 'memory' })
  reasons.push({ clause: 'ISO 15614-1, 8.4.4', text: input.filler ? `Filler ${input.filler}: the same designation (check by hand any change of make with impact tests).` : 'Filler not recorded: cannot tell.', basis: 'memory' })
  return {
    processes: [...input.processes], thickness, diameter, positions, materialGroups, heatInput, preheatMin, interpassMax,
    pwht: input.pwht ?? null, filler: input.filler ?? null, reasons,
  }
}
