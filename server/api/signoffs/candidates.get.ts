import { signoffCandidates } from '../../database/signoffs'

/** GET /api/signoffs/candidates: records awaiting a sign-off I could ask for, and who could sign them */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, staff)
  return signoffCandidates(await useDb(), user)
})
