import { z } from 'zod'
import { versionSchema } from './fields'

const text = (what: string, max: number) => z.string({ required_error: `${what} is required`, invalid_type_error: `${what} must be text` })
  .trim().min(1, `${what} is required`).max(max, `At most ${max} characters`)
const optionalText = (max: number) => z.string().trim().max(max, `At most ${max} characters`).nullish()
  .transform(v => (v ? v : null))

/** A roster entry as the quality manager enters it. */
export const welderSchema = z.object({
  name: text('Name', 120),
  stamp: text('Stamp', 20).regex(/^[A-Za-z0-9][A-Za-z0-9 ./-]*$/, 'Letters, digits, space, dot, slash or dash'),
  employeeNumber: optionalText(40),
  status: z.enum(['active', 'inactive'], { errorMap: () => ({ message: 'Active or inactive' }) }).default('active'),
  email: z.string().trim().max(254, 'At most 254 characters').email('Enter a valid e-mail address').nullish().or(z.literal('')).transform(v => (v ? v : null)),
})
export type WelderInput = z.infer<typeof welderSchema>

/** An edit carries the version it was read at; a stale one is refused (409). */
export const welderPatchSchema = welderSchema.partial().extend({
  version: versionSchema,
})
export type WelderPatch = z.infer<typeof welderPatchSchema>
