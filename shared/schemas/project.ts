import { z } from 'zod'
import { versionSchema } from './fields'
import { isoDay } from './sheet'

const id = (what: string) => z.coerce.number({ invalid_type_error: `Choose ${what}` }).int(`Choose ${what}`).positive(`Choose ${what}`).max(2_147_483_647)
const text = (what: string, max: number) => z.string({ required_error: `Enter ${what}`, invalid_type_error: `Enter ${what}` }).trim()
  .min(1, `Enter ${what}`).max(max, `${what}: at most ${max} characters`)
const optional = (what: string, max: number) => z.preprocess(v => (typeof v === 'string' && v.trim() === '' ? null : v ?? null),
  z.string({ invalid_type_error: `${what} must be text` }).trim().max(max, `${what}: at most ${max} characters`).nullable())

export const customerSchema = z.object({
  name: text('the customer\'s name', 120),
  contact: optional('Contact', 200),
}).strict()
export type CustomerInput = z.infer<typeof customerSchema>

const projectFields = {
  customerId: id('a customer'),
  number: text('a project number', 40),
  name: text('a project name', 160),
  startsOn: isoDay('Start'),
  endsOn: z.preprocess(v => (v === '' ? null : v ?? null), isoDay('End').nullable()),
}

const periodRule = (p: { startsOn?: string, endsOn?: string | null }) => !p.startsOn || !p.endsOn || p.endsOn >= p.startsOn
const periodIssue = { message: 'The end must not be before the start', path: ['endsOn'] }

export const projectSchema = z.object(projectFields).strict().refine(periodRule, periodIssue)
export type ProjectInput = z.infer<typeof projectSchema>

const version = versionSchema

/** An edit names the version of the row it was made on, so a stale edit is refused (409). */
export const projectPatchSchema = z.object({ ...projectFields, version })
  .partial().required({ version: true }).strict().refine(periodRule, periodIssue)

export const attachProcedureSchema = z.object({ procedureId: id('a procedure') }).strict()
export const attachWelderSchema = z.object({ welderId: id('a welder') }).strict()
export const grantAuditorSchema = z.object({ accountId: id('an auditor account') }).strict()
