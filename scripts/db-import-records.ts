// npm run db:import-records <file.json>: loads a records archive (downloaded from Export → JSON archive, or
// /api/export/archive) into an EMPTY database, the uploaded files into the file store (NUXT_FILES_DIR or 'files'
// beside the data directory; an S3 bucket with S3_BUCKET). Refuses a database that holds any record. Stop the server first.
import { readFileSync } from 'node:fs'
import { resolve } from 'node:path'
import { createStorage } from 'unstorage'
import fsDriver from 'unstorage/drivers/fs'
import { openDatabase } from '../server/database/client'
import { ArchiveRefused, loadArchive, type RecordsArchive } from '../server/database/records-archive'
import { filesDirFor } from '../server/backup/archive'
import { s3Driver, s3Settings } from '../server/utils/storage'

const source = process.argv[2]
if (!source) {
  console.error('Usage: npm run db:import-records <archive.json>')
  process.exit(1)
}
const archive = JSON.parse(readFileSync(resolve(source), 'utf8')) as RecordsArchive
const dataDir = resolve(process.env.NUXT_DATA_DIR ?? '.data/db')
const s3 = s3Settings()
const files = createStorage({ driver: s3 ? s3Driver(s3) : fsDriver({ base: filesDirFor(dataDir) }) })

let database
try {
  database = await openDatabase({ databaseUrl: process.env.DATABASE_URL || undefined, dataDir, holder: 'npm run db:import-records' })
}
catch (error) {
  console.error(`${(error as Error).message}\nStop the server before loading an archive.`)
  process.exit(1)
}
try {
  const result = await loadArchive(database.db, archive, (key, bytes) => files.setItemRaw(key, bytes))
  const rows = Object.values(result.tables).reduce((a, b) => a + b, 0)
  console.log(`Loaded ${rows} rows in ${Object.keys(result.tables).length} tables and ${result.files} files from ${source}.`)
}
catch (error) {
  console.error(error instanceof ArchiveRefused ? error.message : error)
  process.exitCode = 1
}
finally {
  await database.close()
}
