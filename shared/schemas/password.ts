import { z } from 'zod'

export const passwordSchema = z.string()
  .min(10, 'At least 10 characters')
  .max(200, 'At most 200 characters')
  .refine(v => v.trim().length >= 10, 'At least 10 characters that are not spaces')

// The token in the link: 32 random bytes, base64url.
export const linkTokenSchema = z.string().trim().regex(/^[\w-]{43}$/, 'This link is not complete: open it from the e-mail again')

export const setPasswordSchema = z.object({
  token: linkTokenSchema,
  password: passwordSchema,
  confirm: z.string(),
}).refine(v => v.password === v.confirm, { path: ['confirm'], message: 'The two passwords differ' })
export type SetPassword = z.infer<typeof setPasswordSchema>

export const forgotPasswordSchema = z.object({
  email: z.string().trim().min(1, 'Enter your e-mail address').max(254).email('Enter a valid e-mail address'),
})

export const linkQuerySchema = z.object({ token: linkTokenSchema })
