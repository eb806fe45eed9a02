import type { CoverAnswer, CoverReason } from '../results'
import type { Basis, Form, Reason, WeldType } from '../types'
import { answerOf, recordOf } from '../variables'
import { describeLetters, qw4619, type Letter } from './positions'

/**
 * Welding operators (machine and automatic welding), ASME BPVC IX QW-360, QW-361: the operator's own essential
 * variables, recorded on a form such as QW-484B. What each variable qualifies is read from QW-361.1 (automatic) and
 * QW-361.2 (machine) as remembered (basis 'memory'); positions follow QW-361.2(e) through QW-303 and QW-461.9.
 * Thickness and diameter are not operator essential variables in QW-361 (from memory): they are not limited here.
 */
export type OperatorMode = 'machine' | 'automatic'
export type VisualControl = 'direct' | 'remote'
export type PassesPerSide = 'single' | 'multiple'

/** What the operator's test coupon was welded with (the operator's part of the record). */
export interface OperatorTest {
  mode: OperatorMode
  process: string
  visualControl: VisualControl
  /** Automatic arc voltage control (GTAW), QW-361.2(c) */
  arcVoltageControl: boolean
  /** Automatic joint tracking, QW-361.2(d) */
  jointTracking: boolean
  consumableInserts: boolean
  /** Backing; a double-welded groove counts as welded with backing, QW-361.2(g) */
  backing: boolean
  passesPerSide: PassesPerSide
  form: Form
  weld: WeldType
  positions: readonly string[]
}

/** A production joint for an operator; null where the joint does not state the variable. */
export interface OperatorJoint {
  mode: OperatorMode | null
  process: string | null
  visualControl: VisualControl | null
  arcVoltageControl: boolean | null
  jointTracking: boolean | null
  consumableInserts: boolean | null
  backing: boolean | null
  passesPerSide: PassesPerSide | null
  form: Form | null
  weld: WeldType | null
  position: Letter | null
}

/** What one operator test qualifies, variable by variable. */
export interface OperatorRanges {
  modes: OperatorMode[]
  process: string
  visualControl: VisualControl[]
  /** Whether the production weld may be made with (true) / without (false) the device */
  arcVoltageControl: boolean[]
  jointTracking: boolean[]
  consumableInserts: boolean[]
  backing: boolean[]
  passesPerSide: PassesPerSide[]
  groove: Letter[]
  groovePipe: Letter[]
  fillet: Letter[]
  reasons: Reason[]
}

const memory: Basis = 'memory'
const withOrWithout = (tested: boolean) => (tested ? [true] : [false, true])

/** The ranges an operator test qualifies (QW-361.1, QW-361.2). */
export function operatorRanges(test: OperatorTest): OperatorRanges {
  const positions = qw4619(test.form, test.weld, [...test.positions])
  const reasons: Reason[] = [
    { clause: test.mode === 'automatic' ? 'QW-361.1(a)' : 'QW-361.2', text: test.mode === 'automatic' ? 'Automatic welding only: a change to machine welding needs a new test.' : 'Machine welding only; automatic welding is qualified on its own.', basis: memory },
    { clause: test.mode === 'automatic' ? 'QW-361.1(b)' : 'QW-361.2(a)', text: `${test.process} only: a change of process needs a new test.`, basis: memory },
    { clause: 'QW-361.2(b)', text: `${test.visualControl === 'direct' ? 'Direct' : 'Remote'} visual control only: a change to ${test.visualControl === 'direct' ? 'remote' : 'direct'} control needs a new test.`, basis: memory },
    { clause: 'QW-361.2(c)', text: test.arcVoltageControl ? 'With automatic arc voltage control only (deleting it needs a new test).' : 'With or without automatic arc voltage control.', basis: memory },
    { clause: 'QW-361.2(d)', text: test.jointTracking ? 'With automatic joint tracking only (deleting it needs a new test).' : 'With or without automatic joint tracking.', basis: memory },
    { clause: 'QW-361.2(f)', text: test.consumableInserts ? 'With consumable inserts, and also fillet welds and welds with backing.' : 'Without consumable inserts; a joint with inserts is also qualified (only their deletion needs a new test).', basis: memory },
    { clause: 'QW-361.2(g)', text: test.backing ? 'With backing only (double-welded grooves count as backing).' : 'With or without backing.', basis: memory },
    { clause: 'QW-361.2(h)', text: test.passesPerSide === 'single' ? 'Single pass per side only: multiple passes per side need a new test.' : 'Multiple or single passes per side.', basis: memory },
    { clause: 'QW-361.2(e), QW-461.9', text: `Groove plate ${describeLetters(positions.groove)}; groove pipe ${describeLetters(positions.groovePipe)}; fillet ${describeLetters(positions.fillet)}.`, basis: positions.fromMemory ? memory : 'verified' },
  ]
  return {
    modes: [test.mode],
    process: test.process,
    visualControl: [test.visualControl],
    arcVoltageControl: withOrWithout(test.arcVoltageControl),
    jointTracking: withOrWithout(test.jointTracking),
    // QW-361.2(f): deleting inserts needs a new test; a test with inserts also qualifies fillets and welds with backing.
    consumableInserts: test.consumableInserts ? [true] : [false, true],
    backing: withOrWithout(test.backing),
    passesPerSide: test.passesPerSide === 'single' ? ['single'] : ['single', 'multiple'],
    groove: positions.groove,
    groovePipe: positions.groovePipe,
    fillet: positions.fillet,
    reasons,
  }
}

export interface OperatorCovers { covered: boolean, answer: CoverAnswer, record: string[], reasons: CoverReason[] }

/**
 * Whether an operator test covers a production joint: every operator essential variable compared, each met, not met or
 * not recorded ("cannot tell: record X"). Covered only when every one is met.
 */
export function operatorCovers(test: OperatorTest, joint: OperatorJoint): OperatorCovers {
  const r = operatorRanges(test)
  const reasons: CoverReason[] = []
  const compare = <T>(variable: keyof OperatorJoint, clause: string, allowed: readonly T[], value: T | null, words: (v: T) => string) => {
    if (value === null) reasons.push({ met: false, state: 'not-recorded', variable, record: `joint.${variable}`, clause, text: `Cannot tell: record the joint's ${variable}.`, basis: memory })
    else if (allowed.includes(value)) reasons.push({ met: true, state: 'met', variable, clause, text: `${words(value)}: qualified.`, basis: memory })
    else reasons.push({ met: false, state: 'not-met', variable, clause, text: `${words(value)}: not qualified by this test.`, basis: memory })
  }
  const yes = (what: string) => (v: boolean) => `${v ? 'With' : 'Without'} ${what}`
  compare('mode', 'QW-361.1(a)', r.modes, joint.mode, v => `${v} welding`)
  compare('process', 'QW-361.2(a)', [r.process], joint.process, v => v)
  compare('visualControl', 'QW-361.2(b)', r.visualControl, joint.visualControl, v => `${v} visual control`)
  compare('arcVoltageControl', 'QW-361.2(c)', r.arcVoltageControl, joint.arcVoltageControl, yes('automatic arc voltage control'))
  compare('jointTracking', 'QW-361.2(d)', r.jointTracking, joint.jointTracking, yes('automatic joint tracking'))
  // QW-361.2(f): a test with inserts also qualifies a joint without them when it is a fillet or has backing.
  const insertsWaived = test.consumableInserts && joint.consumableInserts === false && (joint.weld === 'fillet' || joint.backing === true)
  if (insertsWaived) reasons.push({ met: true, state: 'met', variable: 'consumableInserts', clause: 'QW-361.2(f)', text: 'Without consumable inserts, on a fillet or with backing: qualified by a test with inserts.', basis: memory })
  else compare('consumableInserts', 'QW-361.2(f)', r.consumableInserts, joint.consumableInserts, yes('consumable inserts'))
  compare('backing', 'QW-361.2(g)', r.backing, joint.backing, yes('backing'))
  compare('passesPerSide', 'QW-361.2(h)', r.passesPerSide, joint.passesPerSide, v => `${v} pass(es) per side`)
  // Positions: the column of QW-461.9 for the joint's weld and form (QW-361.2(e)); a pipe groove from a plate test
  // carries the dagger of column B (large diameters only), which is not compared here: check by hand.
  if (joint.position === null || joint.weld === null || joint.form === null) {
    reasons.push({ met: false, state: 'not-recorded', variable: 'position', record: 'joint.position', clause: 'QW-361.2(e)', text: 'Cannot tell: record the joint\'s position, weld and form.', basis: memory })
  }
  else if (joint.weld === 'groove' && joint.form === 'pipe' && test.form === 'plate' && test.weld === 'groove') {
    reasons.push({ met: false, state: 'not-checked', variable: 'position', clause: 'QW-461.9 (column B †)', text: 'A pipe groove from a plate groove test depends on the pipe diameter: check by hand.', basis: memory })
  }
  else {
    const letters = joint.weld === 'fillet' ? r.fillet : joint.form === 'pipe' ? r.groovePipe : r.groove
    compare('position', 'QW-361.2(e), QW-461.9', letters, joint.position, v => `Position ${v}`)
  }
  const answer = answerOf(reasons)
  return { covered: answer === 'covered', answer, record: answer === 'cannot-tell' ? recordOf(reasons) : [], reasons }
}
