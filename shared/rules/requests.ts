import { z } from 'zod'
import { isCalendarDay } from '../schemas/fields'
import type { ContinuityInput } from './continuity-lapse'
import type { GaugeInput } from './gauge'
import type { HeatInputInput } from './heat-input'
import type { BendInput, CoversInput, ProcedureRangesInput, RadiographyInput, SpecimenSetInput, ToughnessInput, WelderTestInput, WpsSupportInput } from './inputs'
import type { ReadingsInput } from './readings'
import type { TensileInput } from './tensile'
import type { CheckName } from './types'

/** Request schemas of the rules engine, shared by the CLI, the server routes and the forms. */

const LARGEST = 1_000_000

const positive = (what: string) => z.number({ required_error: `${what} is required`, invalid_type_error: `${what} must be a number` })
  .finite(`${what} must be a finite number`).positive(`${what} must be more than 0`).max(LARGEST, `${what} is too large`)
const nonNegative = (what: string) => z.number({ required_error: `${what} is required`, invalid_type_error: `${what} must be a number` })
  .finite(`${what} must be a finite number`).min(0, `${what} cannot be negative`).max(LARGEST, `${what} is too large`)
const day = (what: string) => z.string({ required_error: `${what} is required`, invalid_type_error: `${what} must be a date string` })
  .regex(/^\d{4}-\d{2}-\d{2}$/, `${what} must be a date as YYYY-MM-DD`).refine(isCalendarDay, `${what} is not a calendar date`)

export const codeSchema = z.enum(['asme-ix', 'aws-d1.1', 'aws-d1.3', 'iso-9606-1'], {
  errorMap: (_issue, ctx) => ({ message: ctx.data === 'iso-15614-1'
    ? 'code: ISO 15614-1 qualifies procedures, not welders: a welder test names iso-9606-1'
    : 'code must be one of asme-ix, aws-d1.1, aws-d1.3, iso-9606-1' }),
})
export const checkNames = ['procedure-ranges', 'welder-ranges', 'covers', 'bend', 'radiography', 'continuity', 'heat-input', 'gauge', 'tensile', 'readings', 'wps-support', 'specimens', 'toughness'] as const satisfies readonly CheckName[]
export const checkSchema = z.enum(checkNames, { errorMap: () => ({ message: `check must be one of ${checkNames.join(', ')}` }) })
export const unitSchema = z.enum(['in', 'mm'], { errorMap: () => ({ message: 'unit must be "in" or "mm"' }) })
const transferSchema = z.enum(['short-circuit', 'globular', 'spray', 'pulse'], { errorMap: () => ({ message: 'transfer must be short-circuit, globular, spray or pulse' }) })
const formSchema = z.enum(['plate', 'pipe'], { errorMap: () => ({ message: 'form must be "plate" or "pipe"' }) })
const weldSchema = z.enum(['groove', 'fillet'], { errorMap: () => ({ message: 'weld must be "groove" or "fillet"' }) })
const jointSchema = z.enum(['square-groove', 'flare-groove', 'fillet', 'plug', 'arc-spot', 'arc-seam'], { errorMap: () => ({ message: 'joint must be square-groove, flare-groove, fillet, plug, arc-spot or arc-seam' }) })
const processSchema = z.string({ required_error: 'process is required', invalid_type_error: 'process must be a string' }).min(1, 'process is required')
const rangeSchema = z.object({ min: nonNegative('min').nullable(), max: nonNegative('max').nullable() }).strict()
  .refine(r => r.min === null || r.max === null || r.min <= r.max, 'min must not be above max')

export const envelopeSchema = z.object({
  code: codeSchema,
  check: checkSchema,
  unit: unitSchema,
  edition: z.string({ invalid_type_error: 'edition must be a string such as "2019"' }).optional(),
  input: z.record(z.unknown(), { required_error: 'input is required', invalid_type_error: 'input must be an object' }),
}).strict()

export const procedureRangesSchema = z.object({
  process: processSchema,
  transfer: transferSchema.optional(),
  couponThickness: positive('couponThickness'),
  depositThickness: positive('depositThickness').optional(),
  toughness: z.boolean({ invalid_type_error: 'toughness must be true or false' }).optional(),
  maxPassThickness: positive('maxPassThickness').optional(),
  /** AWS D1.1: the PQR's groove test positions (1G–6G, 6GR), for the WPS positions qualified. */
  testPositions: z.array(z.string().max(4), { invalid_type_error: 'testPositions must be a list such as ["2G"]' }).max(4).optional(),
}).strict()

const progressionSchema = z.enum(['uphill', 'downhill'], { errorMap: () => ({ message: 'progression must be "uphill" or "downhill"' }) })
const currentSchema = z.enum(['AC', 'DCEP', 'DCEN'], { errorMap: () => ({ message: 'current must be AC, DCEP or DCEN' }) })
const fillerFormSchema = z.enum(['solid', 'metal-cored', 'flux-cored', 'powder'], { errorMap: () => ({ message: 'fillerForm must be solid, metal-cored, flux-cored or powder' }) })
const sidesSchema = z.enum(['single', 'both'], { errorMap: () => ({ message: 'sides must be "single" or "both"' }) })
const layeringSchema = z.enum(['single', 'multi'], { errorMap: () => ({ message: 'layering must be "single" or "multi"' }) })
const bool = (what: string) => z.boolean({ invalid_type_error: `${what} must be true or false` })
const fNumberSchema = z.number({ invalid_type_error: 'fNumber must be a number' }).int('fNumber must be a whole number').positive('fNumber must be positive')
const layersSchema = z.number({ invalid_type_error: 'layers must be a number' }).int('layers must be a whole number').positive('layers must be at least 1')
const pNumberSchema = z.union([z.string(), z.number()], { invalid_type_error: 'pNumber must be a string such as "1" or "15E"' }).transform(String)
const temperature = (what: string) => z.number({ invalid_type_error: `${what} must be a number` }).finite(`${what} must be a finite number`).min(-500, `${what} is too low`).max(3000, `${what} is too high`)

/** The welder variables of one process (on a test coupon, or in a production joint). */
const processVariableFields = {
  transfer: transferSchema.optional(),
  fNumber: fNumberSchema.optional(),
  progression: progressionSchema.optional(),
  fillerAdded: bool('fillerAdded').optional(),
  consumableInsert: bool('consumableInsert').optional(),
  fillerForm: fillerFormSchema.optional(),
  backingGas: bool('backingGas').optional(),
  current: currentSchema.optional(),
  fillerType: z.string({ invalid_type_error: 'fillerType must be a string such as "B" or "S"' }).min(1, 'fillerType is empty').max(8, 'fillerType is too long').optional(),
}
export const processVariablesSchema = z.object({
  process: processSchema,
  depositThickness: positive('depositThickness').optional(),
  layers: layersSchema.optional(),
  ...processVariableFields,
}).strict()

export const welderTestSchema = z.object({
  process: processSchema.optional(),
  processes: z.array(processVariablesSchema, { invalid_type_error: 'processes must be a list of { process, depositThickness, ... }' })
    .min(1, 'processes needs at least one process').optional(),
  form: formSchema,
  weld: weldSchema,
  testPositions: z.array(z.string({ invalid_type_error: 'each test position must be a string' }), { required_error: 'testPositions is required', invalid_type_error: 'testPositions must be a list such as ["3G","4G"]' })
    .min(1, 'testPositions needs at least one position'),
  couponThickness: positive('couponThickness').optional(),
  depositThickness: positive('depositThickness').optional(),
  layers: layersSchema.optional(),
  outsideDiameter: positive('outsideDiameter').optional(),
  backing: bool('backing').optional(),
  pNumber: pNumberSchema.optional(),
  joint: jointSchema.optional(),
  coating: z.string({ invalid_type_error: 'coating must be a string ("none" for uncoated)' }).min(1, 'coating is empty').optional(),
  sides: sidesSchema.optional(),
  layering: layeringSchema.optional(),
  ...processVariableFields,
}).strict().superRefine((v, ctx) => {
  if (v.process === undefined && v.processes === undefined) ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['process'], message: 'process is required (or processes, for a combination coupon)' })
  if (v.process !== undefined && v.processes !== undefined) ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['processes'], message: 'give process or processes, not both' })
  if (v.processes !== undefined) {
    for (const field of ['transfer', 'depositThickness', 'layers', 'fNumber', 'progression', 'fillerAdded', 'consumableInsert', 'fillerForm', 'backingGas', 'current', 'fillerType'] as const) {
      if (v[field] !== undefined) ctx.addIssue({ code: z.ZodIssueCode.custom, path: [field], message: `with processes, give ${field} inside each process` })
    }
  }
})

export const productionSchema = z.object({
  code: codeSchema.optional(),
  form: formSchema,
  weld: weldSchema,
  position: z.string({ invalid_type_error: 'position must be a string' }).min(1, 'position is empty').optional(),
  positions: z.array(z.string({ invalid_type_error: 'each position must be a string' }).min(1, 'a position is empty'), { invalid_type_error: 'positions must be a list such as ["F","V","O"]' })
    .min(1, 'positions needs at least one position').optional(),
  outsideDiameter: positive('outsideDiameter').optional(),
  thickness: positive('thickness').optional(),
  process: processSchema.optional(),
  processes: z.array(processVariablesSchema.omit({ layers: true }), { invalid_type_error: 'processes must be a list of { process, depositThickness, ... }' })
    .min(1, 'processes needs at least one process').optional(),
  backing: bool('backing').optional(),
  pNumber: pNumberSchema.optional(),
  joint: jointSchema.optional(),
  coating: z.string({ invalid_type_error: 'coating must be a string ("none" for uncoated)' }).min(1, 'coating is empty').optional(),
  sides: sidesSchema.optional(),
  layering: layeringSchema.optional(),
  ...processVariableFields,
}).strict().superRefine((v, ctx) => {
  if (v.position === undefined && v.positions === undefined) ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['position'], message: 'position is required (or positions, for a joint welded in several)' })
  if (v.process !== undefined && v.processes !== undefined) ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['processes'], message: 'give process or processes, not both' })
})

export const coversSchema = z.object({
  test: z.union([welderTestSchema, z.array(welderTestSchema).min(1, 'test needs at least one welder test')]),
  production: productionSchema,
}).strict()

export const bendSchema = z.object({
  specimens: z.array(z.object({
    type: z.string({ required_error: 'type is required (face, root, side)' }).min(1, 'type is required'),
    indications: z.array(z.object({
      size: nonNegative('size'),
      atCorner: z.boolean().optional(),
      fromInternalDefect: z.boolean().optional(),
    }).strict()),
  }).strict(), { required_error: 'specimens is required' }).min(1, 'specimens needs at least one specimen'),
}).strict()

export const radiographySchema = z.object({
  thickness: positive('thickness'),
  indications: z.array(z.object({
    kind: z.enum(['crack', 'incomplete-fusion', 'incomplete-penetration', 'slag', 'rounded'], { errorMap: () => ({ message: 'kind must be crack, incomplete-fusion, incomplete-penetration, slag or rounded' }) }),
    length: nonNegative('length'),
  }).strict(), { required_error: 'indications is required (an empty list when none)' }),
  process: processSchema.optional(),
  transfer: transferSchema.optional(),
}).strict()

export const continuitySchema = z.object({ lastUse: day('lastUse'), on: day('on') }).strict()

export const heatInputSchema = z.object({
  volts: positive('volts').optional(),
  amps: positive('amps').optional(),
  travelSpeed: positive('travelSpeed').optional(),
  energy: positive('energy').optional(),
  power: positive('power').optional(),
  arcTime: positive('arcTime').optional(),
  weldLength: positive('weldLength').optional(),
}).strict().superRefine((v, ctx) => {
  const va = v.volts !== undefined || v.amps !== undefined || v.travelSpeed !== undefined
  const energy = v.energy !== undefined
  const power = v.power !== undefined || v.arcTime !== undefined
  const methods = [va, energy, power].filter(Boolean).length
  if (methods !== 1) {
    ctx.addIssue({ code: z.ZodIssueCode.custom, message: 'give exactly one method: volts, amps and travelSpeed; or energy and weldLength; or power, arcTime and weldLength' })
    return
  }
  const need = (field: keyof typeof v) => {
    if (v[field] === undefined) ctx.addIssue({ code: z.ZodIssueCode.custom, path: [field], message: `${field} is required for this method` })
  }
  const needed: (keyof typeof v)[] = va ? ['volts', 'amps', 'travelSpeed'] : energy ? ['weldLength'] : ['power', 'arcTime', 'weldLength']
  needed.forEach(need)
})

export const gaugeSchema = z.object({
  gauge: z.number({ required_error: 'gauge is required', invalid_type_error: 'gauge must be a number' }).int('gauge must be a whole number').positive('gauge must be positive'),
  material: z.string({ required_error: 'material is required ("steel")', invalid_type_error: 'material must be a string' }),
}).strict()

export const tensileSchema = z.object({
  width: positive('width'),
  thickness: positive('thickness'),
  load: positive('load'),
  minimumStrength: positive('minimumStrength'),
}).strict()

const readingKeys = { volts: 0, amps: 0, wireFeedSpeed: 0, travelSpeed: 0, ctwd: 0, gasFlow: 0 }
export const readingsSchema = z.object({
  window: z.object(Object.fromEntries(Object.keys(readingKeys).map(k => [k, rangeSchema.optional()])) as Record<keyof typeof readingKeys, z.ZodOptional<typeof rangeSchema>>).strict(),
  readings: z.object(Object.fromEntries(Object.keys(readingKeys).map(k => [k, nonNegative(k).optional()])) as Record<keyof typeof readingKeys, z.ZodOptional<z.ZodNumber>>).strict(),
}).strict()

const baseMetalSchema = z.object({
  pNumber: pNumberSchema,
  group: z.number({ invalid_type_error: 'group must be a number' }).int('group must be a whole number').positive('group must be positive').optional(),
}).strict()
const baseMetalsSchema = z.object({ a: baseMetalSchema, b: baseMetalSchema.optional() }, { invalid_type_error: 'baseMetals must be { a: { pNumber }, b: { pNumber } }' }).strict()
const pwhtSchema = z.object({
  condition: z.enum(['none', 'below-lower', 'above-upper', 'above-upper-then-below-lower', 'between'], { errorMap: () => ({ message: 'pwht.condition must be none, below-lower, above-upper, above-upper-then-below-lower or between' }) }),
  temperatureMin: temperature('temperatureMin').optional(),
  temperatureMax: temperature('temperatureMax').optional(),
  hours: nonNegative('hours').optional(),
}).strict().refine(p => p.temperatureMin === undefined || p.temperatureMax === undefined || p.temperatureMin <= p.temperatureMax, 'pwht.temperatureMin must not be above temperatureMax')

const layerFields = {
  process: processSchema,
  transfer: transferSchema.optional(),
  fNumber: fNumberSchema.optional(),
  aNumber: z.number({ invalid_type_error: 'aNumber must be a number' }).int('aNumber must be a whole number').positive('aNumber must be positive').optional(),
  current: currentSchema.optional(),
  progression: progressionSchema.optional(),
  fillerAdded: bool('fillerAdded').optional(),
  consumableInsert: bool('consumableInsert').optional(),
  fillerForm: fillerFormSchema.optional(),
  backingGas: bool('backingGas').optional(),
}
export const wpsLayerSchema = z.object({
  ...layerFields,
  depositMax: positive('depositMax').nullable().optional(),
  heatInputMax: positive('heatInputMax').optional(),
}).strict()
export const pqrLayerSchema = z.object({
  ...layerFields,
  depositThickness: positive('depositThickness').optional(),
  maxPassThickness: positive('maxPassThickness').optional(),
  heatInput: positive('heatInput').optional(),
}).strict()

export const toughnessSchema = z.object({
  temperature: temperature('temperature').optional(),
  specimens: z.array(z.object({
    energy: nonNegative('energy'),
    lateralExpansion: nonNegative('lateralExpansion').optional(),
    location: z.string().max(40, 'location is too long').optional(),
  }).strict(), { required_error: 'specimens is required' }).min(1, 'specimens needs at least one Charpy specimen'),
  acceptance: z.object({
    averageEnergy: nonNegative('averageEnergy').optional(),
    singleEnergy: nonNegative('singleEnergy').optional(),
    lateralExpansion: nonNegative('lateralExpansion').optional(),
    temperatureMax: temperature('temperatureMax').optional(),
  }, { required_error: 'acceptance is required (the values of the construction code)' }).strict(),
}).strict()

export const pqrSchema = procedureRangesSchema.extend({
  process: processSchema.optional(),
  id: z.string().optional(),
  heatInput: positive('heatInput').optional(),
  fNumber: z.number().int().positive().optional(),
  layers: z.array(pqrLayerSchema).min(1, 'layers needs at least one process layer').optional(),
  baseMetals: baseMetalsSchema.optional(),
  preheat: temperature('preheat').optional(),
  interpassMax: temperature('interpassMax').optional(),
  pwht: pwhtSchema.optional(),
  toughnessResults: toughnessSchema.optional(),
  testPositions: z.array(z.string().min(1).max(10)).optional(),
}).strict().superRefine((v, ctx) => {
  if (v.process === undefined && v.layers === undefined) ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['process'], message: 'process is required (or layers, for a multi-process PQR)' })
  if (v.process !== undefined && v.layers !== undefined) ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['layers'], message: 'give process or layers, not both' })
})

export const wpsSupportSchema = z.object({
  wps: z.object({
    process: processSchema.optional(),
    transfer: transferSchema.optional(),
    thickness: rangeSchema,
    depositMax: positive('depositMax').nullable().optional(),
    toughness: z.boolean().optional(),
    heatInputMax: positive('heatInputMax').optional(),
    fNumber: z.number().int().positive().optional(),
    layers: z.array(wpsLayerSchema).min(1, 'layers needs at least one process layer').optional(),
    baseMetals: baseMetalsSchema.optional(),
    preheatMin: temperature('preheatMin').optional(),
    interpassMax: temperature('interpassMax').optional(),
    pwht: pwhtSchema.optional(),
    positions: z.array(z.enum(['F', 'H', 'V', 'O'], { errorMap: () => ({ message: 'positions are F, H, V or O' }) })).optional(),
  }).strict().superRefine((v, ctx) => {
    if (v.process === undefined && v.layers === undefined) ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['process'], message: 'process is required (or layers, for a multi-process WPS)' })
    if (v.process !== undefined && v.layers !== undefined) ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['layers'], message: 'give process or layers, not both' })
  }),
  pqrs: z.array(pqrSchema).min(1, 'pqrs needs at least one PQR'),
}).strict()

export const specimensSchema = z.object({
  test: welderTestSchema,
  specimens: z.array(z.object({
    type: z.enum(['face', 'root', 'side', 'macro', 'fracture'], { errorMap: () => ({ message: 'type must be face, root, side, macro or fracture' }) }),
  }).strict(), { required_error: 'specimens is required' }),
}).strict()

/** The input schema of each check; each is checked against the rule's input type below. */
export const inputSchemas = {
  'procedure-ranges': procedureRangesSchema,
  'welder-ranges': welderTestSchema,
  'covers': coversSchema,
  'bend': bendSchema,
  'radiography': radiographySchema,
  'continuity': continuitySchema,
  'heat-input': heatInputSchema,
  'gauge': gaugeSchema,
  'tensile': tensileSchema,
  'readings': readingsSchema,
  'wps-support': wpsSupportSchema,
  'specimens': specimensSchema,
  'toughness': toughnessSchema,
} as const satisfies Record<CheckName, z.ZodTypeAny>

// Compile-time agreement between the schemas and the rule inputs.
type Agrees<S extends z.ZodTypeAny, T> = z.infer<S> extends T ? true : never
export const schemasAgree: [
  Agrees<typeof procedureRangesSchema, ProcedureRangesInput>,
  Agrees<typeof welderTestSchema, WelderTestInput>,
  Agrees<typeof coversSchema, CoversInput>,
  Agrees<typeof bendSchema, BendInput>,
  Agrees<typeof radiographySchema, RadiographyInput>,
  Agrees<typeof continuitySchema, ContinuityInput>,
  Agrees<typeof heatInputSchema, HeatInputInput>,
  Agrees<typeof gaugeSchema, GaugeInput>,
  Agrees<typeof tensileSchema, TensileInput>,
  Agrees<typeof readingsSchema, ReadingsInput>,
  Agrees<typeof wpsSupportSchema, WpsSupportInput>,
  Agrees<typeof specimensSchema, SpecimenSetInput>,
  Agrees<typeof toughnessSchema, ToughnessInput>,
] = [true, true, true, true, true, true, true, true, true, true, true, true, true]

export type RuleRequest = z.infer<typeof envelopeSchema>

/** Field-level messages: "input.couponThickness: couponThickness must be more than 0". */
export function formatIssues(error: z.ZodError, prefix: string): string {
  return error.issues.map((issue) => {
    const path = [prefix, ...issue.path.map(String)].filter(Boolean).join('.')
    if (issue.code === z.ZodIssueCode.unrecognized_keys) return `${path}: unknown field${issue.keys.length > 1 ? 's' : ''} ${issue.keys.join(', ')}`
    return path ? `${path}: ${issue.message}` : issue.message
  }).join('; ')
}
