import { idParamSchema } from '#shared/schemas/list'
import { versionBodySchema } from '#shared/schemas/fields'
import { certifyPqr } from '../../../database/pqr-writes'

/** POST /api/pqrs/:id/certify: the inspector signs the results, which freezes the PQR */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['inspector'])
  const { id } = await validParams(event, idParamSchema)
  const { version } = await validBody(event, versionBodySchema)
  const { pqr, signature } = orThrow(await certifyPqr(await useDb(), id, version, user))
  return {
    id: pqr.id, number: pqr.number, status: pqr.status, version: pqr.version,
    signature: { signerName: signature.signerName, meaning: signature.meaning, signedAt: signature.signedAt, sha256: signature.sha256, verifyCode: signature.verifyCode },
  }
})
