import Papa from 'papaparse'
import { z } from 'zod'
import { calendarDay } from '../../shared/schemas/continuity-entry'
import { jointWelderSchema } from '../../shared/schemas/joints'
import { processSchema } from '../../shared/schemas/list'
import type { RowError } from '../workers/import-parse'

/** One line of a weld log file: a welder's process on a joint, welded on a day. */
export interface WeldLogRow { line: number, mark: string, stamp: string, process: z.infer<typeof processSchema>, weldedOn: string, layer: z.infer<typeof jointWelderSchema.shape.layer>, fNumber: number | null }

const rowSchema = z.object({
  mark: z.string({ required_error: 'Mark is missing' }).trim().min(1, 'Mark is missing').max(60, 'Mark is too long'),
  stamp: z.string({ required_error: 'Stamp is missing' }).trim().min(1, 'Stamp is missing').max(20, 'Stamp is too long'),
  process: z.string({ required_error: 'Process is missing' }).trim().toUpperCase().pipe(processSchema),
  weldedOn: calendarDay,
  layer: jointWelderSchema.shape.layer,
  fNumber: jointWelderSchema.shape.fNumber,
})
const headers: Record<keyof z.infer<typeof rowSchema>, string[]> = {
  mark: ['mark', 'joint', 'joint mark', 'weld'], stamp: ['stamp', 'welder stamp', 'welder'], process: ['process'],
  weldedOn: ['date', 'welded on', 'weldedon', 'welded'], layer: ['layer'], fNumber: ['f-no.', 'f-no', 'f number', 'fnumber', 'f no'],
}
const required = ['mark', 'stamp', 'process', 'weldedOn'] as const
const normal = (h: string) => h.trim().toLowerCase().replace(/[_\s]+/g, ' ')

/** Parses a weld log (header line, then `mark,stamp,process,date[,layer][,f-no.]`): the rows that read, and each line that does not. */
export function parseWeldLog(csv: string): { rows: WeldLogRow[], errors: RowError[] } {
  const parsed = Papa.parse<Record<string, string>>(csv.replace(/^\uFEFF/, ''), { header: true, delimiter: ',', skipEmptyLines: 'greedy', transformHeader: normal })
  const fields = parsed.meta.fields ?? []
  const column = Object.fromEntries(Object.entries(headers).map(([key, names]) => [key, fields.find(f => names.includes(f))])) as Record<keyof typeof headers, string | undefined>
  const missing = required.filter(k => !column[k]).map(k => headers[k][0])
  if (missing.length) return { rows: [], errors: [{ line: 1, field: 'header', message: `The first line must name the columns; missing: ${missing.join(', ')}` }] }
  const errors: RowError[] = parsed.errors.map(e => ({ line: (e.row ?? 0) + 2, field: 'row', message: e.message }))
  const rows: WeldLogRow[] = []
  parsed.data.forEach((raw, i) => {
    const line = i + 2
    const value = (k: keyof typeof headers) => (column[k] ? raw[column[k]!]?.trim() : undefined)
    const result = rowSchema.safeParse({ mark: value('mark'), stamp: value('stamp'), process: value('process'), weldedOn: value('weldedOn'), layer: value('layer') ?? null, fNumber: value('fNumber') ?? null })
    if (!result.success) {
      for (const [field, messages] of Object.entries(result.error.flatten().fieldErrors)) {
        const header = column[field as keyof typeof headers]
        errors.push({ line, field, message: messages?.[0] ?? 'Invalid', column: header, value: header === undefined ? undefined : raw[header] ?? '' })
      }
      return
    }
    rows.push({ line, ...result.data })
  })
  return { rows, errors }
}
