import { spawn, type ChildProcess } from 'node:child_process'
import { mkdtempSync, rmSync } from 'node:fs'
import { createServer } from 'node:net'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import pg from 'pg'

export interface TestServer {
  url: string
  dataDir: string
  databaseUrl?: string
  process: ChildProcess
  output: () => string
  stop: (signal?: NodeJS.Signals, options?: { keepData?: boolean }) => Promise<void>
}

/** The built server; NUXT_OUTPUT_DIR picks another build (parallel work, benchmarks). */
export const serverEntry = join(process.env.NUXT_OUTPUT_DIR || '.output', 'server/index.mjs')

export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer()
    server.listen(0, '127.0.0.1', () => {
      const address = server.address()
      server.close(() => (typeof address === 'object' && address ? resolve(address.port) : reject(new Error('no port'))))
    })
  })
}

/** A fresh database on the PostgreSQL server named by TEST_DATABASE_URL (CI), or undefined for PGlite. */
async function freshPostgres(): Promise<string | undefined> {
  const admin = process.env.TEST_DATABASE_URL
  if (!admin) return undefined
  const name = `rootface_test_${process.pid}_${Date.now()}`
  const client = new pg.Client({ connectionString: admin })
  await client.connect()
  await client.query(`create database ${name}`)
  await client.end()
  const url = new URL(admin)
  url.pathname = `/${name}`
  return url.toString()
}

export async function startServer(options: { dataDir?: string, databaseUrl?: string, port?: number, env?: Record<string, string> } = {}): Promise<TestServer> {
  const port = options.port ?? await freePort()
  const dataDir = options.dataDir ?? mkdtempSync(join(tmpdir(), 'rootface-api-'))
  // A given data directory means PGlite on purpose (unless a database URL is given too).
  const databaseUrl = options.databaseUrl ?? (options.dataDir ? undefined : await freshPostgres())
  const url = `http://127.0.0.1:${port}`
  let log = ''
  const child = spawn(process.execPath, [serverEntry], {
    env: {
      ...process.env, PORT: String(port), HOST: '127.0.0.1', NUXT_DATA_DIR: join(dataDir, 'db'),
      AUTH_ORIGIN: `${url}/api/auth`, AUTH_SECRET: 'test-secret-for-rootface-api-tests', NODE_ENV: 'production',
      // The suites sign in as the demo accounts; a test that needs an empty database passes NUXT_SEED_DEMO=false.
      NUXT_SEED_DEMO: 'true',
      ...(databaseUrl ? { DATABASE_URL: databaseUrl, NUXT_DATABASE_URL: databaseUrl } : { DATABASE_URL: '', NUXT_DATABASE_URL: '' }),
      ...options.env,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  })
  const collect = (chunk: Buffer) => {
    log += chunk.toString()
  }
  child.stdout?.on('data', collect)
  child.stderr?.on('data', collect)
  const deadline = Date.now() + 60_000
  for (;;) {
    if (child.exitCode !== null) throw new Error(`server exited (${child.exitCode}):\n${log}`)
    try {
      const res = await fetch(`${url}/api/health`)
      if (res.ok) break
    }
    catch { /* not listening yet */ }
    if (Date.now() > deadline) throw new Error(`server did not become healthy:\n${log}`)
    await new Promise(r => setTimeout(r, 150))
  }
  return {
    url, dataDir, databaseUrl, process: child, output: () => log,
    stop: async (signal: NodeJS.Signals = 'SIGTERM', stopOptions: { keepData?: boolean } = {}) => {
      if (child.exitCode === null) {
        const exited = new Promise(r => child.once('exit', r))
        child.kill(signal)
        await exited
      }
      if (!options.dataDir && !stopOptions.keepData) rmSync(dataDir, { recursive: true, force: true })
    },
  }
}

/** A signed-in client: cookies kept, next-auth csrf + credentials callback. */
export class Client {
  cookies = new Map<string, string>()
  constructor(readonly base: string) {}

  private absorb(res: Response) {
    for (const line of res.headers.getSetCookie()) {
      const [pair] = line.split(';')
      const [name, ...value] = pair!.split('=')
      this.cookies.set(name!.trim(), value.join('='))
    }
  }

  get cookieHeader() {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; ')
  }

  async fetch(path: string, init: RequestInit = {}) {
    const headers = new Headers(init.headers)
    if (this.cookies.size) headers.set('cookie', this.cookieHeader)
    if (!headers.has('origin')) headers.set('origin', this.base)
    const res = await fetch(`${this.base}${path}`, { ...init, headers, redirect: 'manual' })
    this.absorb(res)
    return res
  }

  async json<T = unknown>(path: string, init: RequestInit = {}): Promise<{ status: number, body: T }> {
    const res = await this.fetch(path, init)
    const text = await res.text()
    let body: unknown = text
    try {
      body = JSON.parse(text)
    }
    catch { /* not JSON */ }
    return { status: res.status, body: body as T }
  }

  async signIn(email: string, password = 'rootface-demo') {
    const csrf = await this.json<{ csrfToken: string }>('/api/auth/csrf')
    const res = await this.fetch('/api/auth/callback/credentials', {
      method: 'POST',
      headers: { 'content-type': 'application/x-www-form-urlencoded' },
      body: new URLSearchParams({ csrfToken: csrf.body.csrfToken, email, password, json: 'true', callbackUrl: `${this.base}/` }),
    })
    const text = await res.text()
    const signedIn = [...this.cookies.keys()].some(k => k.includes('session-token'))
    if (!signedIn || text.includes('csrf=true') || text.includes('error=')) return false
    return true
  }
}

export const demo = {
  supervisor: 'supervisor@demo.rootface.test',
  inspector: 'inspector@demo.rootface.test',
  welder: 'welder@demo.rootface.test',
  auditor: 'auditor@demo.rootface.test',
} as const

export async function signedIn(base: string, role: keyof typeof demo) {
  const client = new Client(base)
  if (!await client.signIn(demo[role])) throw new Error(`could not sign in as ${role}`)
  return client
}

export function removeDir(dir: string) {
  rmSync(dir, { recursive: true, force: true })
}
