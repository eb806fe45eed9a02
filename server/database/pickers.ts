import { asc, desc, eq, ilike, inArray, or, sql } from 'drizzle-orm'
import type { Db } from './client'
import { baseMetals, fillerMetals, pqrs, procedures, welders } from './schema'
import { allOf, containsPattern } from '../utils/list'
import { supportPqrs } from './pqrs'
import type { PqrPickerQuery, ProcedurePickerQuery, WelderPickerQuery } from '../../shared/schemas/picker'

/**
 * Search as you type for the pickers (welder, WPS, PQR): the first `limit` matches and whether there are more, or the
 * records of `ids` (what a form already holds). One indexed query each; no list is loaded whole, however large the shop.
 */
const more = <T>(rows: T[], limit: number) => ({ items: rows.slice(0, limit), more: rows.length > limit })

export async function pickWelders(db: Db, query: WelderPickerQuery) {
  const pattern = containsPattern(query.q)
  const where = query.ids
    ? inArray(welders.id, query.ids.length ? query.ids : [0])
    : allOf([query.status === 'active' && eq(welders.status, 'active'), query.q && or(ilike(welders.stamp, pattern), ilike(welders.name, pattern), ilike(welders.employeeNumber, pattern))])
  const rows = await db.select({ id: welders.id, stamp: welders.stamp, name: welders.name, email: welders.email, status: welders.status }).from(welders).where(where)
    // An exact stamp first, then stamps that start with the text, then the rest by stamp
    .orderBy(desc(sql`lower(${welders.stamp}) = lower(${query.q})`), desc(sql`${welders.stamp} ilike ${`${query.q.replace(/[\\%_]/g, m => `\\${m}`)}%`}`), asc(welders.stamp))
    .limit(query.ids ? 50 : query.limit + 1)
  return more(rows, query.ids ? 50 : query.limit)
}

export async function pickProcedures(db: Db, query: ProcedurePickerQuery) {
  const pattern = containsPattern(query.q)
  const where = query.ids
    ? inArray(procedures.id, query.ids.length ? query.ids : [0])
    : allOf([query.status && eq(procedures.status, query.status), query.q && or(ilike(procedures.number, pattern), ilike(procedures.title, pattern))])
  const rows = await db.select({ id: procedures.id, number: procedures.number, revision: procedures.revision, title: procedures.title, process: procedures.process, status: procedures.status })
    .from(procedures).where(where).orderBy(asc(procedures.number), desc(procedures.revision)).limit(query.ids ? 50 : query.limit + 1)
  return more(rows, query.ids ? 50 : query.limit)
}

/** PQRs with what the WPS form's support check needs of each (the same shape as the PQR list). */
export async function pickPqrs(db: Db, query: PqrPickerQuery) {
  const pattern = containsPattern(query.q)
  const where = query.ids
    ? inArray(pqrs.id, query.ids.length ? query.ids : [0])
    : allOf([query.status && eq(pqrs.status, query.status), query.q && or(ilike(pqrs.number, pattern), ilike(pqrs.labReportNumber, pattern))])
  const rows = await db.select({
    id: pqrs.id, number: pqrs.number, testDate: pqrs.testDate, code: pqrs.code, edition: pqrs.edition, unit: pqrs.unit, process: pqrs.process,
    transfer: pqrs.transfer, processes: pqrs.processes, couponThickness: pqrs.couponThickness, status: pqrs.status,
    pNumber: baseMetals.pNumber, groupNumber: baseMetals.groupNumber, baseMetalId: pqrs.baseMetalId, baseMetal: baseMetals.specification,
    baseGrade: baseMetals.grade, fillerMetalId: pqrs.fillerMetalId, fillerSpecification: fillerMetals.specification, filler: fillerMetals.classification,
    fNumber: fillerMetals.fNumber, aNumber: fillerMetals.aNumber,
  }).from(pqrs).leftJoin(baseMetals, eq(baseMetals.id, pqrs.baseMetalId)).leftJoin(fillerMetals, eq(fillerMetals.id, pqrs.fillerMetalId))
    .where(where).orderBy(asc(pqrs.number)).limit(query.ids ? 50 : query.limit + 1)
  const page = more(rows, query.ids ? 50 : query.limit)
  const support = await supportPqrs(db, page.items.map(r => r.id))
  return { ...page, items: page.items.map(r => ({ ...r, support: support.find(s => s.id === r.id)!, supports: support.filter(s => s.id === r.id) })) }
}
