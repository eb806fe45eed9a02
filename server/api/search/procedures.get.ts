import { pickProcedures } from '../../database/pickers'
import { procedurePickerSchema } from '#shared/schemas/picker'

/** GET /api/search/procedures?q=: the WPS picker's matches as the user types (staff), or the WPSs of `ids` */
export default defineEventHandler(async (event) => {
  await requireRole(event, ['supervisor', 'inspector'])
  const query = await validQuery(event, procedurePickerSchema)
  return pickProcedures(await useDb(), query)
})
