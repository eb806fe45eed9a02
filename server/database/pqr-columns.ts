import type { pqrs } from './schema'
import { blankPqrLayer, totalDeposit, type PqrDraft, type PqrLayer } from '../../shared/schemas/pqr'
import { wpqrPieceSchema, type WpqrPiece } from '../../shared/schemas/procedure-iso'
import type { Unit } from '../../shared/rules/types'

/** A stored PQR as the form's draft and its layers, and a draft as columns: pure (relative imports only, for the seed scripts). */

export type PqrRow = typeof pqrs.$inferSelect

type Loose = Record<string, unknown>
const obj = (v: unknown): Loose => (v && typeof v === 'object' && !Array.isArray(v) ? v as Loose : {})
const num = (v: unknown) => (typeof v === 'number' && Number.isFinite(v) ? v : null)
const str = (v: unknown) => (typeof v === 'string' && v.trim() !== '' ? v : null)

/**
 * The layers of a stored PQR. A record written before process layers reads as one layer: its process, filler and
 * deposit, with the electrical values of its `actuals`.
 */
export function pqrLayersOf(row: Pick<PqrRow, 'layers' | 'process' | 'transfer' | 'fillerMetalId' | 'depositThickness' | 'actuals'>): PqrLayer[] {
  const stored = Array.isArray(row.layers) && row.layers.length ? row.layers.map(obj) : null
  const list = stored ?? [{
    ...obj(row.actuals), name: 'all passes', process: row.process, transfer: row.transfer, fillerMetalId: row.fillerMetalId,
    depositThickness: row.depositThickness, fillerSize: null,
  }]
  return list.map((l) => {
    const blank = blankPqrLayer((str(l.process) ?? row.process) as PqrLayer['process'], str(l.name) ?? 'all passes')
    const current = str(l.current)
    return {
      ...blank, transfer: (str(l.transfer) as PqrLayer['transfer']) ?? null, fillerMetalId: num(l.fillerMetalId),
      fillerSize: num(l.fillerSize) ?? (typeof l.fillerSize === 'string' ? Number.parseFloat(l.fillerSize) || null : null),
      depositThickness: num(l.depositThickness), current: current === 'DCEP' || current === 'DCEN' || current === 'AC' ? current : null,
      amps: num(l.amps), volts: num(l.volts), wireFeed: num(l.wireFeed), travelSpeed: num(l.travelSpeed), heatInput: num(l.heatInput),
      gas: str(l.gas), gasFlow: num(l.gasFlow), ctwd: num(l.ctwd), tungsten: str(l.tungsten), backingGas: str(l.backingGas), flux: str(l.flux),
    }
  })
}

/** The columns of a PQR: the first layer's process and filler and the total deposit in the columns of old, every layer in `layers`. */
export function pqrColumns(draft: PqrDraft) {
  const first = draft.layers[0]!
  return {
    number: draft.number, testDate: draft.testDate, code: draft.code, edition: draft.edition, unit: draft.unit, process: first.process,
    transfer: first.transfer, couponThickness: draft.couponThickness, depositThickness: totalDeposit(draft.layers), baseMetalId: draft.baseMetalId,
    baseMetalBId: draft.baseMetalBId, welderId: draft.welderId, processes: [...new Set(draft.layers.map(l => l.process))], layers: draft.layers,
    fillerMetalId: draft.layers.find(l => l.fillerMetalId !== null)?.fillerMetalId ?? null, toughnessRequired: draft.toughnessRequired,
    actuals: draft.actuals, labReportNumber: draft.labReportNumber,
  }
}

/** The ISO 15614-1 test piece kept in a WPQR's actuals (null on ASME/AWS PQRs, or when it does not read). */
export function wpqrPieceOf(row: Pick<PqrRow, 'actuals'>): WpqrPiece | null {
  const a = obj(row.actuals)
  if (!a.iso) return null
  const parsed = wpqrPieceSchema.safeParse(a.iso)
  return parsed.success ? parsed.data : null
}

/** A stored PQR as the form's draft. */
export function pqrDraftOf(row: PqrRow): PqrDraft {
  const a = obj(row.actuals)
  const progression = a.progression === 'uphill' || a.progression === 'downhill' ? a.progression : null
  return {
    number: row.number, testDate: row.testDate, code: row.code as PqrDraft['code'], edition: row.edition, unit: row.unit as Unit,
    couponThickness: row.couponThickness, baseMetalId: row.baseMetalId ?? 0, baseMetalBId: row.baseMetalBId, welderId: row.welderId,
    toughnessRequired: row.toughnessRequired, labReportNumber: row.labReportNumber, layers: pqrLayersOf(row),
    actuals: {
      position: str(a.position), progression, preheat: num(a.preheat), interpass: num(a.interpass), pwht: str(a.pwht), pwhtTemperature: num(a.pwhtTemperature), pwhtHours: num(a.pwhtHours),
      // ISO 15614-1 only: present on WPQRs, absent on every other record (so their drafts read as before).
      ...(wpqrPieceOf(row) ? { iso: wpqrPieceOf(row) } : {}),
    },
  }
}
