import { z } from 'zod'

/** POST /api/me/sign-out-everywhere and /api/accounts/:id/sign-out: the body confirms the wish, so a stray call does nothing. */
export const endSessionsSchema = z.object({
  confirm: z.literal(true, { errorMap: () => ({ message: 'Confirm signing out of all devices' }) }),
}).strict()
export type EndSessions = z.infer<typeof endSessionsSchema>
