// npm run db:backup [file]: a restorable archive of the database.
// Embedded (PGlite): a gzip tarball of the data directory, taken with the server stopped
// (while it runs, download one from /api/admin/backup as the quality manager).
// PostgreSQL (DATABASE_URL): pg_dump in its custom format.
import { spawnSync } from 'node:child_process'
import { mkdirSync, writeFileSync } from 'node:fs'
import { dirname, resolve } from 'node:path'
import { format } from 'date-fns'
import { openDatabase } from '../server/database/client'

const url = process.env.DATABASE_URL
const file = resolve(process.argv[2] ?? `.data/backups/rootface-${format(new Date(), 'yyyyMMdd-HHmmss')}.${url ? 'dump' : 'tar.gz'}`)
mkdirSync(dirname(file), { recursive: true })

if (url) {
  const dump = spawnSync('pg_dump', ['--format=custom', '--no-owner', `--file=${file}`, url], { stdio: 'inherit' })
  if (dump.status !== 0) process.exit(dump.status ?? 1)
}
else {
  const dataDir = resolve(process.env.NUXT_DATA_DIR ?? '.data/db')
  let database
  try {
    database = await openDatabase({ dataDir, holder: 'npm run db:backup' })
  }
  catch (error) {
    console.error(`${(error as Error).message}\nWhile the server runs, download a backup from /api/admin/backup instead.`)
    process.exit(1)
  }
  try {
    writeFileSync(file, Buffer.from(await (await database.backup!()).arrayBuffer()))
  }
  finally {
    await database.close()
  }
}
console.log(`Backup written to ${file}`)
