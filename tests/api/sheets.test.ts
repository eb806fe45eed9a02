import { mkdtempSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { PGlite } from '@electric-sql/pglite'
import pg from 'pg'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { removeDir, signedIn, startServer, type Client, type TestServer } from './harness'
import { pdfPages, squeeze } from './pdf-text'

// Ids of the demo seed: procedure 3 = KB-W02 rev. 1 (project KB-2611), 2 = KB-W02 rev. 0 (KB-2598 only); PQR 1 = PQR-K101,
// 2 = PQR-K102; test 1 = KB-01's SMAW plate test, 3 = KB-02's (KB-02 is not on KB-2611), 5 = KB-03's GMAW test; project 1 = KB-2611.
const usePostgres = !!process.env.TEST_DATABASE_URL
let dataDir = ''
let server: TestServer
let supervisor: Client
let auditor: Client
let welder: Client

async function signInAll() {
  supervisor = await signedIn(server.url, 'supervisor')
  auditor = await signedIn(server.url, 'auditor')
  welder = await signedIn(server.url, 'welder')
}

/** Changes the stored records behind the server's back: psql-style on PostgreSQL, or PGlite with the server stopped. */
async function inDatabase(work: (query: (sql: string, params?: unknown[]) => Promise<{ rows: Record<string, unknown>[] }>) => Promise<void>) {
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
    await work(async (sql, params) => db.query<Record<string, unknown>>(sql, params as unknown[]))
  }
  finally {
    await db.close()
  }
  server = await startServer({ dataDir })
  await signInAll()
}

async function download(client: Client, path: string) {
  const started = performance.now()
  const res = await client.fetch(path)
  const body = new Uint8Array(await res.arrayBuffer())
  return { res, body, ms: performance.now() - started }
}

beforeAll(async () => {
  dataDir = mkdtempSync(join(tmpdir(), 'rootface-sheets-'))
  server = usePostgres ? await startServer() : await startServer({ dataDir })
  await signInAll()
})
afterAll(async () => {
  await server?.stop()
  if (dataDir) removeDir(dataDir)
})

describe('sheets render for the demo records, with what the code asks them to carry', () => {
  it('a WPS sheet: number, revision, ranges with clauses, signature, hash, code and caution', async () => {
    const model = await supervisor.json<{ verify: { code: string }, hash: { value: string } }>('/api/sheets/procedures/3?format=json')
    const { res, body, ms } = await download(supervisor, '/api/sheets/procedures/3')
    expect(res.status).toBe(200)
    expect(res.headers.get('content-type')).toBe('application/pdf')
    expect(res.headers.get('content-disposition')).toMatch(/^attachment; filename="WPS-KB-W02-rev.-1\.pdf"/)
    const pages = await pdfPages(body)
    const text = squeeze(pages.join('\n'))
    const warm = await download(supervisor, '/api/sheets/procedures/3')
    console.info(`[measure] one WPS sheet: ${pages.length} pages, first ${Math.round(ms)} ms, again ${Math.round(warm.ms)} ms (whole request, render included)`)
    // The seeded demo shows what it seeds: shop, number, revision, the WPS's stated range and its signer
    for (const expected of ['Kestrel Bend Fabrication', 'KB-W02', 'Revision 1', '3/16 in to 1-1/2 in', 'Approved', 'Maren Oduya']) {
      expect(text).toContain(squeeze(expected))
    }
    // ASME BPVC IX, QW-403.8 → Table QW-451.1: the WPS thickness range is checked against what its PQR qualifies
    expect(text).toContain('QW-403.8,QW-451.1')
    expect(text).toContain(model.body.hash.value)
    expect(text).toContain(squeeze(`${model.body.verify.code.slice(0, 5)}-${model.body.verify.code.slice(5)}`))
    expect(text).toContain(squeeze('the Authorized Inspector or certified welding inspector have the final word'))
    expect(text).toContain(squeeze(`Sheet page 1 of ${pages.length}`))
    expect(text).toContain(squeeze(`Sheet page ${pages.length} of ${pages.length}`))
  })

  it('a PQR sheet: the tensile strength and the base metal range the coupon qualifies', async () => {
    const { res, body } = await download(supervisor, '/api/sheets/pqrs/1')
    expect(res.status).toBe(200)
    const text = squeeze((await pdfPages(body)).join('\n'))
    expect(text).toContain('PQR-K101')
    // ASME BPVC IX QW-152: tensile strength = load / (width × thickness): 5410 lbf / (0.75 in × 0.1345 in) = 53,631 psi
    expect(text).toContain(String(Math.round(5410 / (0.75 * 0.1345))))
    // ASME BPVC IX-2019 Table QW-451.1 (T from 1/16 to 3/8 in: 1/16 in to 2T) narrowed by QW-403.10 (short-circuit GMAW,
    // T under 1/2 in: 1.1T = 1.1 × 0.1345 = 0.14795 in)
    expect(text).toContain(squeeze('1/16 in to 0.14795 in'))
    expect(text).toContain('QW-403.10')
    expect(text).toContain('Certified')
    expect(text).toContain(squeeze('prepared, welded and tested in accordance with the requirements of ASME BPVC Section IX, 2019 edition'))
  })

  it('a WPQ sheet: the test as welded, the ranges qualified and the certification', async () => {
    const { res, body } = await download(supervisor, '/api/sheets/tests/1')
    expect(res.status).toBe(200)
    const text = squeeze((await pdfPages(body)).join('\n'))
    expect(text).toContain(squeeze('Dmitri Ashcombe'))
    // ASME BPVC IX Table QW-452.1(b): a deposit t under 1/2 in qualifies up to 2t: 2 × 3/8 in = 3/4 in
    expect(text).toContain(squeeze('Deposited weld metal, maximum3/4 in'))
    // ASME BPVC IX QW-461.9: 3G and 4G plate groove tests together qualify groove welding flat, vertical and overhead
    expect(text).toContain('QW-461.9')
    expect(text).toContain(squeeze('Tobias Lindqvist-Hale'))
    expect(text).toContain('SHA-256')
  })

  it('a continuity log: the chain of tests, every logged use and the standing (QW-322)', async () => {
    const { res, body } = await download(supervisor, '/api/sheets/continuity/3?projectId=1')
    expect(res.status).toBe(200)
    const text = squeeze((await pdfPages(body)).join('\n'))
    for (const expected of ['Continuity log', 'CL-KB-03', 'Ines Carvalho', 'KB-2611 nozzle pads', 'QW-322.1', 'Issued']) expect(text).toContain(squeeze(expected))
    const again = await supervisor.json<{ verify: { code: string } }>('/api/sheets/continuity/3?projectId=1&format=json')
    const verified = await supervisor.json<{ state: string, sheet: string }>(`/api/verify/${again.body.verify.code}`)
    expect(verified.body).toMatchObject({ state: 'unchanged', sheet: 'Continuity log' })
  })

  it('rejects a bad period with a field message', async () => {
    const res = await supervisor.json<{ data: { fieldErrors: Record<string, string[]> } }>('/api/sheets/continuity/3?from=2026-02-30')
    expect(res.status).toBe(400)
    expect(res.body.data.fieldErrors.from?.[0]).toMatch(/calendar date/)
  })
})

describe('who may download what', () => {
  it('a welder gets their own WPQ and approved WPSs, not another welder\'s test, a draft or a PQR', async () => {
    expect((await welder.fetch('/api/sheets/tests/5')).status).toBe(200)
    expect((await welder.fetch('/api/sheets/tests/1')).status).toBe(404)
    expect((await welder.fetch('/api/sheets/procedures/5')).status).toBe(404) // KB-W04 is a draft
    expect((await welder.fetch('/api/sheets/pqrs/1')).status).toBe(403)
    expect((await welder.fetch('/api/sheets/continuity/1')).status).toBe(404)
  })

  it('an auditor reads only records of a granted project (404) and no quality-manager route (403)', async () => {
    expect((await auditor.fetch('/api/projects/2')).status).toBe(404)
    expect((await auditor.fetch('/api/sheets/procedures/2')).status).toBe(404)
    expect((await auditor.fetch('/api/sheets/pqrs/1')).status).toBe(404)
    expect((await auditor.fetch('/api/sheets/tests/3')).status).toBe(404)
    expect((await auditor.fetch('/api/sheets/continuity/2?projectId=1')).status).toBe(404)
    expect((await auditor.fetch('/api/sheets/continuity/1')).status).toBe(404) // no project named
    expect((await auditor.fetch('/api/packets', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ projectId: 2 }) })).status).toBe(404)
    expect((await auditor.fetch('/api/customers')).status).toBe(403)
    expect((await auditor.fetch('/api/projects/1/choices')).status).toBe(403)
    expect((await auditor.fetch('/api/projects', { method: 'POST', headers: { 'content-type': 'application/json' }, body: '{}' })).status).toBe(403)
    expect((await auditor.fetch('/api/projects/1', { method: 'DELETE' })).status).toBe(403)
    // and what was granted opens
    expect((await auditor.fetch('/api/sheets/procedures/3')).status).toBe(200)
    expect((await auditor.fetch('/api/sheets/tests/1')).status).toBe(200)
  })
})

describe('the packet', () => {
  it('builds as a job with progress, and downloads as one PDF with cover, index, summary and every sheet', async () => {
    const detail = await auditor.json<{ sheetCount: number }>('/api/projects/1')
    const started = await auditor.json<{ id: number, status: string }>('/api/packets', {
      method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ projectId: 1 }),
    })
    expect(started.status).toBe(202)
    const seen = new Set<number>()
    let state = { status: started.body.status, progress: 0, pageCount: null as number | null }
    for (let i = 0; i < 200 && state.status !== 'ready' && state.status !== 'failed'; i++) {
      await new Promise(r => setTimeout(r, 100))
      state = (await auditor.json<typeof state>(`/api/packets/${started.body.id}`)).body
      seen.add(state.progress)
    }
    expect(state.status).toBe('ready')
    const { res, body } = await download(auditor, `/api/packets/${started.body.id}/file`)
    expect(res.status).toBe(200)
    const pages = await pdfPages(body)
    expect(pages.length).toBe(state.pageCount)
    // cover + index + summary, then every sheet starts on its own page
    const sheetStarts = pages.filter(p => /Sheet page 1 of/.test(p)).length
    expect(sheetStarts).toBe(detail.body.sheetCount)
    expect(pages.length).toBeGreaterThanOrEqual(3 + detail.body.sheetCount)
    expect(squeeze(pages[0]!)).toContain('KB-2611')
    expect(squeeze(pages[1]!)).toContain(squeeze('Sheets in this packet'))
    expect(squeeze(pages.at(-1)!)).toContain(squeeze(`packet page ${pages.length} of ${pages.length}`))
    // The index gives each sheet's page: the WPS KB-W02 rev. 1 starts where the index says
    const indexLine = pages[1]!.split('\n').find(l => l.includes('KB-W02 rev. 1'))
    const page = Number(indexLine?.trim().split(/\s+/).at(-1))
    expect(pages[page - 1]).toContain('KB-W02')
    expect(squeeze(pages[page - 1]!)).toContain(squeeze('Sheet page 1 of'))
    // Not current: the summary page lists the project's gaps (or says there are none)
    expect(squeeze(pages[2]!)).toContain(squeeze('Welders not current on a day of the period'))
  })
})

describe('verification by code', () => {
  let wpqCode = ''

  it('a good code verifies as unchanged, publicly, with signers and dates and no more', async () => {
    const model = await supervisor.json<{ verify: { code: string }, hash: { value: string } }>('/api/sheets/tests/5?format=json')
    wpqCode = model.body.verify.code
    const res = await fetch(`${server.url}/api/verify/${wpqCode.slice(0, 5)}-${wpqCode.slice(5).toLowerCase()}`)
    expect(res.status).toBe(200)
    const body = await res.json() as Record<string, unknown>
    expect(body).toMatchObject({ state: 'unchanged', number: 'WPQ-5', signedSha256: model.body.hash.value })
    expect(Object.keys(body).sort()).toEqual(['code', 'number', 'revision', 'sheet', 'signedSha256', 'signers', 'state', 'status', 'subject'])
    expect((body.signers as { name: string }[])[0]?.name).toBe('Tobias Lindqvist-Hale')
  })

  it('an unknown code is a plain 404 and a malformed one a 400', async () => {
    expect((await fetch(`${server.url}/api/verify/ZZZZZZZZZZ`)).status).toBe(404)
    expect((await fetch(`${server.url}/api/verify/not-a-code`)).status).toBe(400)
  })

  it('a record changed in the database verifies as changed, and its sheet says so; names with markup print as text', async () => {
    const odd = '<b>Zoë</b> Łukasz-Ørsted «Ω» & <script>x</script>'
    const auditorDownloadsBefore = { n: 0 }
    await inDatabase(async (query) => {
      await query('update welder_tests set coupon_thickness = coupon_thickness + 0.01 where id = 5')
      const [w] = (await query('insert into welders (name, stamp) values ($1, $2) returning id', [odd, 'KB-Ω1'])).rows
      await query(`insert into welder_tests (welder_id, test_date, code, edition, unit, process, form, weld, coupon_thickness, positions, status, backing, f_number, p_number)
        values ($1, '2026-01-10', 'asme-ix', '2023', 'in', 'SMAW', 'plate', 'groove', 0.375, '{3G}', 'recorded', true, '4', '1')`, [w!.id])
      await query('insert into project_welders (project_id, welder_id) values (1, $1)', [w!.id])
      const [n] = (await query(`select count(*)::int as n from audit_events e join accounts a on a.id = e.account_id
        where a.email = 'auditor@demo.rootface.test' and e.action in ('sheet.download', 'packet.download')`)).rows
      auditorDownloadsBefore.n = Number(n!.n)
    })
    // Every download the auditor made above is in the audit trail (2 sheets, 1 packet)
    expect(auditorDownloadsBefore.n).toBeGreaterThanOrEqual(3)

    const verified = await (await fetch(`${server.url}/api/verify/${wpqCode}`)).json() as { state: string }
    expect(verified.state).toBe('changed')
    const { body } = await download(supervisor, '/api/sheets/tests/5')
    expect(squeeze((await pdfPages(body)).join('\n'))).toContain(squeeze('no longer hashes to the signed value'))

    const added = await supervisor.json<{ welders: { id: number, name: string }[], tests: { welderId: number, tests: { id: number }[] }[] }>('/api/projects/1')
    const oddWelder = added.body.welders.find(w => w.name === odd)!
    expect(oddWelder).toBeDefined()
    const log = await download(supervisor, `/api/sheets/continuity/${oddWelder.id}`)
    expect(log.res.status).toBe(200)
    expect(squeeze((await pdfPages(log.body)).join('\n'))).toContain(squeeze(odd))
  })
})
