import { idParamSchema } from '#shared/schemas/list'
import { projectDetail, mayReadProject } from '../../database/projects'
import { gapsOfProject, packetPlan, sheetCount } from '../../sheets/packet'

/** GET /api/projects/:id: the project, its WPSs, welders, auditors and who was not current in its period; auditors only granted ones */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'auditor'])
  const { id } = await validParams(event, idParamSchema)
  const db = await useDb()
  if (!await mayReadProject(db, user, id)) throw httpError(missing('Project'))
  const detail = await projectDetail(db, id)
  const plan = await packetPlan(db, id)
  if (!detail || !plan) throw httpError(missing('Project'))
  const tests = plan.welders.map(w => ({ welderId: w.id, tests: w.tests }))
  return {
    ...detail,
    // An auditor sees who was granted only as far as themselves
    auditors: user.role === 'supervisor' ? detail.auditors : [],
    pqrs: plan.pqrs,
    tests,
    period: plan.period,
    sheetCount: sheetCount(plan),
    notCurrent: await gapsOfProject(db, plan),
  }
})
