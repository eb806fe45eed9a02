import { format } from 'date-fns'
import { recordAudit } from '../../database/audit'

/** GET /api/admin/backup: a restorable archive of the embedded database, taken while it runs (supervisor) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const database = await useDatabase()
  if (!database.backup) {
    throw httpError(conflict('This server runs on a PostgreSQL server: back it up with pg_dump (npm run db:backup does so).'))
  }
  const archive = Buffer.from(await (await database.backup()).arrayBuffer())
  await recordAudit(database.db, { accountId: user.id, action: 'backup', recordType: 'database', after: { bytes: archive.length } })
  setResponseHeaders(event, {
    'content-type': 'application/gzip',
    'content-disposition': `attachment; filename="rootface-${format(new Date(), 'yyyyMMdd-HHmmss')}.tar.gz"`,
  })
  return archive
})
