import type { Basis, Range, RuleContext } from '../types'
import { cautionText } from '../caution'
import { formatLength, pick, toMicro, type PrintedLength } from '../units'
import {
  baseMetalRows, electrodeMax, findJoint, fillerFamilies, lowHydrogen, normalGrade, normalSpecification, notCarriedLimits,
  preheatBands, preheatFrom, prequalifiedProcesses, prequalifiedTables, type BaseMetalRow, type JointOption, type PreheatCategory,
} from './prequalified-tables'

/** A WPS as the prequalification check reads it; lengths in the context's unit, temperatures in °F (in) or °C (mm). */
export interface PrequalifiedInput {
  layers: {
    name?: string
    process: string
    transfer?: string | null
    fillers: { classification: string, size?: number | null }[]
    fluxClassification?: string | null
  }[]
  /** Base metal A and B as specification and grade (null: not picked from the catalogue). */
  baseMetals: { specification: string | null, grade: string | null }[]
  thickness: Partial<Range>
  preheatMin: number | null
  positions: string[]
  joint: { designation: string | null, rootOpening: Partial<Range>, grooveAngle: number | null, rootFace: Partial<Range> }
}

/** pass: within the carried limit; fail: outside it; by-hand: not carried or cannot tell, never a pass. */
export type PrequalifiedState = 'pass' | 'fail' | 'by-hand'

export interface PrequalifiedItem {
  /** Which limit: process, base metal, filler, preheat, positions, electrode size, joint, other. */
  limit: string
  /** The table, figure or clause of the edition. */
  table: string
  state: PrequalifiedState
  text: string
  basis: Basis
  /** The form field the item is about (dot path). */
  field: string | null
  /** What the code requires, in words, when the WPS falls short (the minimum preheat...). */
  required?: string
}

export interface PrequalifiedResult {
  code: 'aws-d1.1'
  edition: string
  /** "clause 3" (2015) or "clause 5" (2020 and later). */
  clause: string
  unit: RuleContext['unit']
  items: PrequalifiedItem[]
  failures: number
  byHand: number
  /** No item fails. Items to check by hand still need the signed statement. */
  noFailures: boolean
  caution: string
}

const letters = ['F', 'H', 'V', 'O'] as const
type Letter = typeof letters[number]
const isNumber = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v)
const upper = (s: string) => s.trim().toUpperCase()

/**
 * Whether a WPS stays inside AWS D1.1's prequalification limits (Clause 3 in 2015, Clause 5 from 2020): process,
 * base metal and its group, matching filler, minimum preheat and interpass by category and thickest part, electrode
 * size and positions for the process, and the prequalified joint detail with its tolerances. Each item names its table.
 */
export function prequalifiedCheck(input: PrequalifiedInput, context: Pick<RuleContext, 'edition' | 'unit'>): PrequalifiedResult {
  const u = context.unit
  const f = (m: number) => formatLength(m, u)
  const tables = prequalifiedTables(context.edition)
  const old = Number(context.edition) <= 2015
  const items: PrequalifiedItem[] = []
  const add = (item: PrequalifiedItem) => items.push(item)
  const layerName = (i: number) => (input.layers.length > 1 ? `${input.layers[i]!.name ?? `layer ${i + 1}`} (${input.layers[i]!.process}): ` : '')

  // Processes (3.2.1 in 2015): SMAW, SAW, GMAW other than short-circuit, FCAW.
  input.layers.forEach((layer, i) => {
    const process = upper(layer.process)
    const ok = (prequalifiedProcesses as readonly string[]).includes(process)
    const shortCircuit = process === 'GMAW' && layer.transfer === 'short-circuit'
    const field = `layers.${i}.process`
    if (!ok) add({ limit: 'process', table: tables.processes, state: 'fail', field, basis: 'verified', text: `${layerName(i)}${process} is not a prequalified process (SMAW, SAW, GMAW other than short-circuit, FCAW): qualify the WPS by test.` })
    else if (shortCircuit) add({ limit: 'process', table: tables.processes, state: 'fail', field: `layers.${i}.transfer`, basis: 'verified', text: `${layerName(i)}GMAW short-circuit transfer (GMAW-S) is not prequalified: qualify the WPS by test.` })
    else if (process === 'GMAW' && !layer.transfer) add({ limit: 'process', table: tables.processes, state: 'by-hand', field: `layers.${i}.transfer`, basis: 'convention', text: `${layerName(i)}cannot tell: state the GMAW transfer mode (short-circuit is not prequalified).` })
    else add({ limit: 'process', table: tables.processes, state: 'pass', field, basis: 'verified', text: `${layerName(i)}${process}${layer.transfer ? ` (${layer.transfer})` : ''} is a prequalified process.` })
  })

  // Base metals (Table 3.1 / 5.3) and their group.
  const thick = isNumber(input.thickness.max) ? toMicro(input.thickness.max) : null
  const rows: (BaseMetalRow | null)[] = input.baseMetals.map((side, i) => {
    const name = i === 0 ? 'Base metal A' : 'Base metal B'
    const field = `baseMetals.${i === 0 ? 'a' : 'b'}`
    if (!side.specification) {
      add({ limit: 'base metal', table: tables.baseMetals, state: 'by-hand', field, basis: 'convention', text: `${name}: cannot tell: pick the base metal from the catalogue so its specification and grade can be compared with ${tables.baseMetals}.` })
      return null
    }
    const spec = normalSpecification(side.specification)
    const grade = normalGrade(side.grade)
    const candidates = baseMetalRows.filter(r => r.specification === spec && r.grades.includes(r.grades.length === 1 && r.grades[0] === '' ? '' : grade))
    const label = `${side.specification}${grade ? ` Grade ${grade}` : ''}`
    if (!candidates.length) {
      add({ limit: 'base metal', table: tables.baseMetals, state: 'by-hand', field, basis: 'convention', text: `${name} ${label}: not carried: check by hand whether ${tables.baseMetals} lists it and in which group.` })
      return null
    }
    const fits = (r: BaseMetalRow) => {
      if (!r.thickness) return true
      if (thick === null) return false
      if (r.thickness.upTo) return thick <= pick(r.thickness.upTo, u)
      if (r.thickness.over) return thick > pick(r.thickness.over, u)
      return true
    }
    const row = candidates.length === 1 ? candidates[0]! : candidates.find(fits) ?? null
    if (!row) {
      add({ limit: 'base metal', table: tables.baseMetals, state: 'by-hand', field: 'thickness.groove.max', basis: 'convention', text: `${name} ${label}: cannot tell its group: state the largest thickness (the group depends on it).` })
      return null
    }
    const limit = row.thickness?.upTo ? ` up to ${f(pick(row.thickness.upTo, u))}` : row.thickness?.over ? ` over ${f(pick(row.thickness.over, u))}` : ''
    add({ limit: 'base metal', table: tables.baseMetals, state: 'pass', field, basis: row.basis, text: `${name} ${label}${limit} is an approved base metal, Group ${row.group} (${row.source}).` })
    return row
  })
  const known = rows.filter((r): r is BaseMetalRow => r !== null)
  // Different groups joined: the filler may match the lower-strength group (from memory).
  const group: 'I' | 'II' | null = known.length === input.baseMetals.length && known.length > 0 ? (known.some(r => r.group === 'I') ? 'I' : 'II') : null

  // Matching filler (Table 3.2 / 5.4).
  input.layers.forEach((layer, i) => {
    const process = upper(layer.process)
    const family = fillerFamilies.find(x => x.process === process)
    if (!family) return
    const classes = process === 'SAW' ? [layer.fluxClassification ?? ''] : layer.fillers.map(x => x.classification)
    const field = process === 'SAW' ? `layers.${i}.flux.classification` : `layers.${i}.fillers`
    if (!classes.length || classes.every(c => !c.trim())) {
      add({ limit: 'filler', table: tables.fillers, state: 'by-hand', field, basis: 'convention', text: `${layerName(i)}cannot tell: state the ${process === 'SAW' ? 'electrode–flux classification' : 'filler classification'}.` })
      return
    }
    for (const raw of classes) {
      const c = upper(raw).replace(/\s+/g, '')
      if (!family.recognised.test(c)) {
        add({ limit: 'filler', table: tables.fillers, state: 'by-hand', field, basis: 'convention', text: `${layerName(i)}${raw}: not carried: check by hand against ${tables.fillers}.` })
        continue
      }
      if (group === null) {
        add({ limit: 'filler', table: tables.fillers, state: 'by-hand', field, basis: 'convention', text: `${layerName(i)}${raw}: cannot tell whether it matches: the base metal group is not known.` })
        continue
      }
      const ok = family.group[group].test(c)
      add({
        limit: 'filler', table: tables.fillers, state: ok ? 'pass' : 'fail', field, basis: 'memory',
        text: ok ? `${layerName(i)}${raw} matches Group ${group} base metal.` : `${layerName(i)}${raw} does not match Group ${group} base metal for ${process}.`,
        ...(ok ? {} : { required: family.words[group] }),
      })
    }
  })

  // Minimum preheat and interpass (Table 3.3 / 5.8) by category and the thickness of the thickest part.
  preheat(input, context, tables.preheat, known, old, add)

  // Positions and electrode size for the process (Table 3.7 in 2015).
  const positions = letters.filter(p => input.positions.map(upper).includes(p))
  input.layers.forEach((layer, i) => {
    const process = upper(layer.process)
    const max = electrodeMax[process]
    if (!max) return
    const outOfProcess = positions.filter(p => !max[p])
    if (outOfProcess.length) {
      add({ limit: 'positions', table: tables.requirements, state: 'fail', field: 'positions', basis: 'memory', text: `${layerName(i)}${process} is prequalified in ${Object.keys(max).join(', ')} only; the WPS lists ${outOfProcess.join(', ')}.` })
    }
    for (const filler of layer.fillers) {
      if (!isNumber(filler.size)) {
        add({ limit: 'electrode size', table: tables.requirements, state: 'by-hand', field: `layers.${i}.fillers`, basis: 'convention', text: `${layerName(i)}cannot tell: state the ${filler.classification || 'filler'} diameter.` })
        continue
      }
      const size = toMicro(filler.size)
      const limits = positions.filter(p => max[p]).map(p => ({ p, max: pick(max[p]!, u) }))
      if (!limits.length) continue
      const tightest = limits.reduce((a, b) => (b.max < a.max ? b : a))
      const ok = size <= tightest.max
      add({
        limit: 'electrode size', table: tables.requirements, state: ok ? 'pass' : 'fail', field: `layers.${i}.fillers`, basis: 'memory',
        text: `${layerName(i)}${filler.classification} Ø ${f(size)}: ${ok ? 'within' : 'over'} the ${f(tightest.max)} largest for ${process} in position ${tightest.p}.`,
        ...(ok ? {} : { required: `Ø ${f(tightest.max)} or less` }),
      })
    }
  })

  joint(input, context, tables, positions, add)

  for (const limit of notCarriedLimits) {
    add({ limit: 'other', table: tables.requirements, state: 'by-hand', field: null, basis: 'convention', text: `Not carried: check by hand ${limit}.` })
  }

  const failures = items.filter(i => i.state === 'fail').length
  const byHand = items.filter(i => i.state === 'by-hand').length
  return {
    code: 'aws-d1.1', edition: context.edition, clause: tables.clause, unit: u, items, failures, byHand, noFailures: failures === 0,
    caution: cautionText('aws-d1.1', context.edition),
  }
}

function preheat(input: PrequalifiedInput, context: Pick<RuleContext, 'edition' | 'unit'>, table: string, known: BaseMetalRow[], old: boolean, add: (i: PrequalifiedItem) => void) {
  const u = context.unit
  const f = (m: number) => formatLength(m, u)
  const deg = u === 'in' ? '°F' : '°C'
  const field = 'preheatMin'
  const basis: Basis = old ? 'verified' : 'partial'
  const thick = [input.thickness.max].filter(isNumber).map(toMicro)[0]
  if (thick === undefined) {
    add({ limit: 'preheat', table, state: 'by-hand', field: 'thickness.groove.max', basis: 'convention', text: 'Cannot tell the minimum preheat: state the largest thickness (the thickest part at the point of welding).' })
    return
  }
  if (thick < pick(preheatFrom, u)) {
    add({ limit: 'preheat', table, state: 'by-hand', field: 'thickness.groove.max', basis: 'convention', text: `Thickness under ${f(pick(preheatFrom, u))} is below ${table}: not carried: check by hand (sheet steel is welded to AWS D1.3).` })
    return
  }
  // A layer of SMAW with other than low-hydrogen electrodes is category A; every other prequalified process category B.
  const categories = new Set<PreheatCategory>()
  for (const layer of input.layers) {
    const process = upper(layer.process)
    if (process === 'SMAW') {
      for (const filler of layer.fillers) categories.add(lowHydrogen(filler.classification) ? 'B' : 'A')
    }
    else if ((prequalifiedProcesses as readonly string[]).includes(process)) categories.add('B')
  }
  if (!categories.size) {
    add({ limit: 'preheat', table, state: 'by-hand', field, basis: 'convention', text: 'Cannot tell the preheat category: no prequalified process with a stated filler.' })
    return
  }
  const band = preheatBands.find(b => (b.over === null || thick > pick(b.over, u)) && (b.upTo === null || thick <= pick(b.upTo, u)))!
  const bandText = `${band.over === null ? f(pick(preheatFrom, u)) : `over ${f(pick(band.over, u))}`}${band.upTo === null ? ' and over' : ` to ${f(pick(band.upTo, u))} incl.`}`
  let required = -Infinity
  const words: string[] = []
  for (const category of categories) {
    // The steel must be listed in the category (Table 3.3 lists A572 and A992 in category B only).
    const unlisted = known.filter(r => !r.categories.includes(category))
    if (unlisted.length) {
      add({ limit: 'preheat', table, state: 'fail', field, basis: 'partial', text: `${unlisted.map(r => r.specification).join(', ')} is not listed in category ${category} (${category === 'A' ? 'SMAW with other than low-hydrogen electrodes' : 'low-hydrogen SMAW, SAW, GMAW, FCAW'}): use low-hydrogen electrodes or qualify by test.` })
    }
    const value = u === 'in' ? band[category].F : band[category].C
    words.push(`category ${category}: ${value} ${deg}`)
    required = Math.max(required, value)
  }
  if (known.length < input.baseMetals.length) {
    add({ limit: 'preheat', table, state: 'by-hand', field, basis: 'convention', text: `A base metal is not carried, so its preheat category cannot be told: the least ${table} asks for ${bandText} is ${required} ${deg} (${words.join('; ')}); check by hand.`, required: `${required} ${deg} or more` })
    return
  }
  const stated = input.preheatMin
  const note = required <= (u === 'in' ? 32 : 0) ? ` Below ${u === 'in' ? '32 °F' : '0 °C'} base metal the code asks for a preheat of at least ${u === 'in' ? '70 °F' : '20 °C'} (table note, from memory).` : ''
  if (!isNumber(stated)) {
    add({ limit: 'preheat', table, state: 'fail', field, basis, required: `${required} ${deg} or more`, text: `State the minimum preheat and interpass temperature: ${table} asks for ${required} ${deg} for the thickest part ${bandText} (${words.join('; ')}).${note}` })
    return
  }
  const ok = stated >= required
  add({
    limit: 'preheat', table, state: ok ? 'pass' : 'fail', field, basis,
    text: ok
      ? `Minimum preheat and interpass ${stated} ${deg}: at least the ${required} ${deg} ${table} asks for the thickest part ${bandText} (${words.join('; ')}).${note}`
      : `Minimum preheat and interpass ${stated} ${deg} is below the ${required} ${deg} ${table} asks for the thickest part ${bandText} (${words.join('; ')}).`,
    ...(ok ? {} : { required: `${required} ${deg} or more` }),
  })
}

function joint(input: PrequalifiedInput, context: Pick<RuleContext, 'edition' | 'unit'>, tables: ReturnType<typeof prequalifiedTables>, positions: Letter[], add: (i: PrequalifiedItem) => void) {
  const u = context.unit
  const f = (m: number) => formatLength(m, u)
  const designation = input.joint.designation?.trim()
  const figures = `${tables.cjp} (CJP) or ${tables.pjp} (PJP)`
  if (!designation) {
    add({ limit: 'joint', table: figures, state: 'by-hand', field: 'joints.designation', basis: 'convention', text: `No prequalified joint designation given: name it from ${figures}, or check the joint (fillet welds included) by hand.` })
    return
  }
  const detail = findJoint(designation)
  if (!detail) {
    add({ limit: 'joint', table: figures, state: 'by-hand', field: 'joints.designation', basis: 'convention', text: `${designation}: not carried: check its root opening, groove angle, root face, thickness and positions by hand against ${figures}.` })
    return
  }
  const table = detail.kind === 'CJP' ? tables.cjp : tables.pjp
  const field = 'joints'
  const processes = input.layers.map(l => upper(l.process))
  const wrong = processes.filter(p => !detail.processes.includes(p))
  if (wrong.length) add({ limit: 'joint', table, state: 'fail', field: 'joints.designation', basis: detail.basis, text: `${detail.designation} is detailed for ${detail.processes.join(', ')}, not ${[...new Set(wrong)].join(', ')}.` })
  if (detail.thicknessMax) {
    const max = pick(detail.thicknessMax, u)
    const t = input.thickness.max
    if (!isNumber(t)) add({ limit: 'joint', table, state: 'by-hand', field: 'thickness.groove.max', basis: 'convention', text: `${detail.designation}: cannot tell: state the largest thickness (T1 at most ${f(max)}).` })
    else add({ limit: 'joint', table, state: toMicro(t) <= max ? 'pass' : 'fail', field: 'thickness.groove.max', basis: detail.basis, text: `${detail.designation}: T1 up to ${f(max)}; the WPS goes to ${f(toMicro(t))}.`, ...(toMicro(t) <= max ? {} : { required: `${f(max)} or less` }) })
  }
  const ro = input.joint.rootOpening
  if (!isNumber(ro.min) || !isNumber(ro.max)) {
    add({ limit: 'joint', table, state: 'by-hand', field: 'joints.rootOpening', basis: 'convention', text: `${detail.designation}: cannot tell: state the root opening range.` })
    return
  }
  const fits = (o: JointOption) => rootWithin(o, ro as Range, u) && angleWithin(o, input.joint.grooveAngle) && faceWithin(o, input.joint.rootFace, u)
  const option = detail.options.find(fits)
  const describe = (o: JointOption) => `R ${f(pick(o.root, u))}${o.rootTo ? ` to ${f(pick(o.rootTo, u))}` : ''} (fit-up +${f(pick(o.rootFitUp.plus, u))}/−${f(pick(o.rootFitUp.minus, u))})${o.angle === null ? '' : `, α ${o.angle}° (+${o.angleFitUp.plus}°/−${o.angleFitUp.minus}°)`}${o.rootFaceMax ? `, f up to ${f(pick(o.rootFaceMax, u))}` : ''}, positions ${o.positions.join(', ')}`
  if (!option) {
    add({
      limit: 'joint', table, state: 'fail', field, basis: detail.basis, required: detail.options.map(describe).join('; or '),
      text: `${detail.designation} (${detail.title}): root opening ${f(toMicro(ro.min))} to ${f(toMicro(ro.max!))}${input.joint.grooveAngle === null ? '' : `, groove angle ${input.joint.grooveAngle}°`} fit none of the detail's preparations: ${detail.options.map(describe).join('; or ')}.`,
    })
    return
  }
  add({ limit: 'joint', table, state: 'pass', field, basis: detail.basis, text: `${detail.designation} (${detail.title}): root opening, groove angle and root face within ${describe(option)} (${detail.source}).` })
  const outside = positions.filter(p => !option.positions.includes(p))
  add({
    limit: 'positions', table, state: outside.length ? 'fail' : 'pass', field: 'positions', basis: detail.basis,
    text: outside.length ? `${detail.designation} with this preparation is prequalified in ${option.positions.join(', ')}; the WPS also lists ${outside.join(', ')}.` : `Positions ${positions.join(', ')} within the detail's ${option.positions.join(', ')}.`,
    ...(outside.length ? { required: option.positions.join(', ') } : {}),
  })
}

function rootWithin(o: JointOption, ro: Range, u: RuleContext['unit']) {
  const low = pick(o.root, u) - pick(o.rootFitUp.minus, u)
  const high = pick(o.rootTo ?? o.root, u) + pick(o.rootFitUp.plus, u)
  return toMicro(ro.min!) >= low && toMicro(ro.max!) <= high
}

function angleWithin(o: JointOption, angle: number | null) {
  if (o.angle === null) return angle === null || angle === 0
  if (angle === null) return false
  return angle >= o.angle - o.angleFitUp.minus && angle <= o.angle + o.angleFitUp.plus
}

function faceWithin(o: JointOption, face: Partial<Range>, u: RuleContext['unit']) {
  const max = isNumber(face.max) ? toMicro(face.max) : isNumber(face.min) ? toMicro(face.min) : 0
  const allowed: PrintedLength | undefined = o.rootFaceMax
  return allowed ? max <= pick(allowed, u) : max === 0
}
