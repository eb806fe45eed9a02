import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signedIn, startServer, type Client, type TestServer } from './harness'

let server: TestServer
let supervisor: Client

beforeAll(async () => {
  server = await startServer()
  supervisor = await signedIn(server.url, 'supervisor')
})
afterAll(async () => server?.stop())

describe('list routes page, sort and filter on the server', () => {
  it('pages the roster and sorts by stamp both ways', async () => {
    const asc = await supervisor.json<{ items: { stamp: string }[], total: number }>('/api/welders?sort=stamp&dir=asc&pageSize=5')
    expect(asc.status).toBe(200)
    expect(asc.body.total).toBe(13) // the demo roster: KB-01 to KB-12, and KB-13 (the ISO 9606-1 welder, demo-iso.ts)
    expect(asc.body.items.map(w => w.stamp)).toEqual(['KB-01', 'KB-02', 'KB-03', 'KB-04', 'KB-05'])
    const page3 = await supervisor.json<{ items: { stamp: string }[] }>('/api/welders?sort=stamp&dir=asc&pageSize=5&page=3')
    expect(page3.body.items.map(w => w.stamp)).toEqual(['KB-11', 'KB-12', 'KB-13'])
    const desc = await supervisor.json<{ items: { stamp: string }[] }>('/api/welders?sort=stamp&dir=desc&pageSize=1')
    expect(desc.body.items[0]!.stamp).toBe('KB-13')
  })

  it('filters by text and status; the text filter treats % and _ literally', async () => {
    const found = await supervisor.json<{ items: { name: string }[] }>('/api/welders?q=carval')
    expect(found.body.items.map(w => w.name)).toEqual(['Ines Carvalho'])
    const inactive = await supervisor.json<{ total: number }>('/api/welders?status=inactive')
    expect(inactive.body.total).toBe(1)
    const wildcard = await supervisor.json<{ total: number }>('/api/welders?q=%25')
    expect(wildcard.body.total).toBe(0)
  })

  it('filters procedures by a thickness they cover', async () => {
    const list = await supervisor.json<{ items: { number: string, thicknessMin: number, thicknessMax: number }[] }>('/api/procedures?thickness=1.4&pageSize=50')
    expect(list.body.items.length).toBeGreaterThan(0)
    for (const p of list.body.items) expect(p.thicknessMin <= 1.4 && p.thicknessMax >= 1.4).toBe(true)
  })

  it('bad query values answer 400 with field messages, never 500', async () => {
    for (const query of ['page=0', 'pageSize=100000', 'sort=password', 'dir=sideways', 'status=retired', `q=${'x'.repeat(300)}`, 'thickness=-1']) {
      const res = await supervisor.json<{ statusCode: number, data?: { fieldErrors: Record<string, string[]> } }>(`/api/${query.startsWith('thickness') ? 'procedures' : 'welders'}?${query}`)
      expect(res.status, query).toBe(400)
      expect(Object.keys(res.body.data?.fieldErrors ?? {}).length, query).toBeGreaterThan(0)
    }
    expect((await supervisor.fetch('/api/welders/abc')).status).toBe(400)
  })

  it('each roster row carries where each process stands, with the lapse date', async () => {
    const list = await supervisor.json<{ items: { stamp: string, standings: { process: string, lapsesOn: string, standing: string }[] }[] }>('/api/welders?pageSize=50')
    const all = list.body.items.flatMap(w => w.standings)
    expect(all.length).toBeGreaterThan(0)
    // The demo is built to show every standing at once.
    expect(new Set(all.map(s => s.standing))).toEqual(new Set(['current', 'lapsing', 'lapsed']))
  })
})
