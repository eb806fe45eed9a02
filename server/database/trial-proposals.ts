import { eq } from 'drizzle-orm'
import type { Db } from './client'
import { baseMetals, fillerMetals, pqrs, trialSeries } from './schema'
import { findSeries, judgedBeads, needsBackPenetration, seriesOf, startingRows, type TrialSeriesRow } from './trials'
import { createPqr } from './pqr-writes'
import { pqrLayersOf, supportPqrs } from './pqrs'
import { createDraft } from './procedure-writes'
import { findProcedure, supportOf } from './procedures'
import type { SessionUser } from '../utils/auth'
import { fieldFailure, invalid, isFailure, missing, refused, type Outcome } from '../../shared/types/outcome'
import { pqrDraftSchema, type PqrDraft } from '../../shared/schemas/pqr'
import { blankLayer, procedureDraftSchema, type ProcedureDraft } from '../../shared/schemas/procedure'
import type { ProposePqrInput, ProposeWpsInput, TrialSeries } from '../../shared/schemas/trials'
import { pqrQualifies } from '../../shared/qualification/procedure-support'
import { nearestStartingPoint } from '../../shared/trials/starting-points'
import { proposePqr, proposeWpsWindow, type PqrLimits, type PqrProposal, type WpsProposal } from '../../shared/trials/proposals'
import { trialJointWords } from '../../shared/vocabulary/trial-joints'
import { positionLetterOf } from '../../shared/vocabulary/trial-positions'
import type { Unit } from '../../shared/rules/types'

// From trials to records: a draft PQR at the values of the accepted region's middle bead, and, once that PQR is
// certified, a draft WPS whose window is the accepted region clipped to what the PQR qualifies. Both are drafts: the
// PQR's tests and the WPS's support check decide, as for any record typed by hand.

async function beadsOf(db: Db, row: TrialSeriesRow) {
  const header = seriesOf(row)
  const start = nearestStartingPoint(header, await startingRows(db))
  return judgedBeads(db, row, start?.row ?? null)
}

/** GMAW and FCAW wires are commonly welded DCEP; Rootface proposes it and says so (check by hand for other wires). */
const currentOf = (series: TrialSeries) => (series.process === 'GMAW' || series.process === 'FCAW' ? 'DCEP' as const : null)

/** The PQR draft the accepted beads propose, with each value's source; a Failure when something must be stated first. */
function pqrDraftFrom(series: TrialSeries, proposal: PqrProposal, input: ProposePqrInput): Outcome<PqrDraft> {
  if (series.baseMetalId === null) return fieldFailure('baseMetalId', 'Pick the base metal from the catalogue in the series header first')
  if (series.fillerMetalId === null && series.process !== 'GTAW') return fieldFailure('fillerMetalId', 'Pick the filler metal from the catalogue in the series header first')
  const parsed = pqrDraftSchema.safeParse({
    number: input.number, testDate: input.testDate, code: input.code, edition: input.edition, unit: series.unit,
    couponThickness: series.thickness, baseMetalId: series.baseMetalId, baseMetalBId: null, welderId: null, toughnessRequired: false,
    actuals: { position: series.position, progression: series.progression },
    layers: [{
      name: 'all passes', process: series.process, transfer: series.transfer, fillerMetalId: series.fillerMetalId, fillerSize: series.wireDiameter,
      // One process welds the whole sheet joint: its deposit is the coupon thickness (check it on the coupon).
      depositThickness: series.thickness, current: currentOf(series), amps: proposal.layer.amps, volts: proposal.layer.volts,
      wireFeed: proposal.layer.wireFeed, travelSpeed: proposal.layer.travelSpeed, heatInput: proposal.layer.heatInput, gas: series.gas,
      gasFlow: proposal.layer.gasFlow, ctwd: proposal.layer.ctwd, tungsten: null, backingGas: null, flux: null,
    }],
    labReportNumber: null,
  })
  if (!parsed.success) {
    const flat = parsed.error.flatten()
    return invalid('proposal', flat.formErrors, flat.fieldErrors as Record<string, string[]>)
  }
  return parsed.data
}

/** What "propose a PQR" would create, without creating it (the page shows it with each value's source). */
export async function previewPqr(db: Db, id: number) {
  const row = await findSeries(db, id)
  if (!row) return missing('Trial series')
  return proposePqr(seriesOf(row), await beadsOf(db, row))
}

/** A draft PQR (status recorded) at the values the accepted beads propose; the series keeps the link. */
export async function proposePqrFromTrials(db: Db, user: SessionUser, id: number, input: ProposePqrInput) {
  const row = await findSeries(db, id)
  if (!row) return missing('Trial series')
  if (row.pqrId !== null) return refused('PQR proposed already', 'This series has its PQR already; open it from the series.')
  const series = seriesOf(row)
  const proposal = proposePqr(series, await beadsOf(db, row))
  if (!proposal) return refused('No accepted bead', 'No bead of this series is accepted: judge the beads (wetting, spatter, arc sound and the checks) first.')
  const draft = pqrDraftFrom(series, proposal, input)
  if (isFailure(draft)) return draft
  const created = await createPqr(db, draft, user)
  if (isFailure(created)) return created
  await db.update(trialSeries).set({ pqrId: created.id, updatedAt: new Date() }).where(eq(trialSeries.id, id))
  return { pqr: { id: created.id, number: created.number, status: created.status }, proposal }
}

type LimitsOutcome = { limits: PqrLimits, pqr: typeof pqrs.$inferSelect } | { blocker: string }

/** What the series' certified PQR qualifies, in the series' unit; a blocker sentence while it cannot be used. */
async function limitsOf(db: Db, row: TrialSeriesRow): Promise<LimitsOutcome> {
  if (row.pqrId === null) return { blocker: 'Propose a PQR from the accepted beads first.' }
  const [pqr] = await db.select().from(pqrs).where(eq(pqrs.id, row.pqrId))
  if (!pqr) return { blocker: 'The PQR of this series is gone.' }
  if (pqr.status !== 'certified') return { blocker: `${pqr.number} is ${pqr.status}: the WPS window is proposed once its results are certified and pass.` }
  if (pqr.unit !== row.unit) return { blocker: `${pqr.number} is recorded in ${pqr.unit}, the series in ${row.unit}: cannot tell the window; type it by hand.` }
  const [support] = await supportPqrs(db, [pqr.id])
  if (!support || !support.resultsPass) return { blocker: `${pqr.number}'s results do not all pass: it cannot support a WPS.` }
  const qualifies = pqrQualifies(support, { code: pqr.code, edition: pqr.edition, unit: pqr.unit as Unit }, pqr.toughnessRequired)
  if (qualifies.error || !qualifies.baseMetal) return { blocker: `Cannot tell what ${pqr.number} qualifies: ${qualifies.error ?? 'no thickness range'}. Type the WPS by hand.` }
  const layer = pqrLayersOf(pqr)[0]
  const clause = qualifies.reasons[0]?.clause
  return {
    pqr,
    limits: {
      number: pqr.number, thickness: qualifies.baseMetal, thicknessSource: `what ${pqr.number} qualifies${clause ? ` (${clause})` : ''}`,
      depositMax: qualifies.depositMax, heatInput: support.heatInput, toughness: pqr.toughnessRequired,
      volts: layer?.volts ?? null, wireFeed: layer?.wireFeed ?? null, ctwd: layer?.ctwd ?? null, travelSpeed: layer?.travelSpeed ?? null, amps: layer?.amps ?? null,
    },
  }
}

/** What "propose the WPS window" would create, or why it cannot yet. */
export async function previewWps(db: Db, id: number): Promise<Outcome<{ proposal: WpsProposal | null, blocker: string | null }>> {
  const row = await findSeries(db, id)
  if (!row) return missing('Trial series')
  const limits = await limitsOf(db, row)
  if ('blocker' in limits) return { proposal: null, blocker: limits.blocker }
  const proposal = proposeWpsWindow(row.unit as Unit, await beadsOf(db, row), limits.limits)
  return { proposal, blocker: proposal ? null : 'No bead of this series is accepted.' }
}

const win = (w: { min: number | null, max: number | null, setPoint: number | null }) => w

/** A draft WPS from the window; the existing support check judges it like any other WPS. */
export async function proposeWpsFromTrials(db: Db, user: SessionUser, id: number, input: ProposeWpsInput) {
  const row = await findSeries(db, id)
  if (!row) return missing('Trial series')
  if (row.procedureId !== null) return refused('WPS proposed already', 'This series has its WPS already; open it from the series.')
  const limits = await limitsOf(db, row)
  if ('blocker' in limits) return refused('Not yet', limits.blocker)
  const series = seriesOf(row)
  const proposal = proposeWpsWindow(series.unit, await beadsOf(db, row), limits.limits)
  if (!proposal) return refused('No accepted bead', 'No bead of this series is accepted.')
  if (proposal.thickness.min === null || proposal.thickness.max === null) return refused('State the thickness', `${limits.pqr.number} leaves the thickness open at one end: type the WPS's range by hand.`)
  const [base] = limits.pqr.baseMetalId ? await db.select().from(baseMetals).where(eq(baseMetals.id, limits.pqr.baseMetalId)) : []
  const fillerId = pqrLayersOf(limits.pqr)[0]?.fillerMetalId ?? null
  const [filler] = fillerId ? await db.select().from(fillerMetals).where(eq(fillerMetals.id, fillerId)) : []
  const side = { baseMetalId: base?.id ?? null, pNumber: base?.pNumber ?? '', groupNumber: base?.groupNumber ?? null }
  const flow = series.gasFlow
  const layer = {
    ...blankLayer(series.process, 'all passes'), transfer: series.transfer,
    fillers: filler ? [{ fillerMetalId: filler.id, specification: filler.specification, classification: filler.classification, fNumber: filler.fNumber, aNumber: filler.aNumber, size: series.wireDiameter }] : [],
    depositMax: proposal.depositMax, current: currentOf(series) ?? 'DCEP',
    amps: win(proposal.amps), volts: win(proposal.volts), wireFeed: win(proposal.wireFeed), travelSpeed: win(proposal.travelSpeed), ctwd: win(proposal.ctwd),
    heatInputMax: proposal.heatInputMax, gas: { composition: series.gas, flow: { min: flow, max: flow, setPoint: flow } }, bead: 'stringer',
  }
  const parsed = procedureDraftSchema.safeParse({
    number: input.number, title: input.title, code: limits.pqr.code, edition: limits.pqr.edition, unit: series.unit, supportingPqrIds: [limits.pqr.id],
    baseMetals: { a: side, b: side }, thickness: { groove: proposal.thickness, fillet: { min: null, max: null } }, diameter: { min: null, max: null },
    joints: {
      type: trialJointWords[series.joint], groove: null, grooveAngle: null,
      rootOpening: series.rootGap === null ? { min: null, max: null } : { min: series.rootGap, max: series.rootGap }, rootFace: { min: null, max: null },
      backing: needsBackPenetration(series) ? 'none (welded from one side, trials judged the back)' : null,
    },
    positions: [positionLetterOf[series.position]], progression: series.progression, toughnessRequired: limits.pqr.toughnessRequired,
    preheatMin: null, interpassMax: null, pwht: { required: false, temperature: { min: null, max: null }, holdHours: null, note: null }, cleaning: null,
    layers: [layer], prequalified: false,
  } satisfies Record<keyof ProcedureDraft, unknown>)
  if (!parsed.success) {
    const flat = parsed.error.flatten()
    return invalid('proposal', flat.formErrors, flat.fieldErrors as Record<string, string[]>)
  }
  const created = await createDraft(db, parsed.data, user)
  if (isFailure(created)) return created
  await db.update(trialSeries).set({ procedureId: created.id, updatedAt: new Date() }).where(eq(trialSeries.id, id))
  const stored = (await findProcedure(db, created.id))!
  const { check } = await supportOf(db, stored, [limits.pqr.id])
  return {
    procedure: { id: created.id, number: created.number, revision: created.revision, status: created.status },
    proposal,
    support: { supported: check.supported, violations: check.violations, blockers: check.blockers },
  }
}

/** Both proposals as the page shows them before anything is created. */
export async function trialProposals(db: Db, id: number) {
  const row = await findSeries(db, id)
  if (!row) return missing('Trial series')
  const beads = await beadsOf(db, row)
  const series = seriesOf(row)
  const pqr = proposePqr(series, beads)
  const limits = await limitsOf(db, row)
  const wps = 'blocker' in limits ? null : proposeWpsWindow(series.unit, beads, limits.limits)
  return {
    pqr,
    pqrMissing: [series.baseMetalId === null ? 'the base metal from the catalogue' : null, series.fillerMetalId === null ? 'the filler metal from the catalogue' : null].filter((x): x is string => !!x),
    wps,
    wpsBlocker: 'blocker' in limits ? limits.blocker : wps ? null : 'No bead of this series is accepted.',
  }
}
