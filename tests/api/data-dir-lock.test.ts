import { mkdtempSync } from 'node:fs'
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
})
