import { z } from 'zod'
import { calendarDate } from './fields'
import { listQuerySchema, processSchema } from './list'
import { anyCodeIds, procedureStatuses, pqrStatuses, welderStatuses, welderTestStatuses } from '../vocabulary/records'
import { isoProcessIds } from '../vocabulary/iso'

// The query of each list route: its sort columns and filters. The route validates with it; its table sends it.

const id = z.coerce.number().int().positive().max(2_147_483_647)
const isoDate = calendarDate('Date', { format: 'Use YYYY-MM-DD' })
const pNumber = z.string().trim().max(8).optional()
// Welder tests and standings are listed under ASME/AWS process names or ISO 4063 numbers (ISO 9606-1)
const welderProcess = z.union([processSchema, z.enum(isoProcessIds)])

export const procedureListQuerySchema = listQuerySchema(['number', 'title', 'process', 'status', 'updatedAt']).extend({
  status: z.enum(procedureStatuses).optional(),
  process: processSchema.optional(),
  code: z.enum(anyCodeIds).optional(),
  pNumber,
  thickness: z.coerce.number().positive().max(1000).optional(),
})
export type ProcedureListQuery = z.infer<typeof procedureListQuerySchema>

export const pqrListQuerySchema = listQuerySchema(['number', 'testDate', 'process', 'status', 'couponThickness']).extend({
  status: z.enum(pqrStatuses).optional(),
  process: processSchema.optional(),
  code: z.enum(anyCodeIds).optional(),
  pNumber,
})
export type PqrListQuery = z.infer<typeof pqrListQuerySchema>

export const welderTestListQuerySchema = listQuerySchema(['testDate', 'welder', 'process', 'status']).extend({
  status: z.enum(welderTestStatuses).optional(),
  process: welderProcess.optional(),
  welderId: id.optional(),
})
export type WelderTestListQuery = z.infer<typeof welderTestListQuerySchema>

export const welderListQuerySchema = listQuerySchema(['name', 'stamp', 'employeeNumber', 'status']).extend({
  status: z.enum(welderStatuses).optional(),
})
export type WelderListQuery = z.infer<typeof welderListQuerySchema>

export const continuityListQuerySchema = listQuerySchema(['weldedOn', 'welder', 'process']).extend({
  process: processSchema.optional(),
  welderId: id.optional(),
  from: isoDate.optional(),
  to: isoDate.optional(),
})
export type ContinuityListQuery = z.infer<typeof continuityListQuerySchema>

export const standingsQuerySchema = z.object({
  process: welderProcess.optional(),
  standing: z.enum(['current', 'lapsing', 'lapsed']).optional(),
  q: z.string().trim().max(100, 'At most 100 characters').optional(),
  limit: z.coerce.number().int().min(1).max(2000).default(300),
})
export type StandingsQuery = z.infer<typeof standingsQuerySchema>

export const auditQuerySchema = z.object({
  recordType: z.string().trim().min(1).max(40).regex(/^[a-z-]+$/, 'Lower-case letters and dashes').optional(),
  recordId: id.optional(),
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(50),
})
export type AuditQuery = z.infer<typeof auditQuerySchema>
