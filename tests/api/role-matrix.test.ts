import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { Client, signedIn, startServer, type TestServer } from './harness'
import { apiRoutes } from './routes'
import type { MatrixEntries } from './matrix/types'

type Who = 'signedOut' | 'supervisor' | 'inspector' | 'welder' | 'auditor'
const who: Who[] = ['signedOut', 'supervisor', 'inspector', 'welder', 'auditor']

// One file per area under ./matrix; together they must name every route in server/api.
const modules = import.meta.glob<{ entries: MatrixEntries }>('./matrix/*.ts', { eager: true })
const matrix: MatrixEntries = Object.assign({}, ...Object.values(modules).map(m => m.entries ?? {}))

let server: TestServer
const clients = {} as Record<Who, Client>

beforeAll(async () => {
  server = await startServer()
  clients.signedOut = new Client(server.url)
  for (const role of who.slice(1) as Exclude<Who, 'signedOut'>[]) clients[role] = await signedIn(server.url, role)
})
afterAll(async () => server?.stop())

describe('role matrix: every API route × every role', () => {
  it('has an entry for every route in server/api, and no stale entries', () => {
    const routes = apiRoutes().map(r => `${r.method} ${r.path}`).sort()
    expect(Object.keys(matrix).sort()).toEqual(routes)
  })

  for (const [route, entry] of Object.entries(matrix)) {
    const [method, path] = route.split(' ') as [string, string]
    it(`${route} answers ${entry.expect.join('/')}`, async () => {
      const url = typeof entry.url === 'function' ? await entry.url({ supervisor: clients.supervisor }) : entry.url ?? path
      const init: RequestInit = { method }
      if (entry.body !== undefined) {
        init.body = JSON.stringify(entry.body)
        init.headers = { 'content-type': 'application/json' }
      }
      const got: number[] = []
      for (const role of who) got.push((await clients[role].fetch(url, init)).status)
      expect(got).toEqual(entry.expect)
    })
  }
})

describe('object-level rules', () => {
  it('a welder reading their own roster entry gets it; another welder\'s gets 404', async () => {
    const me = await clients.welder.json<{ welder: { id: number, stamp: string } }>('/api/me/qualifications')
    expect(me.status).toBe(200)
    expect(me.body.welder.stamp).toBe('KB-03')
    expect((await clients.welder.fetch(`/api/welders/${me.body.welder.id}`)).status).toBe(200)
    expect((await clients.welder.fetch('/api/welders/999999')).status).toBe(404)
  })

  it('a welder lists only their own tests and continuity entries', async () => {
    const tests = await clients.welder.json<{ items: { welderStamp: string }[], total: number }>('/api/tests?pageSize=200')
    expect(tests.body.total).toBeGreaterThan(0)
    expect(new Set(tests.body.items.map(t => t.welderStamp))).toEqual(new Set(['KB-03']))
    // the welder's own log has entries, all theirs; asking for another welder's log shows none of theirs
    const own = await clients.welder.json<{ items: { welderStamp: string }[] }>('/api/continuity?pageSize=200')
    expect(own.body.items.length, 'a check over an empty list proves nothing').toBeGreaterThan(0)
    expect(own.body.items.every(e => e.welderStamp === 'KB-03')).toBe(true)
    const log = await clients.welder.json<{ items: { welderStamp: string }[] }>('/api/continuity?pageSize=200&welderId=1')
    expect(log.body.items.filter(e => e.welderStamp !== 'KB-03')).toEqual([])
  })

  it('a welder sees approved procedures only', async () => {
    const list = await clients.welder.json<{ items: { status: string }[] }>('/api/procedures?pageSize=200')
    expect(list.body.items.length).toBeGreaterThan(0)
    expect(list.body.items.length, 'a check over an empty list proves nothing').toBeGreaterThan(0)
    expect(list.body.items.every(p => p.status === 'approved')).toBe(true)
    const all = await clients.supervisor.json<{ items: { status: string }[] }>('/api/procedures?pageSize=200')
    expect(all.body.items.some(p => p.status === 'draft')).toBe(true)
  })

  it('an auditor sees only the projects granted to them', async () => {
    const mine = await clients.auditor.json<{ number: string }[]>('/api/projects')
    expect(mine.body.map(p => p.number)).toEqual(['KB-2611'])
    const all = await clients.supervisor.json<{ number: string }[]>('/api/projects')
    expect(all.body.length).toBe(3)
  })
})

describe('sign-in', () => {
  it('a wrong password does not sign in', async () => {
    const client = new Client(server.url)
    expect(await client.signIn('inspector@demo.rootface.test', 'wrong-password')).toBe(false)
    expect((await client.fetch('/api/tests')).status).toBe(401)
  })

  it('repeated failures for one account are slowed down', async () => {
    // After 3 failures each attempt waits 0.25 s, then 0.5 s, then 1 s (README, Sign-in throttling): the sixth waits 1 s.
    const client = new Client(server.url)
    for (let i = 0; i < 5; i++) await client.signIn('auditor@demo.rootface.test', `wrong-${i}`)
    const started = Date.now()
    await client.signIn('auditor@demo.rootface.test', 'wrong-again')
    expect(Date.now() - started).toBeGreaterThanOrEqual(900)
  })
})
