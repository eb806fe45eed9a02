/** A 400 naming one field, in the same shape as validBody's messages. */
export function fieldError(field: string, message: string) {
  return createError({
    statusCode: 400, statusMessage: 'Invalid body', message: `${field}: ${message}`,
    data: { formErrors: [], fieldErrors: { [field]: [message] } },
  })
}
