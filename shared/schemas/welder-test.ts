import { z } from 'zod'
import { versionSchema } from './fields'
import { codeSchema, unitSchema } from '../rules/requests'
import { getRuleSet } from '../rules'
import { processIds } from '../vocabulary/records'
import { isoButtDetailIds, isoButtTestPositions, isoFilletTestPositions, isoFillerTypeIds, isoLayeringIds, isoPositions, isoProcessIds, isoRevalidationRouteIds, isoTestMethodIds, isoTransferProcesses, isIsoWelderCode } from '../vocabulary/iso'
import { calendarDay } from './continuity-entry'
import { operatorVariablesSchema } from './operator'
import { qualifiedAsValues } from '../vocabulary/qualified-as'

const length = (what: string) => z.number({ invalid_type_error: `${what} must be a number` }).finite().positive(`${what} must be more than 0`).max(10_000, `${what} is too large`)
// Form inputs send '' for an empty number box; it means "not given".
const emptyIsNull = (v: unknown) => (v === '' ? null : v)
const optionalLength = (what: string) => z.preprocess(emptyIsNull, length(what).nullish()).transform(v => v ?? null)

export const bendTypes = ['face', 'root', 'side'] as const
export const testPositions = ['1G', '2G', '3G', '4G', '5G', '6G', '6GR', '1F', '2F', '3F', '4F', '5F'] as const
/** AWS D1.3 joint types a welder is tested on (D1.3 4.7 in 2008, clause 6 in 2018): each its own qualification. */
export const d13JointTypes = ['square-groove', 'flare-groove', 'fillet', 'plug', 'arc-spot', 'arc-seam'] as const
/** AWS D1.3 covers sheet steel of 3/16 in (4.8 mm) and less; thicker work is welded to AWS D1.1. */
const d13ScopeMax = { in: 0.1875, mm: 4.8 } as const

/** ASME/AWS process names, or ISO 4063 numbers when the code is ISO 9606-1 (checked per code below). */
const testProcessIds = [...processIds, ...isoProcessIds] as const
const anyTestPosition = [...testPositions, ...isoPositions] as const
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
  process: z.enum(testProcessIds, { errorMap: () => ({ message: 'Pick the process' }) }),
  transfer: z.preprocess(emptyIsNull, z.enum(['short-circuit', 'globular', 'spray', 'pulse']).nullish()).transform(v => v ?? null),
  depositThickness: optionalLength('Deposit thickness'),
  /** The F-No. of this process's filler when it differs from the coupon's (QW-433) */
  fNumber: z.string().trim().regex(/^\d{1,2}$/, 'A whole number such as 4').nullish().or(z.literal('')).transform(v => v || null),
})
export type TestProcess = z.infer<typeof testProcessSchema>

/**
 * What an ISO 9606-1 test records beyond the coupon (clauses 5.6, 5.9, 6, 9.3 and 10): filler type, weld details,
 * the examiner or examining body, the methods of test, the welder's identification and the revalidation route.
 */
export const isoTestSchema = z.object({
  fillerType: z.enum(isoFillerTypeIds as [string, ...string[]], { errorMap: () => ({ message: 'Pick the filler type (ISO 9606-1, 5.6)' }) }),
  details: z.enum([...isoButtDetailIds, ...isoLayeringIds], { errorMap: () => ({ message: 'Pick the weld details (ss nb, ss mb, bs; sl or ml for a fillet)' }) }),
  gouging: z.preprocess(emptyIsNull, z.enum(['gg', 'ng']).nullish()).transform(v => v ?? null),
  examiner: z.string({ required_error: 'Name the examiner or examining body' }).trim().min(1, 'Name the examiner or examining body').max(120),
  examiningBody: z.string().trim().max(120).nullish().transform(v => v || null),
  testMethods: z.array(z.enum(isoTestMethodIds), { required_error: 'Pick the methods of test' }).min(1, 'Pick the methods of test').max(6),
  welderIdentification: z.string().trim().max(120).nullish().transform(v => v || null),
  route: z.enum(isoRevalidationRouteIds, { errorMap: () => ({ message: 'Pick the revalidation route of 9.3 (a, b or c)' }) }),
})
export type IsoTestInput = z.infer<typeof isoTestSchema>

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
  positions: z.array(z.enum(anyTestPosition), { required_error: 'Pick the test position' }).min(1, 'Pick the test position').max(4),
  jointType: z.preprocess(emptyIsNull, z.enum(d13JointTypes, { errorMap: () => ({ message: 'Pick the D1.3 joint type' }) }).nullish()).transform(v => v ?? null),
  progression: z.preprocess(emptyIsNull, z.enum(['uphill', 'downhill']).nullish()).transform(v => v ?? null),
  // null: not examined yet; visual examination is the gate before any mechanical test
  visualAccepted: z.boolean().nullish().transform(v => v ?? null),
  visualNotes: z.string().trim().max(1000, 'At most 1000 characters').nullish().transform(v => v || null),
  examination: z.enum(['bend', 'radiography', 'macro-fracture']),
  bends: z.array(bendSpecimenSchema).max(8, 'At most 8 specimens').default([]),
  radiography: radiographyRecordSchema.nullish().transform(v => v ?? null),
  macro: macroRecordSchema.nullish().transform(v => v ?? null),
  /** ISO 9606-1 only: null for the other codes */
  iso: z.preprocess(v => (v && typeof v === 'object' && Object.values(v).every(x => x === undefined) ? null : v), isoTestSchema.nullish()).transform(v => v ?? null),
  // A welder (manual, semi-automatic) or a welding operator (machine, automatic) with their own variables (QW-360)
  // (optional: a record without them is a welder's test)
  qualifiedAs: z.enum(qualifiedAsValues, { errorMap: () => ({ message: 'Welder or welding operator' }) }).optional(),
  operator: operatorVariablesSchema.nullish(),
}

type Draft = { qualifiedAs?: string, operator?: unknown, code: z.infer<typeof codeSchema>, jointType?: string | null, iso?: { details?: string, gouging?: string | null } | null, fNumber?: string | null, edition?: string, unit?: 'in' | 'mm', processes?: { process: string, transfer: string | null, depositThickness: number | null }[], form?: string, outsideDiameter?: number | null, couponThickness?: number | null, weld?: string, positions?: string[], visualAccepted?: boolean | null, bends?: unknown[], radiography?: unknown, macro?: unknown, examination?: string }

/** AWS D1.3: a joint type that fits the weld, sheet only, and the scope check that sends thicker work to D1.1. */
function d13Consistent(v: Draft, issue: (path: string, message: string) => void) {
  if (v.code !== 'aws-d1.3') {
    if (v.jointType) issue('jointType', 'A joint type is recorded for AWS D1.3 tests only')
    return
  }
  const groove = v.jointType === 'square-groove' || v.jointType === 'flare-groove'
  if (v.weld === 'groove' && !groove) issue('jointType', 'A D1.3 groove test is a square-groove or flare-groove joint')
  if (v.weld === 'fillet' && v.jointType && groove) issue('jointType', 'A square or flare groove is a groove test, not a fillet test')
  if (v.form === 'pipe') issue('form', 'AWS D1.3 qualifies welders on sheet: record the coupon as plate')
  const max = d13ScopeMax[v.unit ?? 'in']
  if (v.couponThickness && v.couponThickness > max) {
    issue('couponThickness', `Over ${v.unit === 'mm' ? '4.8 mm' : '3/16 in'} is outside AWS D1.3 (sheet steel): record this test under AWS D1.1`)
  }
}

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
  d13Consistent(v, issue)
  const iso = isIsoWelderCode(v.code)
  if (iso) isoConsistent(v, ctx)
  else {
    if (v.iso) issue('iso', 'ISO 9606-1 details belong to an ISO 9606-1 test')
    if (v.positions?.some(p => !(testPositions as readonly string[]).includes(p))) issue('positions', 'Positions 1G to 6G and 1F to 5F (ISO 6947 positions are for ISO 9606-1 tests)')
    else if (v.weld === 'groove' && v.positions?.some(p => p.endsWith('F'))) issue('positions', 'A groove test is welded in 1G to 6G')
    else if (v.weld === 'fillet' && v.positions?.some(p => p.includes('G'))) issue('positions', 'A fillet test is welded in 1F to 5F')
    v.processes?.forEach((p, i) => !(processIds as readonly string[]).includes(p.process) && ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['processes', i, 'process'], message: 'ISO 4063 numbers are for ISO 9606-1 tests: pick the process by name' }))
  }
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
    if (p.transfer && p.process !== 'GMAW' && p.process !== 'FCAW' && !(isoTransferProcesses as readonly string[]).includes(p.process)) ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['processes', i, 'transfer'], message: 'A transfer mode is stated for GMAW and FCAW (ISO 131, 135, 136, 138) only' })
    if (list.findIndex(q => q.process === p.process && q.transfer === p.transfer) !== i) ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['processes', i, 'process'], message: 'Each process once on a coupon' })
  })
  if (list.length > 1 && list.some(p => p.depositThickness === null)) {
    list.forEach((p, i) => p.depositThickness === null && ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['processes', i, 'depositThickness'], message: 'A combination coupon needs each process\'s deposit thickness' }))
  }
  const total = list.reduce((sum, p) => sum + (p.depositThickness ?? 0), 0)
  if (v.couponThickness && total > v.couponThickness * (1 + 1e-9)) issue('processes', 'The deposits together cannot be thicker than the coupon')
  if (v.examination === 'radiography' && v.radiography && !v.couponThickness) issue('couponThickness', 'Radiographic acceptance needs the coupon thickness')
}

/** ISO 9606-1 tests: ISO 4063 processes, ISO 6947 positions of the weld type, the details of the weld type, FM1–FM6. */
function isoConsistent(v: Draft, ctx: z.RefinementCtx) {
  const issue = (path: (string | number)[], message: string) => ctx.addIssue({ code: z.ZodIssueCode.custom, path, message })
  v.processes?.forEach((p, i) => !(isoProcessIds as readonly string[]).includes(p.process) && issue(['processes', i, 'process'], 'An ISO 9606-1 test names its process by ISO 4063 number (111, 135, 141…)'))
  const allowed: readonly string[] = v.weld === 'fillet' ? isoFilletTestPositions : isoButtTestPositions
  if (v.positions?.some(p => !allowed.includes(p))) issue(['positions'], `A ${v.weld === 'fillet' ? 'fillet' : 'butt'} test is welded in ${allowed.join(', ')} (ISO 6947; ISO 9606-1 Tables ${v.weld === 'fillet' ? '10' : '9'})`)
  if (v.unit !== undefined && v.unit !== 'mm') issue(['unit'], 'ISO 9606-1 records are in millimetres')
  if (v.fNumber && !/^[1-6]$/.test(v.fNumber)) issue(['fNumber'], 'Filler group FM1 to FM6 (ISO 9606-1, 5.5)')
  if (!v.iso) {
    issue(['iso'], 'An ISO 9606-1 test records its filler type, weld details, examiner, methods of test and 9.3 route')
    return
  }
  const details: readonly string[] = v.weld === 'fillet' ? isoLayeringIds : isoButtDetailIds
  if (v.iso.details && !details.includes(v.iso.details)) issue(['iso', 'details'], v.weld === 'fillet' ? 'A fillet weld is sl (single layer) or ml (multi-layer)' : 'A butt weld is ss nb, ss mb or bs')
  if (v.iso.gouging && v.iso.details !== 'bs') issue(['iso', 'gouging'], 'Back gouging is stated for a weld from both sides (bs) only')
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
export const welderTestPatchSchema = z.object({ ...variables, version: versionSchema })
  .superRefine(consistent)
export type WelderTestPatch = z.infer<typeof welderTestPatchSchema>

export const certifySchema = z.object({
  version: z.number({ required_error: 'version is required' }).int().positive(),
})
