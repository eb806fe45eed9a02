import { and, eq, inArray } from 'drizzle-orm'
import type { Db } from '../database/client'
import { auditorGrants, procedurePqrs, procedures, projectProcedures, projectWelders, projects, welderTests } from '../database/schema'
import type { SessionUser } from '../utils/auth'

/**
 * Who may read which record, beyond the role check: a welder only their own tests and logs and approved WPSs,
 * an auditor only what belongs to a project granted to them. A record someone may not read is "not found".
 */
export async function grantedProjectIds(db: Db, accountId: number): Promise<number[]> {
  const rows = await db.select({ id: auditorGrants.projectId }).from(auditorGrants).where(eq(auditorGrants.accountId, accountId))
  return rows.map(r => r.id)
}

export async function mayReadProject(db: Db, user: SessionUser, projectId: number) {
  if (user.role === 'supervisor') return (await db.select({ id: projects.id }).from(projects).where(eq(projects.id, projectId))).length > 0
  if (user.role === 'auditor') return (await grantedProjectIds(db, user.id)).includes(projectId)
  return false
}

export async function mayReadProcedure(db: Db, user: SessionUser, id: number) {
  const [row] = await db.select({ status: procedures.status }).from(procedures).where(eq(procedures.id, id))
  if (!row) return false
  if (user.role === 'supervisor' || user.role === 'inspector') return true
  if (user.role === 'welder') return row.status === 'approved'
  const granted = await grantedProjectIds(db, user.id)
  if (!granted.length) return false
  const hit = await db.select({ id: projectProcedures.procedureId }).from(projectProcedures)
    .where(and(eq(projectProcedures.procedureId, id), inArray(projectProcedures.projectId, granted))).limit(1)
  return hit.length > 0
}

export async function mayReadPqr(db: Db, user: SessionUser, id: number) {
  if (user.role === 'supervisor' || user.role === 'inspector') return true
  if (user.role !== 'auditor') return false
  const granted = await grantedProjectIds(db, user.id)
  if (!granted.length) return false
  const hit = await db.select({ id: procedurePqrs.pqrId }).from(procedurePqrs)
    .innerJoin(projectProcedures, eq(projectProcedures.procedureId, procedurePqrs.procedureId))
    .where(and(eq(procedurePqrs.pqrId, id), inArray(projectProcedures.projectId, granted))).limit(1)
  return hit.length > 0
}

/** An auditor reads a welder's sheets only through a granted project the welder worked on. */
export async function auditorMayReadWelder(db: Db, user: SessionUser, welderId: number, projectId?: number) {
  const granted = await grantedProjectIds(db, user.id)
  const scope = projectId === undefined ? granted : granted.filter(id => id === projectId)
  if (!scope.length) return false
  const hit = await db.select({ id: projectWelders.welderId }).from(projectWelders)
    .where(and(eq(projectWelders.welderId, welderId), inArray(projectWelders.projectId, scope))).limit(1)
  return hit.length > 0
}

export async function mayReadWelderTest(db: Db, user: SessionUser, id: number) {
  const [row] = await db.select({ welderId: welderTests.welderId, status: welderTests.status }).from(welderTests).where(eq(welderTests.id, id))
  if (!row) return false
  if (user.role === 'supervisor' || user.role === 'inspector') return true
  if (user.role === 'welder') return user.welderId === row.welderId
  // The packet carries certified qualifications; an auditor reads those.
  return row.status === 'certified' && auditorMayReadWelder(db, user, row.welderId)
}

export async function mayReadWelder(db: Db, user: SessionUser, welderId: number, projectId?: number) {
  if (user.role === 'supervisor' || user.role === 'inspector') return true
  if (user.role === 'welder') return user.welderId === welderId
  return auditorMayReadWelder(db, user, welderId, projectId)
}
