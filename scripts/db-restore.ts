// npm run db:restore <file>: brings a backup back.
// Embedded (PGlite): the current data directory is kept aside as <dir>.before-restore-<time>, then the archive is unpacked.
// PostgreSQL (DATABASE_URL): pg_restore --clean into that database.
import { spawnSync } from 'node:child_process'
import { existsSync, readFileSync, renameSync } from 'node:fs'
import { resolve } from 'node:path'
import { format } from 'date-fns'
import { restorePglite } from '../server/database/client'
import { lockDataDir } from '../server/database/lock'

const source = process.argv[2]
if (!source || !existsSync(source)) {
  console.error('Usage: npm run db:restore <backup file>')
  process.exit(1)
}
const url = process.env.DATABASE_URL
if (url) {
  const restore = spawnSync('pg_restore', ['--clean', '--if-exists', '--no-owner', `--dbname=${url}`, source], { stdio: 'inherit' })
  process.exit(restore.status ?? 1)
}
const dataDir = resolve(process.env.NUXT_DATA_DIR ?? '.data/db')
try {
  lockDataDir(dataDir, 'npm run db:restore')() // refuses while a server holds it
}
catch (error) {
  console.error(`${(error as Error).message}\nStop the server before restoring.`)
  process.exit(1)
}
if (existsSync(dataDir)) {
  const aside = `${dataDir}.before-restore-${format(new Date(), 'yyyyMMdd-HHmmss')}`
  renameSync(dataDir, aside)
  console.log(`The current database is kept at ${aside}`)
}
await restorePglite(dataDir, new Blob([readFileSync(source)]), 'npm run db:restore')
console.log(`Restored ${source} into ${dataDir}`)
