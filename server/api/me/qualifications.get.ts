import { welderLogsOwnContinuity } from '../../database/continuity'
import { ownQualifications } from '../../database/me'
import { renewalOf } from '#shared/qualification/renewal'

/** GET /api/me/qualifications: the signed-in welder's tests, what each covers in plain words, standings and usable WPSs */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['welder'])
  const db = await useDb()
  const welderId = user.welderId ?? -1
  const standings = (await standingsOfWelders(db, [welderId])).get(welderId) ?? []
  const own = await ownQualifications(db, welderId, standings)
  if (!own) throw httpError(missing('Roster entry'))
  return {
    ...own, today: todayIso(), logsOwnContinuity: await welderLogsOwnContinuity(db),
    standings: standings.map(s => ({ ...s, renewal: s.standing === 'lapsed' ? renewalOf[s.code] : null })),
  }
})
