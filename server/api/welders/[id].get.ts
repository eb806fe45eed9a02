import { welderHistory } from '../../database/welders'
import { idParamSchema } from '#shared/schemas/list'

/** GET /api/welders/:id: one welder with linked account, tests, continuity and standings; a welder may read only their own (404 otherwise) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'welder'])
  const { id } = await validParams(event, idParamSchema)
  if (user.role === 'welder' && user.welderId !== id) throw httpError(missing('Welder'))
  const db = await useDb()
  const history = await welderHistory(db, id)
  if (!history) throw httpError(missing('Welder'))
  const standings = (await standingsOfWelders(db, [id])).get(id) ?? []
  return { ...history, standings, today: todayIso() }
})
