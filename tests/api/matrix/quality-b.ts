import type { MatrixEntries } from './types'

// [signed out, supervisor, inspector, welder, auditor]. Mutating routes get no body: allowed roles stop at validation (400).
// Equipment 1 is the first machine of the demo register; welder 1 (KB-01) is not the demo welder account's own entry.
export const entries: MatrixEntries = {
  'GET /api/equipment': { expect: [401, 200, 200, 200, 403] },
  'POST /api/equipment': { expect: [401, 400, 400, 403, 403] },
  'GET /api/equipment/due': { expect: [401, 200, 200, 403, 403] },
  'GET /api/equipment/[id]': { url: '/api/equipment/1', expect: [401, 200, 200, 200, 403] },
  'PATCH /api/equipment/[id]': { url: '/api/equipment/1', expect: [401, 400, 400, 403, 403] },
  'GET /api/welders/[id]/card': { url: '/api/welders/1/card?format=json', expect: [401, 200, 200, 404, 403] },
  'POST /api/welders/[id]/card-page': { url: '/api/welders/1/card-page', expect: [401, 400, 403, 403, 403] },
  'GET /api/export': { expect: [401, 200, 403, 403, 403] },
  'GET /api/export/tables/[name]': { url: '/api/export/tables/welders?format=xlsx', expect: [401, 200, 403, 403, 403] },
  'GET /api/export/archive': { expect: [401, 200, 403, 403, 403] },
  'POST /api/import/[kind]': { url: '/api/import/roster', expect: [401, 400, 403, 403, 403] },
  'GET /api/welders/[id]/imported-tests': { url: '/api/welders/1/imported-tests', expect: [401, 200, 200, 404, 403] },
  'POST /api/imported-tests/[id]/confirm': { url: '/api/imported-tests/999999/confirm', expect: [401, 403, 404, 403, 403] },
  'GET /api/imported-documents': { url: '/api/imported-documents?kind=wps', expect: [401, 200, 200, 403, 403] },
  // Public by design: the secret in the address is the key; an unknown one is a 404 for everyone.
  'GET /api/cards/[token]': { url: '/api/cards/not-a-real-card-token-0000000000', expect: [404, 404, 404, 404, 404] },
}
