import type { MatrixEntries } from './types'

// Test 1 of the demo is not an ISO 9606-1 test: readers get 404 (the route answers ISO tests only), writers reach validation.
export const entries: MatrixEntries = {
  'GET /api/tests/[id]/iso-validity': { url: '/api/tests/1/iso-validity', expect: [401, 404, 404, 404, 404] },
  'POST /api/tests/[id]/iso-validity': { url: '/api/tests/1/iso-validity', expect: [401, 400, 400, 403, 403] },
}
