import { signoffRequestSchema } from '#shared/schemas/signoff'
import { requestSignoff } from '../../database/signoffs'
import { invalidField } from '../../sheets/errors'

const problems = {
  role: ['meaning', 'A quality manager asks an inspector to certify or witness; an inspector asks a quality manager to approve'],
  type: ['recordType', 'That record cannot be signed with this meaning'],
  record: ['recordId', 'No such record'],
  recipient: ['requestedOf', 'Choose an active account of the role that signs this'],
} as const

/** POST /api/signoffs: ask for a sign-off; the request shows on the other's dashboard and goes to the mail hook */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, staff)
  const body = await validBody(event, signoffRequestSchema)
  const result = await requestSignoff(await useDb(), user, body)
  if ('problem' in result) {
    if (result.problem === 'signed') throw conflict('This version of the record already carries that signature.')
    if (result.problem === 'open') throw conflict('A request for this sign-off is already open.')
    const [field, message] = problems[result.problem]
    throw invalidField(field, message)
  }
  await useNitroApp().hooks.callHook('rootface:signoff-requested', result.notice).catch((error: unknown) => {
    console.error('[rootface] a sign-off hook failed', error) // the request is stored either way
  })
  setResponseStatus(event, 201)
  return { id: result.notice.requestId }
})
