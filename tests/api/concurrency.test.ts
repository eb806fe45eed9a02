import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signedIn, startServer, type Client, type TestServer } from './harness'

// OWASP ASVS 4.0 V11 (business logic): two edits from the same version — one wins, the other gets 409, nothing lost;
// concurrent writes keep every row.
let server: TestServer
let supervisor: Client
let inspector: Client

beforeAll(async () => {
  server = await startServer()
  supervisor = await signedIn(server.url, 'supervisor')
  inspector = await signedIn(server.url, 'inspector')
})
afterAll(async () => server?.stop())

const json = (method: string, body: unknown): RequestInit => ({ method, headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) })

describe('concurrent edits and writes', () => {
  it('two edits of one welder from the same version: one 200, one 409, and the winner\'s change is kept', async () => {
    const { body: welder } = await supervisor.json<{ welder: { id: number, version: number, name: string } }>('/api/welders/2')
    const version = welder.welder.version
    const [a, b] = await Promise.all([
      supervisor.json<{ name: string }>('/api/welders/2', json('PATCH', { version, name: 'Rosalind Mbeki (edit A)' })),
      supervisor.json<{ name: string }>('/api/welders/2', json('PATCH', { version, name: 'Rosalind Mbeki (edit B)' })),
    ])
    expect([a.status, b.status].sort()).toEqual([200, 409])
    const winner = a.status === 200 ? 'Rosalind Mbeki (edit A)' : 'Rosalind Mbeki (edit B)'
    const { body: after } = await supervisor.json<{ welder: { name: string, version: number } }>('/api/welders/2')
    expect(after.welder.name).toBe(winner)
    expect(after.welder.version).toBe(version + 1)
  })

  it('200 continuity entries sent at once from two accounts are all stored', async () => {
    const before = await supervisor.json<{ total: number }>('/api/continuity?welderId=4&pageSize=1')
    const day = (i: number) => `2026-${String(1 + (i % 11)).padStart(2, '0')}-${String(1 + (i % 28)).padStart(2, '0')}`
    const results = await Promise.all(Array.from({ length: 200 }, (_, i) =>
      (i % 2 ? supervisor : inspector).fetch('/api/continuity', json('POST', { welderId: 4, process: 'SMAW', weldedOn: day(i), reference: `load ${i}` })).then(r => r.status)))
    expect(results.filter(s => s === 201).length).toBe(200)
    const after = await supervisor.json<{ total: number }>('/api/continuity?welderId=4&pageSize=1')
    expect(after.body.total).toBe(before.body.total + 200)
  })

  it('bulk entries and single entries interleaved: each bulk is all-or-nothing and every row is kept', async () => {
    const ids = [1, 2, 3, 5, 6, 7, 9, 10]
    const before = await supervisor.json<{ total: number }>('/api/continuity?reference=&q=interleave&pageSize=1')
    const work = [
      ...Array.from({ length: 10 }, (_, i) => supervisor.fetch('/api/continuity/bulk', json('POST', { welderIds: ids, process: 'GTAW', weldedOn: '2026-11-02', reference: `interleave bulk ${i}` }))),
      ...Array.from({ length: 40 }, (_, i) => inspector.fetch('/api/continuity', json('POST', { welderId: ids[i % ids.length], process: 'GTAW', weldedOn: '2026-11-03', reference: `interleave single ${i}` }))),
      // one bulk naming a welder that does not exist: refused whole
      supervisor.fetch('/api/continuity/bulk', json('POST', { welderIds: [1, 999999], process: 'GTAW', weldedOn: '2026-11-02', reference: 'interleave refused' })),
    ]
    const statuses = (await Promise.all(work)).map(r => r.status)
    expect(statuses.slice(0, 50).length, 'a check over an empty list proves nothing').toBeGreaterThan(0)
    expect(statuses.slice(0, 50).every(s => s === 201)).toBe(true)
    expect(statuses[50]).toBe(400)
    const after = await supervisor.json<{ total: number }>('/api/continuity?q=interleave&pageSize=1')
    expect(after.body.total - before.body.total).toBe(10 * ids.length + 40)
  })
})
