import { verifyCodeSchema } from '#shared/schemas/sheet'
import { verifyCode } from '../../sheets/verify'

/**
 * GET /api/verify/:code: public, no sign-in. Whether the record behind a sheet's code still hashes to the signed value.
 * It answers only what the sheet itself prints; an unknown code is a plain 404.
 */
export default defineEventHandler(async (event) => {
  const { code } = await validParams(event, verifyCodeSchema)
  const result = orThrow(await verifyCode(await useDb(), code))
  setResponseHeader(event, 'cache-control', 'no-store')
  return result
})
