import { createHash, randomUUID } from 'node:crypto'
import { and, asc, desc, eq } from 'drizzle-orm'
import type { Db } from './client'
import { accounts, attachments, baseMetals, signatures, welders } from './schema'
import { mayReadProcedure } from './procedures'
import { mayReadPqr } from './pqrs'
import { mayReadWelderTest } from './welder-tests'
import { mayReadTrialBead } from './trials'
import { recordAudit } from './audit'
import { mayReadEquipment } from './equipment'
import { mayReadWelder } from './welders'
import type { SessionUser } from '../utils/auth'
import { makeThumbnail, thumbnailKey } from '../utils/attachments'
import { putStoredFile, readStoredFile, removeStoredFile } from '../utils/storage'
import type { AttachmentOwner, AttachmentRecordType } from '../../shared/schemas/attachment'
import { contentTypeWords, displayFileName, isImageType, type AttachmentContentType } from '../../shared/attachments/file-rules'
import { conflict, fieldFailure, forbidden, gone, missing, type Outcome } from '../../shared/types/outcome'
import type { Role } from '../../shared/utils/roles'

// The files attached to records. Who may see a file is who may read its record: the same mayRead… function the
// record's sheet, page and packet use, so a file never shows what its record hides. A record someone may not read is
// missing (404).

/** Roles that may add files to each kind of record. */
export const uploaders: Record<AttachmentRecordType, readonly Role[]> = {
  'pqr': ['supervisor', 'inspector'],
  'welder-test': ['supervisor', 'inspector'],
  'procedure': ['supervisor'],
  'base-metal': ['supervisor'],
  // A welder reaches a bead only when the shop lets welders record trials (mayReadTrialBead).
  'trial-bead': ['supervisor', 'inspector', 'welder'],
  'equipment': ['supervisor', 'inspector'],
  'welder': ['supervisor'],
}

/** A catalogue entry is staff's; its files go into packets only through the PQRs and WPSs that use it. */
async function mayReadBaseMetal(db: Db, user: SessionUser, id: number) {
  if (user.role !== 'supervisor' && user.role !== 'inspector') return false
  const [row] = await db.select({ id: baseMetals.id }).from(baseMetals).where(eq(baseMetals.id, id)).limit(1)
  return !!row
}

/** A welder's photo is seen by whoever may read the welder. */
async function welderExists(db: Db, user: SessionUser, id: number) {
  if (!await mayReadWelder(db, user, id)) return false
  const [row] = await db.select({ id: welders.id }).from(welders).where(eq(welders.id, id)).limit(1)
  return !!row
}

/** Whether the user may read the record (and so its files). False also when the record does not exist. */
export function mayReadRecord(db: Db, user: SessionUser, type: AttachmentRecordType, id: number): Promise<boolean> {
  switch (type) {
    case 'procedure': return mayReadProcedure(db, user, id)
    case 'pqr': return mayReadPqr(db, user, id)
    case 'welder-test': return mayReadWelderTest(db, user, id)
    case 'base-metal': return mayReadBaseMetal(db, user, id)
    case 'trial-bead': return mayReadTrialBead(db, user, id)
    case 'equipment': return mayReadEquipment(db, user, id)
    case 'welder': return welderExists(db, user, id)
  }
}

/** The time of the record's latest signature, or null while it is unsigned (base metals are never signed). */
async function lastSignedAt(db: Db, type: AttachmentRecordType, id: number): Promise<Date | null> {
  if (type === 'base-metal' || type === 'trial-bead' || type === 'equipment' || type === 'welder') return null
  const [row] = await db.select({ at: signatures.signedAt }).from(signatures)
    .where(and(eq(signatures.recordType, type), eq(signatures.recordId, id))).orderBy(desc(signatures.signedAt)).limit(1)
  return row?.at ?? null
}

const attachmentColumns = {
  id: attachments.id, recordType: attachments.recordType, recordId: attachments.recordId, kind: attachments.kind,
  fileName: attachments.fileName, contentType: attachments.contentType, size: attachments.size, sha256: attachments.sha256,
  createdAt: attachments.createdAt, uploadedBy: accounts.name,
}

/** The files of one record, oldest first: name, type, size and checksum (what a sheet lists by reference). */
export async function attachmentsOf(db: Db, type: AttachmentRecordType, id: number) {
  return db.select(attachmentColumns).from(attachments).leftJoin(accounts, eq(accounts.id, attachments.uploadedBy))
    .where(and(eq(attachments.recordType, type), eq(attachments.recordId, id))).orderBy(asc(attachments.createdAt), asc(attachments.id))
}

/** A file the user may read, with its stored row; missing otherwise. */
async function readableFile(db: Db, user: SessionUser, id: number, what: string) {
  const [row] = await db.select().from(attachments).where(eq(attachments.id, id)).limit(1)
  if (!row || !await mayReadRecord(db, user, row.recordType as AttachmentRecordType, row.recordId)) return missing(what)
  return row
}

/** The files of a record the user may read, and whether they may add or remove files. */
export async function listFiles(db: Db, user: SessionUser, owner: AttachmentOwner) {
  if (!await mayReadRecord(db, user, owner.recordType, owner.recordId)) return missing('Record')
  const [items, signedAt] = await Promise.all([attachmentsOf(db, owner.recordType, owner.recordId), lastSignedAt(db, owner.recordType, owner.recordId)])
  const mayChange = uploaders[owner.recordType].includes(user.role)
  return {
    items: items.map(a => ({ ...a, addedAfterSigning: !!signedAt && a.createdAt > signedAt })),
    signedAt,
    mayUpload: mayChange,
    // Files of a signed record stay: they are part of what was signed off.
    mayDelete: mayChange && !signedAt,
  }
}

/** The stored bytes of a file the user may read. */
export async function readFile(db: Db, user: SessionUser, id: number) {
  const row = await readableFile(db, user, id, 'File')
  if ('fail' in row) return row
  const data = await readStoredFile(row.storageKey)
  if (!data) return gone('The stored file is missing; tell your quality manager')
  return { file: row, data }
}

/** The small WebP of an image file the user may read; remade when it went missing. */
export async function readThumbnail(db: Db, user: SessionUser, id: number) {
  const row = await readableFile(db, user, id, 'Image')
  if ('fail' in row) return row
  if (!isImageType(row.contentType)) return missing('Image')
  return { file: row, data: async () => {
    const kept = await readStoredFile(thumbnailKey(row.storageKey))
    if (kept) return kept
    const original = await readStoredFile(row.storageKey)
    if (!original) return null
    const made = await makeThumbnail(original)
    await putStoredFile(thumbnailKey(row.storageKey), made, 'image/webp')
    return made
  } }
}

/** Whether the user's role may add or remove files of this kind of record (a 403 in the route when not). */
export const mayChangeFiles = (user: SessionUser, type: AttachmentRecordType) => uploaders[type].includes(user.role)

/** Removes a file of an unsigned record; a signed record keeps its files. */
export async function removeFile(db: Db, user: SessionUser, id: number): Promise<Outcome<{ type: AttachmentRecordType }>> {
  const row = await readableFile(db, user, id, 'File')
  if ('fail' in row) return row
  const type = row.recordType as AttachmentRecordType
  if (!mayChangeFiles(user, type)) return forbidden('Your role may not remove files from this record')
  if (await lastSignedAt(db, type, row.recordId)) return conflict('The record is signed: its files are part of what was signed off and stay with it')
  await db.transaction(async (tx) => {
    await tx.delete(attachments).where(eq(attachments.id, id))
    const { storageKey: _key, ...before } = row
    await recordAudit(tx, { accountId: user.id, action: 'detach', recordType: type, recordId: row.recordId, before })
  })
  for (const key of [row.storageKey, thumbnailKey(row.storageKey)]) {
    await removeStoredFile(key).catch((error: unknown) => console.error('[rootface] could not remove a stored file', key, error))
  }
  return { type }
}

/** A checked upload; `sha256` when the bytes were hashed while they streamed in. */
export interface CheckedUpload { fileName: string | undefined, bytes: Buffer, sha256?: string, contentType: AttachmentContentType }

/** Stores a checked upload on a record the user may read: the bytes under a fresh key, its thumbnail, then the row. */
export async function storeFile(db: Db, user: SessionUser, owner: AttachmentOwner & { kind: string }, upload: CheckedUpload) {
  if (!await mayReadRecord(db, user, owner.recordType, owner.recordId)) return missing('Record')
  if (!mayChangeFiles(user, owner.recordType)) return forbidden('Your role may not add files to this record')
  const sha256 = upload.sha256 ?? createHash('sha256').update(upload.bytes).digest('hex')
  const [same] = await db.select({ id: attachments.id, fileName: attachments.fileName }).from(attachments)
    .where(and(eq(attachments.recordType, owner.recordType), eq(attachments.recordId, owner.recordId), eq(attachments.sha256, sha256))).limit(1)
  if (same) return conflict(`This file is already attached as ${same.fileName}`)

  // An image must decode as what its first bytes say; its thumbnail is made now, once.
  let thumbnail: Buffer | null = null
  if (isImageType(upload.contentType)) {
    try {
      thumbnail = await makeThumbnail(upload.bytes)
    }
    catch {
      return fieldFailure('file', `The file starts like a ${contentTypeWords[upload.contentType]} but cannot be read as one`, 415)
    }
  }
  const fileName = displayFileName(upload.fileName, upload.contentType)
  const storageKey = `${owner.recordType}:${owner.recordId}:${randomUUID()}`
  await putStoredFile(storageKey, upload.bytes, upload.contentType)
  if (thumbnail) await putStoredFile(thumbnailKey(storageKey), thumbnail, 'image/webp')
  try {
    const row = await db.transaction(async (tx) => {
      const [created] = await tx.insert(attachments).values({
        recordType: owner.recordType, recordId: owner.recordId, kind: owner.kind, fileName, contentType: upload.contentType,
        size: upload.bytes.length, sha256, storageKey, uploadedBy: user.id,
      }).returning()
      await recordAudit(tx, { accountId: user.id, action: 'attach', recordType: owner.recordType, recordId: owner.recordId, after: { attachmentId: created!.id, fileName, kind: owner.kind, sha256, size: upload.bytes.length } })
      return created!
    })
    const { storageKey: _key, ...visible } = row
    return { ...visible, uploadedBy: user.name }
  }
  catch (error) {
    await removeStoredFile(storageKey).catch(() => {})
    if (thumbnail) await removeStoredFile(thumbnailKey(storageKey)).catch(() => {})
    throw error
  }
}

/** The welder's photograph (the newest JPEG or PNG "photo" attachment) for a sheet the caller already may read; null when none. */
export async function welderPhotoDataUrl(db: Db, welderId: number): Promise<string | null> {
  const [photo] = await db.select({ storageKey: attachments.storageKey, contentType: attachments.contentType }).from(attachments)
    .where(and(eq(attachments.recordType, 'welder'), eq(attachments.recordId, welderId), eq(attachments.kind, 'photo')))
    .orderBy(desc(attachments.createdAt), desc(attachments.id)).limit(1)
  if (!photo || !/^image\/(jpeg|png)$/.test(photo.contentType)) return null
  const bytes = await readStoredFile(photo.storageKey)
  return bytes ? `data:${photo.contentType};base64,${Buffer.from(bytes).toString('base64')}` : null
}
