import { z } from 'zod'

const id = (what: string) => z.number({ required_error: `Choose ${what}`, invalid_type_error: `Choose ${what}` }).int().positive().max(2_147_483_647)

/** A quality manager asks an inspector to certify (or witness) a record; an inspector asks a quality manager to approve one. */
export const signoffRequestSchema = z.object({
  recordType: z.enum(['procedure', 'pqr', 'welder-test'], { errorMap: () => ({ message: 'Choose a procedure, a PQR or a welder test' }) }),
  recordId: id('the record'),
  meaning: z.enum(['approved', 'certified', 'witnessed'], { errorMap: () => ({ message: 'Choose approve, certify or witness' }) }),
  requestedOf: id('who is asked').nullable().default(null),
  note: z.preprocess(v => (typeof v === 'string' && v.trim() === '' ? null : v ?? null), z.string().trim().max(500, 'Note: at most 500 characters').nullable()),
}).strict()
export type SignoffRequestInput = z.infer<typeof signoffRequestSchema>

export const signoffResolveSchema = z.object({
  status: z.enum(['done', 'withdrawn'], { errorMap: () => ({ message: 'status must be done or withdrawn' }) }),
}).strict()

export const signoffListSchema = z.object({ box: z.enum(['inbox', 'sent']).default('inbox') })

export const signoffWords: Record<'approved' | 'certified' | 'witnessed', string> = {
  approved: 'approve',
  certified: 'certify',
  witnessed: 'witness',
}
