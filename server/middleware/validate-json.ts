// Every JSON body sent to the API passes the limits of server/utils/json-limits.ts before a route reads it:
// too deep, or holding a lone surrogate, is a 400 with a message, never a 500. (Runs after same-origin.ts.)
const withBody = new Set(['POST', 'PUT', 'PATCH', 'DELETE'])

export default defineEventHandler(async (event) => {
  if (!withBody.has(event.method) || !event.path.startsWith('/api/')) return
  const type = String(getRequestHeader(event, 'content-type') ?? '')
  if (type && !type.includes('json')) return
  const text = await readRawBody(event, 'utf8')
  if (!text) return
  const problem = jsonBodyProblem(text)
  if (problem) throw createError({ statusCode: 400, statusMessage: 'Invalid body', message: problem.message, data: problem.data })
})
