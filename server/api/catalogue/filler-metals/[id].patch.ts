import { and, eq, ne } from 'drizzle-orm'
import { fillerMetals, pqrs } from '../../../database/schema'
import { isUniqueViolation } from '../../../database/procedures'
import { fillerMetalPatchSchema } from '#shared/schemas/catalogue'
import { idParamSchema } from '#shared/schemas/list'

/** PATCH /api/catalogue/filler-metals/:id: correct a filler metal (supervisor); 409 once a signed PQR relies on it */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const patch = await validBody(event, fillerMetalPatchSchema)
  const db = await useDb()
  try {
    return await db.transaction(async (tx) => {
      const [row] = await tx.select().from(fillerMetals).where(eq(fillerMetals.id, id)).for('update')
      if (!row) throw notFound('Filler metal')
      const [signed] = await tx.select({ number: pqrs.number }).from(pqrs).where(and(eq(pqrs.fillerMetalId, id), ne(pqrs.status, 'recorded'))).limit(1)
      if (signed) throw conflict(`${signed.number} is signed with ${row.specification} ${row.classification}: add a new catalogue entry instead of changing this one.`)
      const [saved] = await tx.update(fillerMetals).set(patch).where(eq(fillerMetals.id, id)).returning()
      await recordAudit(tx, { accountId: user.id, action: 'filler-metal.update', recordType: 'filler-metal', recordId: id, before: row, after: saved })
      return saved!
    })
  }
  catch (error) {
    if (isUniqueViolation(error)) throw conflict('That specification and classification is in the catalogue already.')
    throw error
  }
})
