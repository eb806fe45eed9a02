// A Rootface backup archive (gzip tarball) holds everything a restore needs:
//   rootface-backup.json   what is inside (format, time, database driver, where the files are)
//   database.tar.gz        the PGlite data directory (PGlite's own dump), or
//   database.dump          pg_dump's custom format (PostgreSQL)
//   files/                 every uploaded file and thumbnail, as kept on disk
// When files live in an S3 bucket the archive holds none and says so: the bucket is backed up by its own versioning.
// Plain node and the system's `tar` (GNU tar or bsdtar): used by scripts/db-backup.ts, scripts/db-restore.ts and
// GET /api/admin/backup alike.
import { spawn } from 'node:child_process'
import { existsSync } from 'node:fs'
import { cp, mkdir, mkdtemp, readFile, readdir, rename, rm, stat, symlink, writeFile } from 'node:fs/promises'
import { tmpdir } from 'node:os'
import { basename, dirname, join, resolve } from 'node:path'

export const MANIFEST = 'rootface-backup.json'

export type FilesPart
  = | { storage: 'disk', count: number, bytes: number }
    | { storage: 's3', bucket: string, prefix: string, note: string }

export interface BackupManifest {
  format: 'rootface-backup'
  version: 1
  createdAt: string
  database: { driver: 'pglite' | 'postgres', file: 'database.tar.gz' | 'database.dump' }
  files: FilesPart
}

/** Where uploaded files live on disk outside the server (scripts): NUXT_FILES_DIR, else 'files' beside the data directory. */
export function filesDirFor(dataDir: string, env = process.env) {
  return env.NUXT_FILES_DIR ? resolve(env.NUXT_FILES_DIR) : join(dirname(resolve(dataDir)), 'files')
}

export function s3Bucket(env = process.env) {
  return env.S3_BUCKET ? { bucket: env.S3_BUCKET, prefix: (env.S3_PREFIX ?? '').replace(/^\/+|\/+$/g, '') } : null
}

export function runTar(args: string[]): Promise<void> {
  return new Promise((resolvePromise, reject) => {
    const child = spawn('tar', args, { stdio: ['ignore', 'ignore', 'pipe'] })
    let errors = ''
    child.stderr.on('data', (chunk: Buffer) => {
      errors += chunk.toString()
    })
    child.on('error', reject)
    child.on('exit', code => (code === 0 ? resolvePromise() : reject(new Error(`tar ${args[0]} failed (${code}): ${errors.trim()}`))))
  })
}

async function countFiles(dir: string) {
  let count = 0
  let bytes = 0
  if (!existsSync(dir)) return { count, bytes }
  for (const entry of await readdir(dir, { recursive: true, withFileTypes: true })) {
    if (!entry.isFile()) continue
    count++
    bytes += (await stat(join(entry.parentPath, entry.name))).size
  }
  return { count, bytes }
}

/**
 * Writes the archive to `out`. `writeDatabase(path)` puts the database part at `path`; `filesDir` is the folder
 * of uploaded files (null when they are in S3).
 */
export async function writeBackupArchive(out: string, options: {
  driver: 'pglite' | 'postgres'
  writeDatabase: (path: string) => Promise<void>
  filesDir: string | null
  s3?: { bucket: string, prefix: string } | null
}): Promise<BackupManifest> {
  const staging = await mkdtemp(join(tmpdir(), 'rootface-backup-'))
  try {
    const file = options.driver === 'pglite' ? 'database.tar.gz' : 'database.dump'
    await options.writeDatabase(join(staging, file))
    let files: FilesPart
    if (options.s3) {
      files = {
        storage: 's3', bucket: options.s3.bucket, prefix: options.s3.prefix,
        note: `The uploaded files are in the S3 bucket ${options.s3.bucket}${options.s3.prefix ? ` under ${options.s3.prefix}/` : ''}, not in this archive: keep that bucket backed up by its own versioning (and replication), and restore it to the state of this backup's time.`,
      }
    }
    else {
      const dir = options.filesDir!
      files = { storage: 'disk', ...await countFiles(dir) }
      // The files folder goes in through a link (tar -h follows it), so nothing is copied first.
      if (existsSync(dir)) await symlink(resolve(dir), join(staging, 'files'), 'dir')
      else await mkdir(join(staging, 'files'))
    }
    const manifest: BackupManifest = { format: 'rootface-backup', version: 1, createdAt: new Date().toISOString(), database: { driver: options.driver, file }, files }
    await writeFile(join(staging, MANIFEST), `${JSON.stringify(manifest, null, 2)}\n`)
    await mkdir(dirname(resolve(out)), { recursive: true })
    await runTar(['-czhf', resolve(out), '-C', staging, MANIFEST, file, ...(options.s3 ? [] : ['files'])])
    return manifest
  }
  finally {
    await rm(staging, { recursive: true, force: true })
  }
}

export interface OpenedBackup {
  /** null for an archive made before files were included (the database part only). */
  manifest: BackupManifest | null
  databaseFile: string
  filesFolder: string | null
  cleanup: () => Promise<void>
}

/** Unpacks an archive into a temporary folder. Older archives (a bare PGlite tarball or a pg_dump file) open too. */
export async function openBackupArchive(file: string): Promise<OpenedBackup> {
  const dir = await mkdtemp(join(tmpdir(), 'rootface-restore-'))
  const cleanup = () => rm(dir, { recursive: true, force: true })
  try {
    await runTar(['-xzf', resolve(file), '-C', dir, MANIFEST]).catch(() => undefined)
    if (!existsSync(join(dir, MANIFEST))) return { manifest: null, databaseFile: resolve(file), filesFolder: null, cleanup }
    const manifest = JSON.parse(await readFile(join(dir, MANIFEST), 'utf8')) as BackupManifest
    if (manifest.format !== 'rootface-backup') throw new Error(`${basename(file)} is not a Rootface backup`)
    await runTar(['-xzf', resolve(file), '-C', dir])
    return { manifest, databaseFile: join(dir, manifest.database.file), filesFolder: manifest.files.storage === 'disk' ? join(dir, 'files') : null, cleanup }
  }
  catch (error) {
    await cleanup()
    throw error
  }
}

/** Puts the archive's files in place; a non-empty folder already there is kept aside as <folder>.before-restore-<stamp>. */
export async function restoreFiles(from: string, filesDir: string, stamp: string): Promise<{ count: number, bytes: number, keptAside: string | null }> {
  let keptAside: string | null = null
  if (existsSync(filesDir) && (await readdir(filesDir)).length) {
    keptAside = `${filesDir}.before-restore-${stamp}`
    await rename(filesDir, keptAside)
  }
  await mkdir(dirname(filesDir), { recursive: true })
  await cp(from, filesDir, { recursive: true })
  return { ...await countFiles(filesDir), keptAside }
}
