import { idParamSchema } from '#shared/schemas/list'
import { readingSchema } from '#shared/schemas/reading'
import { findProcedure } from '../../../database/procedures'
import { recordReading } from '../../../database/procedure-writes'

/** POST /api/procedures/:id/readings: production readings checked against the window of an approved WPS */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'welder'])
  const { id } = await validParams(event, idParamSchema)
  const input = await validBody(event, readingSchema)
  const db = await useDb()
  const row = await findProcedure(db, id)
  if (!row || (user.role === 'welder' && row.status !== 'approved')) throw notFound('Procedure')
  if (row.status !== 'approved') throw conflict(`Readings are taken against an approved WPS; ${row.number} rev. ${row.revision} is ${row.status}.`)
  setResponseStatus(event, 201)
  return recordReading(db, row, input, user)
})
