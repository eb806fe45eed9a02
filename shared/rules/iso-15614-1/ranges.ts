import type { Range, Reason } from '../types'
import { fromMicro, scale, toMicro } from '../units'
import { refuse } from '../refusal'

/**
 * ISO 15614-1:2017 (level 2, arc welding of steels): the range of qualification a welding procedure test (WPQR) gives.
 * Every value here is FROM MEMORY of clause 8 and its tables (no public copy of the tables was read); each reason says
 * "memory" and names the clause it is remembered from. Where memory offers a wider and a narrower reading, the narrower
 * one is kept (house rule: never a false yes). Millimetres, °C, heat input in kJ/mm.
 */
export interface WpqrTestPiece {
  /** ISO 4063 process number(s), root first. */
  processes: string[]
  form: 'plate' | 'pipe'
  /** Test piece thickness t (mm). */
  thickness: number
  /** Outside diameter D (mm), pipe only. */
  outsideDiameter?: number
  /** Single-run or multi-run (Table 6 has a column for each); multi-run when not given. */
  runs?: 'single' | 'multi'
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
  /** Preheat used (°C) and the highest interpass temperature reached (°C). */
  preheat?: number
  interpassMax?: number
  /** Post-weld heat treatment: none, or its holding temperature (°C) and time (h). */
  pwht?: { done: boolean, temperature?: number, hours?: number }
  /** Filler designation (e.g. ISO 14341-A G 42 4 M21 3Si1). */
  filler?: string
  /** Filler group FM1–FM6 as "1"…"6" (the grouping of ISO 9606-1 Table 2, carried for reference). */
  fillerGroup?: string
}

export type WpqrReason = Reason & { variable: WpqrVariable }
export type WpqrVariable = 'thickness' | 'diameter' | 'position' | 'process' | 'material' | 'heat-input' | 'preheat' | 'interpass' | 'pwht' | 'filler'

export interface WpqrRanges {
  processes: string[]
  thickness: Range
  diameter: Range | null
  positions: string[]
  materialGroups: string[] | null
  heatInput: Range | null
  preheatMin: number | null
  interpassMax: number | null
  pwht: { done: boolean, temperature: Range | null, hours: number | null } | null
  filler: { designation: string, group: string | null } | null
  reasons: WpqrReason[]
}

const m = (v: number) => toMicro(v)
const back = (v: number) => fromMicro(v)

/**
 * ISO 15614-1:2017 Table 6 (from memory), butt welds, test piece thickness t → range of qualification:
 * multi-run: t ≤ 3: 0.7t to 2t; 3 < t ≤ 12: 3 to 2t; 12 < t ≤ 100: 0.5t to 2t; t > 100: 50 to 2t.
 * single-run: t ≤ 3: 0.7t to 1.3t; 3 < t ≤ 12: 0.5t (3 minimum) to 1.3t; 12 < t ≤ 100: 0.5t to 1.1t; t > 100: not qualified.
 */
export function thicknessRange(t: number, runs: 'single' | 'multi' = 'multi'): Range {
  if (!(t > 0)) refuse('thickness: give the test piece thickness in mm')
  const tm = m(t)
  if (runs === 'single') {
    if (tm <= m(3)) return { min: back(scale(tm, 7, 10)), max: back(scale(tm, 13, 10)) }
    if (tm <= m(12)) return { min: back(Math.max(scale(tm, 1, 2), m(3))), max: back(scale(tm, 13, 10)) }
    if (tm <= m(100)) return { min: back(scale(tm, 1, 2)), max: back(scale(tm, 11, 10)) }
    refuse('thickness: Table 6 gives no single-run range over 100 mm (from memory): check by hand')
  }
  if (tm <= m(3)) return { min: back(scale(tm, 7, 10)), max: back(2 * tm) }
  if (tm <= m(12)) return { min: 3, max: back(2 * tm) }
  if (tm <= m(100)) return { min: back(scale(tm, 1, 2)), max: back(2 * tm) }
  return { min: 50, max: back(2 * tm) }
}

/** ISO 15614-1:2017 Table 7 (from memory): outside diameter D → D ≤ 25: 0.5D to 2D; D > 25: 0.5D and over, 25 mm minimum. */
export function diameterRange(D: number): Range {
  if (!(D > 0)) refuse('outsideDiameter: give the outside diameter in mm')
  const d = m(D)
  if (d <= m(25)) return { min: back(scale(d, 1, 2)), max: back(2 * d) }
  return { min: back(Math.max(scale(d, 1, 2), m(25))), max: null }
}

const allPositions = ['PA', 'PB', 'PC', 'PD', 'PE', 'PF', 'PG', 'PH', 'PJ', 'H-L045', 'J-L045']
const down = ['PG', 'PJ', 'J-L045']

/**
 * ISO 15614-1:2017, 8.4.2 (from memory): welding in one position qualifies all positions except the vertical-down ones
 * (PG, PJ, J-L045), which need their own test and qualify only themselves.
 */
export function positionRange(positions: string[]): string[] {
  const set = new Set<string>()
  for (const p of positions.map(x => x.toUpperCase())) {
    if (!allPositions.includes(p)) refuse(`positions: ${p} is not an ISO 6947 position`)
    if (down.includes(p)) set.add(p)
    else allPositions.filter(x => !down.includes(x)).forEach(x => set.add(x))
  }
  return allPositions.filter(p => set.has(p))
}

/** ISO 15614-1:2017, 8.4.8 (from memory): impact tests cap heat input at +25 % of the highest used; hardness tests floor it at −25 % of the lowest. */
export function heatInputRange(input: Pick<WpqrTestPiece, 'impactTested' | 'hardnessTested' | 'heatInputMax' | 'heatInputMin'>): Range | null {
  if (!input.impactTested && !input.hardnessTested) return null
  return {
    min: input.hardnessTested && input.heatInputMin !== undefined ? back(scale(m(input.heatInputMin), 3, 4)) : null,
    max: input.impactTested && input.heatInputMax !== undefined ? back(scale(m(input.heatInputMax), 5, 4)) : null,
  }
}

/** ISO 15614-1:2017, 8.4.9 (from memory): the PWHT as tested, holding temperature within ±20 °C; adding or removing it needs a new test. */
export function pwhtRange(pwht: WpqrTestPiece['pwht']): WpqrRanges['pwht'] {
  if (!pwht) return null
  if (!pwht.done) return { done: false, temperature: null, hours: null }
  return { done: true, temperature: pwht.temperature === undefined ? null : { min: pwht.temperature - 20, max: pwht.temperature + 20 }, hours: pwht.hours ?? null }
}

const r = (variable: WpqrVariable, clause: string, text: string): WpqrReason => ({ variable, clause, text, basis: 'memory' })

/** What a WPQR test piece qualifies (ISO 15614-1:2017 clause 8, all from memory), one reason per variable with its clause. */
export function wpqrRanges(input: WpqrTestPiece): WpqrRanges {
  if (!input.processes.length) refuse('processes: name the ISO 4063 process(es) of the test')
  const runs = input.runs ?? 'multi'
  const reasons: WpqrReason[] = []
  const thickness = thicknessRange(input.thickness, runs)
  reasons.push(r('thickness', 'ISO 15614-1:2017, 8.3.2.1, Table 6', `Test piece t = ${input.thickness} mm, ${runs}-run, qualifies ${thickness.min} to ${thickness.max} mm.`))
  let diameter: Range | null = null
  if (input.form === 'pipe') {
    if (input.outsideDiameter === undefined) refuse('outsideDiameter: a pipe test piece needs its outside diameter')
    diameter = diameterRange(input.outsideDiameter)
    reasons.push(r('diameter', 'ISO 15614-1:2017, 8.3.2.2, Table 7', `D = ${input.outsideDiameter} mm qualifies ${diameter.min} mm${diameter.max === null ? ' and over' : ` to ${diameter.max} mm`}.`))
  }
  else reasons.push(r('diameter', 'ISO 15614-1:2017, 8.3.2.2', 'A plate test piece qualifies pipe over 500 mm outside diameter (and over 150 mm welded in PA or PC, rotated: check by hand).'))
  const positions = positionRange(input.positions)
  reasons.push(r('position', 'ISO 15614-1:2017, 8.4.2', `Welded in ${input.positions.join(', ')}: qualifies ${positions.join(', ')}.`))
  reasons.push(r('process', 'ISO 15614-1:2017, 8.4.1', `Each process qualifies itself only, in the order tested: ${input.processes.join(' + ')}.`))
  const materialGroups = input.materialGroup ? [input.materialGroup] : null
  reasons.push(r('material', 'ISO 15614-1:2017, 8.3.1.1, Table 3', input.materialGroup ? `Parent metal group ${input.materialGroup} (ISO/TR 15608); the other groups Table 3 lets it qualify are not carried: check by hand.` : 'Parent metal group not recorded: cannot tell, record it.'))
  const heatInput = heatInputRange(input)
  reasons.push(r('heat-input', 'ISO 15614-1:2017, 8.4.8', heatInput
    ? `Impact tests: up to 25 % above the highest heat input used; hardness tests: down to 25 % below the lowest (${heatInput.min ?? '—'} to ${heatInput.max ?? '—'} kJ/mm).`
    : 'No impact or hardness tests: heat input is not limited by the test.'))
  const preheatMin = input.preheat ?? null
  reasons.push(r('preheat', 'ISO 15614-1:2017, 8.4.6', preheatMin === null ? 'Preheat not recorded: cannot tell, record it.' : `Preheat not lower than the ${preheatMin} °C used.`))
  const interpassMax = input.interpassMax ?? null
  reasons.push(r('interpass', 'ISO 15614-1:2017, 8.4.7', interpassMax === null ? 'Interpass temperature not recorded: cannot tell, record it.' : `Interpass not over the ${interpassMax} °C reached in the test (the narrower reading kept).`))
  const pwht = pwhtRange(input.pwht)
  reasons.push(r('pwht', 'ISO 15614-1:2017, 8.4.9', !pwht ? 'PWHT not recorded: cannot tell, record it.' : !pwht.done ? 'As welded: adding a PWHT needs a new test.' : `PWHT as tested${pwht.temperature ? `, held at ${pwht.temperature.min} to ${pwht.temperature.max} °C` : ''}${pwht.hours !== null ? `, ${pwht.hours} h (holding time related to the product: check by hand)` : ''}; removing it needs a new test.`))
  const filler = input.filler ? { designation: input.filler.trim(), group: input.fillerGroup ?? null } : null
  reasons.push(r('filler', 'ISO 15614-1:2017, 8.4.4', filler ? `Filler ${filler.designation}${filler.group ? ` (FM${filler.group})` : ''}: the same designation; another designation needs a check by hand.` : 'Filler not recorded: cannot tell, record it.'))
  return { processes: [...input.processes], thickness, diameter, positions, materialGroups, heatInput, preheatMin, interpassMax, pwht, filler, reasons }
}
