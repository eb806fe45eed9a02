import { mkdtempSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { PGlite } from '@electric-sql/pglite'
import pg from 'pg'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { removeDir, signedIn, startServer, type TestServer } from './harness'
import { pdfPages } from './pdf-text'

// A project of about 100 sheets: the five non-draft demo WPSs with their four PQRs (9 sheets), and 31 added welders
// with two certified tests and a continuity log each (93): 102 sheets. The added rows are test data, not expected values.
const welders = 31
let dataDir = ''
let server: TestServer

async function seedLargeProject(query: (sql: string, params?: unknown[]) => Promise<unknown>) {
  await query(`insert into projects (customer_id, number, name, starts_on) values (1, 'SC-100', 'Packet of one hundred sheets', current_date - 200)`)
  await query(`insert into project_procedures (project_id, procedure_id) select p.id, x.id from projects p, procedures x where p.number = 'SC-100' and x.status <> 'draft'`)
  for (let i = 1; i <= welders; i++) {
    const stamp = `SC-${String(i).padStart(2, '0')}`
    await query(`with w as (insert into welders (name, stamp) values ($1, $2) returning id),
      p as (insert into project_welders (project_id, welder_id) select (select id from projects where number = 'SC-100'), id from w),
      t as (insert into welder_tests (welder_id, test_date, code, edition, unit, process, form, weld, coupon_thickness, deposit_thickness, layers,
          outside_diameter, positions, status, backing, f_number, p_number, examination, visual_accepted)
        select id, current_date - 300, 'asme-ix', '2023', 'in', 'SMAW', 'plate', 'groove', 0.375, 0.375, 2, null, '{3G,4G}'::text[], 'certified', true, '4', '1', 'bend', true from w
        union all
        select id, current_date - 280, 'asme-ix', '2023', 'in', 'GTAW', 'pipe', 'groove', 0.28, 0.28, 2, 2.375, '{6G}'::text[], 'certified', false, '6', '1', 'bend', true from w
        returning id, welder_id, process),
      s as (insert into signatures (record_type, record_id, record_version, signer_id, signer_name, meaning, sha256, verify_code)
        select 'welder-test', t.id, 1, (select id from accounts where role = 'inspector' limit 1), 'Scale inspector', 'certified', repeat('0', 64),
          'S' || lpad(t.id::text, 9, '2') from t returning id)
      insert into continuity_entries (welder_id, process, welded_on, reference)
        select welder_id, process, current_date - d, 'SC-100 spool ' || d from t, unnest(array[150, 90, 30]) as d`, [`Scale welder ${i}`, stamp])
  }
}

beforeAll(async () => {
  if (process.env.TEST_DATABASE_URL) {
    server = await startServer()
    const client = new pg.Client({ connectionString: server.databaseUrl })
    await client.connect()
    await seedLargeProject((sql, params) => client.query(sql, params as unknown[]))
    await client.end()
    return
  }
  dataDir = mkdtempSync(join(tmpdir(), 'rootface-scale-'))
  server = await startServer({ dataDir })
  await server.stop()
  const db = await PGlite.create(join(dataDir, 'db'))
  await seedLargeProject((sql, params) => db.query(sql, params as unknown[]))
  await db.close()
  server = await startServer({ dataDir })
}, 180_000)
afterAll(async () => {
  await server?.stop()
  if (dataDir) removeDir(dataDir)
})

describe('a packet of 100 sheets', () => {
  it('builds with visible progress and every sheet in the file', async () => {
    const supervisor = await signedIn(server.url, 'supervisor')
    const projects = await supervisor.json<{ id: number, number: string }[]>('/api/projects')
    const project = projects.body.find(p => p.number === 'SC-100')!
    const detail = await supervisor.json<{ sheetCount: number }>(`/api/projects/${project.id}`)
    expect(detail.body.sheetCount).toBe(102)

    const started = performance.now()
    const job = await supervisor.json<{ id: number }>('/api/packets', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ projectId: project.id }) })
    expect(job.status).toBe(202)
    const progress: number[] = []
    let longestWait = 0
    let state = { status: 'queued', progress: 0, pageCount: 0 }
    while (state.status !== 'ready' && state.status !== 'failed' && performance.now() - started < 120_000) {
      await new Promise(r => setTimeout(r, 100))
      const asked = performance.now()
      try {
        state = (await supervisor.json<typeof state>(`/api/packets/${job.body.id}`)).body
      }
      catch (error) {
        throw new Error(`the server stopped answering:\n${server.output().slice(-3000)}`, { cause: error })
      }
      longestWait = Math.max(longestWait, performance.now() - asked)
      progress.push(state.progress)
    }
    const ms = performance.now() - started
    console.info(server.output().split('\n').filter(l => l.includes('[rootface] packet')).join('\n'))
    expect(state.status).toBe('ready')
    // The page saw the build move: some polls answered between 0 and 100
    expect(progress.some(p => p > 0 && p < 100)).toBe(true)
    const file = await supervisor.fetch(`/api/packets/${job.body.id}/file`)
    const pages = await pdfPages(new Uint8Array(await file.arrayBuffer()))
    expect(pages.length).toBe(state.pageCount)
    expect(pages.filter(p => /Sheet page 1 of/.test(p)).length).toBe(detail.body.sheetCount)
    console.info(`[measure] packet of ${detail.body.sheetCount} sheets: ${pages.length} pages, ${Math.round(ms)} ms from request to ready; `
      + `longest poll answer while building ${Math.round(longestWait)} ms; progress seen ${[...new Set(progress)].join(', ')}`)
  }, 180_000)
})
