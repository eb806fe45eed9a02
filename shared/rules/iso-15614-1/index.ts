import { z } from 'zod'
import { wpqrRanges } from './ranges'
import { isoWpsSupport } from './support'
import { RuleRefusal } from '../refusal'

export { wpqrRanges, thicknessRange, diameterRange, positionRange, heatInputRange, pwhtRange, type WpqrTestPiece, type WpqrRanges, type WpqrReason, type WpqrVariable } from './ranges'
export { isoWpsSupport, againstWpqr, type IsoWps, type IsoSupport, type IsoFinding, type IsoFindingState } from './support'

/**
 * `npm run rules` for the procedure standard: { "code": "iso-15614-1", "check": "wpqr-ranges" | "wps-support", "input": … }.
 * Millimetres and °C only. Requests for the other codes are untouched (this is a separate entry, so old requests keep
 * their answers).
 */
const positive = (what: string) => z.number({ invalid_type_error: `${what} must be a number` }).positive(`${what} must be more than 0`)
const temperature = (what: string) => z.number({ invalid_type_error: `${what} must be a number (°C)` }).min(-50).max(1200)
const pwhtSchema = z.object({ done: z.boolean(), temperature: temperature('pwht.temperature').optional(), hours: positive('pwht.hours').optional() }).strict()
const processList = z.array(z.string().regex(/^\d{2,3}$/, 'an ISO 4063 number such as "135"'), { required_error: 'processes is required' }).min(1)

export const wpqrSchema = z.object({
  processes: processList,
  form: z.enum(['plate', 'pipe']),
  thickness: positive('thickness'),
  outsideDiameter: positive('outsideDiameter').optional(),
  runs: z.enum(['single', 'multi']).optional(),
  positions: z.array(z.string()).min(1, 'positions needs at least one ISO 6947 position'),
  materialGroup: z.string().max(10).optional(),
  heatInputMax: positive('heatInputMax').optional(),
  heatInputMin: positive('heatInputMin').optional(),
  impactTested: z.boolean().optional(),
  hardnessTested: z.boolean().optional(),
  preheat: temperature('preheat').optional(),
  interpassMax: temperature('interpassMax').optional(),
  pwht: pwhtSchema.optional(),
  filler: z.string().max(80).optional(),
  fillerGroup: z.enum(['1', '2', '3', '4', '5', '6']).optional(),
}).strict()

export const isoWpsSchema = z.object({
  processes: processList,
  form: z.enum(['plate', 'pipe']).optional(),
  thickness: z.object({ min: positive('thickness.min'), max: positive('thickness.max') }).strict().optional(),
  outsideDiameterMin: positive('outsideDiameterMin').optional(),
  positions: z.array(z.string()).optional(),
  materialGroup: z.string().max(10).optional(),
  heatInput: z.object({ min: positive('heatInput.min').optional(), max: positive('heatInput.max').optional() }).strict().optional(),
  preheatMin: temperature('preheatMin').optional(),
  interpassMax: temperature('interpassMax').optional(),
  pwht: z.object({ done: z.boolean(), temperature: z.object({ min: temperature('pwht.temperature.min'), max: temperature('pwht.temperature.max') }).strict().optional(), hours: positive('pwht.hours').optional() }).strict().optional(),
  filler: z.string().max(80).optional(),
}).strict()

const envelope = z.object({
  code: z.literal('iso-15614-1'),
  check: z.enum(['wpqr-ranges', 'wps-support'], { errorMap: () => ({ message: 'check: ISO 15614-1 carries "wpqr-ranges" and "wps-support"' }) }),
  edition: z.literal('2017').optional(),
  unit: z.literal('mm', { errorMap: () => ({ message: 'unit: ISO 15614-1 is in millimetres: send "unit": "mm"' }) }).optional(),
  input: z.unknown(),
}).strict()

export const iso15614Caution = 'Computed from ISO 15614-1:2017 (level 2) as this program carries it (every range from memory of clause 8: confirm against your copy). '
  + 'Rootface helps; it does not qualify anyone: the governing code edition, the shop\'s quality manual, the contract and the examiner or examining body have the final word.'

const issues = (error: z.ZodError, prefix: string) => error.issues.map(i => `${[prefix, ...i.path].filter(p => p !== '').join('.')}: ${i.message}`).join('; ')

/** Evaluate one ISO 15614-1 request; never throws. */
export function evaluateIso15614(request: unknown): Record<string, unknown> {
  const parsed = envelope.safeParse(request)
  if (!parsed.success) return { error: issues(parsed.error, '') }
  const base = { code: 'iso-15614-1', edition: '2017', unit: 'mm', caution: iso15614Caution }
  try {
    if (parsed.data.check === 'wpqr-ranges') {
      const input = wpqrSchema.safeParse(parsed.data.input)
      if (!input.success) return { error: issues(input.error, 'input') }
      return { ...wpqrRanges(input.data), ...base }
    }
    const input = z.object({ wps: isoWpsSchema, wpqrs: z.array(wpqrSchema) }).strict().safeParse(parsed.data.input)
    if (!input.success) return { error: issues(input.error, 'input') }
    return { ...isoWpsSupport(input.data.wps, input.data.wpqrs), ...base }
  }
  catch (error) {
    if (error instanceof RuleRefusal) return { error: error.message }
    throw error
  }
}
