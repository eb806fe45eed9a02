import { idParamSchema } from '#shared/schemas/list'
import { findProcedure, layersOf, readingsOf } from '../../../database/procedures'
import { readingWindow } from '../../../database/procedure-writes'

/** GET /api/procedures/:id/readings: the readings kept against a WPS (a welder sees their own) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'welder'])
  const { id } = await validParams(event, idParamSchema)
  const db = await useDb()
  const row = await findProcedure(db, id)
  if (!row || (user.role === 'welder' && row.status !== 'approved')) throw httpError(missing('Procedure'))
  const items = await readingsOf(db, id, user.role === 'welder' ? (user.welderId ?? -1) : null)
  const layers = layersOf(row).map((l, i) => ({ index: i, name: l.name, process: l.process, window: readingWindow(row, i) }))
  return { window: readingWindow(row), layers, unit: row.unit, items }
})
