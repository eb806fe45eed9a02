import type { ProcedureRangesInput } from '../inputs'
import type { ProcedureRangesResult, Specimens } from '../results'
import type { Reason, RuleContext } from '../types'
import { refuse } from '../refusal'
import { formatLength, formatRange, fromMicro, pick, scale, toMicro } from '../units'
import { atMost } from './editions'
import { asme } from './limits'
import { asmeProcess, isShortCircuit } from './processes'

/** Table QW-451.1 Note (3): the 8 in (200 mm) maximum applies to these processes only. */
const note3Processes = ['SMAW', 'SAW', 'GMAW', 'PAW', 'LLBW', 'GTAW']
/** QW-403.9 is referenced for these processes (forum-confirmed for SMAW, SAW, GMAW; FCAW shares QW-255). */
const qw4039Processes = ['SMAW', 'SAW', 'GMAW', 'FCAW']

interface Band {
  min: number
  max: number
  deposit: number
  specimens: Specimens
  text: string
}

/** ASME BPVC IX Table QW-451.1 (2017 edition read in full): the row for coupon thickness T and deposit t. */
function qw4511(T: number, t: number, process: string, context: RuleContext): Band {
  const u = context.unit
  const b = (length: { in: number, mm: number }) => pick(length, u)
  const faceRoot: Specimens = { tension: 2, face: 2, root: 2, side: 0 }
  const sides: Specimens = { tension: 2, face: 0, root: 0, side: 4 }
  const f = (m: number) => formatLength(m, u)
  const thickDeposit = t >= b(asme.t3_4)
  if (T < b(asme.t1_16)) {
    return { min: T, max: 2 * T, deposit: 2 * t, specimens: faceRoot, text: `T under ${f(b(asme.t1_16))}: T to 2T, deposit 2t` }
  }
  if (T <= b(asme.t3_8)) {
    return { min: b(asme.t1_16), max: 2 * T, deposit: 2 * t, specimens: faceRoot,
      text: `T from ${f(b(asme.t1_16))} to ${f(b(asme.t3_8))} inclusive: ${f(b(asme.t1_16))} to 2T, deposit 2t` }
  }
  if (T < b(asme.t3_4)) {
    return { min: b(asme.t3_16), max: 2 * T, deposit: 2 * t, specimens: faceRoot,
      text: `T over ${f(b(asme.t3_8))} and under ${f(b(asme.t3_4))}: ${f(b(asme.t3_16))} to 2T, deposit 2t` }
  }
  if (T < b(asme.t1_1_2)) {
    return { min: b(asme.t3_16), max: 2 * T, deposit: thickDeposit ? 2 * T : 2 * t, specimens: sides,
      text: `T from ${f(b(asme.t3_4))} to under ${f(b(asme.t1_1_2))}: ${f(b(asme.t3_16))} to 2T; deposit 2t when t is under ${f(b(asme.t3_4))}, else 2T` }
  }
  if (T <= b(asme.t6)) {
    // Note (3): 8 in (200 mm) for SMAW, SAW, GMAW, PAW, LLBW and GTAW only; other processes 2T (Note (1)).
    const eight = note3Processes.includes(process)
    const max = eight ? b(asme.t8) : 2 * T
    const note = eight ? `${f(b(asme.t8))} (Note 3: ${process} is one of SMAW, SAW, GMAW, PAW, LLBW, GTAW)` : `2T (Note 3 gives 8 in to SMAW, SAW, GMAW, PAW, LLBW and GTAW only, not ${process})`
    return { min: b(asme.t3_16), max, deposit: thickDeposit ? max : 2 * t, specimens: sides,
      text: `T from ${f(b(asme.t1_1_2))} to ${f(b(asme.t6))} inclusive: ${f(b(asme.t3_16))} to ${note}; deposit 2t when t is under ${f(b(asme.t3_4))}, else the same maximum` }
  }
  const max = scale(T, 133, 100)
  return { min: b(asme.t3_16), max, deposit: thickDeposit ? max : 2 * t, specimens: sides,
    text: `T over ${f(b(asme.t6))} (Note 6): ${f(b(asme.t3_16))} to 1.33T; deposit 2t when t is under ${f(b(asme.t3_4))}, else 1.33T` }
}

export function procedureRanges(input: ProcedureRangesInput, context: RuleContext): ProcedureRangesResult {
  const u = context.unit
  const process = asmeProcess(input.process)
  const T = toMicro(input.couponThickness)
  const t = input.depositThickness === undefined ? T : toMicro(input.depositThickness)
  if (t > T) refuse('depositThickness: the deposit of one process cannot be thicker than the coupon')
  const f = (m: number) => formatLength(m, u)
  const reasons: Reason[] = []
  if (input.depositThickness === undefined) {
    reasons.push({ clause: 'QW-451.1', text: 'No deposit thickness given: t is taken as the whole coupon thickness T (one process filled the joint).', basis: 'convention' })
  }
  const band = qw4511(T, t, process, context)
  let min = band.min
  let max = band.max
  let deposit = band.deposit
  reasons.push({ clause: 'QW-451.1', text: `Coupon ${f(T)}, ${band.text}: base metal ${formatRange(min, max, u)}, deposit up to ${f(deposit)}.`, basis: 'verified' })

  if (input.toughness) {
    // QW-403.6 (supplementary essential when toughness is required): minimum T or 5/8 in, whichever is less; T/2 when T is under 1/4 in.
    const toughMin = T < pick(asme.t1_4, u) ? scale(T, 1, 2) : Math.min(T, pick(asme.t5_8, u))
    const stricter = Math.max(min, toughMin)
    reasons.push({ clause: 'QW-403.6', text: `Toughness required: minimum is ${T < pick(asme.t1_4, u) ? 'T/2' : `T or ${f(pick(asme.t5_8, u))}, whichever is less`} = ${f(toughMin)}; the stricter of this and QW-451.1 applies: ${f(stricter)}. The maximum still follows QW-451.1.`, basis: 'verified' })
    min = stricter
  }

  const pass = input.maxPassThickness === undefined ? undefined : toMicro(input.maxPassThickness)
  if (pass !== undefined && pass > pick(asme.t1_2, u) && qw4039Processes.includes(process)) {
    // QW-403.9: a single pass over 1/2 in (13 mm) limits the maximum to 1.1T.
    max = Math.min(max, scale(T, 11, 10))
    reasons.push({ clause: 'QW-403.9', text: `A single pass of ${f(pass)} is over ${f(pick(asme.t1_2, u))}: the maximum base metal thickness is 1.1T = ${f(scale(T, 11, 10))}.`, basis: 'partial' })
  }

  if (isShortCircuit(process, input.transfer)) {
    if (atMost(context.edition, 2019)) {
      if (T < pick(asme.t1_2, u)) {
        // QW-403.10 (editions up to 2019): GMAW-S coupon under 1/2 in qualifies 1.1T maximum; the minimum stays QW-451.1.
        max = Math.min(max, scale(T, 11, 10))
        reasons.push({ clause: 'QW-403.10', text: `Short-circuit GMAW, coupon under ${f(pick(asme.t1_2, u))}: maximum base metal 1.1T = ${f(scale(T, 11, 10))} (applies to the ${context.edition} edition; dropped from QW-255 in 2021).`, basis: 'verified' })
      }
      if (t < pick(asme.t1_2, u)) {
        // QW-404.32 (procedure use up to 2019): deposit under 1/2 in qualifies 1.1t maximum.
        deposit = Math.min(deposit, scale(t, 11, 10))
        reasons.push({ clause: 'QW-404.32', text: `Short-circuit GMAW, deposit under ${f(pick(asme.t1_2, u))}: maximum deposit 1.1t = ${f(scale(t, 11, 10))} (procedure use up to the 2019 edition).`, basis: 'partial' })
      }
    }
    else {
      reasons.push({ clause: 'QW-255', text: `Edition ${context.edition}: QW-403.10 and QW-404.32 are no longer referenced for procedures (since 2021), so short-circuit GMAW follows QW-451.1 alone.`, basis: 'verified' })
    }
  }

  if (band.specimens.side === 0 && T >= pick(asme.t3_8, u)) {
    // Table QW-451.1 Note (5): side bends may replace the face and root bends (threshold from memory).
    reasons.push({ clause: 'QW-451.1 Note (5)', text: `At ${f(pick(asme.t3_8, u))} and over, four side bends may be used in place of the face and root bends.`, basis: 'memory' })
  }
  reasons.push({ clause: 'QW-451.1', text: `Specimens: ${band.specimens.tension} tension, ${band.specimens.face} face, ${band.specimens.root} root, ${band.specimens.side} side bends.`, basis: 'verified' })

  return {
    baseMetal: { min: fromMicro(min), max: fromMicro(max) },
    depositMax: fromMicro(deposit),
    specimens: band.specimens,
    reasons,
  }
}
