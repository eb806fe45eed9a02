import type { MatrixEntries } from './types'

// [signed out, supervisor, inspector, welder, auditor]. Mutating routes get no body: allowed roles stop at validation (400).
// Welder 1 (KB-01) is not the demo welder account's own roster entry (KB-03).
export const entries: MatrixEntries = {
  'POST /api/welders': { expect: [401, 400, 403, 403, 403] },
  'PATCH /api/welders/[id]': { url: '/api/welders/1', expect: [401, 400, 403, 403, 403] },
  'POST /api/tests': { expect: [401, 403, 400, 403, 403] },
  'GET /api/tests/[id]': { url: '/api/tests/1', expect: [401, 200, 200, 404, 403] },
  'PATCH /api/tests/[id]': { url: '/api/tests/1', expect: [401, 403, 400, 403, 403] },
  'POST /api/tests/[id]/certify': { url: '/api/tests/1/certify', expect: [401, 403, 400, 403, 403] },
  // The demo shop does not let welders log their own continuity (403 before validation).
  'POST /api/continuity': { expect: [401, 400, 400, 403, 403] },
  'POST /api/continuity/bulk': { expect: [401, 400, 400, 403, 403] },
  'POST /api/continuity/import': { expect: [401, 400, 400, 403, 403] },
  'GET /api/continuity/standings': { expect: [401, 200, 200, 403, 403] },
  'DELETE /api/continuity/[id]': { url: '/api/continuity/999999', expect: [401, 404, 403, 403, 403] },
  'GET /api/coverage': { url: '/api/coverage?process=SMAW&position=V', expect: [401, 200, 200, 403, 403] },
  'GET /api/me/calendar.ics': { expect: [401, 403, 403, 200, 403] },
  'POST /api/me/calendar-feed': { expect: [401, 403, 403, 400, 403] },
  'DELETE /api/me/calendar-feed': { expect: [401, 403, 403, 204, 403] },
  // Public by design: the secret in the address is the key; an unknown one is a 404 for everyone.
  'GET /api/me/feed/[token]': { url: '/api/me/feed/not-a-real-calendar-token-000.ics', expect: [404, 404, 404, 404, 404] },
}
