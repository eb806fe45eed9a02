import { continuityQuerySchema, welderParamSchema } from '#shared/schemas/sheet'
import { mayReadWelder } from '../../../database/welders'
import { firstRecordDay } from '../../../database/sheet-records'
import { respondWithSheet } from '../../../sheets/download'
import { continuityLogSheet, projectPeriod, publicOrigin } from '../../../sheets/sheets'

/**
 * GET /api/sheets/continuity/:welderId?from&to&projectId: a welder's continuity log. With projectId the period is the
 * project's (an auditor must name a granted project); otherwise from the first entry, or `from`, to today, or `to`.
 */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, everyone)
  const { welderId } = await validParams(event, welderParamSchema)
  const query = await validQuery(event, continuityQuerySchema)
  const db = await useDb()
  if (user.role === 'auditor' && query.projectId === undefined) throw httpError(missing('Continuity log'))
  if (!await mayReadWelder(db, user, welderId, query.projectId)) throw httpError(missing('Continuity log'))
  const today = todayIso()
  const projectSpan = query.projectId === undefined ? null : await projectPeriod(db, query.projectId)
  if (query.projectId !== undefined && !projectSpan) throw httpError(missing('Project'))
  const to = query.to ?? today
  const from = query.from ?? await firstRecordDay(db, welderId) ?? to
  const period = projectSpan ?? { from: from <= to ? from : to, to }
  const sheet = await continuityLogSheet(db, welderId, period, user, publicOrigin(event))
  if (!sheet) throw httpError(missing('Welder'))
  return respondWithSheet(event, db, user, sheet, query.format, { type: 'welder', id: welderId })
})
