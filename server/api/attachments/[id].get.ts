import { idParamSchema } from '#shared/schemas/list'
import type { AttachmentRecordType } from '#shared/schemas/attachment'

/** GET /api/attachments/:id: download the file, as an attachment, if the caller may see its record (404 otherwise) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, everyone)
  const { id } = await validParams(event, idParamSchema)
  const db = await useDb()
  const row = await attachmentById(db, id)
  if (!row || !await maySeeRecord(db, user, row.recordType as AttachmentRecordType, row.recordId)) throw notFound('File')
  const data = await readStoredFile(row.storageKey)
  if (!data) throw createError({ statusCode: 410, statusMessage: 'File missing', message: 'The stored file is missing; tell your quality manager' })
  setResponseHeaders(event, {
    'content-type': row.contentType,
    'content-disposition': contentDisposition('attachment', row.fileName),
    'x-content-type-options': 'nosniff',
    'cache-control': 'private, no-store',
    'etag': `"${row.sha256}"`,
  })
  return data
})
