import { z } from 'zod'
import type { procedureStatuses } from '../vocabulary/records'
import { isIsoProcedureCode } from '../vocabulary/records'
import { isoPositions, isoProcessIds } from '../vocabulary/iso'
import { procedureProcessSchema, isoProcedureRefine } from './procedure-iso'
import {
  procedureCodeIdSchema, editionSchema, idSchema, optionalNumber, optionalText, rangeOf, requiredText, transferIdSchema, unitIdSchema,
  versionSchema, windowOf,
} from './fields'

/**
 * A WPS as the form and the API exchange it. Lengths, speeds, gas flow and heat input are in the record's unit
 * (in: in, in/min, ft³/h, J/in, °F; mm: mm, mm/min, L/min, J/mm, °C).
 */

export const positionLetters = ['F', 'H', 'V', 'O'] as const
export const positionNames: Record<typeof positionLetters[number], string> = { F: 'flat', H: 'horizontal', V: 'vertical', O: 'overhead' }
export const currentTypes = ['DCEP', 'DCEN', 'AC'] as const
export { procedureStatuses } from '../vocabulary/records'
export type ProcedureStatus = typeof procedureStatuses[number]

const baseMetalSide = (side: string) => z.object({
  baseMetalId: idSchema.nullable().default(null),
  pNumber: requiredText(`the P-No. of base metal ${side}`, 8),
  groupNumber: z.preprocess(v => (v === '' || v === undefined ? null : typeof v === 'string' ? Number(v) : v),
    z.number({ invalid_type_error: 'Group No. must be a whole number' }).int('Group No. must be a whole number').min(1, 'Group No. starts at 1').max(99).nullable()),
})

export const procedureFillerSchema = z.object({
  fillerMetalId: idSchema.nullable().default(null),
  specification: requiredText('the filler specification (e.g. SFA-5.18)', 30),
  classification: requiredText('the classification (e.g. ER70S-6)', 30),
  fNumber: requiredText('the F-No.', 8),
  aNumber: optionalText('A-No.', 8),
  /** Diameter in the record's unit (in or mm) */
  size: optionalNumber('Filler size', { positive: true, max: 100 }),
})
export type ProcedureFiller = z.infer<typeof procedureFillerSchema>

/** Processes that weld with a non-consumable tungsten electrode (tungsten, filler added or not, consumable insert); ISO 4063 141–145 and 15. */
export const tungstenProcesses = ['GTAW', 'PAW', '141', '142', '143', '145', '15'] as const
/** Processes fed by a wire whose speed sets the current (wire feed speed, contact tip); ISO 4063 114, 121, 125, 131–138. */
export const wireProcesses = ['GMAW', 'FCAW', 'SAW', 'EGW', 'ESW', '114', '121', '125', '131', '135', '136', '138'] as const
/** Processes whose metal transfer mode is stated (GMAW, FCAW; ISO 4063 131, 135, 136, 138). */
export const transferProcesses = ['GMAW', 'FCAW', '131', '135', '136', '138'] as const
/** Processes that weld under a flux (SAW; ISO 4063 121, 125). */
export const fluxProcesses = ['SAW', '121', '125'] as const
export { isoPositions, isoProcessIds }
export const layerNameSuggestions = ['root', 'hot pass', 'fill', 'cap', 'all passes', 'back weld'] as const

/**
 * One process layer of a WPS, in welding order (root, hot pass, fill, cap...): its process, fillers, deposit limit,
 * current and electrical window, and the process's own variables (ASME IX QW-250 lists them per process).
 */
export const procedureLayerSchema = z.object({
  name: requiredText('the layer (root, hot pass, fill, cap)', 40),
  passes: optionalText('Passes', 20),
  process: procedureProcessSchema,
  transfer: transferIdSchema.nullable().default(null),
  fillers: z.array(procedureFillerSchema).max(4, 'At most 4 filler metals a layer'),
  fillerAdded: z.boolean().nullable().default(null),
  depositMax: optionalNumber('Deposit thickness maximum', { positive: true }),
  current: z.enum(currentTypes, { errorMap: () => ({ message: 'Pick DCEP, DCEN or AC' }) }),
  amps: windowOf('Current'),
  volts: windowOf('Voltage'),
  wireFeed: windowOf('Wire feed speed'),
  travelSpeed: windowOf('Travel speed'),
  heatInputMax: optionalNumber('Heat input limit', { positive: true, max: 1_000_000 }),
  ctwd: windowOf('Contact-tip-to-work distance'),
  gas: z.object({ composition: optionalText('Gas composition', 120), flow: windowOf('Gas flow') }),
  bead: requiredText('stringer or weave', 120),
  pulsing: z.boolean().default(false),
  oscillation: optionalText('Oscillation', 120),
  electrodes: z.enum(['single', 'multiple'], { errorMap: () => ({ message: 'Single or multiple electrodes' }) }).default('single'),
  passesPerSide: z.enum(['single', 'multiple'], { errorMap: () => ({ message: 'Single or multiple passes per side' }) }).nullable().default(null),
  backGouging: z.boolean().default(false),
  tungsten: z.object({ type: optionalText('Tungsten type', 30), size: optionalNumber('Tungsten size', { positive: true, max: 100 }) }),
  backingGas: z.object({ composition: optionalText('Backing gas', 120), flow: windowOf('Backing gas flow') }),
  consumableInsert: optionalText('Consumable insert', 60),
  flux: z.object({ name: optionalText('Flux', 60), classification: optionalText('Electrode–flux classification', 40) }),
}).superRefine((v, ctx) => {
  const issue = (path: (string | number)[], message: string) => ctx.addIssue({ code: z.ZodIssueCode.custom, path, message })
  const tungsten = (tungstenProcesses as readonly string[]).includes(v.process)
  if (v.transfer && !(transferProcesses as readonly string[]).includes(v.process)) issue(['transfer'], 'A transfer mode is stated for GMAW and FCAW only')
  if (v.process === 'GMAW' && !v.transfer) issue(['transfer'], 'Pick the GMAW transfer mode')
  if (!v.fillers.length && !(tungsten && v.fillerAdded === false)) issue(['fillers'], 'Add at least one filler metal (or say no filler is added, GTAW)')
  if (v.fillerAdded === false && v.fillers.length) issue(['fillerAdded'], 'Fillers are listed: filler is added')
  if (!tungsten && v.fillerAdded !== null) issue(['fillerAdded'], 'Filler added or not is stated for GTAW and PAW')
  if (!tungsten && (v.tungsten.type || v.tungsten.size !== null)) issue(['tungsten', 'type'], 'A tungsten electrode belongs to GTAW or PAW')
  if (!tungsten && v.consumableInsert) issue(['consumableInsert'], 'A consumable insert belongs to GTAW or PAW')
  if (!(fluxProcesses as readonly string[]).includes(v.process) && (v.flux.name || v.flux.classification)) issue(['flux', 'name'], 'A flux belongs to SAW')
})
export type ProcedureLayer = z.infer<typeof procedureLayerSchema>

/** PWHT: none, or a temperature range held for a time (hours). */
export const pwhtSchema = z.object({
  required: z.boolean().default(false),
  temperature: rangeOf('PWHT temperature'),
  holdHours: optionalNumber('PWHT time', { positive: true, max: 1000 }),
  note: optionalText('PWHT note', 200),
}).superRefine((v, ctx) => {
  if (v.required && (v.temperature.min === null || v.temperature.max === null)) {
    ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['temperature', 'max'], message: 'Give the PWHT temperature range' })
  }
  if (v.required && v.holdHours === null) ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['holdHours'], message: 'Give the PWHT time' })
})
export type Pwht = z.infer<typeof pwhtSchema>

export const procedureDraftSchema = z.object({
  number: requiredText('the WPS number', 40).regex(/^[A-Za-z0-9][A-Za-z0-9 ._/-]*$/, 'Letters, digits, space, . _ / - only'),
  title: requiredText('a title', 200),
  code: procedureCodeIdSchema,
  edition: editionSchema,
  unit: unitIdSchema,
  supportingPqrIds: z.array(idSchema).max(10, 'At most 10 supporting PQRs').default([]),
  baseMetals: z.object({ a: baseMetalSide('A'), b: baseMetalSide('B') }),
  thickness: z.object({ groove: rangeOf('Groove thickness'), fillet: rangeOf('Fillet thickness') }),
  diameter: rangeOf('Pipe diameter'),
  joints: z.object({
    type: requiredText('the joint type (butt, tee, lap...)', 120),
    groove: optionalText('Groove design', 300),
    grooveAngle: optionalNumber('Groove angle', { max: 180 }),
    rootOpening: rangeOf('Root opening'),
    rootFace: rangeOf('Root face'),
    backing: optionalText('Backing', 120),
    /** A prequalified joint detail of the code (AWS D1.1 B-U2a, TC-U4a-GF...). */
    designation: optionalText('Joint designation', 20),
  }),
  /** AWS D1.1: a prequalified WPS, held to the code's prequalification limits instead of a PQR. */
  prequalified: z.boolean().default(false),
  /** F, H, V, O for ASME and AWS; ISO 6947 positions (PA–PJ, H-L045, J-L045) for ISO 15614-1 (checked per code below). */
  positions: z.array(z.enum([...positionLetters, ...isoPositions], { errorMap: () => ({ message: 'Positions are F, H, V or O (ISO: PA–PJ, H-L045, J-L045)' }) })).min(1, 'Pick at least one position'),
  progression: z.enum(['uphill', 'downhill'], { errorMap: () => ({ message: 'Progression is uphill or downhill' }) }).nullable().default(null),
  toughnessRequired: z.boolean().default(false),
  preheatMin: optionalNumber('Preheat minimum', { min: -100, max: 2000 }),
  interpassMax: optionalNumber('Interpass maximum', { max: 2000 }),
  pwht: pwhtSchema,
  cleaning: optionalText('Cleaning', 200),
  layers: z.array(procedureLayerSchema).min(1, 'Add at least one process layer').max(8, 'At most 8 layers'),
}).superRefine((v, ctx) => {
  if (v.thickness.groove.min === null || v.thickness.groove.max === null) {
    ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['thickness', 'groove', 'max'], message: 'Give the groove thickness range, minimum and maximum' })
  }
  if (v.prequalified && v.code !== 'aws-d1.1') {
    ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['prequalified'], message: 'Only AWS D1.1 WPSs are checked as prequalified here' })
  }
  if (v.positions.includes('V') && !v.progression) {
    ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['progression'], message: 'Vertical welding needs a progression, uphill or downhill' })
  }
  isoProcedureRefine(isIsoProcedureCode(v.code), v.layers.map(l => l.process), v.positions, ctx, ['layers', 'process'])
  if (v.code === 'iso-15614-1' && v.unit !== 'mm') ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['unit'], message: 'ISO 15614-1 records are kept in millimetres and °C' })
})
export type ProcedureDraft = z.infer<typeof procedureDraftSchema>
export type ProcedureDraftInput = z.input<typeof procedureDraftSchema>

/** PATCH: the whole draft as edited plus the version it was loaded at (a stale version is refused with 409). */
export const procedurePatchSchema = z.object({ version: versionSchema, draft: procedureDraftSchema }).strict()
export type ProcedurePatch = z.infer<typeof procedurePatchSchema>

export const procedureListQueryKeys = ['number', 'title', 'process', 'status', 'updatedAt'] as const

/** The variables kept in the `variables` column (everything without its own column; the layers have theirs). */
export type ProcedureVariables = Omit<ProcedureDraft, 'number' | 'title' | 'code' | 'edition' | 'unit' | 'supportingPqrIds' | 'layers'>

/** The processes of a draft in layer order, each once. */
export function processesOf(draft: Pick<ProcedureDraft, 'layers'>): string[] {
  return [...new Set(draft.layers.map(l => l.process))]
}

const emptyRange = () => ({ min: null, max: null })
const emptyWindow = () => ({ min: null, max: null, setPoint: null })

/** A blank filler row. */
export function blankFiller(): ProcedureFiller {
  return { fillerMetalId: null, specification: '', classification: '', fNumber: '', aNumber: null, size: null }
}

/** A blank layer of a process. */
export function blankLayer(process: ProcedureLayer['process'] = 'GMAW', name = 'all passes'): ProcedureLayer {
  return {
    name, passes: null, process, transfer: process === 'GMAW' ? 'short-circuit' : null, fillers: [blankFiller()],
    fillerAdded: (tungstenProcesses as readonly string[]).includes(process) ? true : null, depositMax: null,
    current: process === 'GTAW' ? 'DCEN' : 'DCEP', amps: emptyWindow(), volts: emptyWindow(), wireFeed: emptyWindow(), travelSpeed: emptyWindow(),
    heatInputMax: null, ctwd: emptyWindow(), gas: { composition: null, flow: emptyWindow() }, bead: 'stringer', pulsing: false, oscillation: null,
    electrodes: 'single', passesPerSide: null, backGouging: false, tungsten: { type: null, size: null },
    backingGas: { composition: null, flow: emptyWindow() }, consumableInsert: null, flux: { name: null, classification: null },
  }
}

/** A blank draft for the form. */
export function blankProcedureDraft(): ProcedureDraft {
  return {
    number: '', title: '', code: 'asme-ix', edition: '2023', unit: 'in', supportingPqrIds: [],
    baseMetals: { a: { baseMetalId: null, pNumber: '1', groupNumber: null }, b: { baseMetalId: null, pNumber: '1', groupNumber: null } },
    thickness: { groove: emptyRange(), fillet: emptyRange() }, diameter: emptyRange(),
    joints: { type: '', groove: null, grooveAngle: null, rootOpening: emptyRange(), rootFace: emptyRange(), backing: null, designation: null },
    prequalified: false, positions: ['F', 'H'], progression: null, toughnessRequired: false, preheatMin: null, interpassMax: null,
    pwht: { required: false, temperature: emptyRange(), holdHours: null, note: null }, cleaning: null,
    layers: [blankLayer()],
  }
}

/** One row of the pass table: what the welder sets for each layer, read from the layer. */
export interface PassRow {
  layer: string
  passes: string | null
  process: string
  transfer: string | null
  filler: string
  diameter: number | null
  current: string
  amps: { min: number | null, max: number | null, setPoint: number | null }
  wireFeed: { min: number | null, max: number | null, setPoint: number | null }
  volts: { min: number | null, max: number | null, setPoint: number | null }
  travelSpeed: { min: number | null, max: number | null, setPoint: number | null }
  heatInputMax: number | null
}

/** The pass table of a WPS: one row per layer and filler. */
export function passTable(draft: Pick<ProcedureDraft, 'layers'>): PassRow[] {
  return draft.layers.flatMap(l => (l.fillers.length ? l.fillers : [null]).map(f => ({
    layer: l.name, passes: l.passes, process: l.process, transfer: l.transfer,
    filler: f ? f.classification : (l.fillerAdded === false ? 'none (autogenous)' : ''), diameter: f?.size ?? null, current: l.current,
    amps: l.amps, wireFeed: l.wireFeed, volts: l.volts, travelSpeed: l.travelSpeed, heatInputMax: l.heatInputMax,
  })))
}

/** POST approve: the version being signed; for a code whose support rules this program does not carry, how the ranges were checked. */
export const approveBodySchema = z.object({
  version: versionSchema,
  handCheck: optionalText('How the ranges were checked', 500).optional(),
}).strict()
