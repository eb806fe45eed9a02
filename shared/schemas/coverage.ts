import { z } from 'zod'
import { processSchema } from './list'

// Query strings and form inputs both arrive as text; empty means "not given".
const blank = (v: unknown) => (v === '' || v === null ? undefined : v)
const positive = (what: string) => z.preprocess(blank, z.coerce.number({ invalid_type_error: `${what} must be a number` })
  .finite().positive(`${what} must be more than 0`).max(10_000, `${what} is too large`).optional())

/** A production joint: what "who can weld this?" is asked about. */
export const jointSchema = z.object({
  process: processSchema,
  transfer: z.preprocess(blank, z.enum(['short-circuit', 'globular', 'spray', 'pulse']).optional()),
  unit: z.enum(['in', 'mm']).default('in'),
  pNumber: z.preprocess(blank, z.string().trim().max(8, 'At most 8 characters').regex(/^\d{1,2}[A-Z]?$/i, 'A P-No. such as 1, 8 or 15E').optional()),
  thickness: positive('Thickness'),
  gauge: z.preprocess(blank, z.coerce.number({ invalid_type_error: 'Gauge must be a number' }).int('A whole gauge number').min(3, 'Gauges run 3 to 38').max(38, 'Gauges run 3 to 38').optional()),
  form: z.enum(['plate', 'pipe'], { errorMap: () => ({ message: 'Plate or pipe' }) }).default('plate'),
  outsideDiameter: positive('Outside diameter'),
  weld: z.enum(['groove', 'fillet'], { errorMap: () => ({ message: 'Groove or fillet' }) }).default('groove'),
  position: z.enum(['F', 'H', 'V', 'O'], { errorMap: () => ({ message: 'F, H, V or O' }) }),
  fNumber: z.preprocess(blank, z.coerce.number({ invalid_type_error: 'F-No. must be a number' }).int('A whole number such as 4').positive().max(99).optional()),
  backing: z.preprocess(v => (v === 'true' ? true : v === 'false' ? false : blank(v)), z.boolean().default(true)),
}).superRefine((v, ctx) => {
  if (v.form === 'pipe' && v.outsideDiameter === undefined) ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['outsideDiameter'], message: 'A pipe joint needs its outside diameter' })
  if (v.thickness !== undefined && v.gauge !== undefined) ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['gauge'], message: 'Give a thickness or a gauge, not both' })
})
export type Joint = z.infer<typeof jointSchema>
