// Cross-site request forgery guard: a request that changes data must come from a page of this origin.
// Browsers send Origin on every POST/PUT/PATCH/DELETE; next-auth's own routes carry its CSRF token instead.
const mutating = new Set(['POST', 'PUT', 'PATCH', 'DELETE'])

export default defineEventHandler((event) => {
  if (!mutating.has(event.method) || !event.path.startsWith('/api/') || event.path.startsWith('/api/auth/')) return
  // Routes for other shop systems take only a bearer token, never the session cookie, so a cross-site page cannot ride them.
  if (event.path.startsWith('/api/ext/')) return
  const origin = getRequestHeader(event, 'origin')
  let host: string | undefined
  try {
    host = origin ? new URL(origin).host : undefined
  }
  catch {
    host = undefined
  }
  if (!host || host !== getRequestHost(event, { xForwardedHost: true })) {
    throw createError({ statusCode: 403, statusMessage: 'Cross-site request refused' })
  }
})
