import { z } from 'zod'
import { processSchema } from './list'
import { brokenCharacterMessage, calendarDate, hasLoneSurrogate, wellFormedText } from './fields'

/** A calendar date as YYYY-MM-DD that exists (2026-02-30 does not). */
export const calendarDay = calendarDate('Date', { required: 'Date is required', format: 'Use YYYY-MM-DD', real: 'Not a calendar date' })

const reference = z.string({ required_error: 'Reference is required (job, weld or WPS)' }).trim()
  .min(1, 'Reference is required (job, weld or WPS)').max(200, 'At most 200 characters')
  .regex(wellFormedText, brokenCharacterMessage('Reference'))

export const continuityEntrySchema = z.object({
  welderId: z.number({ required_error: 'Pick the welder' }).int().positive('Pick the welder'),
  process: processSchema,
  weldedOn: calendarDay,
  reference,
})
export type ContinuityEntryInput = z.infer<typeof continuityEntrySchema>

/** Many welders, one process and one date (a shift's work on one job). */
export const continuityBulkSchema = z.object({
  welderIds: z.array(z.number().int().positive(), { required_error: 'Pick at least one welder' })
    .min(1, 'Pick at least one welder').max(1000, 'At most 1000 welders at once')
    .refine(ids => new Set(ids).size === ids.length, 'A welder is picked twice'),
  process: processSchema,
  weldedOn: calendarDay,
  reference,
})
export type ContinuityBulkInput = z.infer<typeof continuityBulkSchema>

export const maxImportBytes = 1_500_000

export const continuityImportSchema = z.object({
  csv: z.string({ required_error: 'csv is required' }).min(1, 'The file is empty').max(maxImportBytes, 'The file is larger than 1.5 MB; split it')
    .refine(v => !hasLoneSurrogate(v), brokenCharacterMessage('The file')),
  commit: z.boolean().default(false),
})

/** One CSV row after its header names are mapped: stamp, process, date, reference. */
export const continuityImportRowSchema = z.object({
  stamp: z.string({ required_error: 'Stamp is missing' }).trim().min(1, 'Stamp is missing').max(20, 'Stamp is too long')
    .regex(wellFormedText, brokenCharacterMessage('Stamp')),
  process: z.string({ required_error: 'Process is missing' }).trim().toUpperCase().pipe(processSchema),
  weldedOn: calendarDay,
  reference,
})

/** Header names accepted for each column (lower case, spaces and underscores alike). */
export const importHeaders: Record<keyof z.infer<typeof continuityImportRowSchema>, string[]> = {
  stamp: ['stamp', 'welder stamp', 'welder'],
  process: ['process'],
  weldedOn: ['date', 'welded on', 'weldedon', 'welded'],
  reference: ['reference', 'job', 'ref'],
}

/**
 * How long after it was stored a committed CSV import may be undone as a whole (by the quality manager): a week, long
 * enough to notice a wrong file, short enough that the entries have not yet been relied on. Later entries or an issued
 * continuity log that rest on the import refuse the undo whatever the age.
 */
export const importUndoDays = 7
