import { z } from 'zod'

/** Turn a welder's public ID-card page on, off, or issue a new address (the old one stops answering). */
export const cardLinkSchema = z.object({
  action: z.enum(['on', 'off', 'renew'], { errorMap: () => ({ message: 'Choose on, off or renew' }) }),
}).strict()
export type CardLinkInput = z.infer<typeof cardLinkSchema>

/** The secret in a public ID-card address: 32 URL-safe characters. */
export const cardTokenParamSchema = z.object({
  token: z.string().regex(/^[A-Za-z0-9_-]{32}$/, 'Not a card address'),
})
