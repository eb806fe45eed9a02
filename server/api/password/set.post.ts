import { setPasswordWithLink } from '../../database/accounts'
import { setPasswordSchema } from '#shared/schemas/password'

/** POST /api/password/set {token, password, confirm}: choose a password with a one-time link (public; the link works once) */
export default defineEventHandler(async (event) => {
  const body = await validBody(event, setPasswordSchema)
  return orThrow(await setPasswordWithLink(await useDb(), body.token, body.password))
})
