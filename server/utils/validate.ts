import type { H3Event } from 'h3'
import { invalid } from '#shared/types/outcome'
import { httpError } from './outcome'
import { z, type ZodType, type ZodTypeAny, type ZodTypeDef } from 'zod'

type Schema<T> = ZodType<T, ZodTypeDef, unknown>

function schemaFailure(where: string, error: { flatten: () => { formErrors: string[], fieldErrors: Record<string, string[] | undefined> } }) {
  const { formErrors, fieldErrors } = error.flatten()
  return httpError(invalid(where, formErrors, fieldErrors as Record<string, string[]>))
}

/** The path of the first text holding a NUL character, which PostgreSQL cannot store in text. */
export function nulPath(value: unknown, path = ''): string | null {
  if (typeof value === 'string') return value.includes('\u0000') ? path || 'body' : null
  if (value && typeof value === 'object') {
    for (const [key, inner] of Object.entries(value)) {
      const here = path ? `${path}.${key}` : key
      if (key.includes('\u0000')) return here
      const found = nulPath(inner, here)
      if (found) return found
    }
  }
  return null
}

/** The fields an object schema knows, looking through refinements, defaults and optionals; null for other shapes. */
function knownFields(schema: ZodTypeAny): Set<string> | null {
  let current: ZodTypeAny = schema
  for (let depth = 0; depth < 8; depth++) {
    if (current instanceof z.ZodObject) return new Set(Object.keys(current.shape as object))
    if (current instanceof z.ZodEffects) current = current.innerType()
    else if (current instanceof z.ZodOptional || current instanceof z.ZodNullable) current = current.unwrap()
    else if (current instanceof z.ZodDefault) current = current.removeDefault()
    else return null
  }
  return null
}

/** A body may not carry fields its schema does not name (OWASP ASVS 4.0 V5.1.2: no mass assignment). */
function unknownField(schema: ZodTypeAny, input: unknown): string | null {
  if (!input || typeof input !== 'object' || Array.isArray(input)) return null
  const known = knownFields(schema)
  if (!known) return null
  return Object.keys(input).find(key => !known.has(key)) ?? null
}

function safeParse<T>(where: string, schema: Schema<T>, input: unknown): T {
  const unknown = where === 'body' ? unknownField(schema, input) : null
  if (unknown !== null) {
    throw httpError(invalid('body', [], { [unknown]: ['Not a field of this form'] }))
  }
  const nul = nulPath(input)
  if (nul) {
    throw httpError(invalid(where, [], { [nul]: ['Contains a NUL character'] }))
  }
  const result = schema.safeParse(input)
  if (!result.success) throw schemaFailure(where, result.error)
  return result.data
}

/** 400 with field messages, never a 500, for a bad query string. */
export async function validQuery<T>(event: H3Event, schema: Schema<T>): Promise<T> {
  return safeParse('query', schema, getQuery(event))
}

export async function validParams<T>(event: H3Event, schema: Schema<T>): Promise<T> {
  return safeParse('address', schema, getRouterParams(event))
}

/** Malformed JSON is a 400 too. */
export async function validBody<T>(event: H3Event, schema: Schema<T>): Promise<T> {
  let body: unknown
  try {
    body = await readBody(event)
  }
  catch {
    throw httpError(invalid('body', ['The body is not valid JSON'], {}))
  }
  return safeParse('body', schema, body)
}
