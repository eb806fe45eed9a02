import { mkdtempSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { PGlite } from '@electric-sql/pglite'
import pg from 'pg'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { removeDir, signedIn, startServer, type Client, type TestServer } from './harness'

// Undo of a committed CSV continuity import (issue 17): whole, audited, by the quality manager, within the stated window
// (7 days: shared/schemas/continuity-entry.ts importUndoDays, a Rootface rule), refused when later records rest on it.
const usePostgres = !!process.env.TEST_DATABASE_URL
let dataDir = ''
let server: TestServer
let supervisor: Client
let inspector: Client
let welder: Client

async function signInAll() {
  supervisor = await signedIn(server.url, 'supervisor')
  inspector = await signedIn(server.url, 'inspector')
  welder = await signedIn(server.url, 'welder')
}

beforeAll(async () => {
  dataDir = usePostgres ? '' : mkdtempSync(join(tmpdir(), 'rootface-undo-'))
  server = await startServer(usePostgres ? {} : { dataDir })
  await signInAll()
})
afterAll(async () => {
  await server?.stop()
  if (dataDir) removeDir(dataDir)
})

/** Changes stored records behind the server's back: a client on PostgreSQL, or PGlite with the server stopped. */
async function inDatabase(work: (query: (sql: string, params?: unknown[]) => Promise<unknown>) => Promise<void>) {
  if (usePostgres) {
    const client = new pg.Client({ connectionString: server.databaseUrl })
    await client.connect()
    try {
      await work((sql, params) => client.query(sql, params as unknown[]))
    }
    finally {
      await client.end()
    }
    return
  }
  await server.stop()
  const db = await PGlite.create(join(dataDir, 'db'))
  try {
    await work(async (sql, params) => db.query(sql, params as unknown[]))
  }
  finally {
    await db.close()
  }
  server = await startServer({ dataDir })
  await signInAll()
}

type Json = Record<string, unknown> & { message?: string }
interface Imports { undoDays: number, items: { id: number, rows: number, by: string | null, undoneAt: string | null, mayUndo: boolean, whyNot: string | null }[] }
const post = (client: Client, path: string, body?: unknown) =>
  client.json<Json>(path, { method: 'POST', ...(body === undefined ? {} : { body: JSON.stringify(body), headers: { 'content-type': 'application/json' } }) })
const daysAgo = (n: number) => new Date(Date.now() - n * 86_400_000).toISOString().slice(0, 10)
const countOf = async (q: string) => (await supervisor.json<{ total: number }>(`/api/continuity?q=${encodeURIComponent(q)}`)).body.total

/** Commits a CSV import and answers the id of the import it made (the newest in the list). */
async function imported(rows: string[]): Promise<number> {
  const res = await post(inspector, '/api/continuity/import', { csv: ['stamp,process,date,reference', ...rows].join('\n'), commit: true })
  expect(res.status).toBe(200)
  expect(res.body.stored).toBe(rows.length)
  const list = await supervisor.json<Imports>('/api/continuity/imports')
  expect(list.body.items.length).toBeGreaterThan(0)
  const [newest] = list.body.items
  expect(newest!.rows).toBe(rows.length)
  return newest!.id
}

describe('undo of a CSV continuity import', () => {
  it('the quality manager undoes a fresh import whole; it is audited and cannot be undone twice', async () => {
    const id = await imported([`KB-01,SMAW,${daysAgo(3)},undo batch A`, `KB-02,SMAW,${daysAgo(3)},undo batch A`])
    expect(await countOf('undo batch A')).toBe(2)
    const listed = (await inspector.json<Imports>('/api/continuity/imports')).body
    expect(listed.undoDays).toBe(7)
    expect(listed.items.find(i => i.id === id)).toMatchObject({ rows: 2, by: expect.any(String), undoneAt: null, mayUndo: true, whyNot: null })

    expect((await post(inspector, `/api/continuity/imports/${id}/undo`)).status).toBe(403) // the inspector imports, only the QM undoes
    expect((await post(welder, `/api/continuity/imports/${id}/undo`)).status).toBe(403)
    expect(await countOf('undo batch A')).toBe(2)

    const undone = await post(supervisor, `/api/continuity/imports/${id}/undo`)
    expect(undone.status).toBe(200)
    expect(undone.body).toEqual({ id, removed: 2 })
    expect(await countOf('undo batch A')).toBe(0)

    const audit = await supervisor.json<{ items: { action: string, before: { entries: { reference: string }[] } }[] }>(`/api/audit?recordType=continuity-import&recordId=${id}`)
    expect(audit.body.items.map(e => e.action)).toEqual(['import-undo'])
    expect(audit.body.items[0]!.before.entries.map(e => e.reference)).toEqual(['undo batch A', 'undo batch A'])

    const again = await post(supervisor, `/api/continuity/imports/${id}/undo`)
    expect(again.status).toBe(409)
    expect(again.body.message).toMatch(/^Already undone/)
    const after = (await supervisor.json<Imports>('/api/continuity/imports')).body.items.find(i => i.id === id)!
    expect(after.undoneAt).not.toBeNull()
    expect(after.mayUndo).toBe(false)
  })

  it('an entry logged later for the same welder and process, dated on or after the import, refuses the undo', async () => {
    const id = await imported([`KB-03,GMAW,${daysAgo(10)},undo batch B`])
    const later = await post(inspector, '/api/continuity', { welderId: await welderId('KB-03'), process: 'GMAW', weldedOn: daysAgo(1), reference: 'after batch B' })
    expect(later.status).toBe(201)
    const refused = await post(supervisor, `/api/continuity/imports/${id}/undo`)
    expect(refused.status).toBe(409)
    expect(refused.body.message).toContain('1 entry logged since for the same welders and processes')
    expect(await countOf('undo batch B')).toBe(1)
    expect((await supervisor.json<Imports>('/api/continuity/imports')).body.items.find(i => i.id === id)).toMatchObject({ mayUndo: false, whyNot: expect.stringContaining('Later records rest on this import') })
  })

  it('a later entry dated before the import\'s first date, or of another process, does not rest on it', async () => {
    const id = await imported([`KB-04,GTAW,${daysAgo(2)},undo batch C`])
    const welder4 = await welderId('KB-04')
    expect((await post(inspector, '/api/continuity', { welderId: welder4, process: 'GTAW', weldedOn: daysAgo(20), reference: 'before batch C' })).status).toBe(201)
    expect((await post(inspector, '/api/continuity', { welderId: welder4, process: 'SMAW', weldedOn: daysAgo(1), reference: 'other process C' })).status).toBe(201)
    const undone = await post(supervisor, `/api/continuity/imports/${id}/undo`)
    expect(undone.status).toBe(200)
    expect(undone.body.removed).toBe(1)
    expect(await countOf('before batch C')).toBe(1)
  })

  it('a continuity log issued after the import for one of its welders refuses the undo (the issued sheet must keep verifying)', async () => {
    const id = await imported([`KB-02,GTAW,${daysAgo(5)},undo batch E`])
    const welder2 = await welderId('KB-02')
    const issued = await supervisor.fetch(`/api/sheets/continuity/${welder2}?format=json`)
    expect(issued.status).toBe(200)
    const refused = await post(supervisor, `/api/continuity/imports/${id}/undo`)
    expect(refused.status).toBe(409)
    expect(refused.body.message).toContain('1 continuity log issued since for these welders')
    expect(await countOf('undo batch E')).toBe(1)
  })

  it('after the 7-day window the undo is refused; an unknown import is a 404', async () => {
    const id = await imported([`KB-05,SMAW,${daysAgo(9)},undo batch D`])
    await inDatabase(async (query) => {
      await query(`update continuity_imports set created_at = now() - interval '7 days 1 minute' where id = $1`, [id])
    })
    const refused = await post(supervisor, `/api/continuity/imports/${id}/undo`)
    expect(refused.status).toBe(409)
    expect(refused.body.message).toContain('for 7 days after it was stored')
    expect(await countOf('undo batch D')).toBe(1)
    expect((await post(supervisor, '/api/continuity/imports/999999/undo')).status).toBe(404)
  })
})

async function welderId(stamp: string): Promise<number> {
  const roster = await supervisor.json<{ items: { id: number, stamp: string }[] }>(`/api/welders?q=${stamp}&pageSize=50`)
  const row = roster.body.items.find(w => w.stamp === stamp)
  expect(row, stamp).toBeDefined()
  return row!.id
}
