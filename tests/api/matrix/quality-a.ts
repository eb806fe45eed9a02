import type { MatrixEntries } from './types'

// [signed out, supervisor, inspector, welder, auditor]. Welder 1 (KB-01) is not the demo welder account's own entry.
export const entries: MatrixEntries = {
  'POST /api/welders/[id]/revocations': { url: '/api/welders/1/revocations', expect: [401, 403, 400, 403, 403] },
  'GET /api/welders/[id]/revocations': { url: '/api/welders/1/revocations', expect: [401, 200, 200, 404, 403] },
  'GET /api/search/welders': { url: '/api/search/welders?q=KB', expect: [401, 200, 200, 403, 403] },
  'GET /api/search/procedures': { url: '/api/search/procedures?q=KB', expect: [401, 200, 200, 403, 403] },
  'GET /api/search/pqrs': { url: '/api/search/pqrs?q=PQR', expect: [401, 200, 200, 403, 403] },
}
