import { z } from 'zod'
import { optionalText, requiredText } from './fields'

/** The base-metal and filler-metal catalogue the WPS and PQR forms pick from. */

export const baseMetalSchema = z.object({
  specification: requiredText('the specification (e.g. SA-516)', 40),
  grade: requiredText('the grade (— when none)', 40),
  pNumber: requiredText('the P-No.', 8).regex(/^\d{1,2}[A-Z]?$/, 'A P-No. such as 1, 8 or 15E'),
  groupNumber: z.preprocess(v => (v === '' || v === undefined ? null : typeof v === 'string' ? Number(v) : v),
    z.number({ invalid_type_error: 'Group No. must be a whole number' }).int('Group No. must be a whole number').min(1).max(99).nullable()),
  minTensilePsi: z.preprocess(v => (v === '' || v === undefined ? null : typeof v === 'string' ? Number(v) : v),
    z.number({ invalid_type_error: 'Minimum tensile must be a number of psi' }).int('Whole psi').min(1000, 'At least 1000 psi').max(300_000, 'At most 300000 psi').nullable()),
})
export type BaseMetalInput = z.infer<typeof baseMetalSchema>
export const baseMetalPatchSchema = baseMetalSchema.partial().refine(v => Object.keys(v).length > 0, 'Send at least one field to change')

export const fillerMetalSchema = z.object({
  specification: requiredText('the specification (e.g. SFA-5.18)', 40),
  classification: requiredText('the classification (e.g. ER70S-6)', 40),
  fNumber: requiredText('the F-No.', 8).regex(/^\d{1,2}[A-Z]?$/, 'An F-No. such as 4 or 6'),
  aNumber: optionalText('A-No.', 8),
})
export type FillerMetalInput = z.infer<typeof fillerMetalSchema>
export const fillerMetalPatchSchema = fillerMetalSchema.partial().refine(v => Object.keys(v).length > 0, 'Send at least one field to change')
