import { recentImports } from '../../../database/continuity-imports'

/** GET /api/continuity/imports: the latest committed CSV imports, each with whether it may still be undone and why not (staff) */
export default defineEventHandler(async (event) => {
  await requireRole(event, staff)
  return recentImports(await useDb(), new Date())
})
