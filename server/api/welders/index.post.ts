import { insertWelder } from '../../database/welders'
import { welderSchema } from '#shared/schemas/welder'

/** POST /api/welders: the quality manager adds a welder to the roster (a stamp already used is a 400 on `stamp`) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const input = await validBody(event, welderSchema)
  const row = orThrow(await insertWelder(await useDb(), input, user.id))
  setResponseStatus(event, 201)
  return row
})
