import { z } from 'zod'
import { equipmentKinds, equipmentStates } from '../vocabulary/equipment-kinds'
import { calendarDate, optionalText, requiredText, versionSchema } from './fields'
import { listQuerySchema } from './list'

/** One welding machine or meter in the shop's register, with its calibration. */
export const equipmentSchema = z.object({
  kind: z.enum(equipmentKinds, { errorMap: () => ({ message: 'Choose what it is' }) }),
  tag: requiredText('the shop\'s tag (asset number)', 40),
  description: optionalText('Description', 160),
  serialNumber: optionalText('Serial number', 80),
  state: z.enum(equipmentStates, { errorMap: () => ({ message: 'Choose in service or out of service' }) }).default('in-service'),
  calibratedOn: z.preprocess(v => (v === '' || v === undefined ? null : v), calendarDate('Calibration date').nullable()),
  intervalMonths: z.preprocess(v => (v === '' || v === undefined || v === null ? null : typeof v === 'string' ? Number(v) : v),
    z.number({ invalid_type_error: 'Interval must be a whole number of months' }).int('Interval must be a whole number of months')
      .min(1, 'Interval: at least 1 month').max(120, 'Interval: at most 120 months').nullable()),
  notes: optionalText('Notes', 1000),
}).strict()
export type EquipmentInput = z.input<typeof equipmentSchema>
export type Equipment = z.infer<typeof equipmentSchema>

export const equipmentPatchSchema = equipmentSchema.extend({
  version: versionSchema,
})
export type EquipmentPatch = z.infer<typeof equipmentPatchSchema>

export const equipmentListQuerySchema = listQuerySchema(['tag', 'kind', 'dueOn'] as const).extend({
  kind: z.enum(equipmentKinds).optional(),
  state: z.enum(equipmentStates).optional(),
})
export type EquipmentListQuery = z.infer<typeof equipmentListQuerySchema>

/** The machine and meters a production reading names (at most eight). */
export const readingEquipmentSchema = z.preprocess(v => (v === undefined || v === null || v === '' ? [] : Array.isArray(v) ? v : [v]),
  z.array(z.coerce.number({ invalid_type_error: 'Choose equipment from the register' }).int().positive().max(2_147_483_647))
    .max(8, 'At most eight machines and meters per reading')
    .refine(ids => new Set(ids).size === ids.length, 'Each machine or meter once'))
