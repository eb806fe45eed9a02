import { whoCanWeld } from '../../database/coverage'
import { resolveJoint } from '#shared/qualification/joint-coverage'
import { jointSchema } from '#shared/schemas/coverage'

/**
 * GET /api/coverage?process=…&positions=F,V,O (or position=…)&code=…: who can weld this joint today: the approved WPSs that cover it and the
 * active welders whose certified tests cover it and who are current, each with the findings behind the answer.
 */
export default defineEventHandler(async (event) => {
  await requireRole(event, staff)
  const query = await validQuery(event, jointSchema)
  const joint = resolveJoint(query)
  if ('error' in joint) throw httpError(fieldFailure('gauge', joint.error))
  const answer = await whoCanWeld(await useDb(), joint, todayIso())
  setResponseHeader(event, 'server-timing', `db;dur=${answer.timing.queryMs}, rules;dur=${answer.timing.rulesMs}`)
  return answer
})
