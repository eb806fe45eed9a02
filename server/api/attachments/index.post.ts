import { storeFile } from '../../database/attachments'
import { attachmentUploadSchema } from '#shared/schemas/attachment'
import {
  claimedContentType, contentTypeWords, detectContentType, maxAttachmentBytes, type AttachmentContentType,
} from '#shared/attachments/file-rules'

// Room for the multipart boundaries and the form fields around the file.
const envelopeBytes = 64 * 1024

const refuse = (statusCode: 400 | 413 | 415, message: string) => httpError(fieldFailure('file', message, statusCode === 400 ? undefined : statusCode))

/** POST /api/attachments (multipart: recordType, recordId, kind, file): add a PDF or image to a record (staff; see uploaders) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, staff)
  const length = Number(getRequestHeader(event, 'content-length') ?? Number.NaN)
  if (!Number.isFinite(length)) throw createError({ statusCode: 411, statusMessage: 'Length required', message: 'Send the upload with a Content-Length' })
  if (length > maxAttachmentBytes + envelopeBytes) throw refuse(413, `Files may be at most ${maxAttachmentBytes / 1024 / 1024} MB`)

  // Streamed to a temporary file while hashing (server/utils/upload-stream.ts), removed when the answer is sent.
  const upload = await receiveUpload(event, { maxFileBytes: maxAttachmentBytes })
  if (!upload) throw refuse(400, 'Send the file as multipart/form-data with the fields recordType, recordId, kind and file')
  const result = attachmentUploadSchema.safeParse(upload.fields)
  if (!result.success) {
    const { formErrors, fieldErrors } = result.error.flatten()
    throw httpError(invalid('upload', formErrors, fieldErrors as Record<string, string[]>))
  }
  const owner = result.data
  const file = upload.file
  if (!file) throw refuse(400, 'Choose a file')
  if (!file.size) throw refuse(400, 'The file is empty')
  if (file.tooLarge) throw refuse(413, `Files may be at most ${maxAttachmentBytes / 1024 / 1024} MB`)

  const detected = detectContentType(file.head)
  if (!detected) throw refuse(415, 'Only PDF, PNG, JPEG or WebP files are accepted, checked from the file\'s content')
  const claimed = claimedContentType(file.mimeType)
  const byName = claimedByName(file.filename ?? '')
  for (const claim of [claimed, byName]) {
    if (claim && claim !== 'application/octet-stream' && claim !== detected) {
      const words = contentTypeWords[claim as AttachmentContentType] ?? claim
      throw refuse(415, `The file claims to be ${words} but its content is ${contentTypeWords[detected]}`)
    }
  }

  const stored = orThrow(await storeFile(await useDb(), user, owner, { fileName: file.filename, bytes: await file.read(), sha256: file.sha256, contentType: detected }))
  setResponseStatus(event, 201)
  return stored
})

function claimedByName(name: string): string | undefined {
  const extension = name.split(/[/\\]/).pop()?.split('.').pop()?.toLowerCase()
  return ({ pdf: 'application/pdf', png: 'image/png', jpg: 'image/jpeg', jpeg: 'image/jpeg', webp: 'image/webp' } as Record<string, string>)[extension ?? '']
}
