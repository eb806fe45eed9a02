import { z } from 'zod'
import { listQuerySchema, processSchema } from './list'
import {
  codeIdSchema, daySchema, editionSchema, optionalNumber, optionalText, pickedId, requiredNumber, requiredText, transferIdSchema,
  unitIdSchema, versionSchema,
} from './fields'
import { trialJointKinds } from '../vocabulary/trial-joints'
import { trialPositions } from '../vocabulary/trial-positions'
import { backPenetrationValues, trialScale } from '../vocabulary/trial-results'

/**
 * Trial runs at the machine: a series (what is welded, with what) and its beads (the settings tried and how each bead
 * came out). Lengths and speeds are in the series' unit (in: in, in/min, ft³/h; mm: mm, mm/min, L/min).
 */

export const trialSeriesSchema = z.object({
  title: requiredText('a title for the series', 120),
  unit: unitIdSchema,
  process: processSchema,
  transfer: transferIdSchema.nullable().default(null),
  wireClass: requiredText('the wire classification (e.g. ER70S-6)', 30),
  wireDiameter: requiredNumber('the wire diameter', { positive: true, max: 10 }),
  fillerMetalId: pickedId('the filler metal').nullable().default(null),
  gas: optionalText('Gas', 80),
  gasFlow: optionalNumber('Gas flow', { positive: true, max: 500 }),
  baseMetal: requiredText('the base metal (e.g. A1011 CS)', 80),
  baseMetalId: pickedId('the base metal').nullable().default(null),
  thickness: requiredNumber('the thickness', { positive: true, max: 10_000 }),
  gauge: optionalText('Gauge', 20),
  joint: z.enum(trialJointKinds, { errorMap: () => ({ message: 'Pick the joint' }) }),
  rootGap: optionalNumber('Root gap', { max: 10_000 }),
  position: z.enum(trialPositions, { errorMap: () => ({ message: 'Pick the position' }) }),
  progression: z.enum(['uphill', 'downhill'], { errorMap: () => ({ message: 'Progression is uphill or downhill' }) }).nullable().default(null),
  notes: optionalText('Notes', 1000),
}).superRefine((v, ctx) => {
  const issue = (path: string, message: string) => ctx.addIssue({ code: z.ZodIssueCode.custom, path: [path], message })
  if (v.process === 'GMAW' && !v.transfer) issue('transfer', 'Pick the GMAW transfer mode')
  if (v.transfer && v.process !== 'GMAW' && v.process !== 'FCAW') issue('transfer', 'A transfer mode is stated for GMAW and FCAW only')
  if (v.position.startsWith('3') && !v.progression) issue('progression', 'Vertical welding needs a progression, uphill or downhill')
})
export type TrialSeries = z.infer<typeof trialSeriesSchema>
export type TrialSeriesInput = z.input<typeof trialSeriesSchema>

export const trialSeriesPatchSchema = z.object({ version: versionSchema, series: trialSeriesSchema }).strict()

const scale = (what: string) => z.enum(trialScale, { errorMap: () => ({ message: `${what}: good, fair or poor` }) }).nullable().default(null)

/** One bead: the settings as set or read, and how it came out. */
export const trialBeadSchema = z.object({
  volts: requiredNumber('the voltage', { positive: true, max: 100 }),
  wireFeed: requiredNumber('the wire feed speed', { positive: true, max: 100_000 }),
  amps: optionalNumber('Current', { positive: true, max: 2000 }),
  ctwd: optionalNumber('CTWD', { positive: true, max: 1000 }),
  travelSpeed: optionalNumber('Travel speed', { positive: true, max: 100_000 }),
  beadLength: optionalNumber('Bead length', { positive: true, max: 100_000 }),
  arcTime: optionalNumber('Arc time', { positive: true, max: 3600 }),
  energy: optionalNumber('Arc energy', { positive: true, max: 100_000_000 }),
  power: optionalNumber('Arc power', { positive: true, max: 1_000_000 }),
  gasFlow: optionalNumber('Gas flow', { positive: true, max: 500 }),
  wetting: scale('Wetting'),
  spatter: scale('Spatter'),
  arcSound: scale('Arc sound'),
  porosity: z.boolean().default(false),
  undercut: z.boolean().default(false),
  meltThrough: z.boolean().default(false),
  lackOfFusion: z.boolean().default(false),
  backPenetration: z.enum(backPenetrationValues, { errorMap: () => ({ message: 'Back: full, partial or none' }) }).nullable().default(null),
  notes: optionalText('Notes', 500),
})
export type TrialBead = z.infer<typeof trialBeadSchema>
export type TrialBeadInput = z.input<typeof trialBeadSchema>

/** A row of the shop's table of starting settings. */
export const startingPointSchema = z.object({
  unit: unitIdSchema,
  process: processSchema,
  transfer: transferIdSchema.nullable().default(null),
  wireDiameter: requiredNumber('the wire diameter', { positive: true, max: 10 }),
  thickness: requiredNumber('the thickness', { positive: true, max: 10_000 }),
  gauge: optionalText('Gauge', 20),
  gas: optionalText('Gas', 80),
  volts: requiredNumber('the voltage', { positive: true, max: 100 }),
  wireFeed: requiredNumber('the wire feed speed', { positive: true, max: 100_000 }),
  amps: optionalNumber('Current', { positive: true, max: 2000 }),
  ctwd: optionalNumber('CTWD', { positive: true, max: 1000 }),
  travelSpeed: optionalNumber('Travel speed', { positive: true, max: 100_000 }),
  source: requiredText('where the row comes from (common practice, a public source, the shop\'s own trials)', 200),
})
export type StartingPoint = z.infer<typeof startingPointSchema>

export const trialSettingsSchema = z.object({ welderRecordsTrials: z.boolean({ required_error: 'Say whether welders may record trials', invalid_type_error: 'Say yes or no' }) }).strict()

export const proposePqrSchema = z.object({
  number: requiredText('the PQR number', 40).regex(/^[A-Za-z0-9][A-Za-z0-9 ._/-]*$/, 'Letters, digits, space, . _ / - only'),
  testDate: daySchema,
  code: codeIdSchema,
  edition: editionSchema,
}).strict()
export type ProposePqrInput = z.infer<typeof proposePqrSchema>

export const proposeWpsSchema = z.object({
  number: requiredText('the WPS number', 40).regex(/^[A-Za-z0-9][A-Za-z0-9 ._/-]*$/, 'Letters, digits, space, . _ / - only'),
  title: requiredText('a title', 200),
}).strict()
export type ProposeWpsInput = z.infer<typeof proposeWpsSchema>

export const beadParamsSchema = z.object({
  id: z.coerce.number().int().positive().max(2_147_483_647),
  beadId: z.coerce.number().int().positive().max(2_147_483_647),
})

/** The list of series: newest worked-on first by default. */
export const trialListQuerySchema = listQuerySchema(['updatedAt', 'title']).extend({ dir: z.enum(['asc', 'desc']).default('desc') })
export type TrialListQuery = z.infer<typeof trialListQuerySchema>
