import { spawnSync } from 'node:child_process'
import { mkdtempSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import pg from 'pg'
import { afterAll, describe, expect, it } from 'vitest'
import { removeDir, signedIn, startServer, type TestServer } from './harness'

const work = mkdtempSync(join(tmpdir(), 'rootface-backup-'))
const servers: TestServer[] = []
afterAll(async () => {
  for (const s of servers) await s.stop()
  removeDir(work)
})

async function tableCounts(server: TestServer) {
  const supervisor = await signedIn(server.url, 'supervisor')
  const res = await supervisor.json<{ tables: Record<string, number> }>('/api/admin/stats')
  expect(res.status).toBe(200)
  const { audit_events: _audit, ...tables } = res.body.tables // the backup itself is an audit event
  return tables
}

function run(script: string, args: string[], env: Record<string, string>) {
  const result = spawnSync(process.execPath, ['node_modules/tsx/dist/cli.mjs', script, ...args], { env: { ...process.env, ...env }, encoding: 'utf8', timeout: 60_000 })
  expect(result.status, `${script}: ${result.stderr}`).toBe(0)
  return result.stdout
}

describe.skipIf(!!process.env.TEST_DATABASE_URL)('backup and restore of the embedded database', () => {
  it('a backup downloaded from the running server restores into a new data directory with the same rows', async () => {
    const source = await startServer({ dataDir: join(work, 'source') })
    servers.push(source)
    const before = await tableCounts(source)
    expect(before.welders).toBeGreaterThan(0)
    const supervisor = await signedIn(source.url, 'supervisor')
    const res = await supervisor.fetch('/api/admin/backup')
    expect(res.status).toBe(200)
    expect(res.headers.get('content-disposition')).toMatch(/attachment; filename="rootface-\d{8}-\d{6}\.tar\.gz"/)
    const archive = join(work, 'backup.tar.gz')
    writeFileSync(archive, Buffer.from(await res.arrayBuffer()))
    expect((await (await signedIn(source.url, 'inspector')).fetch('/api/admin/backup')).status).toBe(403)

    run('scripts/db-restore.ts', [archive], { NUXT_DATA_DIR: join(work, 'restored/db'), DATABASE_URL: '' })
    const restored = await startServer({ dataDir: join(work, 'restored'), env: { NUXT_SEED_DEMO: 'false' } })
    servers.push(restored)
    expect(await tableCounts(restored)).toEqual(before)
  }, 120_000) // two servers start and a whole database is restored: over 30 s on a loaded two-core machine

  it('db:backup refuses while a server holds the data directory, and works once it has stopped', async () => {
    const server = servers[0]!
    const held = spawnSync(process.execPath, ['node_modules/tsx/dist/cli.mjs', 'scripts/db-backup.ts', join(work, 'held.tar.gz')], {
      env: { ...process.env, NUXT_DATA_DIR: join(work, 'source/db'), DATABASE_URL: '' }, encoding: 'utf8',
    })
    expect(held.status).toBe(1)
    expect(held.stderr).toContain('is in use by rootface server')
    await server.stop()
    servers.shift()
    expect(run('scripts/db-backup.ts', [join(work, 'offline.tar.gz')], { NUXT_DATA_DIR: join(work, 'source/db'), DATABASE_URL: '' })).toContain('Backup written')
  })
})

describe.skipIf(!process.env.TEST_DATABASE_URL)('backup and restore on a PostgreSQL server', () => {
  it('pg_dump then pg_restore into an empty database gives the same rows', async () => {
    const source = await startServer()
    servers.push(source)
    const before = await tableCounts(source)
    const dump = join(work, 'pg.dump')
    run('scripts/db-backup.ts', [dump], { DATABASE_URL: source.databaseUrl! })
    const target = new URL(source.databaseUrl!)
    const name = `${target.pathname.slice(1)}_restored`
    const admin = new pg.Client({ connectionString: process.env.TEST_DATABASE_URL })
    await admin.connect()
    await admin.query(`create database ${name}`)
    await admin.end()
    target.pathname = `/${name}`
    run('scripts/db-restore.ts', [dump], { DATABASE_URL: target.toString() })
    const restored = await startServer({ databaseUrl: target.toString(), env: { NUXT_SEED_DEMO: 'false' } })
    servers.push(restored)
    expect(await tableCounts(restored)).toEqual(before)
  })
})
