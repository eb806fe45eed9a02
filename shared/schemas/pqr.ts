import { z } from 'zod'
import { isIsoProcedureCode } from '../vocabulary/records'
import { isoProcedureRefine, procedureProcessSchema, wpqrPieceSchema } from './procedure-iso'
import {
  procedureCodeIdSchema, daySchema, editionSchema, optionalNumber, pickedId, optionalText, requiredNumber, requiredText, transferIdSchema,
  unitIdSchema, versionSchema,
} from './fields'

/** A PQR: the coupon as welded (supervisor) and its test results (inspector). Lengths in the record's unit. */

export { pqrStatuses } from '../vocabulary/records'
export const breakLocations = ['base metal', 'weld metal', 'heat-affected zone', 'fusion line'] as const
export const pqrBendTypes = ['face', 'root', 'side', 'longitudinal-face', 'longitudinal-root'] as const

/** The conditions of the whole coupon as welded (position, progression, temperatures, PWHT). */
export const pqrActualsSchema = z.object({
  position: optionalText('Test position', 10),
  progression: z.enum(['uphill', 'downhill'], { errorMap: () => ({ message: 'Progression is uphill or downhill' }) }).nullable().default(null),
  preheat: optionalNumber('Preheat', { min: -100, max: 2000 }),
  interpass: optionalNumber('Interpass', { max: 2000 }),
  pwht: optionalText('PWHT', 120),
  pwhtTemperature: optionalNumber('PWHT temperature', { max: 2000 }),
  pwhtHours: optionalNumber('PWHT time', { positive: true, max: 1000 }),
  /** ISO 15614-1 only: the WPQR test piece (positions, plate/pipe, runs, parent group, filler); absent on ASME/AWS PQRs. */
  iso: wpqrPieceSchema.nullable(),
}).partial()
export type PqrActuals = z.infer<typeof pqrActualsSchema>

/** One layer of the coupon as welded: its process, filler, the values actually used and the deposit of the process. */
export const pqrLayerSchema = z.object({
  name: requiredText('the layer (root, fill, cap...)', 40),
  process: procedureProcessSchema,
  transfer: transferIdSchema.nullable().default(null),
  fillerMetalId: pickedId('the filler metal').nullable().default(null),
  fillerSize: optionalNumber('Filler size', { positive: true, max: 100 }),
  depositThickness: optionalNumber('Deposit thickness', { positive: true }),
  current: z.enum(['DCEP', 'DCEN', 'AC'], { errorMap: () => ({ message: 'Pick DCEP, DCEN or AC' }) }).nullable().default(null),
  amps: optionalNumber('Current', { positive: true }),
  volts: optionalNumber('Voltage', { positive: true }),
  wireFeed: optionalNumber('Wire feed speed', { positive: true }),
  travelSpeed: optionalNumber('Travel speed', { positive: true }),
  heatInput: optionalNumber('Heat input', { positive: true }),
  gas: optionalText('Gas', 80),
  gasFlow: optionalNumber('Gas flow', { positive: true }),
  ctwd: optionalNumber('Contact-tip-to-work distance', { positive: true }),
  tungsten: optionalText('Tungsten type and size', 40),
  backingGas: optionalText('Backing gas', 80),
  flux: optionalText('Flux and electrode–flux class', 80),
}).superRefine((v, ctx) => {
  if (v.process === 'GMAW' && !v.transfer) ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['transfer'], message: 'Pick the GMAW transfer mode' })
  if (v.transfer && !['GMAW', 'FCAW', '131', '135', '136', '138'].includes(v.process)) ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['transfer'], message: 'A transfer mode is stated for GMAW and FCAW (ISO 131, 135, 136, 138) only' })
  if (v.fillerMetalId === null && !['GTAW', 'PAW', '141', '142', '143', '145', '15'].includes(v.process)) ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['fillerMetalId'], message: 'Pick the filler metal' })
})
export type PqrLayer = z.infer<typeof pqrLayerSchema>

export const pqrDraftSchema = z.object({
  number: requiredText('the PQR number', 40).regex(/^[A-Za-z0-9][A-Za-z0-9 ._/-]*$/, 'Letters, digits, space, . _ / - only'),
  testDate: daySchema,
  code: procedureCodeIdSchema,
  edition: editionSchema,
  unit: unitIdSchema,
  couponThickness: requiredNumber('the coupon thickness', { positive: true }),
  baseMetalId: pickedId('the base metal'),
  /** Base metal B of a dissimilar joint; null when both sides are base metal A */
  baseMetalBId: pickedId('base metal B').nullable().default(null),
  /** The welder who welded the coupon (QW-301.2) */
  welderId: pickedId('the welder').nullable().default(null),
  toughnessRequired: z.boolean().default(false),
  actuals: pqrActualsSchema.default({}),
  layers: z.array(pqrLayerSchema).min(1, 'Add at least one layer').max(6, 'At most 6 layers'),
  labReportNumber: optionalText('Lab report number', 60),
}).superRefine((v, ctx) => {
  const deposits = v.layers.map(l => l.depositThickness)
  if (deposits.every(d => d !== null) && deposits.reduce((a, b) => a! + b!, 0)! > v.couponThickness * (1 + 1e-9)) {
    ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['layers'], message: 'The deposits together cannot be thicker than the coupon' })
  }
  const iso = isIsoProcedureCode(v.code)
  isoProcedureRefine(iso, v.layers.map(l => l.process), v.actuals.iso?.positions ?? null, ctx, ['layers', 'process'])
  if (v.code === 'iso-15614-1' && v.unit !== 'mm') ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['unit'], message: 'ISO 15614-1 records are kept in millimetres and °C' })
  if (iso && !v.actuals.iso) ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['actuals', 'iso', 'positions'], message: 'ISO 15614-1: give the test piece (positions welded, plate or pipe)' })
  if (iso && v.actuals.iso && !v.actuals.iso.positions.length) ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['actuals', 'iso', 'positions'], message: 'Pick the ISO 6947 position(s) the test piece was welded in' })
  if (!iso && v.actuals.iso) ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['actuals', 'iso', 'positions'], message: 'The ISO test piece belongs to ISO 15614-1 records only' })
  v.layers.forEach((l, i) => {
    if (l.depositThickness !== null && l.depositThickness > v.couponThickness) {
      ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['layers', i, 'depositThickness'], message: 'The deposit cannot be thicker than the coupon' })
    }
  })
})
export type PqrDraft = z.infer<typeof pqrDraftSchema>
export type PqrDraftInput = z.input<typeof pqrDraftSchema>

/** A blank layer of the coupon. */
export function blankPqrLayer(process: PqrLayer['process'] = 'SMAW', name = 'all passes'): PqrLayer {
  return {
    name, process, transfer: process === 'GMAW' ? 'short-circuit' : null, fillerMetalId: null, fillerSize: null, depositThickness: null,
    current: null, amps: null, volts: null, wireFeed: null, travelSpeed: null, heatInput: null, gas: null, gasFlow: null, ctwd: null,
    tungsten: null, backingGas: null, flux: null,
  }
}

/** The total deposit of a coupon: the sum of its processes' deposits, or null when one is not given. */
export function totalDeposit(layers: Pick<PqrLayer, 'depositThickness'>[]): number | null {
  if (!layers.length || layers.some(l => l.depositThickness === null)) return null
  return Math.round(layers.reduce((sum, l) => sum + l.depositThickness!, 0) * 1e9) / 1e9
}

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
