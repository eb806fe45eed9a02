import { idParamSchema } from '#shared/schemas/list'
import { approveBodySchema } from '#shared/schemas/procedure'
import { approveProcedure } from '../../../database/procedure-writes'

/** POST /api/procedures/:id/approve: sign and freeze a supported draft, superseding the earlier approved revision (supervisor) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const { version, handCheck } = await validBody(event, approveBodySchema)
  const { procedure, signature, superseded } = orThrow(await approveProcedure(await useDb(), id, version, user, handCheck))
  return {
    id: procedure.id, number: procedure.number, revision: procedure.revision, status: procedure.status, version: procedure.version,
    signature: { signerName: signature.signerName, meaning: signature.meaning, signedAt: signature.signedAt, sha256: signature.sha256, verifyCode: signature.verifyCode },
    superseded,
  }
})
