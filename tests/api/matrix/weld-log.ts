import type { MatrixEntries } from './types'

// Project 1 is the demo's KB-2611 (granted to the demo auditor); joint 1 is its first register entry.
const none = 999999

const registerEntries: MatrixEntries = {
  'GET /api/projects/[id]/joints': { url: '/api/projects/1/joints', expect: [401, 200, 200, 403, 200] },
  'POST /api/projects/[id]/joints': { url: '/api/projects/1/joints', expect: [401, 400, 403, 403, 403] },
  'POST /api/projects/[id]/joints/import': { url: '/api/projects/1/joints/import', expect: [401, 400, 400, 403, 403] },
  'GET /api/projects/[id]/joints/choices': { url: '/api/projects/1/joints/choices', expect: [401, 200, 200, 403, 403] },
  'GET /api/projects/[id]/joints/[jointId]': { url: '/api/projects/1/joints/1', expect: [401, 200, 200, 403, 200] },
  'PATCH /api/projects/[id]/joints/[jointId]': { url: '/api/projects/1/joints/1', expect: [401, 400, 403, 403, 403] },
  'DELETE /api/projects/[id]/joints/[jointId]': { url: `/api/projects/1/joints/${none}`, expect: [401, 404, 403, 403, 403] },
  'GET /api/projects/[id]/joints/[jointId]/check': { url: '/api/projects/1/joints/1/check', expect: [401, 200, 200, 403, 403] },
  'POST /api/projects/[id]/joints/[jointId]/welded': { url: '/api/projects/1/joints/1/welded', expect: [401, 400, 400, 403, 403] },
  'POST /api/projects/[id]/joints/[jointId]/repairs': { url: '/api/projects/1/joints/1/repairs', expect: [401, 400, 400, 403, 403] },
  'POST /api/projects/[id]/joints/[jointId]/examinations': { url: '/api/projects/1/joints/1/examinations', expect: [401, 400, 400, 403, 403] },
  'GET /api/welders/[id]/rejects': { url: '/api/welders/1/rejects', expect: [401, 200, 200, 404, 403] },
  'GET /api/tags/[id]': { url: '/api/tags/1', expect: [401, 200, 200, 200, 200] },
  'GET /api/registers': { expect: [401, 200, 200, 403, 200] },
  'GET /api/dashboard/rejects': { expect: [401, 200, 200, 403, 403] },
}

// API tokens (quality manager) and the routes for other shop systems, which answer only to a bearer token: a session is 401.
const tokenEntries: MatrixEntries = {
  'GET /api/tokens': { expect: [401, 200, 403, 403, 403] },
  'POST /api/tokens': { expect: [401, 400, 403, 403, 403] },
  'DELETE /api/tokens/[id]': { url: `/api/tokens/${none}`, expect: [401, 404, 403, 403, 403] },
  'POST /api/ext/joints/welded': { expect: [401, 401, 401, 401, 401] },
  'POST /api/ext/continuity': { expect: [401, 401, 401, 401, 401] },
}

export const entries: MatrixEntries = { ...registerEntries, ...tokenEntries }
