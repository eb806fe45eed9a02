// npm run bench: builds the app, fills (once) a large invented shop, starts the built server on a copy of it,
// and prints one table: each operation's median and p95 latency and requests per second at 1 and 10
// connections, beside its floor measured in the same run, and the target. Ratios hold; absolute times drift.
// BENCH_SCALE=10 fills a shop ten times the size (20,000 welders); BENCH_DATABASE_URL=postgres://user@host:port/db names
// a PostgreSQL server on which the same table is measured in the same run, beside the embedded database.
import { spawn, spawnSync } from 'node:child_process'
import { cpSync, existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs'
import { cpus, loadavg, tmpdir } from 'node:os'
import { join, resolve } from 'node:path'
import { gzipSync } from 'node:zlib'
import { addDays, format } from 'date-fns'
import { sql } from 'drizzle-orm'
import { openDatabase, type Db } from '../server/database/client'
import { lapseListQuery } from '../server/database/standings'
import pg from 'pg'
import { approvedProcedures, whoCanWeld } from '../server/database/coverage'
import { rangeCoupons, rangeWelders } from '../server/database/coverage-coupons'
import { mergePacket } from '../server/sheets/packet-merge'
import { listJoints } from '../server/database/joints'
import { jointListQuerySchema } from '../shared/schemas/joints'
import { analyzeTables, recomputeStaleQualifiedRanges } from '../server/database/qualified-ranges'
import { resolveJoint, type ResolvedJoint } from '../shared/qualification/joint-coverage'
import { jointSchema } from '../shared/schemas/coverage'
import { type Client, freePort, signedIn } from '../tests/api/harness'

const output = resolve('.output-bench')
const scale = Number(process.env.BENCH_SCALE ?? 1)
const largeDir = resolve(process.env.BENCH_DATA_DIR ?? (scale === 1 ? '.data/large' : `.data/large-x${scale}`))
const serverUrl = process.env.BENCH_DATABASE_URL || undefined
// The joint asked in the coverage row (its query string, and parsed for the SQL floor).
const jointQuery = 'process=GMAW&pNumber=1&thickness=0.25&form=plate&weld=groove&position=V&fNumber=6'
const benchJoint = resolveJoint(jointSchema.parse(Object.fromEntries(new URLSearchParams(jointQuery)))) as ResolvedJoint
const seconds = Number(process.env.BENCH_SECONDS ?? 4)
const today = format(new Date(), 'yyyy-MM-dd')
const in30 = format(addDays(new Date(), 30), 'yyyy-MM-dd')

function run(label: string, command: string, args: string[], env: Record<string, string> = {}) {
  const started = Date.now()
  const result = spawnSync(command, args, { stdio: ['ignore', 'ignore', 'inherit'], env: { ...process.env, ...env } })
  if (result.status !== 0) throw new Error(`${label} failed`)
  console.error(`${label}: ${((Date.now() - started) / 1000).toFixed(1)} s`)
}

interface Stats { median: number, p95: number, rps1: number, rps10: number }
const percentile = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.floor(p * sorted.length))]!

/** `connections` workers repeat `once` for the given time; latencies in ms. */
async function load(once: () => Promise<void>, connections: number, forSeconds: number) {
  const latencies: number[] = []
  const until = performance.now() + forSeconds * 1000
  await Promise.all(Array.from({ length: connections }, async () => {
    while (performance.now() < until) {
      const started = performance.now()
      await once()
      latencies.push(performance.now() - started)
    }
  }))
  latencies.sort((a, b) => a - b)
  return { latencies, rps: latencies.length / forSeconds }
}

/**
 * Each reader its own signed-in session (one connection each), all reading at once for the given time: lists and the
 * lapse list in turn. The p99 is what a busy shop floor feels (issue 14: p99 under 1.1 s at 20 connections).
 */
async function signedInReads(readers: Client[], paths: string[], forSeconds: number) {
  const latencies: number[] = []
  const until = performance.now() + forSeconds * 1000
  await Promise.all(readers.map(async (reader, i) => {
    for (let n = i; performance.now() < until; n++) {
      const started = performance.now()
      await get(reader, paths[n % paths.length]!)()
      latencies.push(performance.now() - started)
    }
  }))
  latencies.sort((a, b) => a - b)
  return { median: percentile(latencies, 0.5), p99: percentile(latencies, 0.99), rps: latencies.length / forSeconds }
}

async function measure(once: () => Promise<void>, options: { warmup?: number, connections10?: boolean, forSeconds?: number } = {}): Promise<Stats> {
  for (let i = 0; i < (options.warmup ?? 20); i++) await once()
  const single = await load(once, 1, options.forSeconds ?? seconds)
  const ten = options.connections10 === false ? { rps: Number.NaN } : await load(once, 10, options.forSeconds ?? seconds)
  return { median: percentile(single.latencies, 0.5), p95: percentile(single.latencies, 0.95), rps1: single.rps, rps10: ten.rps }
}

function get(client: Client, path: string, expectType?: string) {
  return async () => {
    const res = await client.fetch(path)
    const body = await res.arrayBuffer()
    if (res.status !== 200) throw new Error(`${path}: ${res.status} ${Buffer.from(body).toString().slice(0, 200)}`)
    if (expectType && !res.headers.get('content-type')?.includes(expectType)) throw new Error(`${path}: ${res.headers.get('content-type')}`)
  }
}

/**
 * The floors of the two queries through the driver. "Who can weld it?" answers from three statements (the WPSs of the
 * process, its distinct coupons, the welders graded by the coupons' verdicts); its floor is those three statements with
 * the verdicts the rules gave once before, so the rules' own time and the answer's shaping are what lies above it.
 */
async function sqlFloors(db: Db) {
  await recomputeStaleQualifiedRanges(db) // as the server does at start-up
  const answer = await whoCanWeld(db, benchJoint, today)
  const { coupons } = await rangeCoupons(db, benchJoint)
  const covered = coupons.filter(c => !c.dropped).map(c => c.input_key!).slice(0, Math.max(1, answer.welders.able.length))
  return {
    lapses: await measure(async () => { await lapseListQuery(db, today, in30) }, { connections10: false }),
    coverage: await measure(async () => {
      await approvedProcedures(db, benchJoint.process)
      await rangeCoupons(db, benchJoint)
      await rangeWelders(db, benchJoint.process, today, covered, coupons.map(c => c.input_key!).slice(covered.length, covered.length + 100), { lapsed: 100, undecided: 100, notCovered: 100 })
    }, { connections10: false }),
  }
}

/**
 * The merge's memory at 1,000 sheets: a packet front and 1,000 sheet PDFs (one signed sheet's bytes, each loaded and
 * copied as its own document), merged as a packet is; the growth of this process's resident memory at its peak.
 */
async function mergeMemory(sheetPdf: Uint8Array, count: number) {
  global.gc?.()
  const before = process.memoryUsage().rss
  let peak = before
  const timer = setInterval(() => {
    peak = Math.max(peak, process.memoryUsage().rss)
  }, 20)
  const started = performance.now()
  async function* sheets() {
    for (let i = 0; i < count; i++) yield sheetPdf
  }
  const { pageCount, pdf } = await mergePacket(sheetPdf, sheets(), 'Project BENCH')
  const ms = performance.now() - started
  clearInterval(timer)
  peak = Math.max(peak, process.memoryUsage().rss)
  return { growthMb: (peak - before) / 1024 / 1024, pages: pageCount, megabytes: pdf.byteLength / 1024 / 1024, seconds: ms / 1000 }
}

async function firstLoadJs(client: Client, path: string) {
  const html = await (await client.fetch(path)).text()
  const files = new Set([...html.matchAll(/<(?:script[^>]*src|link[^>]*rel="modulepreload"[^>]*href)="([^"]+\.js)"/g)].map(m => m[1]!))
  let bytes = 0
  for (const file of files) bytes += gzipSync(readFileSync(join(output, 'public', file))).length
  return { bytes, files: files.size }
}

function lighthouse(url: string, cookie: string) {
  const result = spawnSync(process.execPath, ['node_modules/lighthouse/cli/index.js', url, '--quiet', '--output=json', '--only-categories=performance',
    '--form-factor=mobile', `--extra-headers=${JSON.stringify({ Cookie: cookie })}`,
    '--chrome-flags=--headless --no-sandbox --disable-gpu --disable-background-networking --disable-component-update --disable-sync --no-first-run'],
  { env: { ...process.env, CHROME_PATH: process.env.CHROME_PATH ?? '/usr/bin/chromium' }, encoding: 'utf8', maxBuffer: 64 * 1024 * 1024, timeout: 180_000 })
  try {
    return Math.round(JSON.parse(result.stdout).categories.performance.score * 100)
  }
  catch {
    return Number.NaN
  }
}

async function packetSeconds(client: Client, projectId: number) {
  const started = performance.now()
  const job = await client.json<{ id: number }>('/api/packets', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ projectId }) })
  if (job.status !== 202) throw new Error(`packet: ${job.status} ${JSON.stringify(job.body)}`)
  let pageCount = 0
  for (;;) {
    const state = await client.json<{ status: string, pageCount: number | null, error: string | null }>(`/api/packets/${job.body.id}`)
    pageCount = state.body.pageCount ?? 0
    if (state.body.status === 'ready') break
    if (state.body.status === 'failed') throw new Error(`packet failed: ${state.body.error}`)
    await new Promise(r => setTimeout(r, 50))
  }
  const file = await client.fetch(`/api/packets/${job.body.id}/file`)
  const pdf = Buffer.from(await file.arrayBuffer())
  // pdf-lib writes pages inside object streams: the count is the packet's own, checked against the download's size
  if (!pdf.byteLength) throw new Error('packet: empty file')
  return { seconds: (performance.now() - started) / 1000, pages: pageCount }
}

interface Target {
  name: 'PGlite' | 'PostgreSQL'
  /** Opens the database the server will use (a fresh copy of the seeded shop) and the server's environment for it. */
  prepare: () => Promise<{ env: Record<string, string>, open: () => Promise<Awaited<ReturnType<typeof openDatabase>>>, cleanup: () => Promise<void> }>
}

const seedEnv = { BENCH_SCALE: String(scale) }

function pglite(): Target {
  return {
    name: 'PGlite',
    prepare: async () => {
      if (!existsSync(join(largeDir, 'db'))) run('seed:large (PGlite)', process.execPath, ['node_modules/tsx/dist/cli.mjs', 'scripts/seed-large.ts'], { ...seedEnv, NUXT_DATA_DIR: join(largeDir, 'db'), DATABASE_URL: '' })
      const work = mkdtempSync(join(tmpdir(), 'rootface-bench-'))
      cpSync(join(largeDir, 'db'), join(work, 'db'), { recursive: true })
      return {
        env: { NUXT_DATA_DIR: join(work, 'db'), DATABASE_URL: '' },
        open: () => openDatabase({ dataDir: join(work, 'db'), holder: 'npm run bench' }),
        cleanup: async () => rmSync(work, { recursive: true, force: true }),
      }
    },
  }
}

/** The seeded shop is kept as its own database on the server (seeded once per scale); each run works on a copy made from it as a template. */
function postgres(url: string): Target {
  const named = (db: string) => {
    const u = new URL(url)
    u.pathname = `/${db}`
    return u.toString()
  }
  // Named after the database in the URL, so several people measuring on one server keep their own copies.
  const base = new URL(url).pathname.replace(/^\//, '') || 'postgres'
  const seeded = `${base === 'postgres' ? 'rootface' : base}_large_x${String(scale).replace('.', '_')}`
  const copy = `${base === 'postgres' ? 'rootface' : base}_bench_${process.pid}`
  const admin = async <T>(work: (client: pg.Client) => Promise<T>) => {
    const client = new pg.Client({ connectionString: url })
    await client.connect()
    try {
      return await work(client)
    }
    finally {
      await client.end()
    }
  }
  return {
    name: 'PostgreSQL',
    prepare: async () => {
      const exists = await admin(c => c.query('select 1 from pg_database where datname = $1', [seeded]))
      if (!exists.rowCount) {
        await admin(c => c.query(`create database ${seeded}`))
        run('seed:large (PostgreSQL)', process.execPath, ['node_modules/tsx/dist/cli.mjs', 'scripts/seed-large.ts'], { ...seedEnv, DATABASE_URL: named(seeded) })
      }
      await admin(c => c.query(`create database ${copy} template ${seeded}`))
      return {
        env: { DATABASE_URL: named(copy), NUXT_DATA_DIR: join(tmpdir(), `rootface-bench-unused-${process.pid}`) },
        open: () => openDatabase({ databaseUrl: named(copy), dataDir: '', holder: 'npm run bench' }),
        cleanup: async () => {
          await admin(c => c.query(`drop database if exists ${copy} with (force)`))
          rmSync(join(tmpdir(), `rootface-bench-unused-${process.pid}`), { recursive: true, force: true })
        },
      }
    },
  }
}

interface Row { op: string, stats: Stats, floorName: string, floor: Stats, target: string, ok: (s: Stats, f: Stats) => boolean }

async function benchOn(target: Target) {
  const prepared = await target.prepare()
  // The floor of the two queries: the same SQL through the driver, before the server holds the database.
  const direct = await prepared.open()
  const counts = (await direct.db.execute<{ welders: number, tests: number, continuity: number }>(sql`select
    (select count(*) from welders)::int as welders, (select count(*) from welder_tests)::int as tests, (select count(*) from continuity_entries)::int as continuity`)).rows[0]!
  await analyzeTables(direct.db) // as the server does at start-up on PGlite (a PostgreSQL server keeps its own statistics)
  const floors = await sqlFloors(direct.db)
  const packetProject = (await direct.db.execute<{ id: number }>(sql`select id from projects where number = 'LP-0001'`)).rows[0]?.id
  const sheetTest = (await direct.db.execute<{ id: number }>(sql`select id from welder_tests where status = 'certified' order by id limit 1`)).rows[0]?.id
  // A project's weld register (1,000 of the 200,000 joints): page 3, welded ones, newest first, filtered by text
  const registerProject = (await direct.db.execute<{ id: number }>(sql`select id from projects where number = 'LP-0100'`)).rows[0]?.id
  const registerQuery = 'page=3&pageSize=25&sort=weldedOn&dir=desc&status=welded&q=L0'
  const registerFloor = registerProject
    ? await measure(async () => {
        await listJoints(direct.db, { id: 1, name: 'bench', email: '', role: 'supervisor', welderId: null }, registerProject, jointListQuerySchema.parse(Object.fromEntries(new URLSearchParams(registerQuery))))
      }, { connections10: false })
    : null
  await direct.close()

  const port = await freePort()
  const base = `http://127.0.0.1:${port}`
  const server = spawn(process.execPath, [join(output, 'server/index.mjs')], {
    env: { ...process.env, ...prepared.env, PORT: String(port), HOST: '127.0.0.1', AUTH_ORIGIN: `${base}/api/auth`, AUTH_SECRET: 'bench-secret-for-rootface-load-measurements' },
    stdio: ['ignore', 'ignore', 'inherit'],
  })
  try {
    for (let i = 0; ; i++) {
      try {
        if ((await fetch(`${base}/api/health`)).ok) break
      }
      catch { /* not yet */ }
      if (i > 600) throw new Error('server did not start')
      await new Promise(r => setTimeout(r, 100))
    }
    const supervisor = await signedIn(base, 'supervisor')
    const welder = await signedIn(base, 'welder')

    const rows: Row[] = []
    const push = (op: string, stats: Stats, floorName: string, floor: Stats, targetText: string, ok: (s: Stats, f: Stats) => boolean) => {
      rows.push({ op, stats, floorName, floor, target: targetText, ok })
      console.error(`${target.name}: measured ${op}`)
    }
    const health = await measure(get(supervisor, '/api/health'))
    push('who can weld this joint? (GET /api/coverage)', await measure(get(supervisor, `/api/coverage?${jointQuery}`)), 'its SQL alone', floors.coverage, 'p95 ≤ 25 ms and ≤ 2× SQL', (s, f) => s.p95 <= 25 && s.p95 <= 2 * f.p95)
    push('lapse list, next 30 days (GET /api/continuity/lapses)', await measure(get(supervisor, `/api/continuity/lapses?days=30`)), 'its SQL alone', floors.lapses, 'p95 ≤ 25 ms and ≤ 2× SQL', (s, f) => s.p95 <= 25 && s.p95 <= 2 * f.p95)
    if (registerProject && registerFloor) {
      push('weld register, 25 of 1,000 joints, filtered and sorted (GET /api/projects/:id/joints)', await measure(get(supervisor, `/api/projects/${registerProject}/joints?${registerQuery}`)), 'its SQL alone', registerFloor, 'p95 ≤ 50 ms', s => s.p95 <= 50)
    }
    const bareSupervisor = await measure(get(supervisor, '/about', 'text/html'))
    push('dashboard, server-rendered, signed in', await measure(get(supervisor, '/dashboard', 'text/html')), 'bare page /about', bareSupervisor, 'median ≤ 1.5× bare page', (s, f) => s.median <= 1.5 * f.median)
    const bareWelder = await measure(get(welder, '/about', 'text/html'))
    push('welder page /me, server-rendered, signed in', await measure(get(welder, '/me', 'text/html')), 'bare page /about', bareWelder, '(no target)', () => true)
    push('welder list, 50 rows, sorted and filtered', await measure(get(supervisor, '/api/welders?pageSize=50&sort=name&dir=asc&status=active&q=ar')), 'GET /api/health', health, '(no target)', () => true)
    // Signed in one after another: twenty sign-ins at once on PostgreSQL met a race in the sign-in throttle (a 500).
    const readers: Client[] = []
    for (let i = 0; i < 20; i++) readers.push(await signedIn(base, i % 2 ? 'supervisor' : 'inspector'))
    const reads = await signedInReads(readers, [
      '/api/welders?pageSize=50&sort=name&dir=asc', '/api/continuity/lapses?days=30', '/api/tests?pageSize=50', '/api/procedures?pageSize=50',
    ], seconds)
    console.error(`${target.name}: measured 20 connections of signed-in reads`)
    if (sheetTest) {
      push('one WPQ sheet (PDF)', await measure(get(supervisor, `/api/sheets/tests/${sheetTest}`, 'application/pdf'), { warmup: 3, forSeconds: 3 }), 'GET /api/health', health, 'median ≤ 150 ms', s => s.median <= 150)
    }
    // The first packet renders the record sheets it finds unrendered (the large seed signs nothing, so none was rendered at
    // signing) and keeps them; the second reads them from storage, as a packet of signed sheets does.
    const firstPacket = packetProject ? await packetSeconds(supervisor, packetProject).catch((e: Error) => ({ seconds: Number.NaN, pages: 0, error: e.message })) : null
    const packet = packetProject ? await packetSeconds(supervisor, packetProject).catch((e: Error) => ({ seconds: Number.NaN, pages: 0, error: e.message })) : null
    const sheetBytes = sheetTest ? new Uint8Array(await (await supervisor.fetch(`/api/sheets/tests/${sheetTest}`)).arrayBuffer()) : null
    const memory = sheetBytes && target.name === 'PGlite' ? await mergeMemory(sheetBytes, 1000) : null
    // Page weight and Lighthouse measure the pages, not the database: once, on the first database.
    const pages = target.name === 'PGlite'
      ? {
          js: await firstLoadJs(welder, '/me'),
          scores: process.env.BENCH_LIGHTHOUSE === 'false'
            ? { me: Number.NaN, dashboard: Number.NaN, procedures: Number.NaN, projects: Number.NaN }
            : {
                me: lighthouse(`${base}/me`, welder.cookieHeader), dashboard: lighthouse(`${base}/dashboard`, supervisor.cookieHeader),
                procedures: lighthouse(`${base}/procedures`, supervisor.cookieHeader), projects: lighthouse(`${base}/projects`, supervisor.cookieHeader),
              },
        }
      : null
    return { name: target.name, counts, rows, reads, firstPacket, packet, memory, pages }
  }
  finally {
    server.kill('SIGTERM')
    await new Promise(r => server.once('exit', r))
    await prepared.cleanup()
  }
}

async function main() {
  const loadAtStart = loadavg()
  // BENCH_BUILD=false measures the build already in .output-bench.
  if (process.env.BENCH_BUILD !== 'false') run('build', 'npx', ['nuxt', 'build'], { NUXT_BUILD_DIR: '.nuxt-bench', NUXT_OUTPUT_DIR: output })
  const results = []
  // BENCH_PGLITE=false measures the PostgreSQL server alone (a quick look at scale 10 without seeding PGlite there).
  for (const target of [...(process.env.BENCH_PGLITE === 'false' ? [] : [pglite()]), ...(serverUrl ? [postgres(serverUrl)] : [])]) results.push(await benchOn(target))

  const f = (n: number) => (Number.isNaN(n) ? '—' : n < 10 ? n.toFixed(2) : n.toFixed(1))
  const first = results[0]!
  const lines = [
    `Rootface bench, ${new Date().toISOString().slice(0, 16)}Z, load average (1, 5, 15 min) ${loadAtStart.map(n => n.toFixed(1)).join(' ')} at the start and ${loadavg().map(n => n.toFixed(1)).join(' ')} at the end on ${cpus().length} cores, scale ${scale}: ${first.counts.welders} welders, ${first.counts.tests} welder tests, ${first.counts.continuity} continuity entries; ${seconds} s per run; ${results.map(r => r.name).join(' and ')}`,
    '',
    '| operation | database | median ms | p95 ms | req/s @1 | req/s @10 | floor | floor median | floor p95 | target | met |',
    '| --- | --- | ---: | ---: | ---: | ---: | --- | ---: | ---: | --- | --- |',
  ]
  for (let i = 0; i < first.rows.length; i++) {
    for (const r of results) {
      const row = r.rows[i]
      if (row) lines.push(`| ${row.op} | ${r.name} | ${f(row.stats.median)} | ${f(row.stats.p95)} | ${f(row.stats.rps1)} | ${f(row.stats.rps10)} | ${row.floorName} | ${f(row.floor.median)} | ${f(row.floor.p95)} | ${row.target} | ${row.ok(row.stats, row.floor) ? 'yes' : 'NO'} |`)
    }
  }
  for (const r of results) {
    lines.push(`| 20 connections of signed-in reads (lists, lapse list): median and **p99** | ${r.name} | ${f(r.reads.median)} | p99 ${f(r.reads.p99)} | | ${f(r.reads.rps)} @20 | | | | p99 ≤ 1100 ms | ${r.reads.p99 <= 1100 ? 'yes' : 'NO'} |`)
  }
  for (const r of results) {
    if (r.firstPacket) lines.push(`| packet PDF, ${r.firstPacket.pages} pages, first (renders and keeps its record sheets) | ${r.name} | ${f(r.firstPacket.seconds * 1000)} | | | | | | | (no target) | |`)
    lines.push(r.packet ? `| packet PDF, ${r.packet.pages} pages, again (sheets from storage; request to last byte) | ${r.name} | ${f(r.packet.seconds * 1000)} | | | | | | | ≤ 1.5 s for 100 sheets | ${r.packet.seconds <= 1.5 ? 'yes' : 'NO'} |` : `| packet | ${r.name} | not measured | | | | | | | | |`)
    if (r.memory) lines.push(`| packet merge of 1,000 sheets (${r.memory.pages} pages, ${r.memory.megabytes.toFixed(0)} MB, ${r.memory.seconds.toFixed(1)} s): memory growth | ${r.name} | ${r.memory.growthMb.toFixed(0)} MB | | | | | | | ≤ 200 MB | ${r.memory.growthMb <= 200 ? 'yes' : 'NO'} |`)
  }
  const pages = first.pages
  if (pages) {
    lines.push(
      `| welder page first-load JavaScript, ${pages.js.files} files | | ${(pages.js.bytes / 1024).toFixed(1)} KB gzip | | | | | | | ≤ 200 KB gzip | ${pages.js.bytes <= 200 * 1024 ? 'yes' : 'NO'} |`,
      `| Lighthouse performance, mobile: /me | | ${f(pages.scores.me)} | | | | | | | ≥ 95 | ${pages.scores.me >= 95 ? 'yes' : 'NO'} |`,
      ...(['dashboard', 'procedures', 'projects'] as const).map(page => `| Lighthouse performance, mobile: /${page} | | ${f(pages.scores[page])} | | | | | | | ≥ 95 | ${pages.scores[page] >= 95 ? 'yes' : 'NO'} |`),
    )
  }
  console.log(lines.join('\n'))
  if (process.env.BENCH_WRITE) writeFileSync(process.env.BENCH_WRITE, `${lines.join('\n')}\n`)
}

await main()
