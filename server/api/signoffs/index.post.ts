import { signoffRequestSchema } from '#shared/schemas/signoff'
import { requestSignoff } from '../../database/signoffs'

/** POST /api/signoffs: ask for a sign-off; the request shows on the other's dashboard and goes to the mail hook */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, staff)
  const body = await validBody(event, signoffRequestSchema)
  const notice = orThrow(await requestSignoff(await useDb(), user, body))
  await useNitroApp().hooks.callHook('rootface:signoff-requested', notice).catch((error: unknown) => {
    console.error('[rootface] a sign-off hook failed', error) // the request is stored either way
  })
  setResponseStatus(event, 201)
  return { id: notice.requestId }
})
