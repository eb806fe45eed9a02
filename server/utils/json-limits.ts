// Limits on JSON bodies, checked before any route reads them (server/middleware/validate-json.ts):
// nesting deeper than MAX_JSON_DEPTH would exhaust the stack of the code that walks a body, and a lone UTF-16
// surrogate ("\ud800" in JSON) is no character at all and cannot be stored.
import { hasLoneSurrogate } from '#shared/schemas/fields'

/** No form of Rootface nests deeper than a few levels (a procedure's variables: about five). */
export const MAX_JSON_DEPTH = 64

/** Whether JSON text nests arrays and objects deeper than `max`; one pass over the text, strings skipped. */
export function jsonTooDeep(text: string, max = MAX_JSON_DEPTH) {
  let depth = 0
  let inString = false
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i)
    if (inString) {
      if (c === 92) i++ // backslash: skip the escaped character
      else if (c === 34) inString = false
    }
    else if (c === 34) inString = true
    else if (c === 91 || c === 123) {
      if (++depth > max) return true
    }
    else if (c === 93 || c === 125) depth--
  }
  return false
}

/** The path of the first key or text with a lone surrogate ('body' for the top level), or null. Depth is bounded already. */
export function loneSurrogatePath(value: unknown, path = ''): string | null {
  if (typeof value === 'string') return hasLoneSurrogate(value) ? path || 'body' : null
  if (value && typeof value === 'object') {
    for (const [key, inner] of Object.entries(value)) {
      const here = path ? `${path}.${key}` : key
      if (hasLoneSurrogate(key)) return here.replace(/[\uD800-\uDFFF]/g, '\uFFFD')
      const found = loneSurrogatePath(inner, here)
      if (found) return found
    }
  }
  return null
}

/** The 400 with field messages for a body over a limit, or null when the body is fine (or not JSON: the route says so). */
export function jsonBodyProblem(text: string) {
  if (jsonTooDeep(text)) {
    const message = `The body nests deeper than ${MAX_JSON_DEPTH} levels`
    return { message, data: { formErrors: [message], fieldErrors: {} } }
  }
  if (!/\\u[dD][89a-fA-F]/.test(text)) return null // no surrogate escapes at all: nothing to look for
  let parsed: unknown
  try {
    parsed = JSON.parse(text)
  }
  catch {
    return null
  }
  const path = loneSurrogatePath(parsed)
  if (!path) return null
  const message = `${path}: contains a broken character (a lone UTF-16 surrogate); type it again`
  return { message, data: { formErrors: [], fieldErrors: { [path]: ['Contains a broken character; type it again'] } } }
}
