import { readFileSync } from 'node:fs'
import pg from 'pg'
import { afterAll, describe, expect, it } from 'vitest'
import { signedIn, startServer, type TestServer } from './harness'

// Issue 14, finding 8: several app servers started at the same moment on one fresh PostgreSQL database all come up;
// the migrations run once, under an advisory lock. (PGlite keeps its data-directory lock: data-dir-lock.test.ts.)
const journal = JSON.parse(readFileSync('server/database/migrations/meta/_journal.json', 'utf8')) as { entries: unknown[] }

describe.skipIf(!process.env.TEST_DATABASE_URL)('three app servers on one fresh PostgreSQL database', () => {
  const servers: TestServer[] = []
  let databaseUrl = ''
  afterAll(async () => {
    for (const s of servers) await s.stop()
  })

  it('start at once: every one answers, and each migration is recorded once', async () => {
    const name = `rootface_three_${process.pid}_${Date.now()}`
    const admin = new pg.Client({ connectionString: process.env.TEST_DATABASE_URL })
    await admin.connect()
    await admin.query(`create database ${name}`)
    await admin.end()
    const url = new URL(process.env.TEST_DATABASE_URL!)
    url.pathname = `/${name}`
    databaseUrl = url.toString()

    const started = await Promise.allSettled([0, 1, 2].map(() => startServer({ databaseUrl })))
    for (const result of started) if (result.status === 'fulfilled') servers.push(result.value)
    const failures = started.filter(r => r.status === 'rejected').map(r => String((r as PromiseRejectedResult).reason).slice(0, 400))
    expect(failures).toEqual([])
    for (const server of servers) {
      expect((await fetch(`${server.url}/api/health`)).status).toBe(200)
      const supervisor = await signedIn(server.url, 'supervisor')
      expect((await supervisor.fetch('/api/welders')).status).toBe(200)
    }

    const client = new pg.Client({ connectionString: databaseUrl })
    await client.connect()
    const migrations = await client.query('select count(*)::int as n from drizzle.__drizzle_migrations')
    await client.end()
    expect(migrations.rows[0].n).toBe(journal.entries.length)
  }, 120_000)
})
