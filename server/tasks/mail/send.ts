/** mail:send (every minute): send what is due in the outbox; failures wait and are tried again. */
export default defineTask({
  meta: { name: 'mail:send', description: 'Send queued e-mail and retry failed sends' },
  async run() {
    return { result: await sendQueuedMail(await useDb()) }
  },
})
