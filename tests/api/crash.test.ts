import { mkdtempSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { afterAll, describe, expect, it } from 'vitest'
import { removeDir, signedIn, startServer, type Client, type TestServer } from './harness'

// PostgreSQL's promise: a commit that was acknowledged survives a crash. Here the crash is the app server's
// process (SIGKILL mid-stream); on PGlite the database lives inside that process.
const dataDir = mkdtempSync(join(tmpdir(), 'rootface-crash-'))
let server: TestServer | undefined
let databaseUrl: string | undefined

/** PGlite on one data directory; with TEST_DATABASE_URL, one PostgreSQL database kept across restarts. */
async function start() {
  server = await startServer(process.env.TEST_DATABASE_URL ? (databaseUrl ? { databaseUrl } : {}) : { dataDir })
  databaseUrl = server.databaseUrl
  return server
}

afterAll(async () => {
  await server?.stop()
  removeDir(dataDir)
})

async function stampsOnRoster(client: Client, prefix: string) {
  const found = new Set<string>()
  for (let page = 1; ; page++) {
    const res = await client.json<{ items: { stamp: string }[], total: number }>(`/api/welders?q=${prefix}&pageSize=200&page=${page}&sort=stamp`)
    expect(res.status).toBe(200)
    for (const w of res.body.items) found.add(w.stamp)
    if (page * 200 >= res.body.total) return found
  }
}

/** Writes welders four at a time until stopped; returns the stamps whose creation was acknowledged (201). */
function writeStream(client: Client, prefix: string) {
  const acknowledged: string[] = []
  // Any answer other than 201 while the server is meant to be up fails the test (no swallowed 500s).
  const unexpected: string[] = []
  let running = true
  let sent = 0
  const worker = async () => {
    while (running) {
      const stamp = `${prefix}-${++sent}`
      let res: Response
      try {
        res = await client.fetch('/api/welders', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ name: `Crash test ${stamp}`, stamp }) })
      }
      catch {
        return // the connection failed: the server went away
      }
      if (res.status === 201) acknowledged.push(stamp)
      else if (running) {
        unexpected.push(`${stamp}: ${res.status} ${(await res.text()).slice(0, 200)}`)
        return
      }
    }
  }
  const workers = Promise.all([worker(), worker(), worker(), worker()])
  return {
    acknowledged,
    unexpected,
    stop: async () => {
      running = false
      await workers
    },
  }
}

describe('acknowledged writes survive the server being killed', () => {
  for (const signal of ['SIGKILL', 'SIGTERM'] as const) {
    it(`${signal} mid-stream: every write that got 201 is there after a restart`, async () => {
      const first = await start()
      const client = await signedIn(first.url, 'supervisor')
      const prefix = signal === 'SIGKILL' ? 'CK' : 'CT'
      const stream = writeStream(client, prefix)
      await new Promise(r => setTimeout(r, 1500))
      const killed = first.stop(signal, { keepData: true })
      await stream.stop()
      await killed
      expect(stream.unexpected).toEqual([])
      expect(stream.acknowledged.length).toBeGreaterThan(10)

      const second = await start()
      const after = await signedIn(second.url, 'supervisor')
      const found = await stampsOnRoster(after, `${prefix}-`)
      const missing = stream.acknowledged.filter(s => !found.has(s))
      console.log(`${signal}: ${stream.acknowledged.length} writes acknowledged before the stop, ${stream.acknowledged.length - missing.length} found after`)
      expect(missing).toEqual([])
      await second.stop('SIGTERM', { keepData: true })
      server = undefined
    })
  }
})
