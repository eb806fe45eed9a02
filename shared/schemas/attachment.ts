import { z } from 'zod'

/** The records a file can belong to, and what kind of file each takes. */
export const attachmentKinds = {
  'pqr': ['lab-report', 'other'],
  'welder-test': ['radiography-report', 'coupon-photo', 'other'],
  'procedure': ['joint-sketch', 'other'],
  'base-metal': ['mill-test-report', 'other'],
  'trial-bead': ['bead-photo', 'other'],
  'equipment': ['calibration-certificate', 'other'],
  'welder': ['photo'],
} as const
export type AttachmentRecordType = keyof typeof attachmentKinds
export const attachmentRecordTypes = Object.keys(attachmentKinds) as [AttachmentRecordType, ...AttachmentRecordType[]]

export const attachmentKindWords: Record<string, string> = {
  'lab-report': 'Lab report',
  'radiography-report': 'Radiography report',
  'coupon-photo': 'Coupon photo',
  'joint-sketch': 'Joint sketch',
  'mill-test-report': 'Mill test report',
  'bead-photo': 'Bead photo',
  'calibration-certificate': 'Calibration certificate',
  'photo': 'Photo for the ID card',
  'other': 'Other document',
}

const recordId = z.coerce.number({ invalid_type_error: 'Give the record' }).int().positive().max(2_147_483_647)

export const attachmentOwnerSchema = z.object({
  recordType: z.enum(attachmentRecordTypes, { errorMap: () => ({ message: 'Unknown kind of record' }) }),
  recordId,
})
export type AttachmentOwner = z.infer<typeof attachmentOwnerSchema>

/** The fields that come with the file in the multipart upload. */
export const attachmentUploadSchema = attachmentOwnerSchema.extend({
  kind: z.string().trim().default('other'),
}).superRefine((value, ctx) => {
  const kinds: readonly string[] = attachmentKinds[value.recordType]
  if (!kinds.includes(value.kind)) ctx.addIssue({ code: 'custom', path: ['kind'], message: `A ${value.recordType} takes: ${kinds.join(', ')}` })
})
