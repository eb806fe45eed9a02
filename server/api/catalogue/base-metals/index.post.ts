import { baseMetals } from '../../../database/schema'
import { isUniqueViolation } from '../../../database/procedures'
import { baseMetalSchema } from '#shared/schemas/catalogue'

/** POST /api/catalogue/base-metals: add a base metal (supervisor) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const input = await validBody(event, baseMetalSchema)
  const db = await useDb()
  try {
    return await db.transaction(async (tx) => {
      const [row] = await tx.insert(baseMetals).values(input).returning()
      await recordAudit(tx, { accountId: user.id, action: 'base-metal.create', recordType: 'base-metal', recordId: row!.id, after: row })
      setResponseStatus(event, 201)
      return row!
    })
  }
  catch (error) {
    if (isUniqueViolation(error)) throw conflict(`${input.specification} ${input.grade} is in the catalogue already.`)
    throw error
  }
})
