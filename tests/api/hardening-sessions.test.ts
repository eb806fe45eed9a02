import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { startFakeSmtp, type FakeSmtp, type ReceivedMail } from '../../scripts/fake-smtp.mjs'
import { Client, demo, signedIn, startServer, type TestServer } from './harness'

// Issue 14, findings 1 and 2: no production start without a strong secret and an origin, no demo accounts unless asked
// for, and sessions that end: sign-out (everywhere), password reset, deactivation (reactivation does not revive
// them), "sign out of all devices" for oneself and by the quality manager for any account.
const json = (body: unknown, method = 'POST'): RequestInit => ({ method, headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) })
const tokenIn = (mail: ReceivedMail) => /set-password\?token=([\w-]{43})/.exec(mail.text)?.[1]

/** A second client holding a copy of another's cookies (a cookie copied off a machine). */
function copyOf(client: Client) {
  const copy = new Client(client.base)
  for (const [name, value] of client.cookies) copy.cookies.set(name, value)
  return copy
}

async function signOut(client: Client) {
  const csrf = await client.json<{ csrfToken: string }>('/api/auth/csrf')
  const res = await client.fetch('/api/auth/signout', {
    method: 'POST', headers: { 'content-type': 'application/x-www-form-urlencoded' },
    body: new URLSearchParams({ csrfToken: csrf.body.csrfToken, json: 'true', callbackUrl: `${client.base}/sign-in` }),
  })
  await res.text()
  return res.status
}

const status = async (client: Client, path = '/api/me/qualifications') => (await client.fetch(path)).status

describe('production start-up', () => {
  it('refuses to start without AUTH_SECRET, with one line naming it', async () => {
    const error = await startServer({ env: { AUTH_SECRET: '' } }).then(() => null, (e: Error) => e)
    expect(error?.message).toMatch(/server exited \(1\)/)
    const lines = error!.message.split('\n').filter(l => l.includes('[rootface]'))
    expect(lines).toHaveLength(1)
    expect(lines[0]).toContain('AUTH_SECRET: set a random secret of at least 32 characters')
    expect(error!.message).not.toContain('Listening')
  })

  it('refuses the development default and a short secret', async () => {
    for (const secret of ['rootface-development-secret-change-me', 'short-secret-31-characters-long']) {
      const error = await startServer({ env: { AUTH_SECRET: secret } }).then(() => null, (e: Error) => e)
      expect(error?.message).toContain('AUTH_SECRET:')
    }
  })

  it('refuses to start without AUTH_ORIGIN, naming it', async () => {
    const error = await startServer({ env: { AUTH_ORIGIN: '' } }).then(() => null, (e: Error) => e)
    expect(error?.message).toContain('AUTH_ORIGIN: set the public address of the sign-in routes')
    expect(error?.message).not.toContain('AUTH_SECRET:')
  })

  it('a fresh production database gets no demo accounts unless NUXT_SEED_DEMO=true', async () => {
    for (const seed of ['', '1']) {
      const server = await startServer({ env: { NUXT_SEED_DEMO: seed } })
      try {
        expect(await new Client(server.url).signIn(demo.supervisor)).toBe(false)
      }
      finally {
        await server.stop()
      }
    }
  }, 90_000)
})

describe('sessions that end', () => {
  let smtp: FakeSmtp
  let server: TestServer
  let supervisor: Client
  let cut = 0
  const refused = async (client: Client) => {
    const got = await status(client, '/api/accounts/1')
    if (got === 401) cut++
    return got
  }
  beforeAll(async () => {
    smtp = await startFakeSmtp()
    server = await startServer({ env: { SMTP_URL: smtp.url } })
    supervisor = await signedIn(server.url, 'supervisor')
  })
  afterAll(async () => {
    console.log(`[hardening] sessions cut: ${cut} stale cookies answered 401`)
    await server?.stop()
    await smtp?.close()
  })

  it('a session lasts at most 8 hours', async () => {
    const client = new Client(server.url)
    const csrf = await client.json<{ csrfToken: string }>('/api/auth/csrf')
    const res = await client.fetch('/api/auth/callback/credentials', {
      method: 'POST', headers: { 'content-type': 'application/x-www-form-urlencoded' },
      body: new URLSearchParams({ csrfToken: csrf.body.csrfToken, email: demo.auditor, password: 'rootface-demo', json: 'true' }),
    })
    const cookie = res.headers.getSetCookie().find(c => c.includes('session-token'))!
    const expires = Date.parse(/Expires=([^;]+)/i.exec(cookie)![1]!)
    expect(expires - Date.now()).toBeLessThanOrEqual(8 * 3600_000 + 60_000)
    expect(expires - Date.now()).toBeGreaterThan(7 * 3600_000)
  })

  it('signing out ends the session everywhere: a copied cookie and another device answer 401', async () => {
    const first = await signedIn(server.url, 'inspector')
    const second = await signedIn(server.url, 'inspector')
    const stolen = copyOf(first)
    expect(await status(stolen, '/api/welders')).toBe(200)
    expect(await signOut(first)).toBe(200)
    expect(await status(stolen, '/api/welders')).toBe(401)
    expect(await status(second, '/api/welders')).toBe(401)
    cut += 2
    // The page's session read clears the dead cookie.
    const session = await stolen.json<Record<string, unknown>>('/api/auth/session')
    expect(session.body).toEqual({})
    expect(await signedIn(server.url, 'inspector')).toBeTruthy()
  })

  it('a password reset ends the sessions opened before it', async () => {
    const before = await signedIn(server.url, 'welder')
    const stolen = copyOf(before)
    expect(await status(stolen)).toBe(200)
    await new Client(server.url).json('/api/password/forgot', json({ email: demo.welder }))
    let mail: ReceivedMail | undefined
    for (let i = 0; i < 100 && !mail; i++) {
      mail = smtp.messages.find(m => m.to.includes(demo.welder) && m.subject.includes('Reset'))
      if (!mail) await new Promise(resolve => setTimeout(resolve, 100))
    }
    const set = await new Client(server.url).json('/api/password/set', json({ token: tokenIn(mail!), password: 'welder renewed password', confirm: 'welder renewed password' }))
    expect(set.status).toBe(200)
    expect(await status(stolen)).toBe(401)
    expect(await status(before)).toBe(401)
    cut += 2
    const after = new Client(server.url)
    expect(await after.signIn(demo.welder, 'welder renewed password')).toBe(true)
    expect(await status(after)).toBe(200)
  })

  it('deactivating ends the sessions, and reactivating does not revive them', async () => {
    const accounts = await supervisor.json<{ items: { id: number, email: string }[] }>('/api/accounts?pageSize=100')
    const auditorId = accounts.body.items.find(a => a.email === demo.auditor)!.id
    const old = await signedIn(server.url, 'auditor')
    expect(await status(old, '/api/projects')).toBe(200)
    expect((await supervisor.json(`/api/accounts/${auditorId}`, json({ active: false }, 'PATCH'))).status).toBe(200)
    expect(await status(old, '/api/projects')).toBe(401)
    expect((await supervisor.json(`/api/accounts/${auditorId}`, json({ active: true }, 'PATCH'))).status).toBe(200)
    expect(await status(old, '/api/projects')).toBe(401)
    cut += 1
    expect(await status(await signedIn(server.url, 'auditor'), '/api/projects')).toBe(200)
  })

  it('"sign out of all devices" for oneself needs the confirmation, then ends every session of the account', async () => {
    const phone = await signedIn(server.url, 'auditor')
    const desk = await signedIn(server.url, 'auditor')
    const unconfirmed = await phone.json<{ data: { fieldErrors: Record<string, string[]> } }>('/api/me/sign-out-everywhere', json({}))
    expect(unconfirmed.status).toBe(400)
    expect(unconfirmed.body.data.fieldErrors.confirm).toBeTruthy()
    expect(await status(desk, '/api/projects')).toBe(200)
    expect((await phone.json('/api/me/sign-out-everywhere', json({ confirm: true }))).status).toBe(200)
    expect(await status(phone, '/api/projects')).toBe(401)
    expect(await status(desk, '/api/projects')).toBe(401)
    cut += 2
  })

  it('the quality manager signs any account out of all devices; their own session stays', async () => {
    const accounts = await supervisor.json<{ items: { id: number, email: string }[] }>('/api/accounts?pageSize=100')
    const inspectorId = accounts.body.items.find(a => a.email === demo.inspector)!.id
    const inspector = await signedIn(server.url, 'inspector')
    const stolen = copyOf(inspector)
    expect((await inspector.json(`/api/accounts/${inspectorId}/sign-out`, json({ confirm: true }))).status).toBe(403)
    expect((await supervisor.json(`/api/accounts/${inspectorId}/sign-out`, json({ confirm: true }))).status).toBe(200)
    expect(await refused(inspector)).toBe(401)
    expect(await refused(stolen)).toBe(401)
    expect(await status(supervisor, '/api/accounts')).toBe(200)
    expect((await supervisor.json('/api/accounts/999999/sign-out', json({ confirm: true }))).status).toBe(404)
    const audit = await supervisor.json<{ items: { action: string }[] }>('/api/audit?pageSize=20')
    expect(audit.body.items.some(e => e.action === 'sign-out-everywhere')).toBe(true)
  })
})
