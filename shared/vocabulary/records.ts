import { codeName } from '../rules/caution'
import type { CodeId } from '../rules/types'

// The words Rootface uses for its codes and records, in one place: schemas, routes, pages, sheets and the database
// checks import them from here. The rules (shared/rules/) keep their own clause texts.

/** The codes Rootface carries, in the order the screens list them (the welder codes: a welder test names one of these). */
export const codeIds = ['asme-ix', 'aws-d1.1', 'aws-d1.3', 'iso-9606-1'] as const satisfies readonly CodeId[]
export const welderCodeIds = codeIds

/**
 * The codes a procedure (WPS) or a procedure qualification (PQR / WPQR) may name. ISO 9606-1 qualifies welders only; an
 * ISO procedure is qualified to ISO 15614-1 (the WPQR) and written with the content of ISO 15609-1 (the WPS).
 * Records stored with "iso-9606-1" before this list existed stay readable (procedureCodeTitle reads them as ISO 15614-1).
 */
export const procedureCodeIds = ['asme-ix', 'aws-d1.1', 'aws-d1.3', 'iso-15614-1'] as const
export type ProcedureCodeId = typeof procedureCodeIds[number]
/** Every code a record may be stored with (list filters). */
export const anyCodeIds = ['asme-ix', 'aws-d1.1', 'aws-d1.3', 'iso-9606-1', 'iso-15614-1'] as const
/** The editions of ISO 15614-1 carried (the rules in shared/rules/iso-15614-1 are written to the 2017 edition). */
export const iso15614Editions = ['2017'] as const

/** A code's full name, as sheets print it ("ASME BPVC Section IX"). */
export { codeName }

const isCodeId = (code: string): code is CodeId => (codeIds as readonly string[]).includes(code)

/** A stored code's full name, or the stored id itself when Rootface does not carry that code. */
export function codeTitle(code: string): string {
  if (code === 'iso-15614-1') return 'ISO 15614-1'
  return isCodeId(code) ? codeName(code) : code
}

/** A code's short name for tables and pickers ("ASME IX"). */
export function codeShortName(code: string): string {
  return code === 'asme-ix' ? 'ASME IX' : codeTitle(code)
}

/** Choices of a code picker: value and short name. */
export const codeChoices = codeIds.map(value => ({ value, label: codeShortName(value) }))
/** Choices of a procedure or PQR code picker: ISO 15614-1, never ISO 9606-1. */
export const procedureCodeChoices = procedureCodeIds.map(value => ({ value, label: value === 'iso-15614-1' ? 'ISO 15614-1 (WPQR) / ISO 15609-1 (WPS)' : codeShortName(value) }))
/** Whether a stored procedure or PQR code is the ISO procedure standard (or the ISO code stored before it had its own id). */
export const isIsoProcedureCode = (code: string) => code === 'iso-15614-1' || code === 'iso-9606-1'

/** The welding processes a record may name (the list routes and filters accept these). */
export const processIds = ['SMAW', 'GTAW', 'GMAW', 'FCAW', 'SAW', 'PAW', 'OFW', 'ESW', 'EGW', 'LLBW'] as const

/** Where each record stands. A welder test and a PQR are recorded, then certified (passed) or failed, both signed. */
export const welderTestStatuses = ['recorded', 'certified', 'failed'] as const
export const pqrStatuses = ['recorded', 'certified', 'failed'] as const
export const procedureStatuses = ['draft', 'approved', 'superseded'] as const
export const welderStatuses = ['active', 'inactive'] as const

/**
 * One name per record. In code, routes and files the record of a welder's qualification test is a "welder test"
 * (`welder-test`, /api/tests, components/welder/Test…); screens and sheets add the trade term WPQ where it helps.
 */
export const recordNames = {
  'procedure': 'WPS',
  'pqr': 'PQR',
  'welder-test': 'welder test (WPQ)',
  'base-metal': 'base metal',
  'continuity': 'continuity log',
} as const
