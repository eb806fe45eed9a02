import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { Client, freePort, signedIn, startServer, type TestServer } from './harness'

// OWASP ASVS 4.0 V3 (sessions), V4 (access control), V14 (configuration: headers).
let server: TestServer

beforeAll(async () => {
  server = await startServer()
})
afterAll(async () => server?.stop())

describe('security headers', () => {
  it('pages carry a CSP with a per-request nonce and no inline script allowance, and framing is refused', async () => {
    const first = await fetch(`${server.url}/sign-in`)
    const second = await fetch(`${server.url}/sign-in`)
    const csp = first.headers.get('content-security-policy') ?? ''
    const scriptSrc = /script-src ([^;]*)/.exec(csp)?.[1] ?? ''
    expect(scriptSrc).toMatch(/'nonce-[^']+'/)
    expect(scriptSrc).not.toContain('unsafe-inline')
    expect(scriptSrc).not.toContain('unsafe-eval')
    expect(csp).toContain('frame-ancestors \'none\'')
    expect(csp).toContain('object-src \'none\'')
    expect(/nonce-([^']+)/.exec(csp)?.[1]).not.toBe(/nonce-([^']+)/.exec(second.headers.get('content-security-policy') ?? '')?.[1])
    expect(first.headers.get('x-content-type-options')).toBe('nosniff')
    expect(first.headers.get('access-control-allow-origin')).toBeNull()
  })

  it('every inline script in the page carries the nonce', async () => {
    const res = await fetch(`${server.url}/sign-in`)
    const nonce = /nonce-([^']+)/.exec(res.headers.get('content-security-policy') ?? '')?.[1]
    const html = await res.text()
    const scripts = [...html.matchAll(/<script\b[^>]*>/g)].map(m => m[0])
    expect(scripts.length).toBeGreaterThan(0)
    for (const tag of scripts) expect(tag).toContain(`nonce="${nonce}"`)
  })
})

describe('session cookie and cross-site requests', () => {
  it('the session cookie is HttpOnly and SameSite=Lax', async () => {
    const client = new Client(server.url)
    const csrf = await client.json<{ csrfToken: string }>('/api/auth/csrf')
    const res = await client.fetch('/api/auth/callback/credentials', {
      method: 'POST',
      headers: { 'content-type': 'application/x-www-form-urlencoded' },
      body: new URLSearchParams({ csrfToken: csrf.body.csrfToken, email: 'inspector@demo.rootface.test', password: 'rootface-demo', json: 'true' }),
    })
    const session = res.headers.getSetCookie().find(c => c.includes('session-token'))
    expect(session).toBeDefined()
    expect(session).toMatch(/HttpOnly/i)
    expect(session).toMatch(/SameSite=Lax/i)
  })

  it('behind https (AUTH_ORIGIN https) the session cookie is Secure', async () => {
    const port = await freePort()
    const secure = await startServer({ port, env: { AUTH_ORIGIN: `https://127.0.0.1:${port}/api/auth` } })
    try {
      const client = new Client(`http://127.0.0.1:${port}`)
      const csrf = await client.json<{ csrfToken: string }>('/api/auth/csrf')
      const res = await client.fetch('/api/auth/callback/credentials', {
        method: 'POST',
        headers: { 'content-type': 'application/x-www-form-urlencoded' },
        body: new URLSearchParams({ csrfToken: csrf.body.csrfToken, email: 'inspector@demo.rootface.test', password: 'rootface-demo', json: 'true' }),
      })
      const session = res.headers.getSetCookie().find(c => c.includes('session-token'))
      expect(session).toMatch(/^__Secure-/)
      expect(session).toMatch(/;\s*Secure/i)
    }
    finally {
      await secure.stop()
    }
  })

  it('a request that changes data from another origin, or with no origin, is refused', async () => {
    const supervisor = await signedIn(server.url, 'supervisor')
    for (const origin of ['http://evil.example', 'null', '']) {
      const res = await supervisor.fetch('/api/welders', { method: 'POST', headers: { 'origin': origin, 'content-type': 'application/json' }, body: '{}' })
      expect(res.status, origin).toBe(403)
    }
  })

  it('errors carry no stack trace or SQL', async () => {
    const supervisor = await signedIn(server.url, 'supervisor')
    for (const path of ['/api/welders/abc', '/api/welders/99999999999', '/api/welders?page=-1', '/api/nothing-here']) {
      const text = await (await supervisor.fetch(path)).text()
      expect(text).not.toMatch(/\bat .*\.(m?js|ts):\d+|"stack"|select |insert into/i)
    }
  })
})
