import { z } from 'zod'
import type { procedureStatuses } from '../vocabulary/records'
import { processSchema } from './list'
import {
  codeIdSchema, editionSchema, idSchema, optionalNumber, optionalText, rangeOf, requiredText, transferIdSchema, unitIdSchema,
  versionSchema, windowOf,
} from './fields'

/**
 * A WPS as the form and the API exchange it. Lengths, speeds, gas flow and heat input are in the record's unit
 * (in: in, in/min, ft³/h, J/in, °F; mm: mm, mm/min, L/min, J/mm, °C).
 */

export const positionLetters = ['F', 'H', 'V', 'O'] as const
export const positionNames: Record<typeof positionLetters[number], string> = { F: 'flat', H: 'horizontal', V: 'vertical', O: 'overhead' }
export const currentTypes = ['DCEP', 'DCEN', 'AC'] as const
export { procedureStatuses } from '../vocabulary/records'
export type ProcedureStatus = typeof procedureStatuses[number]

const baseMetalSide = (side: string) => z.object({
  baseMetalId: idSchema.nullable().default(null),
  pNumber: requiredText(`the P-No. of base metal ${side}`, 8),
  groupNumber: z.preprocess(v => (v === '' || v === undefined ? null : typeof v === 'string' ? Number(v) : v),
    z.number({ invalid_type_error: 'Group No. must be a whole number' }).int('Group No. must be a whole number').min(1, 'Group No. starts at 1').max(99).nullable()),
})

export const procedureFillerSchema = z.object({
  fillerMetalId: idSchema.nullable().default(null),
  specification: requiredText('the filler specification (e.g. SFA-5.18)', 30),
  classification: requiredText('the classification (e.g. ER70S-6)', 30),
  fNumber: requiredText('the F-No.', 8),
  aNumber: optionalText('A-No.', 8),
  size: optionalText('Size', 40),
})

export const procedureDraftSchema = z.object({
  number: requiredText('the WPS number', 40).regex(/^[A-Za-z0-9][A-Za-z0-9 ._/-]*$/, 'Letters, digits, space, . _ / - only'),
  title: requiredText('a title', 200),
  code: codeIdSchema,
  edition: editionSchema,
  unit: unitIdSchema,
  process: processSchema,
  transfer: transferIdSchema.nullable().default(null),
  supportingPqrIds: z.array(idSchema).max(10, 'At most 10 supporting PQRs').default([]),
  baseMetals: z.object({ a: baseMetalSide('A'), b: baseMetalSide('B') }),
  thickness: z.object({ groove: rangeOf('Groove thickness'), fillet: rangeOf('Fillet thickness') }),
  depositMax: optionalNumber('Deposit thickness maximum', { positive: true }),
  diameter: rangeOf('Pipe diameter'),
  joints: z.object({
    type: requiredText('the joint type (butt, tee, lap...)', 120),
    groove: optionalText('Groove design', 300),
    grooveAngle: optionalNumber('Groove angle', { max: 180 }),
    rootOpening: rangeOf('Root opening'),
    rootFace: rangeOf('Root face'),
    backing: optionalText('Backing', 120),
  }),
  fillers: z.array(procedureFillerSchema).min(1, 'Add at least one filler metal').max(6, 'At most 6 filler metals'),
  positions: z.array(z.enum(positionLetters, { errorMap: () => ({ message: 'Positions are F, H, V or O' }) })).min(1, 'Pick at least one position'),
  progression: z.enum(['uphill', 'downhill'], { errorMap: () => ({ message: 'Progression is uphill or downhill' }) }).nullable().default(null),
  toughnessRequired: z.boolean().default(false),
  preheatMin: optionalNumber('Preheat minimum', { min: -100, max: 2000 }),
  interpassMax: optionalNumber('Interpass maximum', { max: 2000 }),
  pwht: requiredText('the PWHT (or "none")', 200),
  gas: z.object({ composition: optionalText('Gas composition', 120), flow: windowOf('Gas flow') }),
  electrical: z.object({
    current: z.enum(currentTypes, { errorMap: () => ({ message: 'Pick DCEP, DCEN or AC' }) }),
    amps: windowOf('Current'),
    volts: windowOf('Voltage'),
    wireFeed: windowOf('Wire feed speed'),
    travelSpeed: windowOf('Travel speed'),
    heatInputMax: optionalNumber('Heat input limit', { positive: true, max: 1_000_000 }),
  }),
  technique: z.object({
    bead: requiredText('stringer or weave', 120),
    ctwd: windowOf('Contact-tip-to-work distance'),
    cleaning: optionalText('Cleaning', 200),
  }),
}).superRefine((v, ctx) => {
  if (v.process !== 'GMAW' && v.transfer && v.process !== 'FCAW') {
    ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['transfer'], message: 'A transfer mode is stated for GMAW and FCAW only' })
  }
  if (v.process === 'GMAW' && !v.transfer) ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['transfer'], message: 'Pick the GMAW transfer mode' })
  if (v.thickness.groove.min === null || v.thickness.groove.max === null) {
    ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['thickness', 'groove', 'max'], message: 'Give the groove thickness range, minimum and maximum' })
  }
  if (v.positions.includes('V') && !v.progression) {
    ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['progression'], message: 'Vertical welding needs a progression, uphill or downhill' })
  }
})
export type ProcedureDraft = z.infer<typeof procedureDraftSchema>
export type ProcedureDraftInput = z.input<typeof procedureDraftSchema>

/** PATCH: the whole draft as edited plus the version it was loaded at (a stale version is refused with 409). */
export const procedurePatchSchema = z.object({ version: versionSchema, draft: procedureDraftSchema }).strict()
export type ProcedurePatch = z.infer<typeof procedurePatchSchema>

export const procedureListQueryKeys = ['number', 'title', 'process', 'status', 'updatedAt'] as const

/** The variables kept in the `variables` column (everything without its own searchable column). */
export type ProcedureVariables = Omit<ProcedureDraft, 'number' | 'title' | 'code' | 'edition' | 'unit' | 'process' | 'transfer' | 'supportingPqrIds'>

const emptyRange = { min: null, max: null }
const emptyWindow = { min: null, max: null, setPoint: null }

/** A blank draft for the form. */
export function blankProcedureDraft(): ProcedureDraft {
  return {
    number: '', title: '', code: 'asme-ix', edition: '2023', unit: 'in', process: 'GMAW', transfer: 'short-circuit', supportingPqrIds: [],
    baseMetals: { a: { baseMetalId: null, pNumber: '1', groupNumber: null }, b: { baseMetalId: null, pNumber: '1', groupNumber: null } },
    thickness: { groove: { ...emptyRange }, fillet: { ...emptyRange } }, depositMax: null, diameter: { ...emptyRange },
    joints: { type: '', groove: null, grooveAngle: null, rootOpening: { ...emptyRange }, rootFace: { ...emptyRange }, backing: null },
    fillers: [{ fillerMetalId: null, specification: '', classification: '', fNumber: '', aNumber: null, size: null }],
    positions: ['F', 'H'], progression: null, toughnessRequired: false, preheatMin: null, interpassMax: null, pwht: 'none',
    gas: { composition: null, flow: { ...emptyWindow } },
    electrical: { current: 'DCEP', amps: { ...emptyWindow }, volts: { ...emptyWindow }, wireFeed: { ...emptyWindow }, travelSpeed: { ...emptyWindow }, heatInputMax: null },
    technique: { bead: 'stringer', ctwd: { ...emptyWindow }, cleaning: null },
  }
}

/** POST approve: the version being signed; for a code whose support rules this program does not carry, how the ranges were checked. */
export const approveBodySchema = z.object({
  version: versionSchema,
  handCheck: optionalText('How the ranges were checked', 500).optional(),
}).strict()
