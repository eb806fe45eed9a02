import type { MatrixEntries } from './types'

// Welder 1 (KB-01) is not the demo welder account's own roster entry (KB-03).
export const entries: MatrixEntries = {
  'GET /api/health': { expect: [200, 200, 200, 200, 200] },
  'GET /api/welders': { expect: [401, 200, 200, 403, 403] },
  'GET /api/welders/[id]': { url: '/api/welders/1', expect: [401, 200, 200, 404, 403] },
  'GET /api/procedures': { expect: [401, 200, 200, 200, 403] },
  'GET /api/tests': { expect: [401, 200, 200, 200, 403] },
  'GET /api/continuity': { expect: [401, 200, 200, 200, 403] },
  'GET /api/me/qualifications': { expect: [401, 403, 403, 200, 403] },
  'GET /api/projects': { expect: [401, 200, 403, 403, 200] },
  'GET /api/dashboard': { expect: [401, 200, 200, 403, 403] },
}
