import { z } from 'zod'
import { brokenCharacterMessage, hasLoneSurrogate } from './fields'

/** One table of the export, by its database name. */
export const exportTableParamSchema = z.object({ name: z.string().regex(/^[a-z_]{1,64}$/, 'Not a table name') })
export const exportTableQuerySchema = z.object({ format: z.enum(['csv', 'xlsx'], { errorMap: () => ({ message: 'Choose csv or xlsx' }) }).default('csv') })

/** What can be brought in from a shop's own spreadsheets. */
export const importKinds = ['roster', 'continuity'] as const
export type ImportKind = typeof importKinds[number]
export const importKindParamSchema = z.object({ kind: z.enum(importKinds, { errorMap: () => ({ message: 'Unknown kind of import' }) }) })

/** 1.5 MB of CSV, or an XLSX file of up to 1.5 MB as base64. */
export const maxImportChars = 2_100_000

/**
 * A file to bring in: CSV text, or an XLSX file as base64; `mapping` names, per Rootface field, the column of the file
 * that holds it (guessed from the headers when left out). Without `commit` it is a dry run.
 */
export const recordsImportSchema = z.object({
  format: z.enum(['csv', 'xlsx'], { errorMap: () => ({ message: 'Choose csv or xlsx' }) }),
  content: z.string({ required_error: 'Choose a file' }).min(1, 'The file is empty').max(maxImportChars, 'The file is larger than 1.5 MB; split it')
    .refine(v => !hasLoneSurrogate(v), brokenCharacterMessage('The file')),
  mapping: z.record(z.string().max(64), z.string().max(200)).optional(),
  commit: z.boolean().default(false),
}).strict()
export type RecordsImport = z.infer<typeof recordsImportSchema>
