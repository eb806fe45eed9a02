import { eq } from 'drizzle-orm'
import { attachments } from '../../database/schema'
import { idParamSchema } from '#shared/schemas/list'
import type { AttachmentRecordType } from '#shared/schemas/attachment'

/** DELETE /api/attachments/:id: remove a file from an unsigned record (its uploaders; 409 once the record is signed) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, staff)
  const { id } = await validParams(event, idParamSchema)
  const db = await useDb()
  const row = await attachmentById(db, id)
  const type = row?.recordType as AttachmentRecordType
  if (!row || !await maySeeRecord(db, user, type, row.recordId)) throw notFound('File')
  if (!uploaders[type].includes(user.role)) throw createError({ statusCode: 403, statusMessage: 'Your role may not remove files from this record' })
  if (await lastSignedAt(db, type, row.recordId)) throw conflict('The record is signed: its files are part of what was signed off and stay with it')
  await db.transaction(async (tx) => {
    await tx.delete(attachments).where(eq(attachments.id, id))
    const { storageKey: _key, ...before } = row
    await recordAudit(tx, { accountId: user.id, action: 'detach', recordType: type, recordId: row.recordId, before })
  })
  for (const key of [row.storageKey, thumbnailKey(row.storageKey)]) {
    await removeStoredFile(key).catch((error: unknown) => console.error('[rootface] could not remove a stored file', key, error))
  }
  setResponseStatus(event, 204)
  return null
})
