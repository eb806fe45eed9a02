// npm run db:backup [file]: one restorable archive of the database AND the uploaded files (server/backup/archive.ts).
// Embedded (PGlite): the data directory's own dump, taken with the server stopped
// (while it runs, download the same kind of archive from /api/admin/backup as the quality manager).
// PostgreSQL (DATABASE_URL): pg_dump in its custom format, inside the archive.
// Files in an S3 bucket (S3_BUCKET) are not copied: the archive says so, and the bucket keeps its own versions.
import { spawnSync } from 'node:child_process'
import { writeFileSync } from 'node:fs'
import { resolve } from 'node:path'
import { format } from 'date-fns'
import { openDatabase } from '../server/database/client'
import { filesDirFor, s3Bucket, writeBackupArchive } from '../server/backup/archive'

const url = process.env.DATABASE_URL
const file = resolve(process.argv[2] ?? `.data/backups/rootface-${format(new Date(), 'yyyyMMdd-HHmmss')}.tar.gz`)
const dataDir = resolve(process.env.NUXT_DATA_DIR ?? '.data/db')
const filesDir = filesDirFor(dataDir)
const s3 = s3Bucket()

let manifest
if (url) {
  manifest = await writeBackupArchive(file, {
    driver: 'postgres', filesDir, s3,
    writeDatabase: async (path) => {
      const dump = spawnSync('pg_dump', ['--format=custom', '--no-owner', `--file=${path}`, url], { stdio: 'inherit' })
      if (dump.status !== 0) throw new Error(`pg_dump failed (${dump.status})`)
    },
  })
}
else {
  let database
  try {
    database = await openDatabase({ dataDir, holder: 'npm run db:backup' })
  }
  catch (error) {
    console.error(`${(error as Error).message}\nWhile the server runs, download a backup from /api/admin/backup instead.`)
    process.exit(1)
  }
  try {
    manifest = await writeBackupArchive(file, {
      driver: 'pglite', filesDir, s3,
      writeDatabase: async path => writeFileSync(path, Buffer.from(await (await database.backup!()).arrayBuffer())),
    })
  }
  finally {
    await database.close()
  }
}
console.log(`Backup written to ${file}`)
console.log(manifest.files.storage === 'disk'
  ? `It holds the database and ${manifest.files.count} stored files (${(manifest.files.bytes / 1024 / 1024).toFixed(1)} MB) from ${filesDir}.`
  : `It holds the database only. ${manifest.files.note}`)
