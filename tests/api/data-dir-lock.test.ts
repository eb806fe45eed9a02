import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { spawnSync } from 'node:child_process'
import { afterAll, describe, expect, it } from 'vitest'
import { removeDir, serverEntry, startServer, type TestServer } from './harness'

const dataDir = mkdtempSync(join(tmpdir(), 'rootface-lock-'))
let first: TestServer | undefined

afterAll(async () => {
  await first?.stop()
  removeDir(dataDir)
})

describe.skipIf(!!process.env.TEST_DATABASE_URL)('one process per PGlite data directory', () => {
  it('a second server on the same data directory stops at once, naming the holder; the first keeps working', async () => {
    first = await startServer({ dataDir })
    const second = spawnSync(process.execPath, [serverEntry], {
      env: { ...process.env, PORT: '0', HOST: '127.0.0.1', NUXT_DATA_DIR: join(dataDir, 'db'), AUTH_ORIGIN: 'http://127.0.0.1:1/api/auth', AUTH_SECRET: 'test-secret-for-rootface-api-tests', DATABASE_URL: '' },
      encoding: 'utf8', timeout: 30_000,
    })
    expect(second.status).toBe(1)
    expect(second.stderr).toContain(`is in use by rootface server (pid ${first.process.pid}`)
    const health = await fetch(`${first.url}/api/health`)
    expect(health.status).toBe(200)
  })

  it('after a clean stop (SIGTERM) the directory opens again with its data', async () => {
    await first!.stop('SIGTERM')
    first = await startServer({ dataDir })
    const res = await fetch(`${first.url}/api/health`)
    expect(res.status).toBe(200)
  })

  it('a stale lock (its process gone) is replaced: the server starts and the lock names the new process', async () => {
    await first!.stop('SIGTERM')
    // A pid that surely is not running: a child that has already exited.
    const gone = spawnSync(process.execPath, ['-e', 'process.exit(0)'])
    expect(gone.status).toBe(0)
    const lockFile = join(dataDir, 'db.lock')
    writeFileSync(lockFile, JSON.stringify({ pid: gone.pid, holder: 'rootface server', since: '2026-01-01T00:00:00.000Z' }))
    first = await startServer({ dataDir })
    expect((await fetch(`${first.url}/api/health`)).status).toBe(200)
    const lock = JSON.parse(readFileSync(lockFile, 'utf8')) as { pid: number }
    expect(lock.pid).toBe(first.process.pid)
    expect(lock.pid).not.toBe(gone.pid)
  })
})
