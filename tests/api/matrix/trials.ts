import type { MatrixContext, MatrixEntries } from './types'

// [signed out, supervisor, inspector, welder, auditor]. The demo shop does not let welders record trials (403).
// Mutating routes get no body: allowed roles answer 400 and nothing is written.
const series = async ({ supervisor }: MatrixContext) => {
  const list = await supervisor.json<{ items: { id: number }[] }>('/api/trials?pageSize=5')
  return list.body.items.at(-1)!.id
}
const at = (tail: string) => async (ctx: MatrixContext) => `/api/trials/${await series(ctx)}${tail}`

export const entries: MatrixEntries = {
  'GET /api/trials': { expect: [401, 200, 200, 403, 403] },
  'POST /api/trials': { expect: [401, 400, 400, 403, 403] },
  'GET /api/trials/[id]': { url: at(''), expect: [401, 200, 200, 403, 403] },
  'PATCH /api/trials/[id]': { url: at(''), expect: [401, 400, 400, 403, 403] },
  'POST /api/trials/[id]/beads': { url: at('/beads'), expect: [401, 400, 400, 403, 403] },
  // No such bead: staff get 404, nothing is removed.
  'DELETE /api/trials/[id]/beads/[beadId]': { url: at('/beads/999999'), expect: [401, 404, 404, 403, 403] },
  'GET /api/trials/[id]/proposals': { url: at('/proposals'), expect: [401, 200, 200, 403, 403] },
  'POST /api/trials/[id]/propose-pqr': { url: at('/propose-pqr'), expect: [401, 400, 403, 403, 403] },
  'POST /api/trials/[id]/propose-wps': { url: at('/propose-wps'), expect: [401, 400, 403, 403, 403] },
  'GET /api/trials/[id]/sheet': { url: at('/sheet'), expect: [401, 200, 200, 403, 403] },
  'GET /api/trials/settings': { expect: [401, 200, 200, 200, 403] },
  'PATCH /api/trials/settings': { expect: [401, 400, 403, 403, 403] },
  'GET /api/trials/starting-points': { expect: [401, 200, 200, 403, 403] },
  'POST /api/trials/starting-points': { expect: [401, 400, 403, 403, 403] },
  'DELETE /api/trials/starting-points/[id]': { url: '/api/trials/starting-points/999999', expect: [401, 404, 403, 403, 403] },
}
