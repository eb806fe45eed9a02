import type { welderTestBends, welderTests } from './schema'
import { testOutcome, type TestRecord } from '../../shared/qualification/test-outcome'
import { isoDetailVariables, type WelderTestVariables } from '../../shared/qualification/test-ranges'
import type { ProcessVariables } from '../../shared/rules/inputs'
import type { WelderRangesResult } from '../../shared/rules/results'
import { combinedProcess } from '../../shared/schemas/welder-test'
import type { CodeId, Unit } from '../../shared/rules/types'
import { designation } from '../../shared/rules/iso-9606-1/designation'
import type { IsoTestInput, WelderTestInput } from '../../shared/schemas/welder-test'

/** A welder test's input as columns, and a stored test as the rules read it: pure (relative imports only, for the seed scripts). */

type Row = typeof welderTests.$inferSelect
type Bend = typeof welderTestBends.$inferSelect

// The jsonb column `radiography` holds the record of a non-bend examination: a radiograph or a macro/fracture result.
export type ExamRecord = { kind: 'radiography', indications: { kind: string, length: number }[], reportNumber: string | null }
  | { kind: 'macro-fracture', accepted: boolean, notes: string | null }

export function examRecordOf(input: Pick<WelderTestInput, 'examination' | 'radiography' | 'macro'>): ExamRecord | null {
  if (input.examination === 'radiography' && input.radiography) return { kind: 'radiography', ...input.radiography }
  if (input.examination === 'macro-fracture' && input.macro) return { kind: 'macro-fracture', ...input.macro }
  return null
}

/** A stored process of a coupon: its process, transfer, own deposit and what that deposit qualifies. */
export interface StoredDeposit { process: string, transfer: string | null, depositThickness: number | null, fNumber?: string | null, depositMax?: number | null, error?: string }

/** The processes of a stored test; a test recorded before combination coupons has its one process. */
export function depositsOf(row: Pick<Row, 'deposits' | 'process' | 'transfer' | 'depositThickness'>): StoredDeposit[] {
  const list = Array.isArray(row.deposits) ? row.deposits as StoredDeposit[] : []
  return list.length ? list : [{ process: row.process, transfer: row.transfer, depositThickness: row.depositThickness }]
}

const fNo = (v: string | null | undefined) => (v && /^\d+$/.test(v) ? Number(v) : undefined)

/** A combination coupon's processes as the rules take them (each its own deposit and F-No.); null for a single process. */
export function rulesProcesses(list: { process: string, transfer: string | null, depositThickness: number | null, fNumber?: string | null }[], fNumber: string | null, progression: string | null): ProcessVariables[] | null {
  if (list.length < 2) return null
  return list.map(p => Object.fromEntries(Object.entries({
    process: p.process, transfer: p.transfer ?? undefined, depositThickness: p.depositThickness ?? undefined, fNumber: fNo(p.fNumber ?? fNumber),
    progression: progression ?? undefined,
  }).filter(([, v]) => v !== undefined)) as unknown as ProcessVariables)
}

/** The rules' variables of a stored test (a combination coupon with its processes). */
export function variablesOf(row: Row): WelderTestVariables {
  return {
    code: row.code as CodeId, edition: row.edition, unit: row.unit as Unit, process: row.process, transfer: row.transfer,
    form: row.form as 'plate' | 'pipe', weld: row.weld as 'groove' | 'fillet', couponThickness: row.couponThickness,
    depositThickness: row.depositThickness, layers: row.layers, outsideDiameter: row.outsideDiameter, pNumber: row.pNumber,
    fNumber: row.fNumber, backing: row.backing, positions: row.positions, progression: row.progression as 'uphill' | 'downhill' | null,
    processes: rulesProcesses(depositsOf(row), row.fNumber, row.progression), jointType: row.jointType,
    iso: row.iso as WelderTestVariables['iso'],
  }
}

/** The rules' view of a stored test. */
export function recordOf(row: Row, bends: Pick<Bend, 'type' | 'largestIndication' | 'atCorner'>[]): TestRecord {
  const exam = row.radiography as ExamRecord | null
  return {
    ...variablesOf(row), visualAccepted: row.visualAccepted, visualNotes: row.visualNotes,
    examination: row.examination as TestRecord['examination'],
    bends: bends.map(b => ({ type: b.type, largestIndication: b.largestIndication, atCorner: b.atCorner })),
    radiography: exam?.kind === 'radiography' ? { indications: exam.indications } : null,
    macro: exam?.kind === 'macro-fracture' ? { accepted: exam.accepted, notes: exam.notes } : null,
  }
}

/**
 * The columns of a test from its input, with the ranges and bend verdicts the rules give. The first process is kept in
 * `process` and the whole deposit in `depositThickness` (the sum of the processes' deposits); each process, its own
 * deposit and the deposit it qualifies (ASME IX QW-452.1(b): each process its own) go in `deposits`.
 */
export function columnsOf(input: WelderTestInput) {
  const { bends, radiography: _r, macro: _m, processes, ...given } = input
  // ISO 9606-1: backing follows the weld details (ss nb without; ss mb and bs with), so the two never disagree.
  const isoBacking = input.code === 'iso-9606-1' ? (isoDetailVariables(input.iso) as { backing?: boolean }).backing : undefined
  const variables = isoBacking === undefined ? given : { ...given, backing: isoBacking }
  const combined = combinedProcess(processes)
  const record: TestRecord = {
    ...variables, ...combined, processes: rulesProcesses(processes, variables.fNumber, variables.progression),
    bends, radiography: input.radiography, macro: input.macro,
  }
  const outcome = testOutcome(record)
  const verdicts = outcome.bend?.specimens ?? []
  const ranges = outcome.ranges as (WelderRangesResult & { deposits?: { process: string, depositMax?: number | null }[] }) | null
  const deposits: StoredDeposit[] = processes.map((p) => {
    if (!ranges) return { ...p, error: outcome.rangesError ?? 'the rules could not evaluate this coupon' }
    if (processes.length === 1) return { ...p, depositMax: ranges.depositMax ?? null }
    const own = ranges.deposits?.find(d => d.process === p.process)
    return own && own.depositMax !== undefined ? { ...p, depositMax: own.depositMax } : { ...p, error: 'cannot tell: record this process\'s deposit thickness' }
  })
  return {
    values: {
      ...variables, ...combined, processes: [...new Set(processes.map(p => p.process))], deposits,
      qualifiedAs: variables.qualifiedAs ?? 'welder', operator: variables.qualifiedAs === 'welding-operator' ? variables.operator ?? null : null,
      radiography: examRecordOf(input), ranges: outcome.ranges ?? (outcome.rangesError ? { error: outcome.rangesError } : null),
    },
    bends: bends.map((b, i) => ({ ...b, accepted: verdicts[i]?.accepted ?? false })),
    outcome,
  }
}

/** The ISO 9606-1 designation of a stored test (clause 10), or null for another code. */
export function designationOf(row: Row): string | null {
  if (row.code !== 'iso-9606-1') return null
  const iso = row.iso as Partial<IsoTestInput> | null
  return designation({
    processes: depositsOf(row).map(d => ({ process: d.process, depositThickness: d.depositThickness })),
    form: row.form as 'plate' | 'pipe', weld: row.weld as 'groove' | 'fillet',
    fillerGroup: row.fNumber && /^[1-6]$/.test(row.fNumber) ? Number(row.fNumber) : null, fillerType: iso?.fillerType ?? null,
    couponThickness: row.couponThickness, outsideDiameter: row.outsideDiameter, positions: row.positions,
    details: iso?.details ?? null, gouging: iso?.gouging ?? null,
  })
}
