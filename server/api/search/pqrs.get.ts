import { pickPqrs } from '../../database/pickers'
import { pqrPickerSchema } from '#shared/schemas/picker'

/** GET /api/search/pqrs?q=: the PQR picker's matches as the user types (staff), or the PQRs of `ids` */
export default defineEventHandler(async (event) => {
  await requireRole(event, ['supervisor', 'inspector'])
  const query = await validQuery(event, pqrPickerSchema)
  return pickPqrs(await useDb(), query)
})
