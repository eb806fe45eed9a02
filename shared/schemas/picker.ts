import { z } from 'zod'
import { pqrStatuses, procedureStatuses } from '../vocabulary/records'

// What a picker asks the server as the user types: a search text, or the ids of records already chosen (to show
// their labels). A picker shows at most `limit` matches and says when there are more.
const ids = z.string().trim().max(600).regex(/^(\d{1,10}(,\d{1,10})*)?$/, 'Ids separated by commas')
  .transform(v => (v ? [...new Set(v.split(',').map(Number))].filter(n => n > 0 && n <= 2_147_483_647).slice(0, 50) : []))
const base = {
  q: z.string().trim().max(80, 'At most 80 characters').default(''),
  ids: ids.optional(),
  limit: z.coerce.number().int().min(1).max(50).default(20),
}

export const welderPickerSchema = z.object({ ...base, status: z.enum(['active', 'all']).default('active') })
export type WelderPickerQuery = z.infer<typeof welderPickerSchema>

export const procedurePickerSchema = z.object({ ...base, status: z.enum(procedureStatuses).optional() })
export type ProcedurePickerQuery = z.infer<typeof procedurePickerSchema>

export const pqrPickerSchema = z.object({ ...base, status: z.enum(pqrStatuses).optional() })
export type PqrPickerQuery = z.infer<typeof pqrPickerSchema>
