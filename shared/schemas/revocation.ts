import { z } from 'zod'
import { processIds } from '../vocabulary/records'
import { standingKey } from '../vocabulary/qualified-as'

/** The standing keys a revocation may name: a process, or a process's welding-operator qualification. */
export const revocableKeys = processIds.flatMap(p => [p, standingKey(p, 'welding-operator')])

/** What the inspector enters to revoke one welder × process qualification (ASME IX QW-322.1(b)). */
export const revocationSchema = z.object({
  process: z.string().trim().refine(v => revocableKeys.includes(v), 'Pick a process the welder is qualified for'),
  reason: z.string().trim().min(10, 'Name the specific reason (at least 10 characters)').max(2000, 'At most 2,000 characters'),
})
export type RevocationInput = z.infer<typeof revocationSchema>
