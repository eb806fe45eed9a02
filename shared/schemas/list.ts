import { z } from 'zod'
import { processIds } from '../vocabulary/records'

/** Paging, sorting and a free-text filter, shared by every list route and its table. */
export function listQuerySchema<const S extends readonly [string, ...string[]]>(sortable: S) {
  return z.object({
    page: z.coerce.number().int().min(1).max(100_000).default(1),
    pageSize: z.coerce.number().int().min(1).max(200).default(25),
    sort: z.enum(sortable).default(sortable[0] as S[0]),
    dir: z.enum(['asc', 'desc']).default('asc'),
    q: z.string().trim().max(100, 'At most 100 characters').optional(),
  })
}

export interface Page<T> {
  items: T[]
  total: number
  page: number
  pageSize: number
}

export const idParamSchema = z.object({ id: z.coerce.number().int().positive().max(2_147_483_647) })
export const processSchema = z.enum(processIds)
