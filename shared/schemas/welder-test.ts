import { z } from 'zod'
import { codeSchema, unitSchema } from '../rules/requests'
import { getRuleSet } from '../rules'
import { processSchema } from './list'
import { calendarDay } from './continuity'
import { operatorVariablesSchema } from './operator'
import { qualifiedAsValues } from '../vocabulary/qualified-as'

const length = (what: string) => z.number({ invalid_type_error: `${what} must be a number` }).finite().positive(`${what} must be more than 0`).max(10_000, `${what} is too large`)
// Form inputs send '' for an empty number box; it means "not given".
const emptyIsNull = (v: unknown) => (v === '' ? null : v)
const optionalLength = (what: string) => z.preprocess(emptyIsNull, length(what).nullish()).transform(v => v ?? null)

export const bendTypes = ['face', 'root', 'side'] as const
export const testPositions = ['1G', '2G', '3G', '4G', '5G', '6G', '1F', '2F', '3F', '4F', '5F'] as const
export const radiographicKinds = ['crack', 'incomplete-fusion', 'incomplete-penetration', 'slag', 'rounded'] as const

export const bendSpecimenSchema = z.object({
  type: z.enum(bendTypes, { errorMap: () => ({ message: 'Face, root or side' }) }),
  // Largest open discontinuity on the convex surface, in the record's unit (0 when none)
  largestIndication: z.number({ invalid_type_error: 'Enter a size (0 when none)' }).finite().min(0, 'Cannot be negative').max(1000, 'Too large'),
  atCorner: z.boolean().default(false),
})
export type BendSpecimenInput = z.infer<typeof bendSpecimenSchema>

export const radiographyRecordSchema = z.object({
  indications: z.array(z.object({
    kind: z.enum(radiographicKinds, { errorMap: () => ({ message: 'Pick the kind of indication' }) }),
    length: z.number({ invalid_type_error: 'Enter a length' }).finite().min(0, 'Cannot be negative').max(1000, 'Too large'),
  })).max(50, 'At most 50 indications'),
  reportNumber: z.string().trim().max(60).nullish().transform(v => v || null),
})

/** Macro-etch or fracture result of a fillet test: judged by the inspector (QW-184, QW-182). */
export const macroRecordSchema = z.object({
  accepted: z.boolean({ required_error: 'Say whether the macro or fracture test was accepted' }),
  notes: z.string().trim().max(500).nullish().transform(v => v || null),
})

/** One process welded on the coupon with its own deposit (ASME IX QW-452.1(b): each process qualifies its own deposit). */
export const testProcessSchema = z.object({
  process: processSchema,
  transfer: z.preprocess(emptyIsNull, z.enum(['short-circuit', 'globular', 'spray', 'pulse']).nullish()).transform(v => v ?? null),
  depositThickness: optionalLength('Deposit thickness'),
  /** The F-No. of this process's filler when it differs from the coupon's (QW-433) */
  fNumber: z.string().trim().regex(/^\d{1,2}$/, 'A whole number such as 4').nullish().or(z.literal('')).transform(v => v || null),
})
export type TestProcess = z.infer<typeof testProcessSchema>

const variables = {
  welderId: z.number({ required_error: 'Pick the welder' }).int().positive('Pick the welder'),
  procedureId: z.preprocess(emptyIsNull, z.number().int().positive().nullish()).transform(v => v ?? null),
  testDate: calendarDay,
  code: codeSchema,
  edition: z.string({ required_error: 'Edition is required' }).trim().min(1, 'Edition is required').max(10),
  unit: unitSchema,
  // One coupon, one or more processes in welding order (root first)
  processes: z.array(testProcessSchema, { required_error: 'Add the process welded' }).min(1, 'Add the process welded').max(3, 'At most 3 processes on one coupon'),
  /** The PQR coupon this test records, when the welder of a PQR is qualified by it (QW-301.2) */
  pqrId: z.preprocess(emptyIsNull, z.number().int().positive().nullish()).transform(v => v ?? null),
  form: z.enum(['plate', 'pipe'], { errorMap: () => ({ message: 'Plate or pipe' }) }),
  weld: z.enum(['groove', 'fillet'], { errorMap: () => ({ message: 'Groove or fillet' }) }),
  couponThickness: optionalLength('Thickness'),
  layers: z.preprocess(emptyIsNull, z.number({ invalid_type_error: 'Layers must be a number' }).int('A whole number').positive('At least 1').max(200).nullish()).transform(v => v ?? null),
  outsideDiameter: optionalLength('Outside diameter'),
  pNumber: z.string().trim().max(8).nullish().transform(v => v || null),
  fNumber: z.string().trim().regex(/^\d{1,2}$/, 'A whole number such as 4').nullish().or(z.literal('')).transform(v => v || null),
  backing: z.boolean().default(true),
  positions: z.array(z.enum(testPositions), { required_error: 'Pick the test position' }).min(1, 'Pick the test position').max(4),
  progression: z.preprocess(emptyIsNull, z.enum(['uphill', 'downhill']).nullish()).transform(v => v ?? null),
  // null: not examined yet; visual examination is the gate before any mechanical test
  visualAccepted: z.boolean().nullish().transform(v => v ?? null),
  visualNotes: z.string().trim().max(1000, 'At most 1000 characters').nullish().transform(v => v || null),
  examination: z.enum(['bend', 'radiography', 'macro-fracture']),
  bends: z.array(bendSpecimenSchema).max(8, 'At most 8 specimens').default([]),
  radiography: radiographyRecordSchema.nullish().transform(v => v ?? null),
  macro: macroRecordSchema.nullish().transform(v => v ?? null),
  // A welder (manual, semi-automatic) or a welding operator (machine, automatic) with their own variables (QW-360)
  // (optional: a record without them is a welder's test)
  qualifiedAs: z.enum(qualifiedAsValues, { errorMap: () => ({ message: 'Welder or welding operator' }) }).optional(),
  operator: operatorVariablesSchema.nullish(),
}

type Draft = { qualifiedAs?: string, operator?: unknown, code: z.infer<typeof codeSchema>, edition?: string, unit?: 'in' | 'mm', processes?: { process: string, transfer: string | null, depositThickness: number | null }[], form?: string, outsideDiameter?: number | null, couponThickness?: number | null, weld?: string, positions?: string[], visualAccepted?: boolean | null, bends?: unknown[], radiography?: unknown, macro?: unknown, examination?: string }

/** Cross-field rules a record must keep whatever the code. */
function consistent(v: Draft, ctx: z.RefinementCtx) {
  const issue = (path: string, message: string) => ctx.addIssue({ code: z.ZodIssueCode.custom, path: [path], message })
  if (v.edition !== undefined && !getRuleSet(v.code).editions.includes(v.edition)) {
    issue('edition', `Editions carried for this code: ${getRuleSet(v.code).editions.join(', ')}`)
  }
  if (v.unit !== undefined && !getRuleSet(v.code).units.includes(v.unit)) issue('unit', `This code prints its ranges in ${getRuleSet(v.code).units.join(' and ')}`)
  if (v.qualifiedAs === 'welding-operator' && !v.operator) issue('operator', 'Record the welding operator\'s variables (QW-361)')
  if (v.qualifiedAs !== 'welding-operator' && v.operator) issue('operator', 'Operator variables belong to a welding operator\'s test')
  if (v.form === 'pipe' && !v.outsideDiameter) issue('outsideDiameter', 'A pipe coupon needs its outside diameter')
  if (v.weld === 'groove' && v.positions?.some(p => p.endsWith('F'))) issue('positions', 'A groove test is welded in 1G to 6G')
  if (v.weld === 'fillet' && v.positions?.some(p => p.endsWith('G'))) issue('positions', 'A fillet test is welded in 1F to 5F')
  const results = (v.bends?.length ?? 0) > 0 || v.radiography || v.macro
  if (results && v.visualAccepted !== true) {
    issue('visualAccepted', 'Record an accepted visual examination before bend, radiographic or macro results')
  }
  if ((v.bends?.length ?? 0) > 0 && v.examination !== 'bend') issue('bends', 'Bend specimens belong to a bend-tested coupon')
  if (v.radiography && v.examination !== 'radiography') issue('radiography', 'Radiography belongs to a radiographed coupon')
  if (v.macro && v.examination !== 'macro-fracture') issue('macro', 'A macro or fracture result belongs to a fillet coupon')
  if (v.examination === 'radiography' && v.processes?.some(p => p.process === 'GMAW' && p.transfer === 'short-circuit')) {
    issue('examination', 'Short-circuit GMAW is qualified by bend tests, not radiography (ASME IX QW-304)')
  }
  const list = v.processes ?? []
  list.forEach((p, i) => {
    if (p.transfer && p.process !== 'GMAW' && p.process !== 'FCAW') ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['processes', i, 'transfer'], message: 'A transfer mode is stated for GMAW and FCAW only' })
    if (list.findIndex(q => q.process === p.process && q.transfer === p.transfer) !== i) ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['processes', i, 'process'], message: 'Each process once on a coupon' })
  })
  if (list.length > 1 && list.some(p => p.depositThickness === null)) {
    list.forEach((p, i) => p.depositThickness === null && ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['processes', i, 'depositThickness'], message: 'A combination coupon needs each process\'s deposit thickness' }))
  }
  const total = list.reduce((sum, p) => sum + (p.depositThickness ?? 0), 0)
  if (v.couponThickness && total > v.couponThickness * (1 + 1e-9)) issue('processes', 'The deposits together cannot be thicker than the coupon')
  if (v.examination === 'radiography' && v.radiography && !v.couponThickness) issue('couponThickness', 'Radiographic acceptance needs the coupon thickness')
}

/**
 * The coupon's processes as the rules' single-process variables: the first process (its transfer) and the whole deposit,
 * the sum of the processes' deposits (ASME IX QW-452.1(b): the combination qualifies the sum); null when one is not given.
 */
export function combinedProcess(processes: readonly TestProcess[]): { process: string, transfer: string | null, depositThickness: number | null } {
  const first = processes[0]
  if (!first) return { process: '', transfer: null, depositThickness: null }
  const total = processes.every(p => p.depositThickness !== null)
    ? Math.round(processes.reduce((sum, p) => sum + p.depositThickness!, 0) * 1e9) / 1e9
    : null
  return { process: first.process, transfer: first.transfer, depositThickness: processes.length === 1 ? first.depositThickness : total }
}

export const welderTestSchema = z.object(variables).superRefine(consistent)
export type WelderTestInput = z.infer<typeof welderTestSchema>

/** An edit sends the whole record back with the version it was read at (409 when stale). */
export const welderTestPatchSchema = z.object({ ...variables, version: z.number({ required_error: 'version is required' }).int().positive() })
  .superRefine(consistent)
export type WelderTestPatch = z.infer<typeof welderTestPatchSchema>

export const certifySchema = z.object({
  version: z.number({ required_error: 'version is required' }).int().positive(),
})
