import { and, asc, count, eq, inArray } from 'drizzle-orm'
import type { Db } from './client'
import {
  accounts, auditorGrants, customers, packetFiles, packets, procedures, projectProcedures, projectWelders, projects, welders,
} from './schema'
import type { CustomerInput, ProjectInput } from '../../shared/schemas/project'
import { recordAudit } from './audit'
import { gapsOfProject, packetPlan, sheetCount } from '../sheets/packet'
import type { SessionUser } from '../utils/auth'
import { conflict, fieldFailure, missing, stale } from '../../shared/types/outcome'

/** Customers and projects: what the quality manager sets up so an auditor can be handed a packet. */

const asTx = (tx: unknown) => tx as Db

const nameTakenFailure = fieldFailure('name', 'A customer of this name exists already')
const noCustomer = fieldFailure('customerId', 'Choose an existing customer')
const numberTaken = fieldFailure('number', 'A project of this number exists already')
const staleProject = stale('Someone changed this project since you opened it; reload and try again.')

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
  if (await nameTaken(db, input.name)) return nameTakenFailure
  return db.transaction(async (tx) => {
    const [row] = await tx.insert(customers).values(input).returning()
    await recordAudit(asTx(tx), { accountId, action: 'create', recordType: 'customer', recordId: row!.id, after: row })
    return row!
  })
}

export async function updateCustomer(db: Db, id: number, input: CustomerInput & { version: number }, accountId: number) {
  const [before] = await db.select().from(customers).where(eq(customers.id, id))
  if (!before) return missing('Customer')
  if (before.version !== input.version) return stale('Someone changed this customer since you opened it; reload and try again.')
  if (await nameTaken(db, input.name, id)) return nameTakenFailure
  return db.transaction(async (tx) => {
    const [row] = await tx.update(customers).set({ name: input.name, contact: input.contact, version: before.version + 1 })
      .where(and(eq(customers.id, id), eq(customers.version, input.version))).returning()
    if (!row) return stale('Someone changed this customer since you opened it; reload and try again.')
    await recordAudit(asTx(tx), { accountId, action: 'update', recordType: 'customer', recordId: id, before, after: row })
    return row
  })
}

export async function deleteCustomer(db: Db, id: number, accountId: number) {
  const [before] = await db.select().from(customers).where(eq(customers.id, id))
  if (!before) return missing('Customer')
  const [used] = await db.select({ n: count() }).from(projects).where(eq(projects.customerId, id))
  if ((used?.n ?? 0) > 0) return conflict('This customer has projects; delete or move them first.')
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
  if (!await customerExists(db, input.customerId)) return noCustomer
  if (await projectNumberTaken(db, input.number)) return numberTaken
  return db.transaction(async (tx) => {
    const [row] = await tx.insert(projects).values(input).returning()
    await recordAudit(asTx(tx), { accountId, action: 'create', recordType: 'project', recordId: row!.id, after: row })
    return row!
  })
}

export async function updateProject(db: Db, id: number, input: Partial<ProjectInput> & { version: number }, accountId: number) {
  const [before] = await db.select().from(projects).where(eq(projects.id, id))
  if (!before) return missing('Project')
  if (before.version !== input.version) return staleProject
  const { version, ...changes } = input
  const next = { ...before, ...changes }
  if (next.endsOn && next.endsOn < next.startsOn) return fieldFailure('endsOn', 'The end must not be before the start')
  if (changes.customerId !== undefined && !await customerExists(db, changes.customerId)) return noCustomer
  if (changes.number !== undefined && await projectNumberTaken(db, changes.number, id)) return numberTaken
  return db.transaction(async (tx) => {
    const [row] = await tx.update(projects).set({ ...changes, version: version + 1 }).where(and(eq(projects.id, id), eq(projects.version, version))).returning()
    if (!row) return staleProject
    await recordAudit(asTx(tx), { accountId, action: 'update', recordType: 'project', recordId: id, before, after: row })
    return row
  })
}

/** A project goes with its links, grants and packets; the records it listed stay. */
export async function deleteProject(db: Db, id: number, accountId: number) {
  const [before] = await db.select().from(projects).where(eq(projects.id, id))
  if (!before) return missing('Project')
  await db.transaction(async (tx) => {
    const ids = (await tx.select({ id: packets.id }).from(packets).where(eq(packets.projectId, id))).map(p => p.id)
    if (ids.length) {
      await tx.delete(packetFiles).where(inArray(packetFiles.packetId, ids))
      await tx.delete(packets).where(inArray(packets.id, ids))
    }
    await tx.delete(projects).where(eq(projects.id, id))
    await recordAudit(asTx(tx), { accountId, action: 'delete', recordType: 'project', recordId: id, before })
  })
  return { ok: true as const }
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
  if (!project) return missing('Project')
  if (link === 'procedure') {
    const [p] = await db.select({ status: procedures.status }).from(procedures).where(eq(procedures.id, targetId))
    if (!p) return fieldFailure('procedureId', 'Choose an existing procedure')
    if (p.status === 'draft') return fieldFailure('procedureId', 'A draft WPS cannot go into a packet; approve it first')
  }
  if (link === 'welder' && !(await db.select({ id: welders.id }).from(welders).where(eq(welders.id, targetId))).length) return fieldFailure('welderId', 'Choose an existing welder')
  if (link === 'auditor') {
    const [a] = await db.select({ role: accounts.role, active: accounts.active }).from(accounts).where(eq(accounts.id, targetId))
    if (!a || a.role !== 'auditor' || !a.active) return fieldFailure('accountId', 'Choose an active auditor account')
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
    if (!removed.length) return missing(link === 'auditor' ? 'Grant' : 'Link')
    await recordAudit(asTx(tx), { accountId, action: link === 'auditor' ? 'revoke' : 'detach', recordType: 'project', recordId: projectId, before: { [link]: targetId } })
    return { ok: true as const }
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

// Who may read a project: the supervisor any, an auditor those granted to them. The records of a project follow it
// (mayReadProcedure, mayReadPqr, mayReadWelder, mayReadWelderTest in their own modules).

/** The projects granted to an auditor. */
export async function grantedProjectIds(db: Db, accountId: number): Promise<number[]> {
  const rows = await db.select({ id: auditorGrants.projectId }).from(auditorGrants).where(eq(auditorGrants.accountId, accountId))
  return rows.map(r => r.id)
}

export async function mayReadProject(db: Db, user: SessionUser, projectId: number) {
  if (user.role === 'supervisor') return (await db.select({ id: projects.id }).from(projects).where(eq(projects.id, projectId))).length > 0
  if (user.role === 'auditor') return (await grantedProjectIds(db, user.id)).includes(projectId)
  return false
}

/** Whether a welder is on one of the auditor's granted projects (or on `projectId`, when given and granted). */
export async function auditorMayReadWelder(db: Db, user: SessionUser, welderId: number, projectId?: number) {
  const granted = await grantedProjectIds(db, user.id)
  const scope = projectId === undefined ? granted : granted.filter(id => id === projectId)
  if (!scope.length) return false
  const hit = await db.select({ id: projectWelders.welderId }).from(projectWelders)
    .where(and(eq(projectWelders.welderId, welderId), inArray(projectWelders.projectId, scope))).limit(1)
  return hit.length > 0
}

/** Whether a WPS is on one of the auditor's granted projects. */
export async function auditorMayReadProcedure(db: Db, user: SessionUser, procedureId: number) {
  const granted = await grantedProjectIds(db, user.id)
  if (!granted.length) return false
  const hit = await db.select({ id: projectProcedures.procedureId }).from(projectProcedures)
    .where(and(eq(projectProcedures.procedureId, procedureId), inArray(projectProcedures.projectId, granted))).limit(1)
  return hit.length > 0
}

/** Every project for the quality manager; an auditor only the projects granted to them. */
export async function listProjects(db: Db, user: SessionUser) {
  const base = db.select({
    id: projects.id, number: projects.number, name: projects.name, startsOn: projects.startsOn, endsOn: projects.endsOn, customer: customers.name,
  }).from(projects).innerJoin(customers, eq(customers.id, projects.customerId))
  if (user.role === 'supervisor') return base.orderBy(asc(projects.number))
  const granted = db.select({ id: auditorGrants.projectId }).from(auditorGrants).where(eq(auditorGrants.accountId, user.id))
  return base.where(inArray(projects.id, granted)).orderBy(asc(projects.number))
}

/** A project's page: its WPSs, welders, auditors (the grants for the quality manager only), PQRs, tests and who was not current. */
export async function projectPage(db: Db, user: SessionUser, id: number) {
  if (!await mayReadProject(db, user, id)) return missing('Project')
  const detail = await projectDetail(db, id)
  const plan = await packetPlan(db, id)
  if (!detail || !plan) return missing('Project')
  return {
    ...detail,
    // An auditor sees who was granted only as far as themselves
    auditors: user.role === 'supervisor' ? detail.auditors : [],
    pqrs: plan.pqrs,
    tests: plan.welders.map(w => ({ welderId: w.id, tests: w.tests })),
    period: plan.period,
    sheetCount: sheetCount(plan),
    notCurrent: await gapsOfProject(db, plan),
  }
}
