// npm run db:restore <file>: brings a backup back: the database and the uploaded files (server/backup/archive.ts).
// Embedded (PGlite): the current data directory is kept aside as <dir>.before-restore-<time>, then the archive is unpacked.
// PostgreSQL (DATABASE_URL): pg_restore --clean into that database.
// Files: unpacked into NUXT_FILES_DIR (default 'files' beside the data directory); files already there are kept aside
// the same way. Archives made before files were included restore the database only.
import { spawnSync } from 'node:child_process'
import { existsSync, readFileSync, renameSync } from 'node:fs'
import { resolve } from 'node:path'
import { format } from 'date-fns'
import { restorePglite } from '../server/database/client'
import { lockDataDir } from '../server/database/lock'
import { filesDirFor, openBackupArchive, restoreFiles } from '../server/backup/archive'

const source = process.argv[2]
if (!source || !existsSync(source)) {
  console.error('Usage: npm run db:restore <backup file>')
  process.exit(1)
}
const url = process.env.DATABASE_URL
const dataDir = resolve(process.env.NUXT_DATA_DIR ?? '.data/db')
const stamp = format(new Date(), 'yyyyMMdd-HHmmss')
const backup = await openBackupArchive(source)
try {
  if (backup.manifest && (backup.manifest.database.driver === 'postgres') !== !!url) {
    console.error(`This archive holds a ${backup.manifest.database.driver === 'postgres' ? 'PostgreSQL' : 'PGlite'} database: ${url ? 'unset' : 'set'} DATABASE_URL to restore it.`)
    process.exit(1)
  }
  if (url) {
    const restore = spawnSync('pg_restore', ['--clean', '--if-exists', '--no-owner', `--dbname=${url}`, backup.databaseFile], { stdio: 'inherit' })
    if (restore.status !== 0) process.exit(restore.status ?? 1)
  }
  else {
    try {
      lockDataDir(dataDir, 'npm run db:restore')() // refuses while a server holds it
    }
    catch (error) {
      console.error(`${(error as Error).message}\nStop the server before restoring.`)
      process.exit(1)
    }
    if (existsSync(dataDir)) {
      const aside = `${dataDir}.before-restore-${stamp}`
      renameSync(dataDir, aside)
      console.log(`The current database is kept at ${aside}`)
    }
    await restorePglite(dataDir, new Blob([readFileSync(backup.databaseFile)]), 'npm run db:restore')
  }
  console.log(`Restored the database from ${source}${url ? '' : ` into ${dataDir}`}`)
  if (backup.filesFolder) {
    const filesDir = filesDirFor(dataDir)
    const files = await restoreFiles(backup.filesFolder, filesDir, stamp)
    if (files.keptAside) console.log(`The files that were there are kept at ${files.keptAside}`)
    console.log(`Restored ${files.count} stored files into ${filesDir}`)
  }
  else if (backup.manifest?.files.storage === 's3') console.log(backup.manifest.files.note)
  else console.log('This archive holds no files (made before backups included them): restore the files folder separately.')
}
finally {
  await backup.cleanup()
}
