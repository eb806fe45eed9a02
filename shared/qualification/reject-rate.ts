import { addDays, format } from 'date-fns'
import { parseDay } from '../rules/continuity-lapse'

/**
 * Each welder's reject rate from the examinations of the joints they welded: by joints (a weld, or a repair, with a
 * rejected RT or UT result counts once) and, for RT, by length (indication length over length examined). The trend is
 * four 90-day windows ending on the day. A rate that rises from one window to the next with at least two rejected welds
 * in the newest flags the welder for the inspector: a shop convention, not a code limit. The inspector decides whether it
 * is a specific reason to question the welder's ability (ASME IX QW-322.1(b)).
 */

/** One volumetric result of one weld (the original, repair 0, or a repair) and one of the welders who made it. */
export interface ExamFact {
  welderId: number
  jointId: number
  repair: number
  method: 'RT' | 'UT'
  examinedOn: string
  accepted: boolean
  lengthExamined: number | null
  defectLength: number | null
}

export interface RateWindow { from: string, to: string, examined: number, rejected: number, rate: number | null }

export interface WelderRejectRate {
  welderId: number
  examined: number
  rejected: number
  rate: number | null
  rtLength: number
  rtRejectLength: number
  rtRate: number | null
  trend: RateWindow[]
  flagged: boolean
  flagReason: string | null
}

export const windowDays = 90
export const flagMinimumRejects = 2

const ratio = (a: number, b: number) => (b > 0 ? a / b : null)

function weldsOf(facts: ExamFact[]) {
  const welds = new Map<string, { rejected: boolean, on: string }>()
  for (const f of facts) {
    const key = `${f.jointId}|${f.repair}`
    const known = welds.get(key)
    // A weld is judged by its first volumetric examination date; any rejected result rejects it.
    welds.set(key, { rejected: (known?.rejected ?? false) || !f.accepted, on: known && known.on < f.examinedOn ? known.on : f.examinedOn })
  }
  return [...welds.values()]
}

export function rejectRateOf(welderId: number, facts: ExamFact[], today: string): WelderRejectRate {
  const own = facts.filter(f => f.welderId === welderId)
  const welds = weldsOf(own)
  const rejected = welds.filter(w => w.rejected).length
  const rt = own.filter(f => f.method === 'RT')
  const rtLength = rt.reduce((sum, f) => sum + (f.lengthExamined ?? 0), 0)
  const rtRejectLength = rt.filter(f => !f.accepted).reduce((sum, f) => sum + (f.defectLength ?? 0), 0)
  const end = parseDay(today, 'today')
  const trend: RateWindow[] = [3, 2, 1, 0].map((k) => {
    const to = format(addDays(end, -k * windowDays), 'yyyy-MM-dd')
    const from = format(addDays(end, -(k + 1) * windowDays + 1), 'yyyy-MM-dd')
    const inside = welds.filter(w => w.on >= from && w.on <= to)
    const bad = inside.filter(w => w.rejected).length
    return { from, to, examined: inside.length, rejected: bad, rate: ratio(bad, inside.length) }
  })
  const [previous, latest] = [trend[2]!, trend[3]!]
  const rising = latest.rate !== null && latest.rejected >= flagMinimumRejects && (previous.rate === null || latest.rate > previous.rate)
  return {
    welderId, examined: welds.length, rejected, rate: ratio(rejected, welds.length), rtLength, rtRejectLength, rtRate: ratio(rtRejectLength, rtLength),
    trend, flagged: rising,
    flagReason: rising ? `${latest.rejected} of ${latest.examined} welds rejected in the last ${windowDays} days, up from ${previous.rejected} of ${previous.examined}: ask the inspector whether this questions the welder's ability (QW-322.1(b)).` : null,
  }
}

export function rejectRates(facts: ExamFact[], today: string): WelderRejectRate[] {
  return [...new Set(facts.map(f => f.welderId))].sort((a, b) => a - b).map(id => rejectRateOf(id, facts, today))
}
