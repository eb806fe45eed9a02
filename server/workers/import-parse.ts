import Papa from 'papaparse'
import { continuityImportRowSchema, importHeaders } from '../../shared/schemas/continuity'

// The CPU-heavy half of checking a continuity CSV: parsing it and checking every row's fields. Pure (no database), so
// it runs in a worker thread (import-worker.ts); the roster lookup stays on the server (import-check.ts).

export interface RowError { line: number, field: string, message: string }

/** The rows whose fields are right, column by column (cheap to pass between threads), and every row error. */
export interface ParsedImport {
  errors: RowError[]
  lines: number[]
  stamps: string[]
  processes: string[]
  days: string[]
  references: string[]
}

const normal = (h: string) => h.trim().toLowerCase().replace(/[_\s]+/g, ' ')

export function parseImportCsv(csv: string): ParsedImport {
  const result: ParsedImport = { errors: [], lines: [], stamps: [], processes: [], days: [], references: [] }
  const parsed = Papa.parse<Record<string, string>>(csv.replace(/^\uFEFF/, ''), {
    header: true, delimiter: ',', skipEmptyLines: 'greedy', transformHeader: normal,
  })
  const fields = parsed.meta.fields ?? []
  const column = Object.fromEntries(Object.entries(importHeaders).map(([key, names]) => [key, fields.find(f => names.includes(f))]))
  const missing = Object.entries(column).filter(([, f]) => !f).map(([k]) => importHeaders[k as keyof typeof importHeaders][0])
  if (missing.length) {
    result.errors.push({ line: 1, field: 'header', message: `The first line must name the columns; missing: ${missing.join(', ')}` })
    return result
  }
  for (const e of parsed.errors) result.errors.push({ line: (e.row ?? 0) + 2, field: 'row', message: e.message })
  parsed.data.forEach((raw, i) => {
    const line = i + 2
    const row = continuityImportRowSchema.safeParse({
      stamp: raw[column.stamp!], process: raw[column.process!], weldedOn: raw[column.weldedOn!]?.trim(), reference: raw[column.reference!],
    })
    if (!row.success) {
      for (const [field, messages] of Object.entries(row.error.flatten().fieldErrors)) result.errors.push({ line, field, message: messages?.[0] ?? 'Invalid' })
      return
    }
    result.lines.push(line)
    result.stamps.push(row.data.stamp)
    result.processes.push(row.data.process)
    result.days.push(row.data.weldedOn)
    result.references.push(row.data.reference)
  })
  return result
}
