import { z } from 'zod'
import { isoConfirmerIds, isoValidityKindIds } from '../vocabulary/iso'
import { calendarDay } from './continuity-entry'

/**
 * A signed ISO 9606-1 validity record: the six-monthly confirmation of clause 9.2 (the welder has worked within the range
 * of qualification), or the 9.3 b) record of two production welds tested (volumetric or destructive) in the last six
 * months of validity, naming the welds and the report.
 */
export const isoValidityRecordSchema = z.object({
  kind: z.enum(isoValidityKindIds, { errorMap: () => ({ message: 'A 9.2 confirmation or a 9.3 b) production-weld record' }) }),
  on: calendarDay,
  confirmer: z.enum(isoConfirmerIds, { errorMap: () => ({ message: 'The welding coordinator or the examiner signs it' }) }),
  statement: z.string({ required_error: 'State what is confirmed' }).trim().min(10, 'State what is confirmed (at least 10 characters)').max(1000, 'At most 1000 characters'),
  reference: z.string().trim().max(200, 'At most 200 characters').nullish().transform(v => v || null),
}).superRefine((v, ctx) => {
  if (v.kind === 'production-welds' && !v.reference) ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['reference'], message: 'Name the two production welds and the test report (9.3 b)' })
})
export type IsoValidityRecordInput = z.infer<typeof isoValidityRecordSchema>
