import { exportArchive } from '../../database/records-archive'
import { readStoredFile } from '../../utils/storage'

/**
 * GET /api/export/archive: one JSON file of every table and every uploaded file (base64), which loads into an empty
 * database with `npm run db:import-records <file>` (quality manager). Like the backup, it holds the accounts' password hashes.
 */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const archive = await exportArchive(await useDb(), user, readStoredFile)
  setResponseHeaders(event, {
    'content-type': 'application/json; charset=utf-8',
    'content-disposition': `attachment; filename="rootface-records-${archive.exportedAt.slice(0, 10)}.json"`,
    'cache-control': 'private, no-store',
    'x-content-type-options': 'nosniff',
  })
  return JSON.stringify(archive)
})
