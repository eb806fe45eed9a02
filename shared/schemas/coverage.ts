import { z } from 'zod'
import { processSchema } from './list'

// Query strings and form inputs both arrive as text; empty means "not given".
const blank = (v: unknown) => (v === '' || v === null ? undefined : v)
const positive = (what: string) => z.preprocess(blank, z.coerce.number({ invalid_type_error: `${what} must be a number` })
  .finite().positive(`${what} must be more than 0`).max(10_000, `${what} is too large`).optional())
const flag = (what: string) => z.preprocess(v => (v === 'true' ? true : v === 'false' ? false : blank(v)), z.boolean({ invalid_type_error: `${what}: yes or no` }).optional())
const letter = z.enum(['F', 'H', 'V', 'O'], { errorMap: () => ({ message: 'F, H, V or O' }) })
/** "F,V,O", ["F","V","O"] or repeated query keys: several production positions (a fixed pipe joint is welded in several). */
const letters = z.preprocess((v) => {
  const list = (Array.isArray(v) ? v : typeof v === 'string' ? v.split(',') : v) as unknown
  if (!Array.isArray(list)) return blank(list)
  const clean = [...new Set(list.map(x => String(x).trim().toUpperCase()).filter(Boolean))]
  return clean.length ? clean : undefined
}, z.array(letter).min(1).optional())

export const jointCodes = ['asme-ix', 'aws-d1.1', 'aws-d1.3', 'iso-9606-1'] as const

/** A production joint: what "who can weld this?" is asked about. */
export const jointSchema = z.object({
  /** The code the joint is welded to (the WPS's code, or picked): a test to another code never covers it. */
  code: z.preprocess(blank, z.enum(jointCodes, { errorMap: () => ({ message: 'ASME IX, AWS D1.1, AWS D1.3 or ISO 9606-1' }) }).optional()),
  process: processSchema,
  transfer: z.preprocess(blank, z.enum(['short-circuit', 'globular', 'spray', 'pulse']).optional()),
  unit: z.enum(['in', 'mm']).default('in'),
  pNumber: z.preprocess(blank, z.string().trim().max(8, 'At most 8 characters').regex(/^\d{1,2}[A-Z]?$/i, 'A P-No. such as 1, 8 or 15E').optional()),
  thickness: positive('Thickness'),
  gauge: z.preprocess(blank, z.coerce.number({ invalid_type_error: 'Gauge must be a number' }).int('A whole gauge number').min(3, 'Gauges run 3 to 38').max(38, 'Gauges run 3 to 38').optional()),
  form: z.enum(['plate', 'pipe'], { errorMap: () => ({ message: 'Plate or pipe' }) }).default('plate'),
  outsideDiameter: positive('Outside diameter'),
  weld: z.enum(['groove', 'fillet'], { errorMap: () => ({ message: 'Groove or fillet' }) }).default('groove'),
  position: z.preprocess(blank, letter.optional()),
  positions: letters,
  progression: z.preprocess(blank, z.enum(['uphill', 'downhill'], { errorMap: () => ({ message: 'Uphill or downhill' }) }).optional()),
  fNumber: z.preprocess(blank, z.coerce.number({ invalid_type_error: 'F-No. must be a number' }).int('A whole number such as 4').positive().max(99).optional()),
  backing: z.preprocess(v => (v === 'true' ? true : v === 'false' ? false : blank(v)), z.boolean().optional()),
  // GTAW and PAW welder variables (QW-404.14, QW-404.22, QW-404.23, QW-408.8, QW-409.4).
  fillerAdded: flag('Filler metal added'),
  consumableInsert: flag('Consumable insert'),
  fillerForm: z.preprocess(blank, z.enum(['solid', 'metal-cored', 'flux-cored', 'powder'], { errorMap: () => ({ message: 'Solid, metal-cored, flux-cored or powder' }) }).optional()),
  backingGas: flag('Inert backing gas'),
  current: z.preprocess(blank, z.enum(['AC', 'DCEP', 'DCEN'], { errorMap: () => ({ message: 'AC, DCEP or DCEN' }) }).optional()),
}).superRefine((v, ctx) => {
  if (v.position === undefined && v.positions === undefined) ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['position'], message: 'Pick at least one position' })
  if (v.form === 'pipe' && v.outsideDiameter === undefined) ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['outsideDiameter'], message: 'A pipe joint needs its outside diameter' })
  if (v.thickness !== undefined && v.gauge !== undefined) ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['gauge'], message: 'Give a thickness or a gauge, not both' })
})
export type Joint = z.infer<typeof jointSchema>

/** The joint's positions: `positions`, with `position` added when given. */
export function jointPositions(joint: Pick<Joint, 'position' | 'positions'>): ('F' | 'H' | 'V' | 'O')[] {
  const all = [...(joint.positions ?? []), ...(joint.position ? [joint.position] : [])]
  return (['F', 'H', 'V', 'O'] as const).filter(p => all.includes(p))
}
