import type { procedures } from './schema'
import { blankLayer, currentTypes, processesOf, type ProcedureDraft, type ProcedureLayer, type ProcedureVariables, type Pwht } from '../../shared/schemas/procedure'
import type { Unit } from '../../shared/rules/types'

/** A stored WPS as the form's draft and back: pure functions (relative imports only, so the seed scripts can run them). */

export type ProcedureRow = typeof procedures.$inferSelect

type Loose = Record<string, unknown>
export const obj = (v: unknown): Loose => (v && typeof v === 'object' && !Array.isArray(v) ? v as Loose : {})
const num = (v: unknown) => (typeof v === 'number' && Number.isFinite(v) ? v : null)
export const str = (v: unknown) => (typeof v === 'string' && v.trim() !== '' ? v : null)
const range = (v: unknown) => ({ min: num(obj(v).min), max: num(obj(v).max) })
const windowRange = (v: unknown) => ({ ...range(v), setPoint: num(obj(v).setPoint) })

/** A filler size as stored: a number, or older text such as "3/32 in", "1/8", "2.4 mm" read as a number of the record's unit. */
export function sizeOf(v: unknown, unit: Unit): number | null {
  if (typeof v === 'number') return Number.isFinite(v) && v > 0 ? v : null
  const text = str(v)
  if (!text) return null
  const m = text.trim().match(/^(?:(\d+)[ -])?(\d+(?:\.\d+)?)(?:\/(\d+))?\s*(in|"|mm)?\.?$/i)
  if (!m) return null
  const whole = m[1] ? Number(m[1]) : 0
  const value = m[3] ? whole + Number(m[2]) / Number(m[3]) : whole + Number(m[2])
  const written = m[4]?.toLowerCase() === 'mm' ? 'mm' : m[4] ? 'in' : unit
  const inUnit = written === unit ? value : written === 'in' ? value * 25.4 : value / 25.4
  return Number.isFinite(inUnit) && inUnit > 0 ? Math.round(inUnit * 1e6) / 1e6 : null
}

const fillerOf = (f: Loose, unit: Unit, fNumberFallback: string | null) => ({
  fillerMetalId: num(f.fillerMetalId), specification: str(f.specification) ?? '', classification: str(f.classification) ?? '',
  fNumber: str(f.fNumber) ?? fNumberFallback ?? '', aNumber: str(f.aNumber), size: sizeOf(f.size, unit),
})

/** An older filler whose size text names several sizes ("1/8 in and 5/32 in") reads as one filler row per size. */
function fillersOf(f: Loose, unit: Unit, fNumberFallback: string | null) {
  const text = typeof f.size === 'string' ? f.size : null
  const parts = text ? text.split(/\s*(?:,|\band\b|\bor\b|;)\s*/).filter(Boolean) : []
  if (parts.length < 2 || parts.some(p => sizeOf(p, unit) === null)) return [fillerOf(f, unit, fNumberFallback)]
  return parts.map(p => fillerOf({ ...f, size: p }, unit, fNumberFallback))
}

const bool = (v: unknown) => (typeof v === 'boolean' ? v : null)

/** One stored layer as the form's layer, reading partial values with empty defaults. */
export function layerOf(raw: unknown, unit: Unit): ProcedureLayer {
  const l = obj(raw)
  const blank = blankLayer((str(l.process) ?? 'GMAW') as ProcedureLayer['process'], str(l.name) ?? 'all passes')
  const gas = obj(l.gas)
  const backing = obj(l.backingGas)
  const enumOr = <T extends string>(v: unknown, allowed: readonly T[], fallback: T): T => (allowed.includes(v as T) ? v as T : fallback)
  return {
    ...blank, passes: str(l.passes), transfer: (str(l.transfer) as ProcedureLayer['transfer']) ?? null,
    fillers: Array.isArray(l.fillers) ? l.fillers.flatMap(f => fillersOf(obj(f), unit, null)) : [],
    fillerAdded: bool(l.fillerAdded), depositMax: num(l.depositMax),
    current: enumOr(l.current, currentTypes, blank.current),
    amps: windowRange(l.amps), volts: windowRange(l.volts), wireFeed: windowRange(l.wireFeed), travelSpeed: windowRange(l.travelSpeed),
    heatInputMax: num(l.heatInputMax), ctwd: windowRange(l.ctwd), gas: { composition: str(gas.composition), flow: windowRange(gas.flow) },
    bead: str(l.bead) ?? '', pulsing: l.pulsing === true, oscillation: str(l.oscillation), electrodes: enumOr(l.electrodes, ['single', 'multiple'] as const, 'single'),
    passesPerSide: l.passesPerSide === 'single' || l.passesPerSide === 'multiple' ? l.passesPerSide : null, backGouging: l.backGouging === true,
    tungsten: { type: str(obj(l.tungsten).type), size: sizeOf(obj(l.tungsten).size, unit) },
    backingGas: { composition: str(backing.composition), flow: windowRange(backing.flow) }, consumableInsert: str(l.consumableInsert),
    flux: { name: str(obj(l.flux).name), classification: str(obj(l.flux).classification) },
  }
}

/**
 * The layers of a stored WPS. A record written before process layers (or one the migration left without them)
 * reads as one layer made of its single process and its variables.
 */
export function layersOf(row: Pick<ProcedureRow, 'layers' | 'process' | 'transfer' | 'variables' | 'fNumbers' | 'unit'>): ProcedureLayer[] {
  const unit = row.unit as Unit
  if (Array.isArray(row.layers) && row.layers.length) return row.layers.map(l => layerOf(l, unit))
  const v = obj(row.variables)
  const el = obj(v.electrical)
  const tech = obj(v.technique)
  const fillers = (Array.isArray(v.fillers) ? v.fillers : []).map(obj)
  return [{
    ...layerOf({
      name: 'all passes', process: row.process, transfer: row.transfer, depositMax: v.depositMax, current: el.current, amps: el.amps,
      volts: el.volts, wireFeed: el.wireFeed, travelSpeed: el.travelSpeed, heatInputMax: el.heatInputMax, ctwd: tech.ctwd, gas: v.gas, bead: tech.bead,
    }, unit),
    fillers: fillers.flatMap((f, i) => fillersOf(f, unit, row.fNumbers[i] ?? row.fNumbers[0] ?? null)),
  }]
}

/** PWHT as stored: an object, or the older text ("none", or a description kept as the note). */
export function pwhtOf(v: unknown): Pwht {
  if (v && typeof v === 'object') {
    const p = obj(v)
    return { required: p.required === true, temperature: range(p.temperature), holdHours: num(p.holdHours), note: str(p.note) }
  }
  const text = str(v)
  const none = !text || /^none$/i.test(text.trim())
  return { required: !none, temperature: { min: null, max: null }, holdHours: null, note: none ? null : text }
}

/** A stored WPS as the form's draft, reading older or partial `variables` with empty defaults. */
export function draftOf(row: ProcedureRow, supportingPqrIds: number[]): ProcedureDraft {
  const v = obj(row.variables)
  const bm = obj(v.baseMetals)
  const side = (s: unknown, fallback: string | null) => ({ baseMetalId: num(obj(s).baseMetalId), pNumber: str(obj(s).pNumber) ?? fallback ?? '', groupNumber: num(obj(s).groupNumber) })
  const joints = obj(v.joints)
  return {
    number: row.number, title: row.title, code: row.code as ProcedureDraft['code'], edition: row.edition, unit: row.unit as Unit, supportingPqrIds,
    baseMetals: { a: side(bm.a, row.pNumberA), b: side(bm.b, row.pNumberB) },
    thickness: { groove: { min: row.thicknessMin, max: row.thicknessMax }, fillet: range(obj(v.thickness).fillet) },
    diameter: { min: row.diameterMin, max: num(obj(v.diameter).max) },
    joints: {
      type: str(joints.type) ?? '', groove: str(joints.groove), grooveAngle: num(joints.grooveAngle),
      rootOpening: range(joints.rootOpening), rootFace: range(joints.rootFace), backing: str(joints.backing), designation: str(joints.designation),
    },
    prequalified: row.prequalified === true,
    positions: row.positions as ProcedureDraft['positions'],
    progression: (str(v.progression) as ProcedureDraft['progression']) ?? null,
    toughnessRequired: v.toughnessRequired === true,
    preheatMin: num(v.preheatMin), interpassMax: num(v.interpassMax), pwht: pwhtOf(v.pwht),
    cleaning: str(v.cleaning) ?? str(obj(v.technique).cleaning),
    layers: layersOf(row),
  }
}

/** The columns of a draft: searchable values in their own columns, the layers in theirs, the rest in `variables`. */
export function columnsOf(draft: ProcedureDraft) {
  const { number, title, code, edition, unit, supportingPqrIds: _pqrs, layers, ...rest } = draft
  const variables: ProcedureVariables = rest
  const first = layers[0]!
  return {
    number, title, code, edition, unit, process: first.process, transfer: first.transfer, processes: processesOf(draft), layers,
    pNumberA: draft.baseMetals.a.pNumber, pNumberB: draft.baseMetals.b.pNumber,
    thicknessMin: draft.thickness.groove.min, thicknessMax: draft.thickness.groove.max, diameterMin: draft.diameter.min,
    positions: draft.positions, fNumbers: [...new Set(layers.flatMap(l => l.fillers.map(f => f.fNumber)))],
    prequalified: draft.prequalified,
    variables,
  }
}
