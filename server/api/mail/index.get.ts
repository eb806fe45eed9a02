import { listOutbox } from '../../database/mail'
import { mailListQuerySchema } from '#shared/schemas/mail'

/** GET /api/mail: the outbox, newest first, with each message's body and delivery state (supervisor) */
export default defineEventHandler(async (event) => {
  await requireRole(event, ['supervisor'])
  const query = await validQuery(event, mailListQuerySchema)
  const config = useRuntimeConfig()
  // Only a development or test server (NUXT_MAIL_SHOW_LINKS=true) shows one-time links in the outbox.
  const outbox = await listOutbox(await useDb(), query, String(config.mailShowLinks) === 'true')
  return {
    ...outbox,
    smtpConfigured: !!mailSettings().url,
    from: mailSettings().from,
    testClock: config.mailTestClock === true || String(config.mailTestClock) === 'true',
  }
})
