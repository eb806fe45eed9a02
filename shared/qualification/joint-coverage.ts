import { evaluate, getRuleSet, RuleRefusal } from '../rules'
import type { ProductionWeld, WelderTestInput } from '../rules/inputs'
import type { CoverAnswer, CoverReason } from '../rules/results'
import type { CodeId, Unit } from '../rules/types'
import { convertLength } from '../rules/units'
import { standingOn, type Chain } from './process-standing'
import { procedureCovers } from './wps-coverage'
import { welderRangesInput } from './test-ranges'
import { jointPositions, type Joint } from '../schemas/coverage'

/** Rows of the coverage query (snake_case, as the database returns them). */
export interface ProcedureRow {
  id: number
  number: string
  revision: number
  title: string
  code: string
  edition: string
  unit: string
  process: string
  transfer: string | null
  p_number_a: string | null
  p_number_b: string | null
  thickness_min: number | null
  thickness_max: number | null
  diameter_min: number | null
  positions: string[]
  f_numbers: string[]
}
export interface TestRow {
  id: number
  test_date: string
  code: string
  edition: string
  unit: string
  process: string
  transfer: string | null
  form: string
  weld: string
  coupon_thickness: number | null
  deposit_thickness: number | null
  layers: number | null
  outside_diameter: number | null
  p_number: string | null
  f_number: string | null
  backing: boolean
  positions: string[]
  /** Vertical progression as recorded (null on records made before it was captured: "not recorded"). */
  progression?: string | null
}
/** A welder with their certified tests of the process and their continuity chain for it (kept per welder and process by the server). */
export interface CandidateRow { id: number, name: string, stamp: string, tests: TestRow[], chain: Chain }

export type ResolvedJoint = Omit<Joint, 'gauge'> & { thickness?: number, gaugeNote?: string }

/** A gauge becomes a decimal thickness by the rules (steel sheet); the joint then carries the thickness. */
export function resolveJoint(joint: Joint): ResolvedJoint | { error: string } {
  const { gauge, ...rest } = joint
  if (gauge === undefined) return rest
  const result = evaluate({ code: 'asme-ix', check: 'gauge', unit: joint.unit, input: { gauge, material: 'steel' } })
  if ('error' in result) return { error: String(result.error) }
  const thickness = result.thickness as number
  return { ...rest, thickness, gaugeNote: `${gauge} ga sheet steel is ${thickness} ${joint.unit} thick.` }
}

export function judgeProcedures(rows: ProcedureRow[], joint: ResolvedJoint) {
  return rows.map((p) => {
    const verdict = procedureCovers({
      code: p.code as CodeId, unit: p.unit as Unit, process: p.process, transfer: p.transfer, pNumberA: p.p_number_a, pNumberB: p.p_number_b,
      thicknessMin: p.thickness_min, thicknessMax: p.thickness_max, diameterMin: p.diameter_min, positions: p.positions, fNumbers: p.f_numbers,
    }, { ...joint, positions: jointPositions(joint) })
    return { id: p.id, number: p.number, revision: p.revision, title: p.title, code: p.code, edition: p.edition, ...verdict }
  })
}

const tungsten = (process: string) => process === 'GTAW' || process === 'PAW'

function productionIn(joint: ResolvedJoint, unit: Unit) {
  const len = (v: number | undefined) => (v === undefined ? undefined : convertLength(v, joint.unit, unit))
  const gtaw = tungsten(joint.process)
  return Object.fromEntries(Object.entries({
    code: joint.code, form: joint.form, weld: joint.weld, positions: jointPositions(joint), process: joint.process, transfer: joint.transfer,
    thickness: len(joint.thickness), outsideDiameter: len(joint.outsideDiameter), pNumber: joint.pNumber,
    fNumber: joint.fNumber, backing: joint.backing, progression: joint.progression,
    fillerAdded: gtaw ? joint.fillerAdded : undefined, consumableInsert: gtaw ? joint.consumableInsert : undefined, fillerForm: gtaw ? joint.fillerForm : undefined,
    backingGas: joint.backingGas, current: gtaw ? joint.current : undefined,
  }).filter(([, v]) => v !== undefined))
}

const variablesOf = (t: TestRow) => ({
  code: t.code as CodeId, edition: t.edition, unit: t.unit as Unit, process: t.process, transfer: t.transfer, form: t.form as 'plate' | 'pipe',
  weld: t.weld as 'groove' | 'fillet', couponThickness: t.coupon_thickness, depositThickness: t.deposit_thickness, layers: t.layers,
  outsideDiameter: t.outside_diameter, pNumber: t.p_number, fNumber: t.f_number, backing: t.backing, positions: t.positions,
  progression: t.progression,
})

/** The rules input of one stored test as "Who can weld it?" judges it (also what its stored ranges are derived from). */
export const coverageTestInput = (t: TestRow) => welderRangesInput(variablesOf(t)) as unknown as WelderTestInput

/**
 * For each welder: where the process stands today (the newest certified test starts the chain, continuity keeps it),
 * and whether one of their certified tests of the process covers the joint (the rules' covers check takes a set of
 * tests the same way: covered when one test covers it all). Identical coupons are judged once per request.
 */
export type CouponVerdict = { covered: boolean, answer: CoverAnswer, record: string[], reasons: CoverReason[] }

/**
 * The covers rule of a coupon's code for this joint, one call per coupon: `judge(code, edition, unit, input)` answers
 * covered, cannot tell (also when the rules refuse the coupon) or not covered, with the findings.
 */
export function couponJudge(joint: ResolvedJoint) {
  const productions = new Map<Unit, ProductionWeld>()
  const productionOf = (unit: Unit) => productions.get(unit) ?? productions.set(unit, productionIn(joint, unit) as unknown as ProductionWeld).get(unit)!
  return (code: string, edition: string, unit: string, test: WelderTestInput): CouponVerdict => {
    try {
      // Stored tests passed the same schemas when they were saved, so the rule is called without re-parsing them.
      return getRuleSet(code as CodeId).covers({ test, production: productionOf(unit as Unit) }, { code: code as CodeId, edition, unit: unit as Unit })
    }
    catch (error) {
      if (!(error instanceof RuleRefusal)) throw error
      return { covered: false, answer: 'cannot-tell', record: [], reasons: [{ met: false, state: 'not-recorded', clause: 'rules', text: `Cannot judge this test: ${error.message}`, basis: 'convention' }] }
    }
  }
}

/** One welder's line of the answer from the verdict of the test shown (the covering one, else one that cannot tell, else the newest). */
export function welderLine(w: Pick<CandidateRow, 'id' | 'name' | 'stamp' | 'chain'>, shown: CouponVerdict, answer: CoverAnswer, testIds: number[], today: string) {
  const standing = standingOn(w.chain, today)
  return { id: w.id, name: w.name, stamp: w.stamp, covered: answer === 'covered', answer, record: shown.record, current: standing.standing !== 'lapsed', standing, reasons: shown.reasons, testIds }
}

export function judgeWelders(rows: CandidateRow[], joint: ResolvedJoint, today: string) {
  const judgeCoupon = couponJudge(joint)
  const verdicts = new Map<string, CouponVerdict>()
  const judge = (t: TestRow): CouponVerdict => {
    const test = coverageTestInput(t)
    const key = `${t.code}|${t.edition}|${t.unit}|${JSON.stringify(test)}`
    const known = verdicts.get(key)
    if (known) return known
    const verdict = judgeCoupon(t.code, t.edition, t.unit, test)
    verdicts.set(key, verdict)
    return verdict
  }
  return rows.map((w) => {
    const judged = w.tests.map(t => ({ id: t.id, ...judge(t) }))
    const covering = judged.find(j => j.covered)
    const telling = judged.find(j => j.answer === 'cannot-tell')
    const shown = covering ?? telling ?? judged[0]!
    const answer: CoverAnswer = covering ? 'covered' : telling ? 'cannot-tell' : 'not-covered'
    return welderLine(w, shown, answer, covering ? [covering.id] : judged.map(j => j.id), today)
  })
}
