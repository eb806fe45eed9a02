import { linkQuerySchema } from '#shared/schemas/password'
import { accountLinkState } from '../../database/mail'

/** GET /api/password/link?token=: whether a set-password link still works, and for whom (public; the token is the proof) */
export default defineEventHandler(async (event) => {
  const { token } = await validQuery(event, linkQuerySchema)
  const state = await accountLinkState(await useDb(), token)
  if (!state.ok) throw httpError(linkProblem(state.reason))
  return { purpose: state.purpose, email: state.account.email, name: state.account.name }
})
