import { idParamSchema } from '#shared/schemas/list'
import { jointImportSchema } from '#shared/schemas/joints'
import { importWeldLog } from '../../../../database/joints'

/** POST /api/projects/:id/joints/import: a weld log CSV; without commit the preview and row errors, with it every joint welded or none */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector'])
  const { id } = await validParams(event, idParamSchema)
  const { csv, commit } = await validBody(event, jointImportSchema)
  return orThrow(await importWeldLog(await useDb(), user, id, csv, commit, todayIso()))
})
