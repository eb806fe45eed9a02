import { and, eq, ne } from 'drizzle-orm'
import { baseMetals, pqrs } from '../../../database/schema'
import { isUniqueViolation } from '../../../database/procedures'
import { baseMetalPatchSchema } from '#shared/schemas/catalogue'
import { idParamSchema } from '#shared/schemas/list'

/** PATCH /api/catalogue/base-metals/:id: correct a base metal (supervisor); 409 once a signed PQR relies on it */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const patch = await validBody(event, baseMetalPatchSchema)
  const db = await useDb()
  try {
    return await db.transaction(async (tx) => {
      const [row] = await tx.select().from(baseMetals).where(eq(baseMetals.id, id)).for('update')
      if (!row) throw notFound('Base metal')
      const [signed] = await tx.select({ number: pqrs.number }).from(pqrs).where(and(eq(pqrs.baseMetalId, id), ne(pqrs.status, 'recorded'))).limit(1)
      if (signed) throw conflict(`${signed.number} is signed with ${row.specification} ${row.grade}: add a new catalogue entry instead of changing this one.`)
      const [saved] = await tx.update(baseMetals).set(patch).where(eq(baseMetals.id, id)).returning()
      await recordAudit(tx, { accountId: user.id, action: 'base-metal.update', recordType: 'base-metal', recordId: id, before: row, after: saved })
      return saved!
    })
  }
  catch (error) {
    if (isUniqueViolation(error)) throw conflict('That specification and grade is in the catalogue already.')
    throw error
  }
})
