import { z } from 'zod'
import { listQuerySchema } from './list'

const email = z.string().trim().min(1, 'Enter an e-mail address').max(254, 'At most 254 characters').email('Enter a valid e-mail address')
const name = z.string().trim().min(1, 'Enter a name').max(120, 'At most 120 characters')
const id = z.coerce.number().int().positive().max(2_147_483_647)

/** A supervisor invites someone: the account is created without a password and an invitation goes out by e-mail. */
export const accountInviteSchema = z.object({
  email,
  name,
  role: z.enum(['supervisor', 'inspector', 'welder', 'auditor'], { errorMap: () => ({ message: 'Choose a role' }) }),
  // A welder account points at its roster entry (and only a welder account does).
  welderId: id.nullish(),
}).superRefine((value, ctx) => {
  if (value.role === 'welder' && !value.welderId) ctx.addIssue({ code: 'custom', path: ['welderId'], message: 'Choose the welder on the roster' })
  if (value.role !== 'welder' && value.welderId) ctx.addIssue({ code: 'custom', path: ['welderId'], message: 'Only a welder account links to the roster' })
})
export type AccountInvite = z.infer<typeof accountInviteSchema>

/** Change an account: its name, the roster entry of a welder account, or whether it may sign in. */
export const accountPatchSchema = z.object({
  name: name.optional(),
  welderId: id.optional(),
  active: z.boolean().optional(),
}).refine(v => v.name !== undefined || v.welderId !== undefined || v.active !== undefined, { message: 'Nothing to change' })
export type AccountPatch = z.infer<typeof accountPatchSchema>

export const accountListQuerySchema = listQuerySchema(['name', 'email', 'role', 'createdAt']).extend({
  role: z.enum(['supervisor', 'inspector', 'welder', 'auditor']).optional(),
  active: z.enum(['true', 'false']).optional(),
})
