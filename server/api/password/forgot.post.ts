import { requestPasswordReset } from '../../database/accounts'
import { forgotPasswordSchema } from '#shared/schemas/password'

/** POST /api/password/forgot {email}: e-mail a reset link if an active account has this address; the answer is the same either way (public) */
export default defineEventHandler(async (event) => {
  const { email } = await validBody(event, forgotPasswordSchema)
  const db = await useDb()
  // The work happens after the answer, so neither the answer nor its timing tells whether the address has an account.
  const work = requestPasswordReset(db, email.toLowerCase(), appUrl(event)).catch((error: unknown) => console.error('[rootface] password reset failed', error))
  event.waitUntil?.(work)
  setResponseStatus(event, 202)
  return { message: 'If an active account has this address, a link to choose a new password is on its way. It works for one hour.' }
})
