/** The plain message of a failed $fetch: the route's message, its first field message, or a fallback. */
export function apiErrorMessage(error: unknown, fallback = 'That did not work. Try again.'): string {
  const data = (error as { data?: { message?: string, data?: { fieldErrors?: Record<string, string[]>, formErrors?: string[] } } })?.data
  const field = Object.entries(data?.data?.fieldErrors ?? {}).find(([, v]) => v?.length)
  if (data?.message) return data.message
  if (field) return `${field[0]}: ${field[1][0]}`
  return data?.data?.formErrors?.[0] ?? fallback
}

/** The HTTP status of a failed $fetch, when there is one. */
export function apiErrorStatus(error: unknown): number | undefined {
  return (error as { statusCode?: number, status?: number })?.statusCode ?? (error as { status?: number })?.status
}
