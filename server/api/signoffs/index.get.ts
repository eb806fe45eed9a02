import { signoffListSchema } from '#shared/schemas/signoff'
import { listSignoffs } from '../../database/signoffs'

/** GET /api/signoffs?box=inbox|sent: sign-off requests waiting for me, or the ones I asked (quality manager, inspector) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, staff)
  const { box } = await validQuery(event, signoffListSchema)
  return listSignoffs(await useDb(), user, box)
})
