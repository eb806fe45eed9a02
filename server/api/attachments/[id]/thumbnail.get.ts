import { idParamSchema } from '#shared/schemas/list'
import type { AttachmentRecordType } from '#shared/schemas/attachment'
import { isImageType } from '#shared/attachments/file-rules'

/** GET /api/attachments/:id/thumbnail: a small WebP of an image attachment for the record view (images only; 404 otherwise) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, everyone)
  const { id } = await validParams(event, idParamSchema)
  const db = await useDb()
  const row = await attachmentById(db, id)
  if (!row || !isImageType(row.contentType) || !await maySeeRecord(db, user, row.recordType as AttachmentRecordType, row.recordId)) throw notFound('Image')
  const etag = `"${row.sha256}-thumbnail"`
  if (getRequestHeader(event, 'if-none-match') === etag) {
    setResponseStatus(event, 304)
    return null
  }
  let data = await readStoredFile(thumbnailKey(row.storageKey))
  if (!data) {
    // Made at upload; remade here if it went missing.
    const original = await readStoredFile(row.storageKey)
    if (!original) throw notFound('Image')
    data = await makeThumbnail(original)
    await putStoredFile(thumbnailKey(row.storageKey), data, 'image/webp')
  }
  setResponseHeaders(event, {
    'content-type': 'image/webp',
    'content-disposition': contentDisposition('inline', row.fileName.replace(/\.[^.]+$/, '-thumbnail.webp')),
    'x-content-type-options': 'nosniff',
    'content-security-policy': 'default-src \'none\'',
    // An attachment never changes; the browser may keep its thumbnail for the signed-in user.
    'cache-control': 'private, max-age=86400',
    'etag': etag,
  })
  return data
})
