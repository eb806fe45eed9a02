import { z } from 'zod'
import { listQuerySchema, processSchema } from './list'
import { calendarDay, maxImportBytes } from './continuity-entry'
import { brokenCharacterMessage, hasLoneSurrogate, idSchema, optionalNumber, optionalText, pickedId, requiredText, unitIdSchema, versionSchema, wellFormedText } from './fields'
import { defectTypes, examinationMethods, jointLayers, jointTypes, tokenScopes, volumetricMethods } from '../vocabulary/joints'

const positionLetter = z.enum(['F', 'H', 'V', 'O'], { errorMap: () => ({ message: 'F, H, V or O' }) })
const pNumber = z.preprocess(v => (v === '' ? null : v), z.string().trim().max(8, 'At most 8 characters')
  .regex(/^\d{1,2}[A-Z]?$/i, 'A P-No. such as 1, 8 or 15E').nullable())
const flag = z.preprocess(v => (v === 'true' ? true : v === 'false' ? false : v === '' ? null : v), z.boolean().nullable())
const percent = (what: string) => z.preprocess(v => (v === '' || v === null || v === undefined ? 0 : typeof v === 'string' ? Number(v) : v),
  z.number({ invalid_type_error: `${what} must be a number` }).int(`${what}: a whole percentage`).min(0, `${what}: 0 to 100`).max(100, `${what}: 0 to 100`))

/** A written reason that lets a refused check through (supervisor only; audited and printed on the packet). */
export const overrideReasonSchema = z.string({ invalid_type_error: 'The reason must be text' }).trim()
  .min(20, 'Write the reason in at least 20 characters').max(1000, 'At most 1000 characters').regex(wellFormedText, brokenCharacterMessage('Reason'))

/** Empty means no override. */
const optionalOverride = z.preprocess(v => (v === '' || v === null ? undefined : v), overrideReasonSchema.optional())

/** One welder on a joint for one process (and layer). */
export const jointWelderSchema = z.object({
  welderId: pickedId('the welder'),
  process: processSchema,
  layer: z.preprocess(v => (v === '' ? null : v), z.enum(jointLayers, { errorMap: () => ({ message: 'Pick a layer' }) }).nullable()).default(null),
  fNumber: z.preprocess(v => (v === '' ? null : typeof v === 'string' && /^\d+$/.test(v) ? Number(v) : v),
    z.number({ invalid_type_error: 'F-No. must be a number' }).int('A whole number such as 4').positive().max(99).nullable()).default(null),
})
export type JointWelderInput = z.infer<typeof jointWelderSchema>

export const jointSchema = z.object({
  mark: requiredText('the joint mark (drawing / line / weld number)', 60),
  jointType: z.enum(jointTypes, { errorMap: () => ({ message: 'Pick the joint type' }) }),
  weld: z.enum(['groove', 'fillet'], { errorMap: () => ({ message: 'Groove or fillet' }) }),
  unit: unitIdSchema.default('in'),
  pNumberA: pNumber.default(null),
  pNumberB: pNumber.default(null),
  thickness: optionalNumber('Thickness', { positive: true, max: 10_000 }).default(null),
  outsideDiameter: optionalNumber('Outside diameter', { positive: true, max: 10_000 }).default(null),
  positions: z.array(positionLetter, { invalid_type_error: 'Pick at least one position' }).min(1, 'Pick at least one position')
    .transform(list => (['F', 'H', 'V', 'O'] as const).filter(p => list.includes(p))),
  progression: z.preprocess(v => (v === '' ? null : v), z.enum(['uphill', 'downhill'], { errorMap: () => ({ message: 'Uphill or downhill' }) }).nullable()).default(null),
  backing: flag.default(null),
  rtPercent: percent('RT'),
  utPercent: percent('UT'),
  mt: z.boolean().default(false),
  pt: z.boolean().default(false),
  procedureId: z.preprocess(v => (v === '' ? null : typeof v === 'string' && /^\d+$/.test(v) ? Number(v) : v), idSchema.nullable()).default(null),
  welders: z.array(jointWelderSchema).max(12, 'At most 12 welders on a joint').default([])
    .refine(list => new Set(list.map(w => `${w.welderId}|${w.process}|${w.layer}`)).size === list.length, 'A welder is listed twice for the same process and layer'),
  override: optionalOverride,
})
export type JointInput = z.infer<typeof jointSchema>

export const jointPatchSchema = jointSchema.extend({ version: versionSchema })
export type JointPatch = z.infer<typeof jointPatchSchema>

/** Marking a joint welded on a day: the check runs on that day, then continuity is posted for each welder and process. */
export const jointWeldedSchema = z.object({
  weldedOn: calendarDay,
  version: versionSchema,
  override: optionalOverride,
})
export type JointWeldedInput = z.infer<typeof jointWeldedSchema>

/** A repair (R1, R2...) welded on a day by its repair welders, each checked on that day. */
export const jointRepairSchema = z.object({
  cause: requiredText('what is repaired (indication and location)', 300),
  weldedOn: calendarDay,
  welders: z.array(jointWelderSchema).min(1, 'Name the repair welder').max(12),
  override: optionalOverride,
})
export type JointRepairInput = z.infer<typeof jointRepairSchema>

export const jointExaminationSchema = z.object({
  repair: z.number().int().min(0).max(9).default(0),
  method: z.enum(examinationMethods, { errorMap: () => ({ message: 'Pick the method' }) }),
  reportNumber: optionalText('Report number', 60).default(null),
  examinedOn: calendarDay,
  accepted: z.boolean({ required_error: 'Accept or reject', invalid_type_error: 'Accept or reject' }),
  lengthExamined: optionalNumber('Length examined', { positive: true, max: 100_000 }).default(null),
  defectType: z.preprocess(v => (v === '' ? null : v), z.enum(defectTypes, { errorMap: () => ({ message: 'Pick the indication type' }) }).nullable()).default(null),
  defectLength: optionalNumber('Indication length', { positive: true, max: 100_000 }).default(null),
}).superRefine((v, ctx) => {
  const volumetric = (volumetricMethods as readonly string[]).includes(v.method)
  if (volumetric && v.lengthExamined === null) ctx.addIssue({ code: 'custom', path: ['lengthExamined'], message: 'Enter the length of weld examined' })
  if (volumetric && !v.accepted && v.defectType === null) ctx.addIssue({ code: 'custom', path: ['defectType'], message: 'Pick the indication type' })
  if (volumetric && !v.accepted && v.defectLength === null) ctx.addIssue({ code: 'custom', path: ['defectLength'], message: 'Enter the indication length' })
  if (v.accepted && (v.defectType !== null || v.defectLength !== null)) ctx.addIssue({ code: 'custom', path: ['defectType'], message: 'An accepted result records no rejectable indication' })
})
export type JointExaminationInput = z.infer<typeof jointExaminationSchema>

export const jointListQuerySchema = listQuerySchema(['mark', 'weldedOn', 'procedure']).extend({
  status: z.enum(['open', 'welded', 'rejected', 'repaired']).optional(),
  welderId: z.coerce.number().int().positive().max(2_147_483_647).optional(),
})
export type JointListQuery = z.infer<typeof jointListQuerySchema>

export const jointParamsSchema = z.object({
  id: z.coerce.number().int().positive().max(2_147_483_647),
  jointId: z.coerce.number().int().positive().max(2_147_483_647),
})

/** A weld log file: `mark,stamp,process,date[,layer]`, each joint of the project welded by those welders on that date. */
export const jointImportSchema = z.object({
  csv: z.string({ required_error: 'csv is required' }).min(1, 'The file is empty').max(maxImportBytes, 'The file is larger than 1.5 MB; split it')
    .refine(v => !hasLoneSurrogate(v), brokenCharacterMessage('The file')),
  commit: z.boolean().default(false),
})

export const apiTokenSchema = z.object({
  name: requiredText('a name for the token (the system that uses it)', 80),
  scopes: z.array(z.enum(tokenScopes, { errorMap: () => ({ message: 'joints:write or continuity:write' }) })).min(1, 'Pick at least one scope')
    .transform(list => [...new Set(list)]),
})
export type ApiTokenInput = z.infer<typeof apiTokenSchema>

/** What another shop system sends: a joint marked welded by stamps, found by project number and mark. */
export const externalWeldedSchema = z.object({
  project: requiredText('the project number', 40),
  mark: requiredText('the joint mark', 60),
  weldedOn: calendarDay,
  welders: z.array(z.object({
    stamp: requiredText('the welder stamp', 20),
    process: z.string().trim().toUpperCase().pipe(processSchema),
    layer: jointWelderSchema.shape.layer,
    fNumber: jointWelderSchema.shape.fNumber,
  })).min(1, 'Name at least one welder').max(12),
})
export type ExternalWeldedInput = z.infer<typeof externalWeldedSchema>

export const externalContinuitySchema = z.object({
  stamp: requiredText('the welder stamp', 20),
  process: z.string().trim().toUpperCase().pipe(processSchema),
  weldedOn: calendarDay,
  reference: requiredText('a reference (job, weld or WPS)', 200),
})
export type ExternalContinuityInput = z.infer<typeof externalContinuitySchema>
