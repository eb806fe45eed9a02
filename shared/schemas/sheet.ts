import { z } from 'zod'
import { calendarDate } from './fields'

const isoDay = (what: string) => calendarDate(what)

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
