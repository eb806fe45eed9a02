/**
 * The one reader of a failed API call. Every route fails with the shape `httpError` (server/utils/outcome.ts) builds from a
 * `Failure` (shared/types/outcome.ts): a status, a message and, for bad input, `data.fieldErrors` by field path.
 */
export interface ApiFailure {
  /** the HTTP status, when the request reached the server */
  status: number | undefined
  /** one plain sentence to show: the route's message, its first field message, or the fallback */
  message: string
  /** the first message of each field, by path, ready for vee-validate's `setErrors` */
  fields: Record<string, string>
  /** row messages of a rejected import */
  rows: unknown[]
}

interface ErrorBody { message?: string, statusMessage?: string, data?: { fieldErrors?: Record<string, string[] | undefined>, formErrors?: string[], rowErrors?: unknown[] } }

export function apiFailure(error: unknown, fallback = 'That did not work. Try again.'): ApiFailure {
  const e = error as { data?: ErrorBody, statusCode?: number, status?: number } | null | undefined
  const body = e?.data
  const fields = Object.fromEntries(Object.entries(body?.data?.fieldErrors ?? {})
    .filter((entry): entry is [string, string[]] => !!entry[1]?.length).map(([path, messages]) => [path, messages[0]!]))
  const first = Object.entries(fields)[0]
  const message = body?.message ?? (first ? `${first[0]}: ${first[1]}` : undefined) ?? body?.data?.formErrors?.[0] ?? body?.statusMessage ?? fallback
  return { status: e?.statusCode ?? e?.status, message, fields, rows: body?.data?.rowErrors ?? [] }
}

/** Puts a failed call's field messages on the form (vee-validate `setErrors`) and returns the sentence to show. */
export function showApiFailure(error: unknown, setErrors?: (errors: Record<string, string>) => void, fallback?: string): string {
  const failure = apiFailure(error, fallback)
  if (setErrors && Object.keys(failure.fields).length) setErrors(failure.fields)
  return failure.message
}

/** The plain message of a failed call. */
export const apiErrorMessage = (error: unknown, fallback?: string) => apiFailure(error, fallback).message

/** The HTTP status of a failed call, when there is one. */
export const apiErrorStatus = (error: unknown) => apiFailure(error).status
