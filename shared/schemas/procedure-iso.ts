import { z } from 'zod'
import { iso15614Editions, processIds } from '../vocabulary/records'
import { isoFillerGroupIds, isoPositions, isoProcessIds, isoProcessNames } from '../vocabulary/iso'
import { codes, getRuleSet } from '../rules'
import type { CodeId } from '../rules/types'
import { optionalNumber, optionalText } from './fields'

/**
 * The parts of a WPS and a PQR/WPQR that depend on the code being ISO 15614-1: process by ISO 4063 number and positions
 * by ISO 6947 when it is, process names and F/H/V/O (1G–6G on a PQR) when it is not. Shared by procedure.ts and pqr.ts.
 */

/** A process of a procedure layer: an ASME/AWS name, or an ISO 4063 number (checked against the code by isoProcedureRefine). */
export const procedureProcessSchema = z.enum([...processIds, ...isoProcessIds], { errorMap: () => ({ message: 'Pick a process' }) })

const isIsoProcess = (p: string) => (isoProcessIds as readonly string[]).includes(p)
const isIsoPosition = (p: string) => (isoPositions as readonly string[]).includes(p)

/** Cross-field rule: an ISO 15614-1 record names ISO 4063 processes and ISO 6947 positions; the other codes never do. */
export function isoProcedureRefine(iso: boolean, processes: string[], positions: string[] | null, ctx: z.RefinementCtx, processPath: [string, string]) {
  processes.forEach((p, i) => {
    if (iso && !isIsoProcess(p)) ctx.addIssue({ code: z.ZodIssueCode.custom, path: [processPath[0], i, processPath[1]], message: 'ISO 15614-1: pick the process by its ISO 4063 number (111, 135, 141…)' })
    if (!iso && isIsoProcess(p)) ctx.addIssue({ code: z.ZodIssueCode.custom, path: [processPath[0], i, processPath[1]], message: 'ISO 4063 numbers are for ISO 15614-1 records: pick the process by name' })
  })
  const wrong = (positions ?? []).filter(p => iso !== isIsoPosition(p))
  if (wrong.length) {
    ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['positions'], message: iso ? `ISO 15614-1 positions are those of ISO 6947 (PA–PJ, H-L045, J-L045): not ${wrong.join(', ')}` : `ISO 6947 positions are for ISO 15614-1 records: not ${wrong.join(', ')}` })
  }
}

/**
 * The WPQR test piece as ISO 15614-1 ranges it (kept in the PQR's `actuals`; absent on ASME/AWS records): ISO 6947
 * positions welded, plate or pipe and its outside diameter, single- or multi-run, the ISO/TR 15608 parent metal group,
 * the filler designation and group, hardness tested. Preheat, interpass and PWHT are the actuals' own fields; heat input
 * is per layer.
 */
export const wpqrPieceSchema = z.object({
  positions: z.array(z.enum(isoPositions, { errorMap: () => ({ message: 'ISO 6947 positions: PA–PJ, H-L045, J-L045' }) })).max(11).default([]),
  form: z.enum(['plate', 'pipe'], { errorMap: () => ({ message: 'Plate or pipe' }) }).default('plate'),
  outsideDiameter: optionalNumber('Outside diameter', { positive: true, max: 10_000 }),
  runs: z.enum(['single', 'multi'], { errorMap: () => ({ message: 'Single-run or multi-run' }) }).default('multi'),
  materialGroup: optionalText('Parent metal group (ISO/TR 15608)', 10),
  fillerDesignation: optionalText('Filler designation', 80),
  fillerGroup: z.enum(isoFillerGroupIds, { errorMap: () => ({ message: 'Filler group FM1–FM6' }) }).nullable().default(null),
  hardnessTested: z.boolean().default(false),
}).superRefine((v, ctx) => {
  if (v.form === 'pipe' && v.outsideDiameter === null) ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['outsideDiameter'], message: 'A pipe test piece needs its outside diameter' })
})
export type WpqrPiece = z.infer<typeof wpqrPieceSchema>

export function blankWpqrPiece(): WpqrPiece {
  return { positions: ['PA'], form: 'plate', outsideDiameter: null, runs: 'multi', materialGroup: null, fillerDesignation: null, fillerGroup: null, hardnessTested: false }
}

/** The processes a WPS or PQR form offers for its code: ISO 4063 numbers with their names for ISO 15614-1, names otherwise. */
export function processChoicesFor(code: string | undefined): { value: string, label: string }[] {
  if (code === 'iso-15614-1' || code === 'iso-9606-1') return isoProcessIds.map(p => ({ value: p, label: `${p} · ${isoProcessNames[p]}` }))
  return processIds.map(p => ({ value: p, label: p }))
}

/** The editions a procedure or PQR form offers for its code (ISO 15614-1: the edition its rules are written to). */
export function procedureEditionsFor(code: string | undefined): readonly string[] {
  if (code === 'iso-15614-1') return iso15614Editions
  return code && (codes as string[]).includes(code) ? getRuleSet(code as CodeId).editions : []
}

const toIso: Record<string, string> = { SMAW: '111', SAW: '121', GMAW: '135', FCAW: '136', GTAW: '141', PAW: '15', OFW: '311' }
const fromIso: Record<string, string> = { 111: 'SMAW', 114: 'FCAW', 121: 'SAW', 125: 'SAW', 131: 'GMAW', 135: 'GMAW', 136: 'FCAW', 138: 'GMAW', 141: 'GTAW', 142: 'GTAW', 143: 'GTAW', 145: 'GTAW', 15: 'PAW', 311: 'OFW' }
const letterOf: Record<string, string> = { PA: 'F', PB: 'H', PC: 'H', PD: 'O', PE: 'O', PF: 'V', PG: 'V', PH: 'V', PJ: 'V' }

/**
 * What a procedure or PQR form sets when its code switches to or from ISO 15614-1: the edition, the positions and each
 * layer's process in the other vocabulary (a starting point the user then corrects; from memory, e.g. GMAW → 135).
 */
export function isoDefaultsFor(iso: boolean, v: { edition?: string, positions?: string[], processes: string[] }) {
  const editions = iso ? iso15614Editions as readonly string[] : ['2023']
  const positions = iso
    ? (v.positions ?? []).filter(p => !isIsoPosition(p)).length || !(v.positions ?? []).length ? ['PA'] : v.positions!
    : [...new Set((v.positions ?? []).map(p => (isIsoPosition(p) ? letterOf[p] ?? 'F' : p)))]
  return {
    edition: editions.includes(v.edition ?? '') ? v.edition! : editions[0]!,
    positions: positions.length ? positions : iso ? ['PA'] : ['F'],
    processes: v.processes.map(p => (iso ? (isIsoProcess(p) ? p : toIso[p] ?? '135') : (isIsoProcess(p) ? fromIso[p] ?? 'GMAW' : p))),
  }
}
