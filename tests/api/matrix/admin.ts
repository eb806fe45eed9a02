import type { MatrixEntries } from './types'

export const entries: MatrixEntries = {
  'GET /api/audit': { expect: [401, 200, 403, 403, 403] },
  'GET /api/admin/stats': { expect: [401, 200, 403, 403, 403] },
  // On a PostgreSQL server the live backup is refused (409): pg_dump does it there.
  'GET /api/admin/backup': { expect: [401, process.env.TEST_DATABASE_URL ? 409 : 200, 403, 403, 403] },
}
