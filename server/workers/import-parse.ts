import Papa from 'papaparse'
import { continuityImportRowSchema, importHeaders } from '../../shared/schemas/continuity-entry'

// Checking a continuity CSV: parsing it, checking every row's fields and matching stamps to the roster. Pure (no
// database: the roster is handed in), so it runs in a worker thread (import-worker.ts, import-check.ts).

/** A wrong line of the file: `field` for programs, `column` (as headed in the file) and `value` (as typed) for people. */
export interface RowError { line: number, field: string, message: string, column?: string, value?: string }
export interface RosterEntry { id: number, stamp: string, name: string }
export interface CheckedImportRow { line: number, stamp: string, welderName: string, welderId: number, process: string, weldedOn: string, reference: string }

export interface CheckedImport {
  total: number
  welders: number
  errors: RowError[]
  /** The first rows, for the preview. */
  preview: CheckedImportRow[]
  /** Every row, only when asked for (to store them): a large file's rows cost time to pass between threads. */
  rows?: CheckedImportRow[]
}

export const PREVIEW_ROWS = 200

const normal = (h: string) => h.trim().toLowerCase().replace(/[_\s]+/g, ' ')

export function checkImportCsv(csv: string, roster: RosterEntry[], today: string, withRows: boolean): CheckedImport {
  const errors: RowError[] = []
  const parsed = Papa.parse<Record<string, string>>(csv.replace(/^\uFEFF/, ''), {
    header: true, delimiter: ',', skipEmptyLines: 'greedy', transformHeader: normal,
  })
  const fields = parsed.meta.fields ?? []
  const column = Object.fromEntries(Object.entries(importHeaders).map(([key, names]) => [key, fields.find(f => names.includes(f))]))
  const missing = Object.entries(column).filter(([, f]) => !f).map(([k]) => importHeaders[k as keyof typeof importHeaders][0])
  if (missing.length) {
    return { total: 0, welders: 0, preview: [], rows: [], errors: [{ line: 1, field: 'header', message: `The first line must name the columns; missing: ${missing.join(', ')}` }] }
  }
  for (const e of parsed.errors) errors.push({ line: (e.row ?? 0) + 2, field: 'row', message: e.message })
  const byStamp = new Map(roster.map(w => [w.stamp.toLowerCase(), w]))
  const rows: CheckedImportRow[] = []
  const seen = new Set<string>()
  parsed.data.forEach((raw, i) => {
    const line = i + 2
    const result = continuityImportRowSchema.safeParse({
      stamp: raw[column.stamp!], process: raw[column.process!], weldedOn: raw[column.weldedOn!]?.trim(), reference: raw[column.reference!],
    })
    if (!result.success) {
      for (const [field, messages] of Object.entries(result.error.flatten().fieldErrors)) {
        const header = column[field]
        errors.push({ line, field, message: messages?.[0] ?? 'Invalid', column: header, value: header === undefined ? undefined : raw[header] ?? '' })
      }
      return
    }
    const r = result.data
    const welder = byStamp.get(r.stamp.toLowerCase())
    if (!welder) return errors.push({ line, field: 'stamp', message: `No welder with stamp ${r.stamp} on the roster`, column: column.stamp, value: r.stamp })
    if (r.weldedOn > today) return errors.push({ line, field: 'weldedOn', message: `${r.weldedOn} is after today`, column: column.weldedOn, value: r.weldedOn })
    const key = `${welder.id}|${r.process}|${r.weldedOn}|${r.reference}`
    if (seen.has(key)) return errors.push({ line, field: 'row', message: 'The same entry appears twice in the file' })
    seen.add(key)
    rows.push({ line, stamp: welder.stamp, welderName: welder.name, welderId: welder.id, process: r.process, weldedOn: r.weldedOn, reference: r.reference })
  })
  if (!rows.length && !errors.length) errors.push({ line: 1, field: 'file', message: 'The file has a header but no rows' })
  return {
    total: rows.length,
    welders: new Set(rows.map(r => r.welderId)).size,
    errors: errors.sort((a, b) => a.line - b.line),
    preview: rows.slice(0, PREVIEW_ROWS),
    ...(withRows ? { rows } : {}),
  }
}
