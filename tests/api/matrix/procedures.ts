import type { MatrixContext, MatrixEntries } from './types'

// [signed out, supervisor, inspector, welder, auditor]. Mutating routes get no body: allowed roles answer 400, nothing is written.
const procedureId = (number: string, revision: number) => async ({ supervisor }: MatrixContext) => {
  const list = await supervisor.json<{ items: { id: number, number: string, revision: number }[] }>(`/api/procedures?q=${number}&pageSize=50`)
  return list.body.items.find(p => p.number === number && p.revision === revision)!.id
}
const approved = procedureId('KB-W01', 0)
const draft = procedureId('KB-W04', 0)
const pqr = async ({ supervisor }: MatrixContext) => {
  const list = await supervisor.json<{ items: { id: number, number: string }[] }>('/api/pqrs?q=PQR-K104')
  return list.body.items[0]!.id
}

export const entries: MatrixEntries = {
  'POST /api/procedures': { expect: [401, 400, 403, 403, 403] },
  // A draft: staff read it, a welder does not see it exists.
  'GET /api/procedures/[id]': { url: async ctx => `/api/procedures/${await draft(ctx)}`, expect: [401, 200, 200, 404, 403] },
  'PATCH /api/procedures/[id]': { url: async ctx => `/api/procedures/${await draft(ctx)}`, expect: [401, 400, 403, 403, 403] },
  'DELETE /api/procedures/[id]': { url: async ctx => `/api/procedures/${await draft(ctx)}`, expect: [401, 400, 403, 403, 403] },
  'POST /api/procedures/[id]/approve': { url: async ctx => `/api/procedures/${await draft(ctx)}/approve`, expect: [401, 400, 403, 403, 403] },
  'POST /api/procedures/[id]/revise': { url: async ctx => `/api/procedures/${await approved(ctx)}/revise`, expect: [401, 400, 403, 403, 403] },
  'POST /api/procedures/[id]/readings': { url: async ctx => `/api/procedures/${await approved(ctx)}/readings`, expect: [401, 400, 400, 400, 403] },
  'GET /api/procedures/[id]/readings': { url: async ctx => `/api/procedures/${await approved(ctx)}/readings`, expect: [401, 200, 200, 200, 403] },
  'GET /api/pqrs': { expect: [401, 200, 200, 403, 403] },
  'POST /api/pqrs': { expect: [401, 400, 403, 403, 403] },
  'GET /api/pqrs/[id]': { url: async ctx => `/api/pqrs/${await pqr(ctx)}`, expect: [401, 200, 200, 403, 403] },
  'PATCH /api/pqrs/[id]': { url: async ctx => `/api/pqrs/${await pqr(ctx)}`, expect: [401, 400, 403, 403, 403] },
  'PUT /api/pqrs/[id]/results': { url: async ctx => `/api/pqrs/${await pqr(ctx)}/results`, expect: [401, 403, 400, 403, 403] },
  'POST /api/pqrs/[id]/certify': { url: async ctx => `/api/pqrs/${await pqr(ctx)}/certify`, expect: [401, 403, 400, 403, 403] },
  'GET /api/catalogue/base-metals': { expect: [401, 200, 200, 403, 403] },
  'POST /api/catalogue/base-metals': { expect: [401, 400, 403, 403, 403] },
  'PATCH /api/catalogue/base-metals/[id]': { url: '/api/catalogue/base-metals/1', expect: [401, 400, 403, 403, 403] },
  'GET /api/catalogue/filler-metals': { expect: [401, 200, 200, 403, 403] },
  'POST /api/catalogue/filler-metals': { expect: [401, 400, 403, 403, 403] },
  'PATCH /api/catalogue/filler-metals/[id]': { url: '/api/catalogue/filler-metals/1', expect: [401, 400, 403, 403, 403] },
}
