/** The answer of GET /api/coverage as the page reads it. */
import type { ProcessStanding } from './process-standing'
import type { Joint } from '../schemas/coverage'

export interface Finding { met: boolean, clause: string, text: string, state?: 'met' | 'not-met' | 'not-recorded' | 'not-checked' }
export interface WelderAnswer { id: number, name: string, stamp: string, covered: boolean, answer: 'covered' | 'not-covered' | 'cannot-tell', record: string[], current: boolean, standing: ProcessStanding, reasons: Finding[] }
export interface CoverageAnswer {
  today: string
  joint: Joint & { gaugeNote?: string }
  timing: { queryMs: number, rulesMs: number, candidates: number, ruledOut: number }
  procedures: { id: number, number: string, revision: number, title: string, code: string, covered: boolean, reasons: Finding[] }[]
  welders: {
    able: WelderAnswer[]
    lapsed: Pick<WelderAnswer, 'id' | 'name' | 'stamp' | 'standing'>[]
    lapsedCount: number
    notCovered: WelderAnswer[]
    notCoveredCount: number
    undecided: WelderAnswer[]
    undecidedCount: number
  }
}
