import type { H3Event } from 'h3'
import type { ZodType, ZodTypeDef } from 'zod'

type Schema<T> = ZodType<T, ZodTypeDef, unknown>

function invalid(where: string, error: { flatten: () => { formErrors: string[], fieldErrors: Record<string, string[] | undefined> } }) {
  const { formErrors, fieldErrors } = error.flatten()
  return createError({
    statusCode: 400,
    statusMessage: `Invalid ${where}`,
    message: formErrors[0] ?? Object.entries(fieldErrors).map(([k, v]) => `${k}: ${v?.[0]}`).join('; '),
    data: { formErrors, fieldErrors },
  })
}

/** 400 with field messages, never a 500, for a bad query string. */
export async function validQuery<T>(event: H3Event, schema: Schema<T>): Promise<T> {
  const result = schema.safeParse(getQuery(event))
  if (!result.success) throw invalid('query', result.error)
  return result.data
}

export async function validParams<T>(event: H3Event, schema: Schema<T>): Promise<T> {
  const result = schema.safeParse(getRouterParams(event))
  if (!result.success) throw invalid('address', result.error)
  return result.data
}

/** Malformed JSON is a 400 too. */
export async function validBody<T>(event: H3Event, schema: Schema<T>): Promise<T> {
  let body: unknown
  try {
    body = await readBody(event)
  }
  catch {
    throw createError({ statusCode: 400, statusMessage: 'Invalid body', message: 'The body is not valid JSON', data: { formErrors: ['The body is not valid JSON'], fieldErrors: {} } })
  }
  const result = schema.safeParse(body)
  if (!result.success) throw invalid('body', result.error)
  return result.data
}
