import { z } from 'zod'

const isoDay = (what: string) => z.string({ invalid_type_error: `${what} must be a date` })
  .regex(/^\d{4}-\d{2}-\d{2}$/, `${what} must be a date as YYYY-MM-DD`)
  .refine(v => !Number.isNaN(Date.parse(`${v}T00:00:00Z`)) && new Date(`${v}T00:00:00Z`).toISOString().startsWith(v), `${what} is not a calendar date`)

/** ?format=json gives the sheet's content for the read-only record view; the default is the PDF download. */
export const sheetQuerySchema = z.object({ format: z.enum(['pdf', 'json']).default('pdf') })

export const continuityQuerySchema = sheetQuerySchema.extend({
  from: isoDay('from').optional(),
  to: isoDay('to').optional(),
  projectId: z.coerce.number().int().positive().max(2_147_483_647).optional(),
}).refine(q => !q.from || !q.to || q.from <= q.to, { message: 'from must not be after to', path: ['to'] })

export const welderParamSchema = z.object({ welderId: z.coerce.number().int().positive().max(2_147_483_647) })

/** The short code of a sheet: 10 characters of the code alphabet, with or without the dash and spaces. */
export const verifyCodeSchema = z.object({
  code: z.string().transform(v => v.toUpperCase().replace(/[\s-]/g, ''))
    .pipe(z.string().regex(/^[ABCDEFGHJKMNPQRSTVWXYZ23456789]{10}$/, 'A sheet code is 10 letters and digits, as printed beside the QR code')),
})

export { isoDay }
