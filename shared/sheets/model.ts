import type { Unit } from '../rules/types'

/**
 * What a sheet says, independent of how it is drawn: the PDF builder and the read-only record view both render it,
 * so the screen and the paper never disagree.
 */
export type SheetKind = 'wps' | 'pqr' | 'wpq' | 'continuity' | 'register'

export interface SheetField {
  label: string
  value: string
  /** The code paragraph the variable belongs to, e.g. QW-403.8 */
  clause?: string
}

export interface SheetTable {
  columns: string[]
  rows: string[][]
  /** Columns whose values are numbers (right-aligned) */
  numeric?: number[]
  widths?: (number | '*' | 'auto')[]
}

export interface SheetBlock {
  heading: string
  clause?: string
  fields?: SheetField[]
  table?: SheetTable
  notes?: string[]
}

export interface SheetSignature {
  meaning: string
  name: string
  at: string
  version: number
}

export interface SheetModel {
  kind: SheetKind
  kindTitle: string
  shopName: string
  number: string
  revision: number | null
  subtitle: string
  codeLine: string | null
  unit: Unit | null
  status: string
  /** Printed across every page of a sheet that must not be used as if it were signed and current */
  banner: string | null
  blocks: SheetBlock[]
  statement: string | null
  signatures: SheetSignature[]
  /** SHA-256 of the content as stored now, and whether it is still the one the signatures cover */
  hash: { value: string, label: string, matchesSigned: boolean | null }
  verify: { code: string, url: string } | null
  caution: string
  /** The welder's photograph on an ISO 9606-1 certificate (a data: URL of a JPEG or PNG), when one is recorded */
  photo?: { dataUrl: string, caption: string } | null
}

/** "KB-W02 rev. 1" or "PQR-K101". */
export function sheetReference(sheet: Pick<SheetModel, 'number' | 'revision'>) {
  return sheet.revision === null ? sheet.number : `${sheet.number} rev. ${sheet.revision}`
}
