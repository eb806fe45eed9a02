import { listWelderTests } from '../../database/welder-tests'
import { welderTestListQuerySchema } from '#shared/schemas/list-queries'

/** GET /api/tests: welder tests (WPQ); a welder sees only their own */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'welder'])
  const query = await validQuery(event, welderTestListQuerySchema)
  return listWelderTests(await useDb(), user, query)
})
