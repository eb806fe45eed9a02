import { pickWelders } from '../../database/pickers'
import { welderPickerSchema } from '#shared/schemas/picker'

/** GET /api/search/welders?q=: the welder picker's matches as the user types (staff), or the welders of `ids` */
export default defineEventHandler(async (event) => {
  await requireRole(event, ['supervisor', 'inspector'])
  const query = await validQuery(event, welderPickerSchema)
  return pickWelders(await useDb(), query)
})
