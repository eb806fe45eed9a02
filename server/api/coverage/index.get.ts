import { performance } from 'node:perf_hooks'
import { coverageCandidates } from '../../database/coverage'
import { judgeProcedures, judgeWelders, resolveJoint } from '#shared/qualification/joint-coverage'
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
  const db = await useDb()
  const started = performance.now()
  const rows = await coverageCandidates(db, joint.process)
  const queried = performance.now()
  const today = todayIso()
  const procedures = judgeProcedures(rows.procedures, joint)
  const welders = judgeWelders(rows.welders, joint, today)
  const judged = performance.now()
  const timing = { queryMs: Math.round((queried - started) * 10) / 10, rulesMs: Math.round((judged - queried) * 10) / 10, candidates: rows.welders.length }
  setResponseHeader(event, 'server-timing', `db;dur=${timing.queryMs}, rules;dur=${timing.rulesMs}`)
  const lapsed = welders.filter(w => w.covered && !w.current)
  const notCovered = welders.filter(w => w.answer === 'not-covered')
  const undecided = welders.filter(w => w.answer === 'cannot-tell')
  return {
    today, joint, timing,
    procedures: procedures.sort((a, b) => Number(b.covered) - Number(a.covered)),
    welders: {
      // Covered and current today: may weld it (with a WPS that covers it)
      able: welders.filter(w => w.covered && w.current),
      // Covered by their tests, but the process has lapsed: renewal needed first (names and dates only)
      lapsed: lapsed.slice(0, 100).map(({ id, name, stamp, standing }) => ({ id, name, stamp, standing })),
      lapsedCount: lapsed.length,
      // Tested in the process but no test covers the joint: the findings that are not met
      notCovered: notCovered.slice(0, 100).map(w => ({ ...w, reasons: w.reasons.filter(r => r.state === 'not-met' || (r.state === undefined && !r.met)) })),
      notCoveredCount: notCovered.length,
      // A variable the joint states was not recorded on their tests (or the reverse): cannot tell until it is recorded
      undecided: undecided.slice(0, 100).map(w => ({ ...w, reasons: w.reasons.filter(r => !r.met) })),
      undecidedCount: undecided.length,
    },
  }
})
