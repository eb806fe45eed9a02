import { fillerMetals } from '../../../database/schema'
import { isUniqueViolation } from '../../../database/procedures'
import { fillerMetalSchema } from '#shared/schemas/catalogue'

/** POST /api/catalogue/filler-metals: add a filler metal (supervisor) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const input = await validBody(event, fillerMetalSchema)
  const db = await useDb()
  try {
    return await db.transaction(async (tx) => {
      const [row] = await tx.insert(fillerMetals).values(input).returning()
      await recordAudit(tx, { accountId: user.id, action: 'filler-metal.create', recordType: 'filler-metal', recordId: row!.id, after: row })
      setResponseStatus(event, 201)
      return row!
    })
  }
  catch (error) {
    if (isUniqueViolation(error)) throw conflict(`${input.specification} ${input.classification} is in the catalogue already.`)
    throw error
  }
})
