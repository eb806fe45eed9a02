import type { Basis } from '../types'
import { printed, type PrintedLength } from '../units'

/**
 * The tables a prequalified AWS D1.1 WPS is held to, as far as Rootface carries them. The 2015 edition puts
 * prequalification in Clause 3, the 2020 and 2025 editions in Clause 5 (with the tables renumbered). Each row says how
 * it was read: 'verified' on a public copy of the table, 'partial' on a secondary page or another edition's table,
 * 'memory' when recalled and not checked. Rows not carried here are "not carried: check by hand", never passed.
 */

export function prequalifiedClause4(edition: string): boolean {
  return Number(edition) <= 2015
}

export function prequalifiedTables(edition: string) {
  const old = prequalifiedClause4(edition)
  return {
    clause: old ? 'clause 3' : 'clause 5',
    // 2015 3.2.1 read on a public copy of the 2000 edition (same words); the 2020 number is not carried.
    processes: old ? '3.2.1' : 'Clause 5, prequalified processes (3.2.1 in 2015)',
    // 2015: Table 3.1 read (pdfcoffee copy of D1.1:2015). 2020: Table 5.3, named on a public study page.
    baseMetals: old ? 'Table 3.1' : 'Table 5.3',
    // 2015: Table 3.2 (named on weldinginspections.net); 2020: Table 5.4 (named on a public study page).
    fillers: old ? 'Table 3.2' : 'Table 5.4',
    // 2015: Table 3.3 read (scribd and pdfcoffee copies of D1.1:2015). 2020: Table 5.8 (named on public pages).
    preheat: old ? 'Table 3.3' : 'Table 5.8',
    // From memory: the prequalified WPS requirements table (Table 3.7 in 2015); its 2020 number is not carried.
    requirements: old ? 'Table 3.7' : 'Clause 5 prequalified WPS requirements table (Table 3.7 in 2015)',
    // 2015: legend "Figures 3.2 and 3.3" read (3.2 PJP, 3.3 CJP); 2020: Figure 5.1 CJP and Figure 5.2 PJP read.
    cjp: old ? 'Figure 3.3' : 'Figure 5.1',
    pjp: old ? 'Figure 3.2' : 'Figure 5.2',
  }
}

/** Processes that may be prequalified (3.2.1): GMAW only in spray, globular or pulsed transfer, never short-circuit. */
export const prequalifiedProcesses = ['SMAW', 'SAW', 'GMAW', 'FCAW'] as const

/** Preheat category of Table 3.3 (2015): A = SMAW with other than low-hydrogen electrodes; B = low-hydrogen SMAW, SAW, GMAW, FCAW. */
export type PreheatCategory = 'A' | 'B'

export interface BaseMetalRow {
  /** ASTM specification as printed, without "ASTM" (A36, A572). */
  specification: string
  /** Grades this row holds ('' when the specification has none). */
  grades: string[]
  group: 'I' | 'II'
  /** Thickness limit of the group row: A36 is Group I up to 3/4 in (20 mm) and Group II over it. */
  thickness?: { upTo?: PrintedLength, over?: PrintedLength }
  /** Preheat categories whose list in Table 3.3 names the steel. */
  categories: PreheatCategory[]
  basis: Basis
  source: string
}

const t3_4 = printed('3/4', 20)

const read2015 = 'D1.1:2015 Table 3.1 and Table 3.3, read in a copy of the 2015 edition (docs/sources.md)'

/** A subset of the approved base metals (Table 3.1 in 2015, Table 5.3 from 2020) with their group and preheat categories. */
export const baseMetalRows: BaseMetalRow[] = [
  { specification: 'A36', grades: [''], group: 'I', thickness: { upTo: t3_4 }, categories: ['A', 'B'], basis: 'verified', source: read2015 },
  { specification: 'A36', grades: [''], group: 'II', thickness: { over: t3_4 }, categories: ['A', 'B'], basis: 'verified', source: read2015 },
  { specification: 'A53', grades: ['B'], group: 'I', categories: ['A', 'B'], basis: 'verified', source: read2015 },
  { specification: 'A500', grades: ['A', 'B', 'C'], group: 'I', categories: ['A', 'B'], basis: 'verified', source: read2015 },
  // A572 and A992: Group II from memory (Table 3.1's continued page was not legible); Category B read in Table 3.3.
  { specification: 'A572', grades: ['42', '50', '55'], group: 'II', categories: ['B'], basis: 'partial', source: 'D1.1:2015 Table 3.3 (category B, read); group II from memory' },
  { specification: 'A992', grades: [''], group: 'II', categories: ['B'], basis: 'partial', source: 'D1.1:2015 Table 3.3 (category B, read); group II from memory' },
]

/** Normalise a specification as written in a catalogue ("ASTM A-36", "SA-36", "A 572") to "A36", "A572". */
export function normalSpecification(text: string): string {
  const t = text.toUpperCase().replace(/ASTM|ASME/g, '').replace(/[\s-]/g, '')
  return t.startsWith('SA') ? t.slice(1) : t
}

/** Normalise a grade ("Gr. 50", "Grade B", "—") to "50", "B" or "". */
export function normalGrade(text: string | null | undefined): string {
  const t = (text ?? '').toUpperCase().replace(/GRADE|GR\.?/g, '').replace(/[\s—–-]/g, '')
  return t
}

/**
 * Matching filler metal per group (Table 3.2 in 2015, Table 5.4 from 2020), from memory: a regular expression on the
 * AWS classification per process. Group II SMAW is low-hydrogen only. A classification that matches no family of the
 * process is not carried (check by hand); one of the process's family but too weak or not low-hydrogen fails.
 */
export interface FillerFamily {
  process: string
  /** The classifications of the process Rootface recognises at all. */
  recognised: RegExp
  /** Those matching Group I and Group II base metal. */
  group: { I: RegExp, II: RegExp }
  words: { I: string, II: string }
}

export const fillerFamilies: FillerFamily[] = [
  {
    process: 'SMAW',
    recognised: /^E[6-9]\d{3}(-[A-Z0-9]+)*$/,
    group: { I: /^E(60|70)\d{2}(-[A-Z0-9]+)*$/, II: /^E70(15|16|18|28|48)(-[A-Z0-9]+)*$/ },
    words: { I: 'E60XX or E70XX (A5.1), E70XX-X (A5.5)', II: 'low-hydrogen E7015, E7016, E7018, E7028 (A5.1) or E70XX-X (A5.5)' },
  },
  {
    process: 'GMAW',
    recognised: /^ER?\d{2}[SC]-[A-Z0-9]+$/,
    group: { I: /^ER?70[SC]-[A-Z0-9]+$/, II: /^ER?70[SC]-[A-Z0-9]+$/ },
    words: { I: 'ER70S-X (A5.18) or E70C-X', II: 'ER70S-X (A5.18) or E70C-X' },
  },
  {
    process: 'FCAW',
    recognised: /^E[6-9]\dT\d*-[A-Z0-9]+(-[A-Z0-9]+)*$/,
    group: { I: /^E[67]\dT\d*-[A-Z0-9]+(-[A-Z0-9]+)*$/, II: /^E7\dT\d*-(?!(2|3|10|13|14|GS)([A-Z]|$))[A-Z0-9]+(-[A-Z0-9]+)*$/ },
    words: { I: 'E6XT-X or E7XT-X (A5.20)', II: 'E7XT-X (A5.20) other than the single-pass -2, -3, -10, -13, -14 and -GS' },
  },
  {
    process: 'SAW',
    recognised: /^F[6-9]\w*-E\w+/,
    group: { I: /^F[67]\w*-E\w+/, II: /^F7\w*-E\w+/ },
    words: { I: 'F6XX-EXXX or F7XX-EXXX (A5.17)', II: 'F7XX-EXXX (A5.17)' },
  },
]

/** Low-hydrogen SMAW electrodes (EXX15, 16, 18, 28, 48): preheat category B instead of A. From memory. */
export function lowHydrogen(classification: string): boolean {
  return /^E\d{2}(15|16|18|28|48)(-|$)/.test(classification.toUpperCase())
}

export interface PreheatBand {
  /** Thickness of the thickest part, over this (exclusive); null = from 1/8 in (3 mm). */
  over: PrintedLength | null
  /** Up to and including; null = no upper end. */
  upTo: PrintedLength | null
  A: { F: number, C: number }
  B: { F: number, C: number }
}

/**
 * D1.1:2015 Table 3.3, read (scribd 338026693 and pdfcoffee copies): minimum preheat and interpass temperature by
 * category and thickness of the thickest part at the point of welding. The 2020 Table 5.8 values are taken as the same
 * (not seen): basis 'partial' for 2020 and later.
 */
export const preheatFrom = printed('1/8', 3)
export const preheatBands: PreheatBand[] = [
  { over: null, upTo: printed('3/4', 20), A: { F: 32, C: 0 }, B: { F: 32, C: 0 } },
  { over: printed('3/4', 20), upTo: printed('1-1/2', 38), A: { F: 150, C: 65 }, B: { F: 50, C: 10 } },
  { over: printed('1-1/2', 38), upTo: printed('2-1/2', 65), A: { F: 225, C: 110 }, B: { F: 150, C: 65 } },
  { over: printed('2-1/2', 65), upTo: null, A: { F: 300, C: 150 }, B: { F: 225, C: 110 } },
]

/**
 * Largest electrode diameter of the prequalified WPS requirements table (Table 3.7 in 2015), from memory, by position
 * (F, H, V, O). SAW: single electrode only; V and O not prequalified for SAW.
 */
export const electrodeMax: Record<string, Partial<Record<'F' | 'H' | 'V' | 'O', PrintedLength>>> = {
  SMAW: { F: printed('5/16', 8), H: printed('1/4', 6.4), V: printed('3/16', 4.8), O: printed('3/16', 4.8) },
  GMAW: { F: printed('1/8', 3.2), H: printed('1/8', 3.2), V: printed('5/64', 2), O: printed('5/64', 2) },
  FCAW: { F: printed('1/8', 3.2), H: printed('1/8', 3.2), V: printed('5/64', 2), O: printed('5/64', 2) },
  SAW: { F: printed('1/4', 6.4), H: printed('3/16', 4.8) },
}

/** One way a prequalified joint may be prepared: root opening, groove angle, root face with the figure's tolerances. */
export interface JointOption {
  /** Root opening as detailed (a single value, or 0 to a value when `rootTo` is given). */
  root: PrintedLength
  rootTo?: PrintedLength
  /** As fit-up tolerance on the root opening: plus and minus. */
  rootFitUp: { plus: PrintedLength, minus: PrintedLength }
  angle: number | null
  /** As fit-up tolerance on the groove angle, degrees. */
  angleFitUp: { plus: number, minus: number }
  /** Root face as detailed, 0 to this (+ tolerance), or undefined when the detail shows none. */
  rootFaceMax?: PrintedLength
  positions: ('F' | 'H' | 'V' | 'O')[]
}

export interface JointDetail {
  designation: string
  kind: 'CJP' | 'PJP'
  title: string
  processes: string[]
  /** Thickness T1 limit; null = unlimited (U). */
  thicknessMax: PrintedLength | null
  options: JointOption[]
  basis: Basis
  source: string
}

const all: JointOption['positions'] = ['F', 'H', 'V', 'O']
const vGroove = { plus: printed('1/4', 6), minus: printed('1/16', 2) }
const angleFit = { plus: 10, minus: 5 }
// SMAW details may be used for GMAW (except GMAW-S) and FCAW: note e of the joint figures (read in 2015).
const smawE = ['SMAW', 'GMAW', 'FCAW']

/** A few common prequalified joint details. The 2020 inch rows of TC-U4a, TC-U4b and B-P1a were read; B-U2a on a secondary page. */
export const jointDetails: JointDetail[] = [
  {
    designation: 'B-U2a', kind: 'CJP', title: 'single-V-groove butt joint, with backing', processes: smawE, thicknessMax: null,
    options: [
      { root: printed('1/4', 6), rootFitUp: vGroove, angle: 45, angleFitUp: angleFit, positions: all },
      { root: printed('3/8', 10), rootFitUp: vGroove, angle: 30, angleFitUp: angleFit, positions: ['F', 'V', 'O'] },
      { root: printed('1/2', 12), rootFitUp: vGroove, angle: 20, angleFitUp: angleFit, positions: ['F', 'V', 'O'] },
    ],
    basis: 'partial', source: 'D1.1:2025 Figure 5.1 rows quoted on a public study page; tolerances as TC-U4a',
  },
  {
    designation: 'B-U2a-GF', kind: 'CJP', title: 'single-V-groove butt joint, with backing (GMAW, FCAW)', processes: ['GMAW', 'FCAW'], thicknessMax: null,
    options: [
      { root: printed('3/16', 5), rootFitUp: vGroove, angle: 30, angleFitUp: angleFit, positions: ['F', 'V', 'O'] },
    ],
    basis: 'partial', source: 'D1.1:2025 Figure 5.1 row quoted on a public study page; other rows not carried',
  },
  {
    designation: 'TC-U4a', kind: 'CJP', title: 'single-bevel-groove T- or corner joint, with backing', processes: smawE, thicknessMax: null,
    options: [
      { root: printed('1/4', 6), rootFitUp: vGroove, angle: 45, angleFitUp: angleFit, positions: all },
      { root: printed('3/8', 10), rootFitUp: vGroove, angle: 30, angleFitUp: angleFit, positions: ['F', 'V', 'O'] },
    ],
    basis: 'verified', source: 'D1.1:2020 Figure 5.1 (inches), read on a public copy',
  },
  {
    designation: 'TC-U4a-GF', kind: 'CJP', title: 'single-bevel-groove T- or corner joint, with backing (GMAW, FCAW)', processes: ['GMAW', 'FCAW'], thicknessMax: null,
    options: [
      { root: printed('3/16', 5), rootFitUp: vGroove, angle: 30, angleFitUp: angleFit, positions: all },
      { root: printed('3/8', 10), rootFitUp: vGroove, angle: 30, angleFitUp: angleFit, positions: ['F'] },
      { root: printed('1/4', 6), rootFitUp: vGroove, angle: 45, angleFitUp: angleFit, positions: all },
    ],
    basis: 'verified', source: 'D1.1:2020 Figure 5.1 (inches), read on a public copy; FCAW gas shielding required for the 3/16 in row',
  },
  {
    designation: 'TC-U4a-S', kind: 'CJP', title: 'single-bevel-groove T- or corner joint, with backing (SAW)', processes: ['SAW'], thicknessMax: null,
    options: [
      { root: printed('3/8', 10), rootFitUp: vGroove, angle: 30, angleFitUp: angleFit, positions: ['F'] },
      { root: printed('1/4', 6), rootFitUp: vGroove, angle: 45, angleFitUp: angleFit, positions: ['F'] },
    ],
    basis: 'verified', source: 'D1.1:2020 Figure 5.1 (inches), read on a public copy',
  },
  {
    designation: 'TC-U4b', kind: 'CJP', title: 'single-bevel-groove T- or corner joint, backgouged', processes: smawE, thicknessMax: null,
    options: [
      { root: printed('0', 0), rootTo: printed('1/8', 3), rootFitUp: { plus: printed('1/16', 2), minus: printed('1/8', 3) }, angle: 45, angleFitUp: angleFit, rootFaceMax: printed('3/16', 5), positions: all },
    ],
    basis: 'verified', source: 'D1.1:2020 Figure 5.1 (inches), read on a public copy (root face 0 to 1/8 in +1/16 in as detailed)',
  },
  {
    designation: 'B-P1a', kind: 'PJP', title: 'square-groove butt joint, PJP', processes: smawE, thicknessMax: printed('1/8', 3),
    options: [
      { root: printed('0', 0), rootTo: printed('1/16', 2), rootFitUp: { plus: printed('1/16', 2), minus: printed('1/16', 2) }, angle: null, angleFitUp: { plus: 0, minus: 0 }, positions: all },
    ],
    basis: 'partial', source: 'D1.1:2020 Figure 5.2 (millimetres) read on a public copy; the inch row from memory',
  },
  {
    designation: 'B-P1a-GF', kind: 'PJP', title: 'square-groove butt joint, PJP (GMAW, FCAW)', processes: ['GMAW', 'FCAW'], thicknessMax: printed('1/8', 3),
    options: [
      { root: printed('0', 0), rootTo: printed('1/16', 2), rootFitUp: { plus: printed('1/16', 2), minus: printed('1/16', 2) }, angle: null, angleFitUp: { plus: 0, minus: 0 }, positions: all },
    ],
    basis: 'partial', source: 'D1.1:2020 Figure 5.2 (millimetres) read on a public copy; the inch row from memory',
  },
]

export function findJoint(designation: string): JointDetail | undefined {
  const d = designation.trim().toUpperCase().replace(/\s+/g, '')
  return jointDetails.find(j => j.designation.toUpperCase() === d)
}

/** Limits of the prequalified WPS requirements table that the WPS form does not record: each is checked by hand. */
export const notCarriedLimits = [
  'the largest root pass thickness, fill pass thickness and single-pass fillet weld size for the process and position',
  'the welding current within the filler manufacturer\'s recommended range',
  'the shielding gas for GMAW and gas-shielded FCAW',
]
