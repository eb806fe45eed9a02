import { exportTableParamSchema, exportTableQuerySchema } from '#shared/schemas/records'
import { exportTable } from '../../../database/records-archive'
import { toCsv, toXlsx } from '../../../utils/spreadsheets'

/** GET /api/export/tables/:name?format=csv|xlsx: every row of one table, as stored (quality manager) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { name } = await validParams(event, exportTableParamSchema)
  const { format } = await validQuery(event, exportTableQuerySchema)
  const table = await exportTable(await useDb(), user, name, format)
  if (!table) throw httpError(missing('Table'))
  const body = format === 'csv' ? `\uFEFF${toCsv(table.columns, table.rows)}` : await toXlsx(name, table.columns, table.rows)
  setResponseHeaders(event, {
    'content-type': format === 'csv' ? 'text/csv; charset=utf-8' : 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
    'content-disposition': `attachment; filename="${name}.${format}"`,
    'cache-control': 'private, no-store',
    'x-content-type-options': 'nosniff',
  })
  return body
})
