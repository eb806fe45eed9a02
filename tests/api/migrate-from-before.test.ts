import { mkdtempSync, readFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { PGlite } from '@electric-sql/pglite'
import pg from 'pg'
import { afterAll, describe, expect, it } from 'vitest'
import { Client, demo, removeDir, startServer, type TestServer } from './harness'

/**
 * Migrations never lose data: each database made before a round of migrations (tests/fixtures/demo-at-0007.sql,
 * demo-at-0009.sql and demo-at-0017.sql, the invented demo shop at migrations 0000-0007, 0000-0009 and 0000-0017 with signed
 * and issued sheets; the 0017 one with weld registers issued in their own table, since folded into issued_sheets) is loaded into PGlite and, when
 * TEST_DATABASE_URL is set, into a PostgreSQL server; the current server migrates it at start-up. Every row of the
 * old tables is still there, every sheet signed or issued before still verifies "unchanged", and the old accounts
 * still sign in with their passwords.
 */
const fixtures = ['demo-at-0007.sql', 'demo-at-0009.sql', 'demo-at-0017.sql']
  .map(name => ({ name, sql: readFileSync(join(import.meta.dirname, '../fixtures', name), 'utf8') }))

/** Tables of the fixture whose rows must all survive (a migration may add columns or tables, never drop rows). */
const keptTables = [
  'accounts', 'welders', 'base_metals', 'filler_metals', 'procedures', 'pqrs', 'procedure_pqrs', 'welder_tests',
  'welder_test_bends', 'pqr_bend_specimens', 'pqr_tensile_specimens', 'continuity_entries', 'signatures', 'issued_sheets',
  'customers', 'projects', 'project_procedures', 'project_welders', 'auditor_grants', 'readings', 'audit_events',
]

interface Query { (sql: string): Promise<{ rows: Record<string, unknown>[] }> }

/**
 * Row counts and verification codes read straight from the fixture, before any migration. Issued documents are counted
 * together: weld registers issued in their own table (issued_registers, 0016-0017) now live in issued_sheets.
 */
async function snapshot(query: Query) {
  const counts: Record<string, number> = {}
  for (const table of keptTables) {
    const { rows } = await query(`select count(*)::int as n from public.${table}`)
    counts[table] = Number(rows[0]!.n)
  }
  const ownTable = (await query(`select to_regclass('public.issued_registers') is not null as present`)).rows[0]!.present === true
  const registers = ownTable
    ? (await query('select verify_code as code from public.issued_registers')).rows.map(r => String(r.code))
    : (await query(`select verify_code as code from public.issued_sheets where kind = 'weld-register'`)).rows.map(r => String(r.code))
  if (ownTable) counts.issued_sheets! += registers.length
  const codes = (await query('select verify_code as code from public.signatures union all select verify_code from public.issued_sheets'))
    .rows.map(r => String(r.code))
  const migrations = Number((await query('select count(*)::int as n from drizzle.__drizzle_migrations')).rows[0]!.n)
  return { counts, codes: [...new Set([...codes, ...registers])], registers, migrations }
}

const issuedRegisters = (migrations: number) => (migrations >= 18 ? 3 : 0)

type Snapshot = Awaited<ReturnType<typeof snapshot>>

async function checkMigrated(server: TestServer, before: Snapshot, after: Snapshot) {
  // Every row of every old table is still there, and the later migrations were applied.
  expect(after.counts).toEqual(before.counts)
  // Every weld register issued before is an issued sheet now, under its old code (the 0017 fixture holds three, one per
  // demo project's packet; the older fixtures predate the register)
  expect(before.registers.length).toBe(issuedRegisters(before.migrations))
  expect(after.registers.sort()).toEqual(before.registers.sort())
  expect(after.migrations).toBeGreaterThan(before.migrations - 1)

  // Every sheet signed or issued before the migration still verifies unchanged.
  expect(before.codes.length).toBeGreaterThanOrEqual(20)
  const anonymous = new Client(server.url)
  for (const code of before.codes) {
    const { status, body } = await anonymous.json<{ state: string }>(`/api/verify/${code}`)
    expect(status, code).toBe(200)
    expect(body.state, code).toBe('unchanged')
  }
  for (const code of before.registers) {
    const { body } = await anonymous.json<{ sheet: string, state: string }>(`/api/verify/${code}`)
    expect(body, code).toMatchObject({ sheet: 'Weld register', state: 'unchanged' })
  }

  // The old accounts sign in with their old password hashes and read their records.
  for (const role of ['supervisor', 'inspector', 'welder', 'auditor'] as const) {
    const client = new Client(server.url)
    expect(await client.signIn(demo[role]), role).toBe(true)
  }
  const supervisor = new Client(server.url)
  await supervisor.signIn(demo.supervisor)
  const procedures = await supervisor.json<unknown>('/api/procedures')
  expect(procedures.status).toBe(200)
  const tests = await supervisor.json<unknown>('/api/tests')
  expect(tests.status).toBe(200)
}

describe.each(fixtures)('$name: a database made before the current migrations (PGlite)', ({ sql: fixture }) => {
  const root = mkdtempSync(join(tmpdir(), 'rootface-migrate-'))
  let server: TestServer | undefined
  afterAll(async () => {
    await server?.stop()
    removeDir(root)
  })

  it('migrates with every row kept and every signed sheet unchanged', async () => {
    const dataDir = join(root, 'db')
    const loader = new PGlite(dataDir)
    await loader.exec(fixture)
    await loader.exec('set search_path to public')
    const before = await snapshot(sql => loader.query(sql))
    await loader.close()

    server = await startServer({ dataDir: root, env: { NUXT_SEED_DEMO: 'false' } })
    await server.stop(undefined, { keepData: true })
    // Read the migrated database directly (PGlite has one process), then serve it again for the HTTP checks.
    const reader = new PGlite(dataDir)
    const after = await snapshot(sql => reader.query(sql))
    // Migration 0010 (perf): every certified test has its qualified ranges derived, or waits in the queue start-up derives.
    const certified = await reader.query<{ n: number }>(`select count(*)::int as n from welder_tests where status = 'certified'`)
    const unranged = await reader.query<{ n: number }>(`select count(*)::int as n from welder_tests t where t.status = 'certified'
      and not exists (select 1 from qualified_ranges r where r.test_id = t.id) and not exists (select 1 from qualified_ranges_refresh q where q.test_id = t.id)`)
    await reader.close()
    expect(Number(certified.rows[0]!.n)).toBeGreaterThan(0)
    expect(Number(unranged.rows[0]!.n)).toBe(0)

    server = await startServer({ dataDir: root, env: { NUXT_SEED_DEMO: 'false' } })
    await checkMigrated(server, before, after)
  }, 240_000)
})

describe.runIf(process.env.TEST_DATABASE_URL).each(fixtures)('$name: a database made before the current migrations (PostgreSQL)', ({ sql: fixture }) => {
  let server: TestServer | undefined
  let client: pg.Client | undefined
  afterAll(async () => {
    await server?.stop()
    await client?.end()
  })

  it('migrates with every row kept and every signed sheet unchanged', async () => {
    const admin = new pg.Client({ connectionString: process.env.TEST_DATABASE_URL })
    await admin.connect()
    const name = `rootface_migrate_${process.pid}_${Date.now()}`
    await admin.query(`create database ${name}`)
    await admin.end()
    const url = new URL(process.env.TEST_DATABASE_URL!)
    url.pathname = `/${name}`

    client = new pg.Client({ connectionString: url.toString() })
    await client.connect()
    await client.query(fixture)
    await client.query('set search_path to public')
    const query: Query = sql => client!.query(sql)
    const before = await snapshot(query)

    server = await startServer({ databaseUrl: url.toString(), env: { NUXT_SEED_DEMO: 'false' } })
    await checkMigrated(server, before, await snapshot(query))
  }, 240_000)
})
