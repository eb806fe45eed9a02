/** A 409 for an edit of a stale version or of a signed (frozen) record. */
export function conflict(message: string) {
  return createError({ statusCode: 409, statusMessage: 'Conflict', message })
}

export function notFound(what: string) {
  return createError({ statusCode: 404, statusMessage: `${what} not found` })
}
