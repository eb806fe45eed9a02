import { and, asc, count, desc, eq, ilike, inArray, max, or, sql } from 'drizzle-orm'
import type { Db } from './client'
import { accounts, attachments, pqrs, procedures, shopSettings, trialBeads, trialSeries, trialStartingPoints } from './schema'
import { recordAudit } from './audit'
import { readingsOf } from './procedures'
import type { SessionUser } from '../utils/auth'
import { containsPattern, orderOf, pageOf } from '../utils/list'
import { conflict, forbidden, missing, stale, type Outcome } from '../../shared/types/outcome'
import type { StartingPoint, TrialBead, TrialListQuery, TrialSeries } from '../../shared/schemas/trials'
import type { Unit } from '../../shared/rules/types'
import { beadHeatInput, beadVerdict, type BeadHeatInput, type BeadVerdict } from '../../shared/trials/beads'
import { farOutside, firstBeadFrom, nearestStartingPoint, type FarOutside, type StartingRow } from '../../shared/trials/starting-points'
import { plotData, plotSvg, type PlotData, type PlotReading } from '../../shared/trials/plot'
import type { JudgedBead } from '../../shared/trials/proposals'

// Trial runs at the machine: who may record them, the series and their beads, the shop's starting settings.
// Supervisor and inspector always; a welder only when the shop allows it (shop_settings.welder_records_trials);
// an auditor never.

export type TrialSeriesRow = typeof trialSeries.$inferSelect
export type TrialBeadRow = typeof trialBeads.$inferSelect

export async function welderRecordsTrials(db: Db) {
  const [settings] = await db.select({ allowed: shopSettings.welderRecordsTrials }).from(shopSettings).where(eq(shopSettings.id, 1))
  return settings?.allowed ?? false
}

/** Whether the user may read and record trials at all (403 otherwise: the whole area is closed to them). */
export async function mayUseTrials(db: Db, user: SessionUser): Promise<Outcome<true>> {
  if (user.role === 'supervisor' || user.role === 'inspector') return true
  if (user.role === 'welder' && await welderRecordsTrials(db)) return true
  return forbidden(user.role === 'welder' ? 'Your shop has trial runs recorded by the inspector or the quality manager' : 'Your role may not see trial runs')
}

/** Whether the user may read the bead (and so its photos): they may use trials and the bead exists. */
export async function mayReadTrialBead(db: Db, user: SessionUser, beadId: number) {
  if (typeof await mayUseTrials(db, user) !== 'boolean') return false
  const [row] = await db.select({ id: trialBeads.id }).from(trialBeads).where(eq(trialBeads.id, beadId)).limit(1)
  return !!row
}

export async function setTrialSettings(db: Db, user: SessionUser, welderRecords: boolean) {
  await db.transaction(async (tx) => {
    await tx.update(shopSettings).set({ welderRecordsTrials: welderRecords, updatedAt: new Date() }).where(eq(shopSettings.id, 1))
    await recordAudit(tx, { accountId: user.id, action: 'trials.settings', recordType: 'shop', after: { welderRecordsTrials: welderRecords } })
  })
  return { welderRecordsTrials: welderRecords }
}

const seriesValues = (s: TrialSeries) => ({
  title: s.title, unit: s.unit, process: s.process, transfer: s.transfer, wireClass: s.wireClass, wireDiameter: s.wireDiameter,
  fillerMetalId: s.fillerMetalId, gas: s.gas, gasFlow: s.gasFlow, baseMetal: s.baseMetal, baseMetalId: s.baseMetalId,
  thickness: s.thickness, gauge: s.gauge, joint: s.joint, rootGap: s.rootGap, position: s.position, progression: s.progression, notes: s.notes,
})

/** The header of a stored series as the form edits it. */
export function seriesOf(row: TrialSeriesRow): TrialSeries {
  return seriesValues(row as unknown as TrialSeries) as TrialSeries
}

/** The bead values of a stored row as the rules read them. */
export function beadOf(row: TrialBeadRow): TrialBead {
  return {
    volts: row.volts, wireFeed: row.wireFeed, amps: row.amps, ctwd: row.ctwd, travelSpeed: row.travelSpeed, beadLength: row.beadLength,
    arcTime: row.arcTime, energy: row.energy, power: row.power, gasFlow: row.gasFlow, wetting: row.wetting as TrialBead['wetting'],
    spatter: row.spatter as TrialBead['spatter'], arcSound: row.arcSound as TrialBead['arcSound'], porosity: row.porosity, undercut: row.undercut,
    meltThrough: row.meltThrough, lackOfFusion: row.lackOfFusion, backPenetration: row.backPenetration as TrialBead['backPenetration'], notes: row.notes,
  }
}

export async function listSeries(db: Db, query: TrialListQuery) {
  const where = query.q ? or(ilike(trialSeries.title, containsPattern(query.q)), ilike(trialSeries.wireClass, containsPattern(query.q)), ilike(trialSeries.baseMetal, containsPattern(query.q))) : undefined
  const sortColumn = { updatedAt: trialSeries.updatedAt, title: trialSeries.title }[query.sort]
  const beads = db.select({ seriesId: trialBeads.seriesId, beads: count().as('beads') }).from(trialBeads).groupBy(trialBeads.seriesId).as('bead_counts')
  return pageOf(query,
    window => db.select({
      id: trialSeries.id, title: trialSeries.title, unit: trialSeries.unit, process: trialSeries.process, transfer: trialSeries.transfer,
      wireClass: trialSeries.wireClass, wireDiameter: trialSeries.wireDiameter, baseMetal: trialSeries.baseMetal, thickness: trialSeries.thickness,
      gauge: trialSeries.gauge, joint: trialSeries.joint, position: trialSeries.position, updatedAt: trialSeries.updatedAt,
      beads: sql<number>`coalesce(${beads.beads}, 0)`.mapWith(Number),
    }).from(trialSeries).leftJoin(beads, eq(beads.seriesId, trialSeries.id)).where(where)
      .orderBy(orderOf(sortColumn, query.dir), desc(trialSeries.id)).limit(window.limit).offset(window.offset),
    () => db.select({ total: count() }).from(trialSeries).where(where))
}

export async function createSeries(db: Db, user: SessionUser, input: TrialSeries) {
  return db.transaction(async (tx) => {
    const [row] = await tx.insert(trialSeries).values({ ...seriesValues(input), createdBy: user.id }).returning()
    await recordAudit(tx, { accountId: user.id, action: 'trials.create', recordType: 'trial-series', recordId: row!.id, after: input })
    return { id: row!.id, version: row!.version }
  })
}

export async function findSeries(db: Db, id: number) {
  const [row] = await db.select().from(trialSeries).where(eq(trialSeries.id, id)).limit(1)
  return row ?? null
}

export async function updateSeries(db: Db, user: SessionUser, id: number, version: number, input: TrialSeries): Promise<Outcome<{ id: number, version: number }>> {
  const row = await findSeries(db, id)
  if (!row) return missing('Trial series')
  if (row.version !== version) return stale(`The series was changed by someone else (version ${row.version}, you edited ${version}). Reload it.`)
  return db.transaction(async (tx) => {
    const [next] = await tx.update(trialSeries).set({ ...seriesValues(input), version: row.version + 1, updatedAt: new Date() })
      .where(and(eq(trialSeries.id, id), eq(trialSeries.version, version))).returning({ id: trialSeries.id, version: trialSeries.version })
    await recordAudit(tx, { accountId: user.id, action: 'trials.update', recordType: 'trial-series', recordId: id, before: seriesOf(row), after: input })
    return next!
  })
}

/** A new bead, numbered after the series' last; the series is touched so lists show it as recently worked on. */
export async function addBead(db: Db, user: SessionUser, seriesId: number, input: TrialBead): Promise<Outcome<{ id: number, number: number }>> {
  if (!await findSeries(db, seriesId)) return missing('Trial series')
  return db.transaction(async (tx) => {
    const [last] = await tx.select({ n: max(trialBeads.number) }).from(trialBeads).where(eq(trialBeads.seriesId, seriesId))
    const number = (last?.n ?? 0) + 1
    const [row] = await tx.insert(trialBeads).values({ ...input, seriesId, number, recordedBy: user.id }).returning({ id: trialBeads.id, number: trialBeads.number })
    await tx.update(trialSeries).set({ updatedAt: new Date() }).where(eq(trialSeries.id, seriesId))
    await recordAudit(tx, { accountId: user.id, action: 'trials.bead', recordType: 'trial-series', recordId: seriesId, after: { number, ...input } })
    return row!
  })
}

export async function removeBead(db: Db, user: SessionUser, seriesId: number, beadId: number): Promise<Outcome<{ removed: number }>> {
  const [row] = await db.select().from(trialBeads).where(and(eq(trialBeads.id, beadId), eq(trialBeads.seriesId, seriesId))).limit(1)
  if (!row) return missing('Bead')
  const [photo] = await db.select({ id: attachments.id }).from(attachments).where(and(eq(attachments.recordType, 'trial-bead'), eq(attachments.recordId, beadId))).limit(1)
  if (photo) return conflict('Remove the bead\'s photos first')
  await db.transaction(async (tx) => {
    await tx.delete(trialBeads).where(eq(trialBeads.id, beadId))
    await recordAudit(tx, { accountId: user.id, action: 'trials.bead.remove', recordType: 'trial-series', recordId: seriesId, before: { number: row.number, ...beadOf(row) } })
  })
  return { removed: row.number }
}

export async function startingRows(db: Db): Promise<StartingRow[]> {
  const rows = await db.select().from(trialStartingPoints).orderBy(asc(trialStartingPoints.process), asc(trialStartingPoints.wireDiameter), asc(trialStartingPoints.thickness), asc(trialStartingPoints.id))
  return rows.map(r => ({
    id: r.id, unit: r.unit as Unit, process: r.process as StartingRow['process'], transfer: r.transfer as StartingRow['transfer'], wireDiameter: r.wireDiameter,
    thickness: r.thickness, gauge: r.gauge, gas: r.gas, volts: r.volts, wireFeed: r.wireFeed, amps: r.amps, ctwd: r.ctwd, travelSpeed: r.travelSpeed, source: r.source,
  }))
}

export async function addStartingPoint(db: Db, user: SessionUser, input: StartingPoint) {
  return db.transaction(async (tx) => {
    const [row] = await tx.insert(trialStartingPoints).values(input).returning({ id: trialStartingPoints.id })
    await recordAudit(tx, { accountId: user.id, action: 'trials.start.create', recordType: 'trial-starting-point', recordId: row!.id, after: input })
    return row!
  })
}

export async function removeStartingPoint(db: Db, user: SessionUser, id: number): Promise<Outcome<{ id: number }>> {
  const [row] = await db.select().from(trialStartingPoints).where(eq(trialStartingPoints.id, id)).limit(1)
  if (!row) return missing('Starting point')
  await db.transaction(async (tx) => {
    await tx.delete(trialStartingPoints).where(eq(trialStartingPoints.id, id))
    await recordAudit(tx, { accountId: user.id, action: 'trials.start.remove', recordType: 'trial-starting-point', recordId: id, before: row })
  })
  return { id }
}

/** Back penetration decides a bead only on a joint meant to be welded through (butt, outside corner with its gap). */
export const needsBackPenetration = (series: Pick<TrialSeries, 'joint'>) => series.joint === 'butt' || series.joint === 'outside-corner'

export interface JudgedBeadRow extends JudgedBead {
  id: number
  values: TrialBead
  notes: string | null
  verdict: BeadVerdict['kind']
  verdictDetail: BeadVerdict
  heat: BeadHeatInput
  flags: FarOutside[]
  photos: { id: number, fileName: string, contentType: string }[]
  recordedBy: string | null
  createdAt: Date
}

/** The beads of a series with each one's verdict, heat input, far-outside flags and photos. */
export async function judgedBeads(db: Db, series: TrialSeriesRow, start: StartingRow | null): Promise<JudgedBeadRow[]> {
  const rows = await db.select({ bead: trialBeads, recordedBy: accounts.name }).from(trialBeads).leftJoin(accounts, eq(accounts.id, trialBeads.recordedBy))
    .where(eq(trialBeads.seriesId, series.id)).orderBy(asc(trialBeads.number))
  const ids = rows.map(r => r.bead.id)
  const photos = ids.length
    ? await db.select({ id: attachments.id, recordId: attachments.recordId, fileName: attachments.fileName, contentType: attachments.contentType }).from(attachments)
        .where(and(eq(attachments.recordType, 'trial-bead'), inArray(attachments.recordId, ids))).orderBy(asc(attachments.id))
    : []
  const header = seriesOf(series)
  return rows.map(({ bead, recordedBy }) => {
    const values = beadOf(bead)
    const verdict = beadVerdict(values, needsBackPenetration(header))
    return {
      id: bead.id, number: bead.number, ...values, values, verdict: verdict.kind, verdictDetail: verdict,
      heat: beadHeatInput(values, header.unit), flags: farOutside(values, header, start),
      photos: photos.filter(p => p.recordId === bead.id).map(({ id, fileName, contentType }) => ({ id, fileName, contentType })),
      recordedBy: recordedBy ?? null, createdAt: bead.createdAt,
    }
  })
}

export interface SeriesPlots {
  wireFeed: PlotData
  ctwd: PlotData
  svg: { wireFeed: string, ctwd: string }
}

export function seriesPlots(unit: Unit, beads: readonly JudgedBeadRow[], readings: readonly PlotReading[] = []): SeriesPlots {
  const points = beads.map(b => ({ number: b.number, volts: b.volts, wireFeed: b.wireFeed, ctwd: b.ctwd, verdict: b.verdict }))
  const wireFeed = plotData(points, 'wire-feed', unit, readings)
  const ctwd = plotData(points, 'ctwd', unit, readings)
  return { wireFeed, ctwd, svg: { wireFeed: plotSvg(wireFeed), ctwd: plotSvg(ctwd) } }
}

/** One series: header, beads judged, both plots, the nearest starting row, and the PQR and WPS made from it. */
export async function seriesDetail(db: Db, id: number) {
  const row = await findSeries(db, id)
  if (!row) return missing('Trial series')
  const header = seriesOf(row)
  const rows = await startingRows(db)
  const nearest = nearestStartingPoint(header, rows)
  const beads = await judgedBeads(db, row, nearest?.row ?? null)
  const [pqr] = row.pqrId ? await db.select({ id: pqrs.id, number: pqrs.number, status: pqrs.status }).from(pqrs).where(eq(pqrs.id, row.pqrId)) : []
  const [procedure] = row.procedureId ? await db.select({ id: procedures.id, number: procedures.number, revision: procedures.revision, status: procedures.status }).from(procedures).where(eq(procedures.id, row.procedureId)) : []
  // Production readings on the WPS made from this series, drawn against the trials (in the WPS's unit: the series').
  const taken = procedure ? await readingsOf(db, procedure.id, null) : []
  const num = (v: unknown) => (typeof v === 'number' && Number.isFinite(v) ? v : null)
  const readings: PlotReading[] = taken.map((r) => {
    const v = ((r.values ?? {}) as { readings?: Record<string, unknown> }).readings ?? {}
    return { volts: num(v.volts), wireFeed: num(v.wireFeedSpeed), ctwd: num(v.ctwd) }
  })
  const [author] = row.createdBy ? await db.select({ name: accounts.name }).from(accounts).where(eq(accounts.id, row.createdBy)) : []
  return {
    series: { id: row.id, version: row.version, createdAt: row.createdAt, updatedAt: row.updatedAt, createdBy: author?.name ?? null, ...header },
    beads: beads.map(({ values: _values, ...b }) => b),
    plots: seriesPlots(header.unit, beads, readings),
    readings: readings.length,
    start: nearest ? { ...nearest, firstBead: firstBeadFrom(nearest.row, header.unit) } : null,
    pqr: pqr ?? null,
    procedure: procedure ?? null,
    counts: {
      accepted: beads.filter(b => b.verdict === 'accepted').length,
      rejected: beads.filter(b => b.verdict === 'rejected').length,
      notJudged: beads.filter(b => b.verdict === 'not-judged').length,
    },
  }
}
