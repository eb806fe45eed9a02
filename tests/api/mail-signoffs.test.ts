import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { startFakeSmtp, type FakeSmtp } from '../../scripts/fake-smtp.mjs'
import { signedIn, startServer, type TestServer } from './harness'

// Issue 7: a sign-off request goes by e-mail to the accounts asked, once per request.
let smtp: FakeSmtp
let server: TestServer

beforeAll(async () => {
  smtp = await startFakeSmtp()
  server = await startServer({ env: { SMTP_URL: smtp.url } })
})
afterAll(async () => {
  await server?.stop()
  await smtp?.close()
})

describe('sign-off request e-mail', () => {
  it('a quality manager asking to certify a test e-mails the inspectors, once', async () => {
    const supervisor = await signedIn(server.url, 'supervisor')
    const tests = (await supervisor.json<{ items: { id: number, status: string, welderStamp: string }[] }>('/api/tests?pageSize=200')).body.items
    const recorded = tests.find(t => t.status === 'recorded')!
    const asked = await supervisor.json('/api/signoffs', {
      method: 'POST', headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ recordType: 'welder-test', recordId: recorded.id, meaning: 'certified', requestedOf: null, note: 'Bends are in the rack by bay 2' }),
    })
    expect(asked.status).toBe(201)
    const [mail] = await smtp.waitFor(1)
    expect(mail!.to).toEqual(['inspector@demo.rootface.test'])
    expect(mail!.subject).toContain('Certification asked')
    expect(mail!.subject).toContain(recorded.welderStamp)
    expect(mail!.text).toContain('Maren Oduya asks you to certify')
    expect(mail!.text).toContain('Bends are in the rack by bay 2')
    await new Promise(resolve => setTimeout(resolve, 500))
    expect(smtp.messages).toHaveLength(1)
    const outbox = await supervisor.json<{ items: { kind: string, status: string }[] }>('/api/mail?kind=signoff-request')
    expect(outbox.body.items).toEqual([expect.objectContaining({ kind: 'signoff-request', status: 'sent' })])
  })
})
