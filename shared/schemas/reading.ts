import { z } from 'zod'
import { idSchema, optionalNumber, optionalText } from './fields'
import { readingEquipmentSchema } from './equipment'

/** One production reading against a WPS window, in the WPS's unit (V, A, in/min or mm/min, in or mm, ft³/h or L/min). */
export const readingSchema = z.object({
  welderId: z.preprocess(v => (v === '' || v === undefined ? null : typeof v === 'string' ? Number(v) : v), idSchema.nullable()),
  takenAt: z.string().datetime({ offset: true, message: 'takenAt must be a date and time (ISO 8601)' }).optional(),
  volts: optionalNumber('Voltage', { positive: true }),
  amps: optionalNumber('Current', { positive: true }),
  wireFeedSpeed: optionalNumber('Wire feed speed', { positive: true }),
  travelSpeed: optionalNumber('Travel speed', { positive: true }),
  ctwd: optionalNumber('Contact-tip-to-work distance', { positive: true }),
  gasFlow: optionalNumber('Gas flow', { positive: true }),
  reference: optionalText('Weld reference', 120),
  /** Which process layer of the WPS the reading was taken on (0: the first) */
  layer: z.number({ invalid_type_error: 'layer must be a whole number' }).int('layer must be a whole number').min(0).max(7).optional(),
  /** The welding machine and meters the reading was taken with (ids in the equipment register) */
  equipmentIds: readingEquipmentSchema.optional(),
}).strict().refine(v => [v.volts, v.amps, v.wireFeedSpeed, v.travelSpeed, v.ctwd, v.gasFlow].some(x => x !== null && x !== undefined),
  { message: 'Enter at least one reading', path: ['volts'] })
export type ReadingInput = z.input<typeof readingSchema>
export type Reading = z.infer<typeof readingSchema>

/** What a stored reading keeps (readings.values): the values, each parameter checked against the WPS window, the heat input. */
export interface ReadingValues {
  readings: Record<string, number>
  checks: { parameter: string, value: number, within: boolean, text: string }[]
  heatInput: { value: number, perUnit: string, limit: number | null, within: boolean, clause: string, text: string } | null
  reference: string | null
  layer?: number
  layerName?: string
  process?: string
}
