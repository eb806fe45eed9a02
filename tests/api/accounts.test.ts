import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { startFakeSmtp, type FakeSmtp, type ReceivedMail } from '../../scripts/fake-smtp.mjs'
import { Client, signedIn, startServer, type TestServer } from './harness'

// Issue 7: invitations and password resets carry a one-time link (SHA-256 stored, expiring, single use);
// "forgot password" never reveals whether an address has an account.
const json = (body: unknown, method = 'POST'): RequestInit => ({ method, headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) })
const tokenIn = (mail: ReceivedMail) => /set-password\?token=([\w-]{43})/.exec(mail.text)?.[1]

async function mailTo(smtp: FakeSmtp, address: string, count = 1) {
  for (let i = 0; i < 100; i++) {
    const found = smtp.messages.filter(m => m.to.includes(address))
    if (found.length >= count) return found
    await new Promise(resolve => setTimeout(resolve, 100))
  }
  throw new Error(`no mail to ${address}`)
}

describe('invitations and password resets', () => {
  let smtp: FakeSmtp
  let server: TestServer
  let supervisor: Client
  beforeAll(async () => {
    smtp = await startFakeSmtp()
    server = await startServer({ env: { SMTP_URL: smtp.url } })
    supervisor = await signedIn(server.url, 'supervisor')
  })
  afterAll(async () => {
    await server?.stop()
    await smtp?.close()
  })

  it('an invitation link sets a password once; the second use fails', async () => {
    const invite = await supervisor.json<{ id: number, state: string }>('/api/accounts', json({ email: 'New.Inspector@Kestrelbend.test', name: 'Nadia Brook', role: 'inspector' }))
    expect(invite.status).toBe(201)
    expect(invite.body.state).toBe('invited')
    const [mail] = await mailTo(smtp, 'new.inspector@kestrelbend.test')
    expect(mail!.subject).toContain('Your Rootface account')
    expect(mail!.html).toContain('Choose your password')
    const token = tokenIn(mail!)
    expect(token).toBeTruthy()
    expect(mail!.text).toContain(`${server.url}/set-password?token=`)

    const visitor = new Client(server.url)
    expect(await visitor.signIn('new.inspector@kestrelbend.test', 'anything-at-all')).toBe(false) // no password yet
    const link = await visitor.json<{ purpose: string, email: string }>(`/api/password/link?token=${token}`)
    expect(link.body).toMatchObject({ purpose: 'invitation', email: 'new.inspector@kestrelbend.test' })

    const short = await visitor.json<{ data: { fieldErrors: Record<string, string[]> } }>('/api/password/set', json({ token, password: 'short', confirm: 'short' }))
    expect(short.status).toBe(400)
    expect(short.body.data.fieldErrors.password).toBeTruthy()

    const set = await visitor.json('/api/password/set', json({ token, password: 'a long enough password', confirm: 'a long enough password' }))
    expect(set.status).toBe(200)
    expect(await new Client(server.url).signIn('new.inspector@kestrelbend.test', 'a long enough password')).toBe(true)

    const twice = await visitor.json<{ message: string }>('/api/password/set', json({ token, password: 'another long password', confirm: 'another long password' }))
    expect(twice.status).toBe(410)
    expect(twice.body.message).toContain('already been used')
    expect(await new Client(server.url).signIn('new.inspector@kestrelbend.test', 'another long password')).toBe(false)
    expect((await visitor.fetch(`/api/password/link?token=${token}`)).status).toBe(410)

    const list = await supervisor.json<{ items: { email: string, state: string }[] }>('/api/accounts?q=new.inspector')
    expect(list.body.items).toEqual([expect.objectContaining({ email: 'new.inspector@kestrelbend.test', state: 'active' })])
  })

  it('a made-up link is not valid', async () => {
    const res = await new Client(server.url).json('/api/password/set', json({ token: 'A'.repeat(43), password: 'a long enough password', confirm: 'a long enough password' }))
    expect(res.status).toBe(404)
  })

  it('forgot password answers the same for a known and an unknown address, and only the known one gets mail', async () => {
    const visitor = new Client(server.url)
    const known = await visitor.json<{ message: string }>('/api/password/forgot', json({ email: 'inspector@demo.rootface.test' }))
    const unknown = await visitor.json<{ message: string }>('/api/password/forgot', json({ email: 'nobody@nowhere.test' }))
    expect(known.status).toBe(202)
    expect(unknown.status).toBe(202)
    expect(unknown.body).toEqual(known.body)
    const [mail] = await mailTo(smtp, 'inspector@demo.rootface.test')
    expect(mail!.subject).toBe('Reset your Rootface password')
    await new Promise(resolve => setTimeout(resolve, 300))
    expect(smtp.messages.some(m => m.to.includes('nobody@nowhere.test'))).toBe(false)

    // A second request within minutes sends no second link.
    await visitor.json('/api/password/forgot', json({ email: 'inspector@demo.rootface.test' }))
    await new Promise(resolve => setTimeout(resolve, 500))
    expect(smtp.messages.filter(m => m.to.includes('inspector@demo.rootface.test'))).toHaveLength(1)

    const token = tokenIn(mail!)
    expect((await visitor.json('/api/password/set', json({ token, password: 'inspector renewed pw', confirm: 'inspector renewed pw' }))).status).toBe(200)
    expect(await new Client(server.url).signIn('inspector@demo.rootface.test', 'inspector renewed pw')).toBe(true)
    expect(await new Client(server.url).signIn('inspector@demo.rootface.test')).toBe(false)
  })

  it('a welder account is invited with its roster entry; a second account for the same welder is refused', async () => {
    const roster = (await supervisor.json<{ items: { id: number, stamp: string }[] }>('/api/welders?pageSize=200')).body.items
    const kb05 = roster.find(w => w.stamp === 'KB-05')!
    const kb03 = roster.find(w => w.stamp === 'KB-03')!
    const missing = await supervisor.json<{ data: { fieldErrors: Record<string, string[]> } }>('/api/accounts', json({ email: 'hana@kestrelbend.test', name: 'Hana Kowalczyk', role: 'welder' }))
    expect(missing.status).toBe(400)
    expect(missing.body.data.fieldErrors.welderId).toBeTruthy()
    const taken = await supervisor.json('/api/accounts', json({ email: 'ines2@kestrelbend.test', name: 'Ines again', role: 'welder', welderId: kb03.id }))
    expect(taken.status).toBe(409)
    const ok = await supervisor.json<{ id: number, welderId: number }>('/api/accounts', json({ email: 'hana@kestrelbend.test', name: 'Hana Kowalczyk', role: 'welder', welderId: kb05.id }))
    expect(ok.status).toBe(201)
    expect(ok.body.welderId).toBe(kb05.id)
    const duplicate = await supervisor.json('/api/accounts', json({ email: 'HANA@kestrelbend.test', name: 'Hana K', role: 'inspector' }))
    expect(duplicate.status).toBe(409)
  })

  it('a deactivated account cannot sign in and its session stops working; a supervisor cannot deactivate themself', async () => {
    const accounts = (await supervisor.json<{ items: { id: number, email: string }[] }>('/api/accounts?pageSize=200')).body.items
    const auditor = accounts.find(a => a.email === 'auditor@demo.rootface.test')!
    const me = accounts.find(a => a.email === 'supervisor@demo.rootface.test')!
    const session = await signedIn(server.url, 'auditor')
    expect((await session.fetch('/api/projects')).status).toBe(200)
    expect((await supervisor.json(`/api/accounts/${auditor.id}`, json({ active: false }, 'PATCH'))).status).toBe(200)
    expect((await session.fetch('/api/projects')).status).toBe(401)
    expect(await new Client(server.url).signIn('auditor@demo.rootface.test')).toBe(false)
    const self = await supervisor.json<{ data: { fieldErrors: Record<string, string[]> } }>(`/api/accounts/${me.id}`, json({ active: false }, 'PATCH'))
    expect(self.status).toBe(409)
    expect(self.body.data.fieldErrors.active).toBeTruthy()
    expect((await supervisor.json(`/api/accounts/${auditor.id}`, json({ active: true }, 'PATCH'))).status).toBe(200)
    expect(await new Client(server.url).signIn('auditor@demo.rootface.test')).toBe(true)
  })

  it('neither the invitation answer nor the outbox hands the link back; only the e-mail carries it', async () => {
    // The token appears in the mail; the API never hands it back (the invite answer has no token).
    const invite = await supervisor.json<Record<string, unknown>>('/api/accounts', json({ email: 'hash.only@kestrelbend.test', name: 'Hash Only', role: 'auditor' }))
    const [mail] = await mailTo(smtp, 'hash.only@kestrelbend.test')
    expect(JSON.stringify(invite.body)).not.toContain(tokenIn(mail!)!)
    // Nor does the outbox: a supervisor reading it cannot take over the account the link was sent for.
    const outbox = await supervisor.json<{ items: { to: string, text: string, html: string }[], linksHidden: boolean }>('/api/mail?q=hash.only')
    expect(outbox.body.linksHidden).toBe(true)
    expect(outbox.body.items[0]!.text).toContain('set-password?token=hidden')
    expect(JSON.stringify(outbox.body)).not.toContain(tokenIn(mail!)!)
  })
})

describe('an expired invitation', () => {
  let smtp: FakeSmtp
  let server: TestServer
  beforeAll(async () => {
    smtp = await startFakeSmtp()
    // Invitations in this server work for about a second.
    server = await startServer({ env: { SMTP_URL: smtp.url, NUXT_INVITATION_HOURS: '0.0003' } })
  })
  afterAll(async () => {
    await server?.stop()
    await smtp?.close()
  })

  it('cannot set a password, and a new invitation replaces it', async () => {
    const supervisor = await signedIn(server.url, 'supervisor')
    const invite = await supervisor.json<{ id: number }>('/api/accounts', json({ email: 'late@kestrelbend.test', name: 'Late Opener', role: 'inspector' }))
    const [mail] = await mailTo(smtp, 'late@kestrelbend.test')
    await new Promise(resolve => setTimeout(resolve, 1500))
    const visitor = new Client(server.url)
    const res = await visitor.json<{ message: string }>('/api/password/set', json({ token: tokenIn(mail!), password: 'a long enough password', confirm: 'a long enough password' }))
    expect(res.status).toBe(410)
    expect(res.body.message).toContain('expired')
    expect(await visitor.signIn('late@kestrelbend.test', 'a long enough password')).toBe(false)

    expect((await supervisor.json(`/api/accounts/${invite.body.id}/invitation`, { method: 'POST' })).status).toBe(200)
    const [, second] = await mailTo(smtp, 'late@kestrelbend.test', 2)
    expect(tokenIn(second!)).not.toBe(tokenIn(mail!))
    expect((await visitor.json('/api/password/set', json({ token: tokenIn(second!), password: 'a long enough password', confirm: 'a long enough password' }))).status).toBe(200)
    expect((await supervisor.json(`/api/accounts/${invite.body.id}/invitation`, { method: 'POST' })).status).toBe(409)
  })
})
