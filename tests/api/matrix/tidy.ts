import type { MatrixEntries } from './types'

export const entries: MatrixEntries = {
  'GET /api/continuity/imports': { expect: [401, 200, 200, 403, 403] },
  // No such import: the quality manager reaches the lookup (404); everyone else is stopped by the role check first.
  'POST /api/continuity/imports/[id]/undo': { url: '/api/continuity/imports/999999/undo', expect: [401, 404, 403, 403, 403] },
}
