import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { startFakeSmtp, type FakeSmtp } from '../../scripts/fake-smtp.mjs'
import { Client, demo, startServer, type TestServer } from './harness'

// Issue 14, finding 3: sign-in throttling kept in the database, per account and per client address, with a lock
// after 10 failures for an account (50 for an address) for 15 minutes (README, Production); X-Forwarded-For only
// from a trusted proxy; unknown accounts cost the same time as real ones; the owner is e-mailed.

interface Attempt { status: number, signedIn: boolean, ms: number }

async function attempt(base: string, email: string, password: string, headers: Record<string, string> = {}): Promise<Attempt> {
  const client = new Client(base)
  const csrf = await client.json<{ csrfToken: string }>('/api/auth/csrf')
  const started = performance.now()
  const res = await client.fetch('/api/auth/callback/credentials', {
    method: 'POST', headers: { 'content-type': 'application/x-www-form-urlencoded', ...headers },
    body: new URLSearchParams({ csrfToken: csrf.body.csrfToken, email, password, json: 'true', callbackUrl: `${base}/` }),
  })
  const text = await res.text()
  const ms = performance.now() - started
  const signedIn = [...client.cookies.keys()].some(k => k.includes('session-token')) && !text.includes('error=')
  return { status: res.status, signedIn, ms }
}

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)]!

describe('sign-in throttling in the database', () => {
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

  it('150 wrong passwords, 50 at a time: none signs in, 429 after the 10th failure; the right one is refused while locked', async () => {
    const results: Attempt[] = []
    for (let batch = 0; batch < 3; batch++) {
      results.push(...await Promise.all(Array.from({ length: 50 }, (_, i) => attempt(server.url, demo.inspector, `wrong-${batch}-${i}`))))
    }
    expect(results.filter(r => r.signedIn)).toHaveLength(0)
    const beforeLock = results.filter(r => r.status !== 429).length
    console.log(`[hardening] sign-in attempts before the lock: ${beforeLock} of 150 (the rest 429)`)
    expect(beforeLock).toBe(10)
    expect(results.filter(r => r.status === 429)).toHaveLength(140)
    const right = await attempt(server.url, demo.inspector, 'rootface-demo')
    expect(right.status).toBe(429)
    expect(right.signedIn).toBe(false)
    // Another account from the same address is not locked by it.
    expect((await attempt(server.url, demo.auditor, 'rootface-demo')).signedIn).toBe(true)
  })

  it('the owner of the locked account is e-mailed once', async () => {
    for (let i = 0; i < 100 && !smtp.messages.some(m => m.to.includes(demo.inspector)); i++) await new Promise(resolve => setTimeout(resolve, 100))
    const mails = smtp.messages.filter(m => m.to.includes(demo.inspector))
    expect(mails).toHaveLength(1)
    expect(mails[0]!.subject).toBe('Sign-in to your Rootface account is paused')
    expect(mails[0]!.text).toContain('15 minutes')
  })

  it('the lock survives a restart (kept in the database)', async () => {
    const { dataDir, databaseUrl } = server
    await server.stop('SIGTERM', { keepData: true })
    server = await startServer({ dataDir, databaseUrl, env: { SMTP_URL: smtp.url } })
    expect((await attempt(server.url, demo.inspector, 'rootface-demo')).status).toBe(429)
  })

  it('twenty right passwords at once for one account: each signs in or is asked to wait, none is a 500 (a success deleting the count raced the next reservation on PostgreSQL)', async () => {
    const results = await Promise.all(Array.from({ length: 20 }, () => attempt(server.url, demo.welder, 'rootface-demo')))
    expect(results.map(r => r.status).filter(s => s >= 500)).toEqual([])
    // Attempts in flight count against the account's limit of 10 until they succeed, so some may be asked to wait (429);
    // every other one signs in.
    expect(results.filter(r => !r.signedIn).map(r => r.status).filter(s => s !== 429)).toEqual([])
    expect(results.filter(r => r.signedIn).length).toBeGreaterThanOrEqual(10)
  })
})

describe('behind a trusted proxy', () => {
  let server: TestServer
  beforeAll(async () => {
    server = await startServer({ env: { NUXT_TRUSTED_PROXIES: '127.0.0.1' } })
  })
  afterAll(async () => server?.stop())

  it('the client address comes from X-Forwarded-For: a locked address does not lock another', async () => {
    await Promise.all(Array.from({ length: 50 }, (_, i) => attempt(server.url, `ghost-${i}@nowhere.test`, 'x', { 'x-forwarded-for': '203.0.113.7' })))
    expect((await attempt(server.url, demo.supervisor, 'rootface-demo', { 'x-forwarded-for': '203.0.113.7' })).status).toBe(429)
    expect((await attempt(server.url, demo.supervisor, 'rootface-demo', { 'x-forwarded-for': '203.0.113.8' })).signedIn).toBe(true)
  }, 120_000)

  it('an unknown account takes the same time as a real one with a wrong password', async () => {
    const known: number[] = []
    const unknown: number[] = []
    let n = 0
    const address = () => ({ 'x-forwarded-for': `192.0.2.${++n}` })
    // One warm-up pair, then at most three failures in a row per real account and one per address: no throttling delay
    // on either side. The order alternates so neither side always goes first.
    await attempt(server.url, 'warm-up@nowhere.test', 'x', address())
    // The inspector's account is locked by the first test: its quick 429s would not be a password check.
    const open = [demo.welder, demo.auditor, demo.supervisor]
    for (let round = 0; round < 6; round++) {
      // A right password clears an account's count, so no round meets the throttling delay of the fourth failure.
      if (round % 3 === 0) for (const email of open) expect((await attempt(server.url, email, 'rootface-demo', address())).signedIn).toBe(true)
      for (const [i, email] of open.entries()) {
        const real = async () => {
          const tried = await attempt(server.url, email, `wrong-${round}`, address())
          expect(tried.status, email).not.toBe(429)
          return tried
        }
        const none = () => attempt(server.url, `no-such-${round}-${email}`, `wrong-${round}`, address())
        if ((round + i) % 2) {
          known.push((await real()).ms)
          unknown.push((await none()).ms)
        }
        else {
          unknown.push((await none()).ms)
          known.push((await real()).ms)
        }
      }
    }
    const ratio = median(unknown) / median(known)
    console.log(`[hardening] sign-in time, median: real account ${median(known).toFixed(0)} ms, unknown ${median(unknown).toFixed(0)} ms (ratio ${ratio.toFixed(2)})`)
    expect(ratio).toBeGreaterThan(0.67)
    expect(ratio).toBeLessThan(1.5)
  })
})

describe('without a trusted proxy', () => {
  let server: TestServer
  beforeAll(async () => {
    server = await startServer()
  })
  afterAll(async () => server?.stop())

  it('X-Forwarded-For is ignored: one address trying many accounts is locked after 50 failures', async () => {
    // Sent at once (each waits its own throttling delay), then five more.
    const first = await Promise.all(Array.from({ length: 50 }, (_, i) => attempt(server.url, `nobody-${i}@nowhere.test`, 'Winter2026!', { 'x-forwarded-for': `198.51.100.${i}` })))
    expect(first.every(r => r.status !== 429 && !r.signedIn)).toBe(true)
    for (let i = 50; i < 55; i++) expect((await attempt(server.url, `nobody-${i}@nowhere.test`, 'Winter2026!', { 'x-forwarded-for': `198.51.100.${i}` })).status).toBe(429)
    expect((await attempt(server.url, demo.supervisor, 'rootface-demo', { 'x-forwarded-for': '203.0.113.9' })).status).toBe(429)
  }, 120_000)
})
