import type { MatrixEntries } from './types'

// Demo ids: procedure 3 = KB-W02 rev. 1 (approved, project KB-2611), PQR 2 = PQR-K102 (behind it), test 5 = KB-03's
// GMAW test (the welder account's own, certified), welder 3 = KB-03, project 1 = KB-2611 (granted to the auditor).
// Deleting routes point at ids that do not exist (404) or at a customer with projects (409), so the matrix deletes nothing.
const none = 999999

export const entries: MatrixEntries = {
  'GET /api/sheets/procedures/[id]': { url: '/api/sheets/procedures/3?format=json', expect: [401, 200, 200, 200, 200] },
  'GET /api/sheets/pqrs/[id]': { url: '/api/sheets/pqrs/2?format=json', expect: [401, 200, 200, 403, 200] },
  'GET /api/sheets/tests/[id]': { url: '/api/sheets/tests/5?format=json', expect: [401, 200, 200, 200, 200] },
  'GET /api/sheets/continuity/[welderId]': { url: '/api/sheets/continuity/3?projectId=1&format=json', expect: [401, 200, 200, 200, 200] },
  // Public: no sign-in; an unknown code is a 404 for everyone
  'GET /api/verify/[code]': { url: '/api/verify/ZZZZZZZZZZ', expect: [404, 404, 404, 404, 404] },
  'GET /api/customers': { expect: [401, 200, 403, 403, 403] },
  'POST /api/customers': { expect: [401, 400, 403, 403, 403] },
  'PATCH /api/customers/[id]': { url: '/api/customers/1', expect: [401, 400, 403, 403, 403] },
  'DELETE /api/customers/[id]': { url: '/api/customers/1', expect: [401, 409, 403, 403, 403] },
  'POST /api/projects': { expect: [401, 400, 403, 403, 403] },
  'GET /api/projects/[id]': { url: '/api/projects/1', expect: [401, 200, 403, 403, 200] },
  'PATCH /api/projects/[id]': { url: '/api/projects/1', expect: [401, 400, 403, 403, 403] },
  'DELETE /api/projects/[id]': { url: `/api/projects/${none}`, expect: [401, 404, 403, 403, 403] },
  'GET /api/projects/[id]/choices': { url: '/api/projects/1/choices', expect: [401, 200, 403, 403, 403] },
  'POST /api/projects/[id]/procedures': { url: '/api/projects/1/procedures', expect: [401, 400, 403, 403, 403] },
  'DELETE /api/projects/[id]/procedures/[procedureId]': { url: `/api/projects/1/procedures/${none}`, expect: [401, 404, 403, 403, 403] },
  'POST /api/projects/[id]/welders': { url: '/api/projects/1/welders', expect: [401, 400, 403, 403, 403] },
  'DELETE /api/projects/[id]/welders/[welderId]': { url: `/api/projects/1/welders/${none}`, expect: [401, 404, 403, 403, 403] },
  'POST /api/projects/[id]/auditors': { url: '/api/projects/1/auditors', expect: [401, 400, 403, 403, 403] },
  'DELETE /api/projects/[id]/auditors/[accountId]': { url: `/api/projects/1/auditors/${none}`, expect: [401, 404, 403, 403, 403] },
  'GET /api/projects/[id]/packets': { url: '/api/projects/1/packets', expect: [401, 200, 403, 403, 200] },
  'POST /api/packets': { expect: [401, 400, 403, 403, 400] },
  'GET /api/packets/[id]': { url: `/api/packets/${none}`, expect: [401, 404, 403, 403, 404] },
  'GET /api/packets/[id]/file': { url: `/api/packets/${none}/file`, expect: [401, 404, 403, 403, 404] },
  'GET /api/signoffs': { expect: [401, 200, 200, 403, 403] },
  'POST /api/signoffs': { expect: [401, 400, 400, 403, 403] },
  'PATCH /api/signoffs/[id]': { url: '/api/signoffs/1', expect: [401, 400, 400, 403, 403] },
  'GET /api/signoffs/candidates': { expect: [401, 200, 200, 403, 403] },
}
