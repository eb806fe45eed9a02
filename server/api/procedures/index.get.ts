import { listProcedures } from '../../database/procedures'
import { procedureListQuerySchema } from '#shared/schemas/list-queries'

/** GET /api/procedures: WPS list; welders see approved procedures only */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'welder'])
  const query = await validQuery(event, procedureListQuerySchema)
  return listProcedures(await useDb(), user, query)
})
