import { undoImport } from '../../../../database/continuity-imports'
import { idParamSchema } from '#shared/schemas/list'

/**
 * POST /api/continuity/imports/:id/undo: the quality manager undoes a committed import as a whole (every entry it stored
 * is removed and kept in the audit trail); 409 once undone, after the undo window, or when later records rest on it.
 */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  return orThrow(await undoImport(await useDb(), user, id, new Date()))
})
