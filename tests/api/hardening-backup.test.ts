import { spawnSync } from 'node:child_process'
import { createHash } from 'node:crypto'
import { mkdirSync, mkdtempSync, readdirSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { removeDir, signedIn, startServer, type Client, type TestServer } from './harness'
import { samplePdf, samplePng, upload } from './support/files'

// Issue 14, finding 4: a backup holds the database AND the uploaded files; restored into an empty folder, every
// attachment downloads again (200) with the same SHA-256.
const sha = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex')
const work = mkdtempSync(join(tmpdir(), 'rootface-hardening-backup-'))

function run(script: string, args: string[], env: Record<string, string>) {
  const result = spawnSync(process.execPath, ['node_modules/tsx/dist/cli.mjs', script, ...args], { env: { ...process.env, ...env }, encoding: 'utf8', timeout: 120_000 })
  expect(result.status, `${script}: ${result.stderr}`).toBe(0)
  return result.stdout
}

interface Stored { id: number, sha256: string, thumbnail: boolean }

async function downloadsAll(client: Client, files: Stored[]) {
  let ok = 0
  for (const file of files) {
    const res = await client.fetch(`/api/attachments/${file.id}`)
    expect(res.status, `attachment ${file.id}`).toBe(200)
    expect(sha(Buffer.from(await res.arrayBuffer()))).toBe(file.sha256)
    if (file.thumbnail) expect((await client.fetch(`/api/attachments/${file.id}/thumbnail`)).status).toBe(200)
    ok++
  }
  return ok
}

describe.skipIf(!!process.env.TEST_DATABASE_URL)('backups that restore everything (embedded database, files on disk)', () => {
  let source: TestServer
  let supervisor: Client
  const files: Stored[] = []
  const servers: TestServer[] = []

  beforeAll(async () => {
    source = await startServer({ dataDir: join(work, 'source') })
    supervisor = await signedIn(source.url, 'supervisor')
    const pqr = (await supervisor.json<{ items: { id: number }[] }>('/api/pqrs?pageSize=5')).body.items[0]!
    const test = (await supervisor.json<{ items: { id: number }[] }>('/api/tests?pageSize=5')).body.items[0]!
    const uploads = [
      { fields: { recordType: 'pqr', recordId: pqr.id, kind: 'lab-report' }, file: { name: 'lab report 1.pdf', type: 'application/pdf', bytes: samplePdf } },
      { fields: { recordType: 'pqr', recordId: pqr.id, kind: 'other' }, file: { name: 'a;b.pdf', type: 'application/pdf', bytes: Buffer.concat([samplePdf, Buffer.from('% second\n')]) } },
      { fields: { recordType: 'welder-test', recordId: test.id, kind: 'coupon-photo' }, file: { name: 'coupon.png', type: 'image/png', bytes: samplePng } },
    ]
    for (const u of uploads) {
      const res = await upload(supervisor, u.fields, u.file)
      expect(res.status, JSON.stringify(res.body)).toBe(201)
      files.push({ id: res.body.id, sha256: sha(u.file.bytes), thumbnail: u.file.type.startsWith('image/') })
    }
    expect(await downloadsAll(supervisor, files)).toBe(3)
  })
  afterAll(async () => {
    for (const s of servers) await s.stop()
    await source?.stop()
    removeDir(work)
  })

  it('the archive downloaded from the running server restores database and files into an empty folder', async () => {
    const res = await supervisor.fetch('/api/admin/backup')
    expect(res.status).toBe(200)
    const archive = join(work, 'live.tar.gz')
    writeFileSync(archive, Buffer.from(await res.arrayBuffer()))
    const listing = spawnSync('tar', ['-tzf', archive], { encoding: 'utf8' }).stdout
    expect(listing).toContain('rootface-backup.json')
    expect(listing).toContain('database.tar.gz')
    expect(listing).toMatch(/files\//)

    const target = join(work, 'live-restored')
    mkdirSync(target)
    expect(readdirSync(target)).toEqual([])
    const out = run('scripts/db-restore.ts', [archive], { NUXT_DATA_DIR: join(target, 'db'), DATABASE_URL: '' })
    expect(out).toMatch(/Restored \d+ stored files/)
    const restored = await startServer({ dataDir: target, env: { NUXT_SEED_DEMO: 'false' } })
    servers.push(restored)
    const restoredFiles = await downloadsAll(await signedIn(restored.url, 'supervisor'), files)
    console.log(`[hardening] files restored and downloaded with the same SHA-256 (live backup): ${restoredFiles} of ${files.length}`)
    expect(restoredFiles).toBe(files.length)
  })

  it('db:backup with the server stopped, then db:restore into an empty folder: every attachment downloads unchanged', async () => {
    await source.stop('SIGTERM', { keepData: true })
    const archive = join(work, 'offline.tar.gz')
    const out = run('scripts/db-backup.ts', [archive], { NUXT_DATA_DIR: join(work, 'source/db'), DATABASE_URL: '' })
    expect(out).toMatch(/It holds the database and \d+ stored files/)
    const target = join(work, 'offline-restored')
    run('scripts/db-restore.ts', [archive], { NUXT_DATA_DIR: join(target, 'db'), DATABASE_URL: '' })
    const restored = await startServer({ dataDir: target, env: { NUXT_SEED_DEMO: 'false' } })
    servers.push(restored)
    const restoredFiles = await downloadsAll(await signedIn(restored.url, 'supervisor'), files)
    console.log(`[hardening] files restored and downloaded with the same SHA-256 (db:backup): ${restoredFiles} of ${files.length}`)
    expect(restoredFiles).toBe(files.length)
  })

  it('with files in an S3 bucket the archive holds the database only and says the bucket keeps its own versions', async () => {
    const archive = join(work, 's3.tar.gz')
    const out = run('scripts/db-backup.ts', [archive], { NUXT_DATA_DIR: join(work, 'source/db'), DATABASE_URL: '', S3_BUCKET: 'rootface-files' })
    expect(out).toContain('backed up by its own versioning')
    const manifest = JSON.parse(spawnSync('tar', ['-xzOf', archive, 'rootface-backup.json'], { encoding: 'utf8' }).stdout)
    expect(manifest.files).toMatchObject({ storage: 's3', bucket: 'rootface-files' })
    expect(spawnSync('tar', ['-tzf', archive], { encoding: 'utf8' }).stdout).not.toMatch(/files\//)
  })
})
