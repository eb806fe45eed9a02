import { createReadStream } from 'node:fs'
import { mkdtemp, rm, stat, writeFile } from 'node:fs/promises'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { format } from 'date-fns'
import { s3Bucket, writeBackupArchive } from '../../backup/archive'
import { recordAudit } from '../../database/audit'

/** GET /api/admin/backup: a restorable archive of the embedded database and the stored files, taken while it runs (supervisor) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const database = await useDatabase()
  if (!database.backup) {
    throw httpError(conflict('This server runs on a PostgreSQL server: back it up with pg_dump (npm run db:backup does so, with the files).'))
  }
  const dir = await mkdtemp(join(tmpdir(), 'rootface-download-'))
  const file = join(dir, 'backup.tar.gz')
  try {
    const s3 = fileStorageKind() === 's3' ? s3Bucket() : null
    const manifest = await writeBackupArchive(file, {
      driver: 'pglite', filesDir: s3 ? null : filesDir(), s3,
      writeDatabase: async path => writeFile(path, Buffer.from(await (await database.backup!()).arrayBuffer())),
    })
    const { size } = await stat(file)
    await recordAudit(database.db, { accountId: user.id, action: 'backup', recordType: 'database', after: { bytes: size, files: manifest.files.storage === 'disk' ? manifest.files.count : 's3' } })
    setResponseHeaders(event, {
      'content-type': 'application/gzip',
      'content-length': size,
      'content-disposition': `attachment; filename="rootface-${format(new Date(), 'yyyyMMdd-HHmmss')}.tar.gz"`,
    })
  }
  catch (error) {
    await rm(dir, { recursive: true, force: true })
    throw error
  }
  event.node.res.once('close', () => {
    rm(dir, { recursive: true, force: true }).catch(() => {})
  })
  return sendStream(event, createReadStream(file))
})
