import { listAudit } from '../../database/audit'
import { auditQuerySchema } from '#shared/schemas/list-queries'

/** GET /api/audit: the audit trail, newest first, optionally of one record (supervisor) */
export default defineEventHandler(async (event) => {
  await requireRole(event, ['supervisor'])
  const query = await validQuery(event, auditQuerySchema)
  return listAudit(await useDb(), query)
})
