import { randomUUID } from 'node:crypto'
import { and, eq } from 'drizzle-orm'
import { attachments } from '../../database/schema'
import { attachmentUploadSchema } from '#shared/schemas/attachment'
import {
  claimedContentType, contentTypeWords, detectContentType, displayFileName, isImageType, maxAttachmentBytes, type AttachmentContentType,
} from '#shared/attachments/file-rules'

// Room for the multipart boundaries and the form fields around the file.
const envelopeBytes = 64 * 1024

function refuse(statusCode: number, field: string, message: string) {
  return createError({ statusCode, statusMessage: statusCode === 413 ? 'File too large' : statusCode === 415 ? 'File type not accepted' : 'Invalid upload', message, data: { formErrors: [], fieldErrors: { [field]: [message] } } })
}

/** POST /api/attachments (multipart: recordType, recordId, kind, file): add a PDF or image to a record (staff; see uploaders) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, staff)
  const length = Number(getRequestHeader(event, 'content-length') ?? Number.NaN)
  if (!Number.isFinite(length)) throw createError({ statusCode: 411, statusMessage: 'Length required', message: 'Send the upload with a Content-Length' })
  if (length > maxAttachmentBytes + envelopeBytes) throw refuse(413, 'file', `Files may be at most ${maxAttachmentBytes / 1024 / 1024} MB`)

  // Streamed to a temporary file while hashing (server/utils/upload-stream.ts), removed when the answer is sent.
  const upload = await receiveUpload(event, { maxFileBytes: maxAttachmentBytes })
  if (!upload) throw refuse(400, 'file', 'Send the file as multipart/form-data with the fields recordType, recordId, kind and file')
  const result = attachmentUploadSchema.safeParse(upload.fields)
  if (!result.success) {
    const { formErrors, fieldErrors } = result.error.flatten()
    throw createError({ statusCode: 400, statusMessage: 'Invalid upload', message: Object.values(fieldErrors).flat()[0] ?? formErrors[0], data: { formErrors, fieldErrors } })
  }
  const owner = result.data
  const file = upload.file
  if (!file) throw refuse(400, 'file', 'Choose a file')
  if (!file.size) throw refuse(400, 'file', 'The file is empty')
  if (file.tooLarge) throw refuse(413, 'file', `Files may be at most ${maxAttachmentBytes / 1024 / 1024} MB`)

  const detected = detectContentType(file.head)
  if (!detected) throw refuse(415, 'file', 'Only PDF, PNG, JPEG or WebP files are accepted, checked from the file\'s content')
  const claimed = claimedContentType(file.mimeType)
  const byName = claimedByName(file.filename ?? '')
  for (const claim of [claimed, byName]) {
    if (claim && claim !== 'application/octet-stream' && claim !== detected) {
      const words = contentTypeWords[claim as AttachmentContentType] ?? claim
      throw refuse(415, 'file', `The file claims to be ${words} but its content is ${contentTypeWords[detected]}`)
    }
  }

  const db = await useDb()
  if (!await maySeeRecord(db, user, owner.recordType, owner.recordId)) throw notFound('Record')
  if (!uploaders[owner.recordType].includes(user.role)) throw createError({ statusCode: 403, statusMessage: 'Your role may not add files to this record' })

  const sha256 = file.sha256
  const [same] = await db.select({ id: attachments.id, fileName: attachments.fileName }).from(attachments)
    .where(and(eq(attachments.recordType, owner.recordType), eq(attachments.recordId, owner.recordId), eq(attachments.sha256, sha256))).limit(1)
  if (same) throw conflict(`This file is already attached as ${same.fileName}`)

  // An image must decode as what its first bytes say; its thumbnail is made now, once.
  const data = await file.read()
  let thumbnail: Buffer | null = null
  if (isImageType(detected)) {
    try {
      thumbnail = await makeThumbnail(data)
    }
    catch {
      throw refuse(415, 'file', `The file starts like a ${contentTypeWords[detected]} but cannot be read as one`)
    }
  }

  const fileName = displayFileName(file.filename, detected)
  const storageKey = `${owner.recordType}:${owner.recordId}:${randomUUID()}`
  await putStoredFile(storageKey, data, detected)
  if (thumbnail) await putStoredFile(thumbnailKey(storageKey), thumbnail, 'image/webp')
  try {
    const row = await db.transaction(async (tx) => {
      const [created] = await tx.insert(attachments).values({
        recordType: owner.recordType, recordId: owner.recordId, kind: owner.kind, fileName, contentType: detected,
        size: data.length, sha256, storageKey, uploadedBy: user.id,
      }).returning()
      await recordAudit(tx, { accountId: user.id, action: 'attach', recordType: owner.recordType, recordId: owner.recordId, after: { attachmentId: created!.id, fileName, kind: owner.kind, sha256, size: data.length } })
      return created!
    })
    setResponseStatus(event, 201)
    const { storageKey: _key, ...visible } = row
    return { ...visible, uploadedBy: user.name }
  }
  catch (error) {
    await removeStoredFile(storageKey).catch(() => {})
    if (thumbnail) await removeStoredFile(thumbnailKey(storageKey)).catch(() => {})
    throw error
  }
})

function claimedByName(name: string): string | undefined {
  const extension = name.split(/[/\\]/).pop()?.split('.').pop()?.toLowerCase()
  return ({ pdf: 'application/pdf', png: 'image/png', jpg: 'image/jpeg', jpeg: 'image/jpeg', webp: 'image/webp' } as Record<string, string>)[extension ?? '']
}
