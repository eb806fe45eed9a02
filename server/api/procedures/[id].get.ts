import { idParamSchema } from '#shared/schemas/list'
import { findProcedure, procedureDetail } from '../../database/procedures'

/** GET /api/procedures/:id: one WPS with supporting PQRs, signatures, revisions and the live support check; welders read approved ones only */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'welder'])
  const { id } = await validParams(event, idParamSchema)
  const db = await useDb()
  const row = await findProcedure(db, id)
  if (!row || (user.role === 'welder' && row.status !== 'approved')) throw httpError(missing('Procedure'))
  const detail = await procedureDetail(db, row)
  // Welders read the procedure itself; the PQR records behind it stay with the staff.
  if (user.role === 'welder') return { ...detail, pqrs: detail.pqrs.map(p => ({ id: p.id, number: p.number, status: p.status })) }
  return detail
})
