import type { MatrixEntries } from './types'

// Order: [signed out, supervisor, inspector, welder, auditor]. Mutating calls carry no body, so nothing is written.
export const entries: MatrixEntries = {
  'GET /api/mail': { expect: [401, 200, 403, 403, 403] },
  'POST /api/mail/run-reminders': { expect: [401, 400, 403, 403, 403] },
  'POST /api/mail/send': { expect: [401, 400, 403, 403, 403] },
  'POST /api/mail/[id]/retry': { url: '/api/mail/999999/retry', expect: [401, 404, 403, 403, 403] },
  'GET /api/accounts': { expect: [401, 200, 403, 403, 403] },
  'POST /api/accounts': { expect: [401, 400, 403, 403, 403] },
  'GET /api/accounts/[id]': { url: '/api/accounts/999999', expect: [401, 404, 403, 403, 403] },
  'PATCH /api/accounts/[id]': { url: '/api/accounts/999999', expect: [401, 400, 403, 403, 403] },
  'POST /api/accounts/[id]/invitation': { url: '/api/accounts/999999/invitation', expect: [401, 404, 403, 403, 403] },
  // Public: the link's token is the proof; without one every caller gets a 400.
  'GET /api/password/link': { expect: [400, 400, 400, 400, 400] },
  'POST /api/password/set': { expect: [400, 400, 400, 400, 400] },
  'POST /api/password/forgot': { expect: [400, 400, 400, 400, 400] },
  // Without recordType and recordId the list is a 400 for every role that may list files at all.
  'GET /api/attachments': { expect: [401, 400, 400, 400, 400] },
  'POST /api/attachments': { expect: [401, 400, 400, 403, 403] },
  'GET /api/attachments/[id]': { url: '/api/attachments/999999', expect: [401, 404, 404, 404, 404] },
  'DELETE /api/attachments/[id]': { url: '/api/attachments/999999', expect: [401, 404, 404, 403, 403] },
  'GET /api/attachments/[id]/thumbnail': { url: '/api/attachments/999999/thumbnail', expect: [401, 404, 404, 404, 404] },
}
