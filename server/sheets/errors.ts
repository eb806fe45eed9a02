/** A 400 that names one field, shaped like validBody's messages, for checks only the database can make (a taken name). */
export function invalidField(field: string, message: string) {
  return createError({
    statusCode: 400, statusMessage: 'Invalid body', message: `${field}: ${message}`,
    data: { formErrors: [], fieldErrors: { [field]: [message] } },
  })
}
