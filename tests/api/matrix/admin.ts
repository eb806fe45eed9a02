import type { MatrixEntries } from './types'

export const entries: MatrixEntries = {
  'GET /api/admin/stats': { expect: [401, 200, 403, 403, 403] },
}
