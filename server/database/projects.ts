import { and, asc, count, eq, inArray } from 'drizzle-orm'
import type { Db } from './client'
import {
  accounts, auditorGrants, customers, packetFiles, packets, procedures, projectProcedures, projectWelders, projects, welders,
} from './schema'
import type { CustomerInput, ProjectInput } from '../../shared/schemas/project'
import { recordAudit } from '../utils/audit'

/** Customers and projects: what the quality manager sets up so an auditor can be handed a packet. */

const asTx = (tx: unknown) => tx as Db

export async function listCustomers(db: Db) {
  const rows = await db.select({ id: customers.id, name: customers.name, contact: customers.contact, version: customers.version, projects: count(projects.id) })
    .from(customers).leftJoin(projects, eq(projects.customerId, customers.id)).groupBy(customers.id).orderBy(asc(customers.name))
  return rows
}

async function nameTaken(db: Db, name: string, except?: number) {
  const rows = await db.select({ id: customers.id }).from(customers).where(eq(customers.name, name))
  return rows.some(r => r.id !== except)
}

export async function createCustomer(db: Db, input: CustomerInput, accountId: number) {
  if (await nameTaken(db, input.name)) return { error: 'name' as const }
  return db.transaction(async (tx) => {
    const [row] = await tx.insert(customers).values(input).returning()
    await recordAudit(asTx(tx), { accountId, action: 'create', recordType: 'customer', recordId: row!.id, after: row })
    return { row: row! }
  })
}

export async function updateCustomer(db: Db, id: number, input: CustomerInput & { version: number }, accountId: number) {
  const [before] = await db.select().from(customers).where(eq(customers.id, id))
  if (!before) return { error: 'missing' as const }
  if (before.version !== input.version) return { error: 'stale' as const }
  if (await nameTaken(db, input.name, id)) return { error: 'name' as const }
  return db.transaction(async (tx) => {
    const [row] = await tx.update(customers).set({ name: input.name, contact: input.contact, version: before.version + 1 })
      .where(and(eq(customers.id, id), eq(customers.version, input.version))).returning()
    if (!row) return { error: 'stale' as const }
    await recordAudit(asTx(tx), { accountId, action: 'update', recordType: 'customer', recordId: id, before, after: row })
    return { row }
  })
}

export async function deleteCustomer(db: Db, id: number, accountId: number) {
  const [before] = await db.select().from(customers).where(eq(customers.id, id))
  if (!before) return { error: 'missing' as const }
  const [used] = await db.select({ n: count() }).from(projects).where(eq(projects.customerId, id))
  if ((used?.n ?? 0) > 0) return { error: 'in-use' as const }
  await db.transaction(async (tx) => {
    await tx.delete(customers).where(eq(customers.id, id))
    await recordAudit(asTx(tx), { accountId, action: 'delete', recordType: 'customer', recordId: id, before })
  })
  return { ok: true as const }
}

async function projectNumberTaken(db: Db, number: string, except?: number) {
  const rows = await db.select({ id: projects.id }).from(projects).where(eq(projects.number, number))
  return rows.some(r => r.id !== except)
}

async function customerExists(db: Db, id: number) {
  return (await db.select({ id: customers.id }).from(customers).where(eq(customers.id, id))).length > 0
}

export async function createProject(db: Db, input: ProjectInput, accountId: number) {
  if (!await customerExists(db, input.customerId)) return { error: 'customer' as const }
  if (await projectNumberTaken(db, input.number)) return { error: 'number' as const }
  return db.transaction(async (tx) => {
    const [row] = await tx.insert(projects).values(input).returning()
    await recordAudit(asTx(tx), { accountId, action: 'create', recordType: 'project', recordId: row!.id, after: row })
    return { row: row! }
  })
}

export async function updateProject(db: Db, id: number, input: Partial<ProjectInput> & { version: number }, accountId: number) {
  const [before] = await db.select().from(projects).where(eq(projects.id, id))
  if (!before) return { error: 'missing' as const }
  if (before.version !== input.version) return { error: 'stale' as const }
  const { version, ...changes } = input
  const next = { ...before, ...changes }
  if (next.endsOn && next.endsOn < next.startsOn) return { error: 'period' as const }
  if (changes.customerId !== undefined && !await customerExists(db, changes.customerId)) return { error: 'customer' as const }
  if (changes.number !== undefined && await projectNumberTaken(db, changes.number, id)) return { error: 'number' as const }
  return db.transaction(async (tx) => {
    const [row] = await tx.update(projects).set({ ...changes, version: version + 1 }).where(and(eq(projects.id, id), eq(projects.version, version))).returning()
    if (!row) return { error: 'stale' as const }
    await recordAudit(asTx(tx), { accountId, action: 'update', recordType: 'project', recordId: id, before, after: row })
    return { row }
  })
}

/** A project goes with its links, grants and packets; the records it listed stay. */
export async function deleteProject(db: Db, id: number, accountId: number) {
  const [before] = await db.select().from(projects).where(eq(projects.id, id))
  if (!before) return false
  await db.transaction(async (tx) => {
    const ids = (await tx.select({ id: packets.id }).from(packets).where(eq(packets.projectId, id))).map(p => p.id)
    if (ids.length) {
      await tx.delete(packetFiles).where(inArray(packetFiles.packetId, ids))
      await tx.delete(packets).where(inArray(packets.id, ids))
    }
    await tx.delete(projects).where(eq(projects.id, id))
    await recordAudit(asTx(tx), { accountId, action: 'delete', recordType: 'project', recordId: id, before })
  })
  return true
}

export async function projectDetail(db: Db, id: number) {
  const [project] = await db.select({
    id: projects.id, number: projects.number, name: projects.name, startsOn: projects.startsOn, endsOn: projects.endsOn,
    version: projects.version, customerId: projects.customerId, customer: customers.name,
  }).from(projects).innerJoin(customers, eq(customers.id, projects.customerId)).where(eq(projects.id, id))
  if (!project) return null
  const [procs, crew, grants] = await Promise.all([
    db.select({ id: procedures.id, number: procedures.number, revision: procedures.revision, title: procedures.title, status: procedures.status, process: procedures.process })
      .from(projectProcedures).innerJoin(procedures, eq(procedures.id, projectProcedures.procedureId))
      .where(eq(projectProcedures.projectId, id)).orderBy(asc(procedures.number), asc(procedures.revision)),
    db.select({ id: welders.id, name: welders.name, stamp: welders.stamp, status: welders.status })
      .from(projectWelders).innerJoin(welders, eq(welders.id, projectWelders.welderId))
      .where(eq(projectWelders.projectId, id)).orderBy(asc(welders.stamp)),
    db.select({ accountId: accounts.id, name: accounts.name, email: accounts.email, grantedAt: auditorGrants.grantedAt })
      .from(auditorGrants).innerJoin(accounts, eq(accounts.id, auditorGrants.accountId))
      .where(eq(auditorGrants.projectId, id)).orderBy(asc(accounts.name)),
  ])
  return { project, procedures: procs, welders: crew, auditors: grants }
}

type Link = 'procedure' | 'welder' | 'auditor'

/** Attaching twice is harmless; attaching what does not exist (or is not an active auditor) is refused. */
export async function attach(db: Db, projectId: number, link: Link, targetId: number, accountId: number) {
  const [project] = await db.select({ id: projects.id }).from(projects).where(eq(projects.id, projectId))
  if (!project) return { error: 'project' as const }
  if (link === 'procedure') {
    const [p] = await db.select({ status: procedures.status }).from(procedures).where(eq(procedures.id, targetId))
    if (!p) return { error: 'target' as const }
    if (p.status === 'draft') return { error: 'draft' as const }
  }
  if (link === 'welder' && !(await db.select({ id: welders.id }).from(welders).where(eq(welders.id, targetId))).length) return { error: 'target' as const }
  if (link === 'auditor') {
    const [a] = await db.select({ role: accounts.role, active: accounts.active }).from(accounts).where(eq(accounts.id, targetId))
    if (!a || a.role !== 'auditor' || !a.active) return { error: 'target' as const }
  }
  await db.transaction(async (tx) => {
    if (link === 'procedure') await tx.insert(projectProcedures).values({ projectId, procedureId: targetId }).onConflictDoNothing()
    if (link === 'welder') await tx.insert(projectWelders).values({ projectId, welderId: targetId }).onConflictDoNothing()
    if (link === 'auditor') await tx.insert(auditorGrants).values({ projectId, accountId: targetId }).onConflictDoNothing()
    await recordAudit(asTx(tx), { accountId, action: link === 'auditor' ? 'grant' : 'attach', recordType: 'project', recordId: projectId, after: { [link]: targetId } })
  })
  return { ok: true as const }
}

export async function detach(db: Db, projectId: number, link: Link, targetId: number, accountId: number) {
  return db.transaction(async (tx) => {
    const removed = link === 'procedure'
      ? await tx.delete(projectProcedures).where(and(eq(projectProcedures.projectId, projectId), eq(projectProcedures.procedureId, targetId))).returning()
      : link === 'welder'
        ? await tx.delete(projectWelders).where(and(eq(projectWelders.projectId, projectId), eq(projectWelders.welderId, targetId))).returning()
        : await tx.delete(auditorGrants).where(and(eq(auditorGrants.projectId, projectId), eq(auditorGrants.accountId, targetId))).returning()
    if (!removed.length) return false
    await recordAudit(asTx(tx), { accountId, action: link === 'auditor' ? 'revoke' : 'detach', recordType: 'project', recordId: projectId, before: { [link]: targetId } })
    return true
  })
}

/** What the quality manager can attach: procedures that are not drafts, the roster, active auditor accounts. */
export async function projectChoices(db: Db) {
  const [procs, roster, auditors] = await Promise.all([
    db.select({ id: procedures.id, number: procedures.number, revision: procedures.revision, title: procedures.title, status: procedures.status })
      .from(procedures).where(inArray(procedures.status, ['approved', 'superseded'])).orderBy(asc(procedures.number), asc(procedures.revision)),
    db.select({ id: welders.id, name: welders.name, stamp: welders.stamp, status: welders.status }).from(welders).orderBy(asc(welders.stamp)),
    db.select({ id: accounts.id, name: accounts.name, email: accounts.email }).from(accounts)
      .where(and(eq(accounts.role, 'auditor'), eq(accounts.active, true))).orderBy(asc(accounts.name)),
  ])
  return { procedures: procs, welders: roster, auditors }
}
