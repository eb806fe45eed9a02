import { spawnSync } from 'node:child_process'
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import ExcelJS from 'exceljs'
import Papa from 'papaparse'
import { afterAll, describe, expect, it } from 'vitest'
import { Client, signedIn, startServer, type TestServer } from './harness'
import { samplePng, upload } from './support/files'

const work = mkdtempSync(join(tmpdir(), 'rootface-records-'))
const servers: TestServer[] = []
afterAll(async () => {
  for (const s of servers) await s.stop()
  rmSync(work, { recursive: true, force: true })
})

interface Archive { format: string, formatVersion: number, tables: Record<string, Record<string, unknown>[]>, files: { storageKey: string, sha256: string, base64: string }[] }

async function archiveOf(client: Client) {
  const res = await client.fetch('/api/export/archive')
  expect(res.status).toBe(200)
  expect(res.headers.get('content-disposition')).toMatch(/attachment; filename="rootface-records-\d{4}-\d{2}-\d{2}\.json"/)
  return { text: await res.text(), archive: undefined as unknown as Archive }
}

describe.skipIf(!!process.env.TEST_DATABASE_URL)('the way out: export of every record, and back into an empty database', () => {
  let source: TestServer
  let supervisor: Client
  let first: Archive
  let text: string

  it('hands every table out as CSV and XLSX with all its rows, to the quality manager only', async () => {
    source = await startServer({ dataDir: join(work, 'source') })
    servers.push(source)
    supervisor = await signedIn(source.url, 'supervisor')
    const tables = await supervisor.json<{ name: string, rows: number }[]>('/api/export')
    expect(tables.status).toBe(200)
    const welders = tables.body.find(t => t.name === 'welders')!
    expect(welders.rows).toBeGreaterThan(0)
    const csv = await supervisor.fetch('/api/export/tables/welders?format=csv')
    expect(csv.headers.get('content-type')).toContain('text/csv')
    const parsed = Papa.parse<Record<string, string>>((await csv.text()).replace(/^\uFEFF/, ''), { header: true, delimiter: ',', skipEmptyLines: true })
    expect(parsed.data).toHaveLength(welders.rows)
    expect(parsed.meta.fields).toContain('stamp')
    const xlsx = await supervisor.fetch('/api/export/tables/welder_tests?format=xlsx')
    expect(xlsx.status).toBe(200)
    const book = new ExcelJS.Workbook()
    await book.xlsx.load(await xlsx.arrayBuffer())
    const tests = tables.body.find(t => t.name === 'welder_tests')!
    expect(book.worksheets[0]!.actualRowCount).toBe(tests.rows + 1) // the header line and one line a row
    expect((await supervisor.fetch('/api/export/tables/no_such_table')).status).toBe(404)
    expect((await supervisor.fetch('/api/export/tables/welders?format=pdf')).status).toBe(400)
    for (const role of ['inspector', 'welder', 'auditor'] as const) {
      expect((await (await signedIn(source.url, role)).fetch('/api/export/archive')).status, role).toBe(403)
    }
  }, 120_000)

  it('the JSON archive holds every table and the files; loaded into an empty database, nothing is lost', async () => {
    // records of this round in the source shop too: imported test history an inspector confirmed, and a revocation on it
    const inspector = await signedIn(source.url, 'inspector')
    const json = { 'content-type': 'application/json' }
    const made = await supervisor.json<{ id: number }>('/api/welders', { method: 'POST', body: JSON.stringify({ name: 'Invented Archive', stamp: 'AR-1' }), headers: json })
    const csv = `Stamp,Process,Code,Edition,Test date,Positions,Certificate\nAR-1,GMAW,AWS D1.1,2020,2026-06-01,"1G, 2G",C-AR1`
    expect((await supervisor.json('/api/import/tests', { method: 'POST', body: JSON.stringify({ format: 'csv', content: csv, commit: true }), headers: json })).status).toBe(200)
    const [imported] = (await inspector.json<{ id: number }[]>(`/api/welders/${made.body.id}/imported-tests`)).body
    expect((await inspector.fetch(`/api/imported-tests/${imported!.id}/confirm`, { method: 'POST' })).status).toBe(200)
    expect((await inspector.fetch(`/api/welders/${made.body.id}/revocations`, { method: 'POST', body: JSON.stringify({ process: 'GMAW', reason: 'Archive round trip: porosity on two welds' }), headers: json })).status).toBe(201)
    const up = await upload(supervisor, { recordType: 'welder', recordId: 1, kind: 'photo' }, { name: 'face.png', type: 'image/png', bytes: samplePng })
    expect(up.status).toBe(201)
    ;({ text } = await archiveOf(supervisor))
    first = JSON.parse(text) as Archive
    expect(first.format).toBe('rootface-records')
    expect(first.files.length).toBeGreaterThan(0)
    expect(first.files.every(f => f.base64.length > 0)).toBe(true)
    const file = join(work, 'archive.json')
    writeFileSync(file, text)

    // into an empty database (no demo), with the server stopped
    const target = join(work, 'target')
    const env = { ...process.env, NUXT_DATA_DIR: join(target, 'db'), DATABASE_URL: '' }
    const load = spawnSync(process.execPath, ['node_modules/tsx/dist/cli.mjs', 'scripts/db-import-records.ts', file], { env, encoding: 'utf8', timeout: 120_000 })
    expect(load.status, load.stderr).toBe(0)
    expect(load.stdout).toMatch(/Loaded \d+ rows in \d+ tables and \d+ files/)
    // a second load is refused: the database is no longer empty
    const again = spawnSync(process.execPath, ['node_modules/tsx/dist/cli.mjs', 'scripts/db-import-records.ts', file], { env, encoding: 'utf8', timeout: 120_000 })
    expect(again.status).toBe(1)
    expect(again.stderr).toContain('not empty')

    const restored = await startServer({ dataDir: target, env: { NUXT_SEED_DEMO: 'false' } })
    servers.push(restored)
    const back = await signedIn(restored.url, 'supervisor') // the password hashes came along
    const second = JSON.parse((await archiveOf(back)).text) as Archive
    expect(Object.keys(second.tables).sort()).toEqual(Object.keys(first.tables).sort())
    for (const [name, rows] of Object.entries(first.tables)) {
      // the audit trail goes on growing (the second export is in it): the first one's rows are all there, unchanged
      if (name === 'audit_events') expect(second.tables[name]!.slice(0, rows.length), name).toEqual(rows)
      else expect(second.tables[name], name).toEqual(rows)
    }
    expect(second.files).toEqual(first.files)
    // every table's row count and content: the same (compared above row by row); named here so a failure says which
    for (const [name, rows] of Object.entries(first.tables)) expect(second.tables[name]!.length, name).toBeGreaterThanOrEqual(rows.length)
    // every sheet signed or issued in the first shop still verifies "unchanged" in the second (the hash is recomputed)
    const codes = [...(first.tables.signatures ?? []), ...(first.tables.issued_sheets ?? [])].map(r => String(r.verify_code ?? r.verifyCode))
    expect(codes.length).toBeGreaterThan(10)
    const anonymous = new Client(restored.url)
    for (const code of codes) {
      const verified = await anonymous.json<{ state: string }>(`/api/verify/${code}`)
      expect(verified.status, code).toBe(200)
      expect(verified.body.state, code).toBe('unchanged')
    }
    // the kept standings come back the same (recomputed from the loaded tests, continuity and revocations)
    const standingsOf = async (c: Client) => (await c.json<{ rows: unknown[] }>('/api/continuity/standings?limit=2000')).body.rows
    expect(await standingsOf(back)).toEqual(await standingsOf(supervisor))
    // and the file itself downloads from the new server, byte for byte
    const got = await back.fetch(`/api/attachments/${up.body.id}`)
    expect(Buffer.from(await got.arrayBuffer()).equals(samplePng)).toBe(true)
    // new records get new ids after the loaded ones
    const created = await back.json<{ id: number }>('/api/welders', { method: 'POST', body: JSON.stringify({ name: 'After Load', stamp: 'AL-1' }), headers: { 'content-type': 'application/json' } })
    expect(created.status).toBe(201)
    expect(created.body.id).toBeGreaterThan(Math.max(...first.tables.welders!.map(w => Number(w.id))))
  }, 240_000)
})
