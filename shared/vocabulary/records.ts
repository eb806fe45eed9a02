import { codeName } from '../rules/caution'
import type { CodeId } from '../rules/types'

// The words Rootface uses for its codes and records, in one place: schemas, routes, pages, sheets and the database
// checks import them from here. The rules (shared/rules/) keep their own clause texts.

/** The codes Rootface carries, in the order the screens list them. */
export const codeIds = ['asme-ix', 'aws-d1.1', 'aws-d1.3', 'iso-9606-1'] as const satisfies readonly CodeId[]

/** A code's full name, as sheets print it ("ASME BPVC Section IX"). */
export { codeName }

const isCodeId = (code: string): code is CodeId => (codeIds as readonly string[]).includes(code)

/** A stored code's full name, or the stored id itself when Rootface does not carry that code. */
export function codeTitle(code: string): string {
  return isCodeId(code) ? codeName(code) : code
}

/** A code's short name for tables and pickers ("ASME IX"). */
export function codeShortName(code: string): string {
  return code === 'asme-ix' ? 'ASME IX' : codeTitle(code)
}

/** Choices of a code picker: value and short name. */
export const codeChoices = codeIds.map(value => ({ value, label: codeShortName(value) }))

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
