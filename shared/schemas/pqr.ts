import { z } from 'zod'
import { processSchema } from './list'
import {
  codeIdSchema, daySchema, editionSchema, optionalNumber, pickedId, optionalText, requiredNumber, requiredText, transferIdSchema,
  unitIdSchema, versionSchema,
} from './fields'

/** A PQR: the coupon as welded (supervisor) and its test results (inspector). Lengths in the record's unit. */

export { pqrStatuses } from '../vocabulary/records'
export const breakLocations = ['base metal', 'weld metal', 'heat-affected zone', 'fusion line'] as const
export const pqrBendTypes = ['face', 'root', 'side', 'longitudinal-face', 'longitudinal-root'] as const

export const pqrActualsSchema = z.object({
  current: z.enum(['DCEP', 'DCEN', 'AC'], { errorMap: () => ({ message: 'Pick DCEP, DCEN or AC' }) }).nullable().default(null),
  amps: optionalNumber('Current', { positive: true }),
  volts: optionalNumber('Voltage', { positive: true }),
  wireFeed: optionalNumber('Wire feed speed', { positive: true }),
  travelSpeed: optionalNumber('Travel speed', { positive: true }),
  heatInput: optionalNumber('Heat input', { positive: true }),
  gas: optionalText('Gas', 80),
  gasFlow: optionalNumber('Gas flow', { positive: true }),
  ctwd: optionalNumber('Contact-tip-to-work distance', { positive: true }),
  position: optionalText('Test position', 10),
  progression: z.enum(['uphill', 'downhill'], { errorMap: () => ({ message: 'Progression is uphill or downhill' }) }).nullable().default(null),
  preheat: optionalNumber('Preheat', { min: -100, max: 2000 }),
  interpass: optionalNumber('Interpass', { max: 2000 }),
  pwht: optionalText('PWHT', 120),
  fillerSize: optionalText('Filler size', 40),
}).partial()
export type PqrActuals = z.infer<typeof pqrActualsSchema>

export const pqrDraftSchema = z.object({
  number: requiredText('the PQR number', 40).regex(/^[A-Za-z0-9][A-Za-z0-9 ._/-]*$/, 'Letters, digits, space, . _ / - only'),
  testDate: daySchema,
  code: codeIdSchema,
  edition: editionSchema,
  unit: unitIdSchema,
  process: processSchema,
  transfer: transferIdSchema.nullable().default(null),
  couponThickness: requiredNumber('the coupon thickness', { positive: true }),
  depositThickness: optionalNumber('Deposit thickness', { positive: true }),
  baseMetalId: pickedId('the base metal'),
  fillerMetalId: pickedId('the filler metal'),
  toughnessRequired: z.boolean().default(false),
  actuals: pqrActualsSchema.default({}),
  labReportNumber: optionalText('Lab report number', 60),
}).superRefine((v, ctx) => {
  if (v.depositThickness !== null && v.depositThickness > v.couponThickness) {
    ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['depositThickness'], message: 'The deposit cannot be thicker than the coupon' })
  }
  if (v.process === 'GMAW' && !v.transfer) ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['transfer'], message: 'Pick the GMAW transfer mode' })
})
export type PqrDraft = z.infer<typeof pqrDraftSchema>
export type PqrDraftInput = z.input<typeof pqrDraftSchema>

export const pqrPatchSchema = z.object({ version: versionSchema, pqr: pqrDraftSchema }).strict()

export const tensileSpecimenSchema = z.object({
  label: requiredText('a specimen label', 20),
  width: requiredNumber('the width', { positive: true }),
  thickness: requiredNumber('the thickness', { positive: true }),
  load: requiredNumber('the ultimate load', { positive: true }),
  breakLocation: z.enum(breakLocations, { errorMap: () => ({ message: 'Pick where it broke' }) }),
})

export const bendSpecimenSchema = z.object({
  type: z.enum(pqrBendTypes, { errorMap: () => ({ message: 'Pick the bend type' }) }),
  largestIndication: requiredNumber('the largest open discontinuity (0 when none)'),
  atCorner: z.boolean().default(false),
})

export const toughnessSchema = z.object({
  testTemperature: requiredNumber('the test temperature', { min: -400, max: 500 }),
  specimens: z.array(z.object({
    location: requiredText('the notch location', 40),
    energy: requiredNumber('the absorbed energy', { min: 0 }),
  })).min(1, 'Add at least one impact specimen').max(12),
})

/** PUT /api/pqrs/:id/results: the inspector's results, replacing what was recorded before certification. */
export const pqrResultsSchema = z.object({
  version: versionSchema,
  tensile: z.array(tensileSpecimenSchema).max(8, 'At most 8 tensile specimens'),
  bends: z.array(bendSpecimenSchema).max(8, 'At most 8 bend specimens'),
  toughness: toughnessSchema.nullable().default(null),
  labReportNumber: optionalText('Lab report number', 60).optional(),
}).strict()
export type PqrResults = z.infer<typeof pqrResultsSchema>
export type PqrResultsInput = z.input<typeof pqrResultsSchema>

/** Pounds-force per square inch to megapascals: 1 psi = 6894.757293168361 Pa (lbf and in are defined exactly). */
export function psiToMpa(psi: number) {
  return Math.round(psi * 0.006894757293168361 * 1000) / 1000
}
