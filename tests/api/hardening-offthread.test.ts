import { spawn } from 'node:child_process'
import { randomBytes } from 'node:crypto'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signedIn, startServer, type Client, type TestServer } from './harness'
import { upload } from './support/files'

// Issue 14, finding 6: a 20 MB upload and a 40,000-row continuity import leave GET /api/health answering in under
// 100 ms (the upload is streamed to disk while hashed; the CSV is parsed and checked in a worker thread).

interface Latencies { count: number, p95: number, max: number }

function summary(values: number[]): Latencies {
  const sorted = [...values].sort((a, b) => a - b)
  return { count: sorted.length, p95: sorted[Math.min(sorted.length - 1, Math.floor(sorted.length * 0.95))]!, max: sorted.at(-1)! }
}

// The health requests come from a separate process, so the test process's own work (sending 20 MB, building the
// CSV) does not count against the server.
const poller = `
const base = process.argv[1]; const latencies = []; let stop = false
process.on('SIGTERM', () => { stop = true })
await (await fetch(base + '/api/health')).text() // warm up, not counted
process.stderr.write('ready\\n')
while (!stop) {
  const started = performance.now()
  try { await (await fetch(base + '/api/health')).text(); latencies.push(performance.now() - started) } catch { latencies.push(-1) }
  await new Promise(resolve => setTimeout(resolve, 10))
}
process.stdout.write(JSON.stringify(latencies))
`

/** Asks GET /api/health one request after another (from another process) while `work()` runs; returns the latencies. */
async function healthDuring<T>(base: string, work: () => Promise<T>): Promise<{ latencies: Latencies, result: T }> {
  const child = spawn(process.execPath, ['--input-type=module', '-e', poller, base], { stdio: ['ignore', 'pipe', 'pipe'] })
  let out = ''
  child.stdout.on('data', (chunk: Buffer) => {
    out += chunk.toString()
  })
  await new Promise<void>((resolve) => {
    child.stderr.on('data', (chunk: Buffer) => {
      if (chunk.toString().includes('ready')) resolve()
    })
  })
  const exited = new Promise(resolve => child.once('exit', resolve))
  try {
    const result = await work()
    await new Promise(resolve => setTimeout(resolve, 30)) // the request in flight finishes
    return { latencies: summary(JSON.parse(await stopPoller()) as number[]), result }
  }
  finally {
    if (child.exitCode === null) await stopPoller()
  }
  async function stopPoller() {
    child.kill('SIGTERM')
    await exited
    return out || '[]'
  }
}

/** The same, for two seconds with nothing else going on. */
async function idleBaseline(base: string) {
  return (await healthDuring(base, () => new Promise(resolve => setTimeout(resolve, 2000)))).latencies
}

/**
 * Under 100 ms at the 95th percentile on a quiet machine (idle p95 a few ms); on a loaded one (several builds on two
 * cores) the bound grows with the idle baseline measured in the same run. A request held up behind the whole upload
 * or import (the old behaviour: 4.3 s and 4.6 s on a quiet machine) fails either way.
 */
let idle: Latencies
function within(during: Latencies) {
  expect(during.p95).toBeLessThan(Math.max(100, 5 * idle.p95))
  expect(during.max).toBeLessThan(Math.max(1000, 10 * idle.max))
}

const show = (l: Latencies) => `p95 ${l.p95.toFixed(1)} ms, max ${l.max.toFixed(1)} ms over ${l.count} requests`

describe('heavy requests do not hold up the others', () => {
  let server: TestServer
  let supervisor: Client
  beforeAll(async () => {
    server = await startServer()
    supervisor = await signedIn(server.url, 'supervisor')
    idle = await idleBaseline(server.url)
    console.log(`[hardening] GET /api/health idle: ${show(idle)}`)
  })
  afterAll(async () => server?.stop())

  it('a 20 MB upload', async () => {
    const pqr = (await supervisor.json<{ items: { id: number }[] }>('/api/pqrs?pageSize=1')).body.items[0]!
    const bytes = Buffer.concat([Buffer.from('%PDF-1.4\n'), randomBytes(20 * 1024 * 1024 - 9)])
    const { latencies: during, result: res } = await healthDuring(server.url,
      () => upload(supervisor, { recordType: 'pqr', recordId: pqr.id, kind: 'lab-report' }, { name: 'large scan.pdf', type: 'application/pdf', bytes }))
    expect(res.status, JSON.stringify(res.body).slice(0, 300)).toBe(201)
    expect(res.body.size).toBe(bytes.length)
    console.log(`[hardening] GET /api/health during a 20 MB upload: ${show(during)}`)
    expect(during.count).toBeGreaterThan(3)
    within(during)
  }, 120_000)

  it('a 40,000-row continuity import (check, then store)', async () => {
    const roster = (await supervisor.json<{ items: { stamp: string }[] }>('/api/welders?pageSize=200')).body.items.map(w => w.stamp)
    const lines = ['stamp,process,date,reference']
    for (let i = 0; i < 40_000; i++) {
      const day = new Date(Date.UTC(2025, 0, 1) + (i % 300) * 86_400_000).toISOString().slice(0, 10)
      lines.push(`${roster[i % roster.length]},GMAW,${day},job ${i}`)
    }
    const csv = lines.join('\n')
    const post = (commit: boolean) => supervisor.json<{ total: number, errors: unknown[], stored: number }>('/api/continuity/import', {
      method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ csv, commit }),
    })
    const { latencies: duringCheck, result: checked } = await healthDuring(server.url, () => post(false))
    expect(checked.status).toBe(200)
    expect(checked.body.total).toBe(40_000)
    expect(checked.body.errors).toEqual([])
    console.log(`[hardening] GET /api/health during the check of a 40,000-row import: ${show(duringCheck)}`)

    const { latencies: duringStore, result: stored } = await healthDuring(server.url, () => post(true))
    expect(stored.body.stored).toBe(40_000)
    console.log(`[hardening] GET /api/health while a 40,000-row import is stored: ${show(duringStore)}`)
    within(duringCheck)
    within(duringStore)
  }, 180_000)
})
