import { z } from 'zod'
import { brokenCharacterMessage, hasLoneSurrogate } from './fields'

/** One table of the export, by its database name. */
export const exportTableParamSchema = z.object({ name: z.string().regex(/^[a-z_]{1,64}$/, 'Not a table name') })
export const exportTableQuerySchema = z.object({ format: z.enum(['csv', 'xlsx'], { errorMap: () => ({ message: 'Choose csv or xlsx' }) }).default('csv') })

/** What can be brought in from a shop's own spreadsheets. */
export const importKinds = ['roster', 'tests', 'continuity', 'wps-headers', 'pqr-headers'] as const
export type ImportKind = typeof importKinds[number]
export const importKindParamSchema = z.object({ kind: z.enum(importKinds, { errorMap: () => ({ message: 'Unknown kind of import' }) }) })

/** CSV text, or an XLSX file as base64, under the request size limit (2 MB). */
export const maxImportChars = 1_900_000

/**
 * A file to bring in: CSV text, or an XLSX file as base64; `mapping` names, per Rootface field, the column of the file
 * that holds it (guessed from the headers when left out). Without `commit` it is a dry run.
 */
export const recordsImportSchema = z.object({
  format: z.enum(['csv', 'xlsx'], { errorMap: () => ({ message: 'Choose csv or xlsx' }) }),
  content: z.string({ required_error: 'Choose a file' }).min(1, 'The file is empty').max(maxImportChars, 'The file is too large (CSV at most 1.8 MB, XLSX at most 1.4 MB); split it')
    .refine(v => !hasLoneSurrogate(v), brokenCharacterMessage('The file')),
  mapping: z.record(z.string().max(64), z.string().max(200)).optional(),
  commit: z.boolean().default(false),
}).strict()
export type RecordsImport = z.infer<typeof recordsImportSchema>

/** A wrong line of an imported file: `field` for programs, `column` (as headed in the file) and `value` (as typed) for people. */
export interface ImportRowError { line: number, field: string, message: string, column?: string, value?: string }

/** One field Rootface reads from an imported sheet: its label on the mapping screen and the headers it is guessed from. */
export interface ImportField { key: string, label: string, required: boolean, headers: string[] }

export const importFields: Record<ImportKind, ImportField[]> = {
  'roster': [
    { key: 'stamp', label: 'Stamp', required: true, headers: ['stamp', 'welder stamp', 'id stamp', 'symbol', 'welder id'] },
    { key: 'name', label: 'Name', required: true, headers: ['name', 'welder', 'welder name', 'full name'] },
    { key: 'employeeNumber', label: 'Employee no.', required: false, headers: ['employee number', 'employee no', 'employee no.', 'badge', 'payroll number'] },
    { key: 'email', label: 'E-mail', required: false, headers: ['email', 'e-mail', 'mail'] },
    { key: 'status', label: 'Status (active or inactive)', required: false, headers: ['status', 'state'] },
  ],
  'tests': [
    { key: 'stamp', label: 'Welder stamp', required: true, headers: ['stamp', 'welder stamp', 'welder'] },
    { key: 'process', label: 'Process', required: true, headers: ['process'] },
    { key: 'code', label: 'Code', required: true, headers: ['code', 'standard'] },
    { key: 'edition', label: 'Edition', required: false, headers: ['edition', 'year'] },
    { key: 'testDate', label: 'Test date', required: true, headers: ['test date', 'date', 'tested on'] },
    { key: 'positions', label: 'Positions qualified', required: false, headers: ['positions', 'position', 'positions qualified'] },
    { key: 'thickness', label: 'Thickness range', required: false, headers: ['thickness', 'thickness range', 'thickness qualified'] },
    { key: 'diameter', label: 'Diameter range', required: false, headers: ['diameter', 'diameter range', 'od', 'diameter qualified'] },
    { key: 'otherRanges', label: 'Other ranges', required: false, headers: ['other', 'other ranges', 'notes', 'remarks'] },
    { key: 'reference', label: 'Certificate or record no.', required: false, headers: ['reference', 'certificate', 'certificate no', 'record', 'wpq'] },
  ],
  'wps-headers': [
    { key: 'number', label: 'Number', required: true, headers: ['number', 'no', 'no.', 'wps', 'pqr', 'wps no', 'pqr no', 'document'] },
    { key: 'revision', label: 'Revision', required: false, headers: ['revision', 'rev', 'rev.'] },
    { key: 'title', label: 'Title', required: false, headers: ['title', 'description', 'scope'] },
    { key: 'code', label: 'Code', required: true, headers: ['code', 'standard'] },
    { key: 'edition', label: 'Edition', required: false, headers: ['edition', 'year'] },
    { key: 'processes', label: 'Processes', required: false, headers: ['process', 'processes'] },
    { key: 'documentDate', label: 'Date', required: false, headers: ['date', 'issued', 'approved on'] },
    { key: 'status', label: 'Status', required: false, headers: ['status', 'state'] },
  ],
  'pqr-headers': [
    { key: 'number', label: 'Number', required: true, headers: ['number', 'no', 'no.', 'wps', 'pqr', 'wps no', 'pqr no', 'document'] },
    { key: 'revision', label: 'Revision', required: false, headers: ['revision', 'rev', 'rev.'] },
    { key: 'title', label: 'Title', required: false, headers: ['title', 'description', 'scope'] },
    { key: 'code', label: 'Code', required: true, headers: ['code', 'standard'] },
    { key: 'edition', label: 'Edition', required: false, headers: ['edition', 'year'] },
    { key: 'processes', label: 'Processes', required: false, headers: ['process', 'processes'] },
    { key: 'documentDate', label: 'Date', required: false, headers: ['date', 'issued', 'approved on'] },
    { key: 'status', label: 'Status', required: false, headers: ['status', 'state'] },
  ],
  'continuity': [
    { key: 'stamp', label: 'Welder stamp', required: true, headers: ['stamp', 'welder stamp', 'welder'] },
    { key: 'process', label: 'Process', required: true, headers: ['process'] },
    { key: 'weldedOn', label: 'Date welded', required: true, headers: ['date', 'welded on', 'weldedon', 'welded'] },
    { key: 'reference', label: 'Job or weld reference', required: true, headers: ['reference', 'job', 'ref'] },
  ],
}

const squash = (h: string) => h.trim().toLowerCase().replace(/[_\s]+/g, ' ')

/** The column of the file guessed for each field from its header (case, spaces and underscores ignored). */
export function guessMapping(kind: ImportKind, headers: readonly string[]): Record<string, string> {
  const mapping: Record<string, string> = {}
  for (const field of importFields[kind]) {
    const found = headers.find(h => field.headers.includes(squash(h)) || squash(h) === field.key.toLowerCase())
    if (found) mapping[field.key] = found
  }
  return mapping
}

export const importedDocumentsQuerySchema = z.object({ kind: z.enum(['wps', 'pqr'], { errorMap: () => ({ message: 'Choose wps or pqr' }) }) })
