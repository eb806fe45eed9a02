import dayjs from 'dayjs'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signedIn, startServer, type Client, type TestServer } from './harness'

let server: TestServer
let supervisor: Client
let inspector: Client
let welder: Client
let roster: { id: number, stamp: string }[]

beforeAll(async () => {
  server = await startServer()
  supervisor = await signedIn(server.url, 'supervisor')
  inspector = await signedIn(server.url, 'inspector')
  welder = await signedIn(server.url, 'welder')
  roster = (await supervisor.json<{ items: { id: number, stamp: string }[] }>('/api/welders?pageSize=50&sort=stamp')).body.items
})
afterAll(async () => server?.stop())

type Json = Record<string, unknown> & { data?: { fieldErrors: Record<string, string[]>, rowErrors?: { line: number, field: string, message: string }[] } }
const send = (client: Client, path: string, body: unknown, method = 'POST') =>
  client.json<Json>(path, { method, body: JSON.stringify(body), headers: { 'content-type': 'application/json' } })
const idOf = (stamp: string) => roster.find(w => w.stamp === stamp)!.id
const countOf = async (q: string) => (await supervisor.json<{ total: number }>(`/api/continuity?q=${encodeURIComponent(q)}`)).body.total
const yesterday = new Date(Date.now() - 86_400_000).toISOString().slice(0, 10)

describe('continuity', () => {
  it('one entry moves the lapse date six months past the use (ASME BPVC IX-2023, QW-322.1(a))', async () => {
    const res = await send(inspector, '/api/continuity', { welderId: idOf('KB-04'), process: 'SMAW', weldedOn: yesterday, reference: 'single entry test' })
    expect(res.status).toBe(201)
    const smaw = (res.body.standings as { process: string, lastUse: string, lapsesOn: string }[]).find(s => s.process === 'SMAW')!
    expect(smaw.lastUse).toBe(yesterday)
    // Six calendar months later, month ends clamped (docs/sources.md §A4 date convention); cross-checked with
    // dayjs, a different date library than the rules use (date-fns)
    expect(smaw.lapsesOn).toBe(dayjs(yesterday).add(6, 'month').format('YYYY-MM-DD'))
  })

  it('refuses a future date, an unknown welder and a bad process with field messages', async () => {
    const cases: [Record<string, unknown>, string][] = [
      [{ weldedOn: '2999-01-01' }, 'weldedOn'],
      [{ weldedOn: '2026-02-30' }, 'weldedOn'],
      [{ welderId: 999999 }, 'welderId'],
      [{ process: 'LASER' }, 'process'],
      [{ reference: '' }, 'reference'],
    ]
    for (const [extra, field] of cases) {
      const res = await send(supervisor, '/api/continuity', { welderId: idOf('KB-01'), process: 'SMAW', weldedOn: yesterday, reference: 'x', ...extra })
      expect(res.status, field).toBe(400)
      expect(Object.keys(res.body.data?.fieldErrors ?? {}), field).toContain(field)
    }
  })

  it('logs one date for many welders at once, all or none', async () => {
    const ids = ['KB-01', 'KB-02', 'KB-05'].map(idOf)
    const ok = await send(inspector, '/api/continuity/bulk', { welderIds: ids, process: 'GMAW', weldedOn: yesterday, reference: 'bulk shift 7' })
    expect(ok.status).toBe(201)
    expect(ok.body.stored).toBe(3)
    expect(await countOf('bulk shift 7')).toBe(3)
    const bad = await send(inspector, '/api/continuity/bulk', { welderIds: [...ids, 999999], process: 'GMAW', weldedOn: yesterday, reference: 'bulk shift 8' })
    expect(bad.status).toBe(400)
    expect(await countOf('bulk shift 8')).toBe(0)
  })

  it('a CSV with bad rows imports nothing and names each bad row', async () => {
    const csv = [
      'stamp,process,date,reference',
      `KB-01,SMAW,${yesterday},csv import A`,
      `KB-99,SMAW,${yesterday},csv import A`,
      `KB-02,LASER,${yesterday},csv import A`,
      'KB-03,GMAW,2026-02-30,csv import A',
      `KB-04,SMAW,${yesterday},`,
    ].join('\n')
    const preview = await send(inspector, '/api/continuity/import', { csv })
    expect(preview.status).toBe(200)
    expect(preview.body.total).toBe(1)
    const errors = preview.body.errors as { line: number, field: string }[]
    expect(errors.map(e => [e.line, e.field])).toEqual([[3, 'stamp'], [4, 'process'], [5, 'weldedOn'], [6, 'reference']])
    const commit = await send(inspector, '/api/continuity/import', { csv, commit: true })
    expect(commit.status).toBe(400)
    expect(commit.body.data?.rowErrors).toHaveLength(4)
    expect(await countOf('csv import A')).toBe(0)
  })

  it('a clean CSV (any header case, quoted fields, BOM) imports every row in one go', async () => {
    const lines = ['\uFEFFStamp,Process,Welded On,Reference']
    for (const s of ['KB-01', 'KB-02', 'KB-03', 'KB-04', 'KB-05']) lines.push(`${s.toLowerCase()},smaw,${yesterday},"csv import B, bay 2"`)
    const res = await send(supervisor, '/api/continuity/import', { csv: lines.join('\r\n'), commit: true })
    expect(res.status).toBe(200)
    expect(res.body.stored).toBe(5)
    expect(await countOf('csv import B, bay 2')).toBe(5)
    const missing = await send(supervisor, '/api/continuity/import', { csv: 'who,when\nKB-01,2026-01-01' })
    expect((missing.body.errors as { field: string }[])[0]!.field).toBe('header')
  })

  it('standings show last use, lapse date, days left, and for a lapsed process how to renew it', async () => {
    const res = await inspector.json<{ rows: { standing: string, daysLeft: number, lapsesOn: string, renewal: { clause: string } | null, revoked?: unknown }[] }>('/api/continuity/standings')
    expect(res.status).toBe(200)
    const lapsed = res.body.rows.filter(r => r.standing === 'lapsed')
    expect(lapsed.length).toBeGreaterThan(0)
    // A lapse is renewed by one coupon (QW-322.2(a)); a revoked process is not (QW-322.2(b): a new test), so it offers none
    const lapsedOnly = lapsed.filter(r => !r.revoked)
    expect(lapsedOnly.length, 'a check over an empty list proves nothing').toBeGreaterThan(0)
    expect(lapsedOnly.every(r => r.daysLeft <= 0 && r.renewal?.clause === 'ASME IX QW-322.2(a)')).toBe(true)
    expect(lapsed.filter(r => r.revoked).every(r => r.daysLeft <= 0 && r.renewal === null)).toBe(true)
    expect(res.body.rows.filter(r => r.standing !== 'lapsed').length, 'a check over an empty list proves nothing').toBeGreaterThan(0)
    expect(res.body.rows.filter(r => r.standing !== 'lapsed').every(r => r.renewal === null)).toBe(true)
    const filtered = await inspector.json<{ rows: { standing: string }[] }>('/api/continuity/standings?standing=lapsed')
    expect(filtered.body.rows.length).toBe(lapsed.length)
  })

  it('a welder may not log continuity while the shop keeps it to staff', async () => {
    const own = (await welder.json<{ welder: { id: number } }>('/api/me/qualifications')).body.welder.id
    expect((await send(welder, '/api/continuity', { welderId: own, process: 'GMAW', weldedOn: yesterday, reference: 'own log' })).status).toBe(403)
  })

  it('the quality manager removes a mistaken entry; others may not', async () => {
    const list = await supervisor.json<{ items: { id: number }[] }>('/api/continuity?q=bulk%20shift%207')
    const id = list.body.items[0]!.id
    expect((await inspector.fetch(`/api/continuity/${id}`, { method: 'DELETE' })).status).toBe(403)
    expect((await supervisor.fetch(`/api/continuity/${id}`, { method: 'DELETE' })).status).toBe(204)
    expect(await countOf('bulk shift 7')).toBe(2)
  })
})
