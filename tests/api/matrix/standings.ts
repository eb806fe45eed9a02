import type { MatrixEntries } from './types'

export const entries: MatrixEntries = {
  'GET /api/continuity/lapses': { expect: [401, 200, 200, 403, 403] },
}
