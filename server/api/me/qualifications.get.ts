import { myQualifications } from '../../database/me'

/** GET /api/me/qualifications: the signed-in welder's tests, what each covers in plain words, standings and usable WPSs */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['welder'])
  return orThrow(await myQualifications(await useDb(), user.welderId ?? -1, todayIso()))
})
