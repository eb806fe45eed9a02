import type { MatrixEntries } from './types'

// Without {confirm: true} the allowed roles get 400 and no session ends (the matrix's clients stay signed in).
export const entries: MatrixEntries = {
  'POST /api/me/sign-out-everywhere': { expect: [401, 400, 400, 400, 400] },
  'POST /api/accounts/[id]/sign-out': { url: '/api/accounts/1/sign-out', expect: [401, 400, 403, 403, 403] },
}
