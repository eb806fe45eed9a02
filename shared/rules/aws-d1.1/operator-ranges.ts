import type { CoverAnswer, CoverReason } from '../results'
import type { Basis, Form, Reason, WeldType } from '../types'
import { refuse } from '../refusal'
import { answerOf, recordOf } from '../variables'
import { d11Tables } from './editions'
import { d11Positions } from './positions'
import { d11Process } from './welder-ranges'

/**
 * Welding operators (machine and automatic welding) under AWS D1.1: the operator is tested on plate like a welder and
 * kept by the same period of effectiveness (6.2.3 from 2020, 4.2.3.1 in 2015). What Rootface computes, and from where:
 * - positions on plate: Table 6.10 (4.10 in 2015), titled "Welder and Welding Operator Qualification: Production Welding
 *   Positions Qualified by Plate Tests" (read, see SOURCES F-B);
 * - process, omission of backing, vertical progression, single to multiple electrodes: the welding-personnel essential
 *   variables table (Table 4.12 in 2015; cited as Table 6.12 for 2020 by a test house), from memory for operators;
 * - thickness: the operator rows of the specimen and range table are not in our sources: check by hand, never "covered";
 * - pipe and tube tests (Clause 10 from 2020), electroslag and electrogas operator tests: check by hand.
 * SMAW is a manual process: a D1.1 welding operator test of SMAW is refused (it is a welder's test).
 */
export type Letter = 'F' | 'H' | 'V' | 'O'
export type Progression = 'uphill' | 'downhill'
export type Electrodes = 'single' | 'multiple'

export interface D11OperatorTest {
  edition?: string
  process: string
  form: Form
  weld: WeldType
  positions: readonly string[]
  backing: boolean
  /** Vertical progression of the test, when it was welded in a vertical position */
  progression?: Progression | null
  electrodes?: Electrodes | null
}

export interface D11OperatorJoint {
  process: string | null
  form: Form | null
  weld: WeldType | null
  position: Letter | null
  backing: boolean | null
  progression: Progression | null
  electrodes: Electrodes | null
  /** Base metal thickness, in the unit of the record */
  thickness: number | null
}

export interface D11OperatorRanges {
  process: string
  groove: Letter[]
  fillet: Letter[]
  backing: boolean[]
  progression: Progression[] | null
  electrodes: Electrodes[] | null
  /** Not computed: the thickness the test qualifies is read by hand in the code's table */
  thickness: null
  byHand: string[]
  reasons: Reason[]
}

const memory: Basis = 'memory'
/** Processes D1.1 welds by machine or automatically; SMAW is held by the electrode in the welder's hand. */
const machineProcesses = ['SAW', 'GMAW', 'FCAW', 'GTAW', 'ESW', 'EGW'] as const

/** What an AWS D1.1 welding-operator test qualifies, variable by variable, with what must be checked by hand. */
export function d11OperatorRanges(test: D11OperatorTest): D11OperatorRanges {
  const tables = d11Tables(test.edition ?? '2020')
  const process = d11Process(test.process)
  if (!(machineProcesses as readonly string[]).includes(process)) refuse(`process: ${process} is welded by hand; AWS D1.1 qualifies a welder for it, not a welding operator`)
  const byHand: string[] = []
  const reasons: Reason[] = [
    { clause: `${tables.essentials}, change of process`, text: `${process} only: another process needs a new test.`, basis: memory },
  ]
  let groove: Letter[] = []
  let fillet: Letter[] = []
  if (process === 'ESW' || process === 'EGW') {
    byHand.push(`An ${process} operator test has its own plate and ranges in the code: check by hand.`)
    reasons.push({ clause: `${tables.plateThickness} (${process} operator test)`, text: byHand.at(-1)!, basis: 'convention' })
  }
  else if (test.form !== 'plate') {
    byHand.push('Pipe and tube operator tests (Clause 10 from 2020) are not computed: check the positions by hand.')
    reasons.push({ clause: tables.pipePositions, text: byHand.at(-1)!, basis: 'convention' })
  }
  else {
    const pos = d11Positions('plate', test.weld, [...test.positions])
    groove = pos.groove
    fillet = pos.fillet
    reasons.push({ clause: tables.platePositions, text: `Plate: groove ${groove.length ? groove.join(', ') : 'none'}; fillet ${fillet.join(', ')} (the table is for welders and welding operators alike).`, basis: pos.fromMemory ? memory : 'verified' })
  }
  const backing = test.backing ? [true] : [false, true]
  reasons.push({ clause: `${tables.essentials}, omission of backing`, text: test.backing ? 'With backing only (tested with backing).' : 'With or without backing (tested without).', basis: memory })
  const vertical = test.positions.some(p => /^3[GF]$/i.test(p))
  let progression: Progression[] | null = null
  if (vertical) {
    if (test.progression) {
      progression = [test.progression]
      reasons.push({ clause: `${tables.essentials}, vertical progression`, text: `Vertical welding ${test.progression} only.`, basis: memory })
    }
    else {
      byHand.push('Record the vertical progression of the test (uphill or downhill).')
      reasons.push({ clause: `${tables.essentials}, vertical progression`, text: `Cannot tell: ${byHand.at(-1)!}`, basis: memory })
    }
  }
  let electrodes: Electrodes[] | null = null
  if (test.electrodes) {
    electrodes = test.electrodes === 'single' ? ['single'] : ['single', 'multiple']
    reasons.push({ clause: `${tables.essentials}, single to multiple electrodes`, text: test.electrodes === 'single' ? 'Single electrode only: multiple electrodes need a new test.' : 'Multiple or single electrodes.', basis: memory })
  }
  else {
    byHand.push('Record whether the test was welded with one electrode or several.')
    reasons.push({ clause: `${tables.essentials}, single to multiple electrodes`, text: `Cannot tell: ${byHand.at(-1)!}`, basis: memory })
  }
  byHand.push('The base-metal thickness a welding-operator test qualifies is not computed: read it in the code\'s table.')
  reasons.push({ clause: `${tables.plateThickness} (welding operator rows)`, text: `Thickness: check by hand. ${byHand.at(-1)!}`, basis: 'convention' })
  return { process, groove, fillet, backing, progression, electrodes, thickness: null, byHand, reasons }
}

export interface D11OperatorCovers { covered: boolean, answer: CoverAnswer, record: string[], reasons: CoverReason[] }

/**
 * Whether an AWS D1.1 welding-operator test covers a production joint. Every variable is met, not met, not recorded or
 * not checked; the thickness is never checked (no source for the operator rows), so the answer is at best "check by
 * hand", never "covered" on Rootface's word.
 */
export function d11OperatorCovers(test: D11OperatorTest, joint: D11OperatorJoint): D11OperatorCovers {
  const r = d11OperatorRanges(test)
  const tables = d11Tables(test.edition ?? '2020')
  const reasons: CoverReason[] = []
  const compare = <T>(variable: keyof D11OperatorJoint, clause: string, allowed: readonly T[] | null, value: T | null, words: (v: T) => string) => {
    if (value === null) reasons.push({ met: false, state: 'not-recorded', variable, record: `joint.${variable}`, clause, text: `Cannot tell: record the joint's ${variable}.`, basis: memory })
    else if (allowed === null) reasons.push({ met: false, state: 'not-checked', variable, clause, text: `${words(value)}: check by hand (the test does not record it).`, basis: memory })
    else if (allowed.includes(value)) reasons.push({ met: true, state: 'met', variable, clause, text: `${words(value)}: qualified.`, basis: memory })
    else reasons.push({ met: false, state: 'not-met', variable, clause, text: `${words(value)}: not qualified by this test.`, basis: memory })
  }
  compare('process', `${tables.essentials}, change of process`, [r.process], joint.process?.toUpperCase() ?? null, v => v)
  if (joint.weld === null || joint.form === null || joint.position === null) {
    reasons.push({ met: false, state: 'not-recorded', variable: 'position', record: 'joint.position', clause: tables.platePositions, text: 'Cannot tell: record the joint\'s position, weld and form.', basis: memory })
  }
  else if (joint.form !== 'plate' || test.form !== 'plate' || r.groove.length + r.fillet.length === 0) {
    reasons.push({ met: false, state: 'not-checked', variable: 'position', clause: tables.pipePositions, text: 'Pipe, tube, electroslag or electrogas: check the position by hand.', basis: 'convention' })
  }
  else {
    compare('position', tables.platePositions, joint.weld === 'fillet' ? r.fillet : r.groove, joint.position, v => `${joint.weld === 'fillet' ? 'Fillet' : 'Groove'} in position ${v}`)
  }
  compare('backing', `${tables.essentials}, omission of backing`, r.backing, joint.backing, v => `${v ? 'With' : 'Without'} backing`)
  if (joint.position === 'V') compare('progression', `${tables.essentials}, vertical progression`, r.progression, joint.progression, v => `Vertical ${v}`)
  compare('electrodes', `${tables.essentials}, single to multiple electrodes`, r.electrodes, joint.electrodes, v => `${v === 'single' ? 'One electrode' : 'Several electrodes'}`)
  reasons.push({ met: false, state: 'not-checked', variable: 'thickness', clause: `${tables.plateThickness} (welding operator rows)`, text: 'Thickness: check by hand against the code\'s table for welding operators.', basis: 'convention' })
  const answer = answerOf(reasons)
  return { covered: answer === 'covered', answer, record: answer === 'cannot-tell' ? recordOf(reasons) : [], reasons }
}
