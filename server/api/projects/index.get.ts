import { asc, eq, inArray } from 'drizzle-orm'
import { auditorGrants, customers, projects } from '../../database/schema'

/** GET /api/projects: every project for the quality manager; an auditor sees only the projects granted to them */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'auditor'])
  const db = await useDb()
  const base = db.select({
    id: projects.id, number: projects.number, name: projects.name, startsOn: projects.startsOn, endsOn: projects.endsOn, customer: customers.name,
  }).from(projects).innerJoin(customers, eq(customers.id, projects.customerId))
  if (user.role === 'supervisor') return base.orderBy(asc(projects.number))
  const granted = db.select({ id: auditorGrants.projectId }).from(auditorGrants).where(eq(auditorGrants.accountId, user.id))
  return base.where(inArray(projects.id, granted)).orderBy(asc(projects.number))
})
