import { idParamSchema } from '#shared/schemas/list'
import type { AttachmentRecordType } from '#shared/schemas/attachment'
import { isImageType } from '#shared/attachments/file-rules'

/** GET /api/attachments/:id/preview: an image shown inline as the record's thumbnail (images only; 404 otherwise) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, everyone)
  const { id } = await validParams(event, idParamSchema)
  const db = await useDb()
  const row = await attachmentById(db, id)
  if (!row || !isImageType(row.contentType) || !await maySeeRecord(db, user, row.recordType as AttachmentRecordType, row.recordId)) throw notFound('Image')
  if (getRequestHeader(event, 'if-none-match') === `"${row.sha256}"`) {
    setResponseStatus(event, 304)
    return null
  }
  const data = await readStoredFile(row.storageKey)
  if (!data) throw notFound('Image')
  setResponseHeaders(event, {
    'content-type': row.contentType,
    'content-length': data.length,
    'content-disposition': contentDisposition('inline', row.fileName),
    'x-content-type-options': 'nosniff',
    'content-security-policy': 'default-src \'none\'',
    // The content of an attachment never changes; the browser may keep it for the session's user.
    'cache-control': 'private, max-age=86400',
    'etag': `"${row.sha256}"`,
  })
  return data
})
