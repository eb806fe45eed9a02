import { evaluate } from '#shared/rules'
import type { Reason, Unit } from '#shared/rules/types'
import type { SheetBlock, SheetField, SheetModel } from './model'
import type { PqrRecord } from '../database/sheet-records'
import { procedureCaution, certification, procedureCodeLine as codeLine, groupClause, isCode, reasonsBlock, signedParts } from './common'
import { dash, length, list, orDash, printable, rangeText, temperature, yesNo } from './format'
import { unitLabels } from '#shared/qualification/procedure-units'
import { isoWpqrBlocks } from './wpqr-iso'

const metalText = (m: { specification: string, grade: string, pNumber: string, groupNumber: number | null } | null) =>
  m ? `${printable(m.specification)} ${printable(m.grade)}, P-No. ${printable(m.pNumber)}${m.groupNumber ? ` Group ${m.groupNumber}` : ''}` : dash

/** The PQR: the values actually used on the coupon (QW-483) layer by layer, the test results and what the coupon qualifies. */
export function pqrSheet(record: PqrRecord, shop: string, origin: string): SheetModel {
  const q = record.pqr
  const unit = q.unit as Unit
  const u = unitLabels(unit)
  const a = (q.actuals && typeof q.actuals === 'object' ? q.actuals : {}) as Record<string, unknown>
  const c = (g: Parameters<typeof groupClause>[1]) => groupClause(q.code, g)
  const num = (v: unknown) => (typeof v === 'number' ? v : null)
  const processes = [...new Set(record.layers.map(l => l.process))]
  const pwhtHours = num(a.pwhtHours)
  const pwhtTemperature = num(a.pwhtTemperature)
  const iso = isoWpqrBlocks(record)
  const blocks: SheetBlock[] = [
    {
      heading: 'Record',
      fields: [
        { label: 'Test date', value: q.testDate },
        { label: 'Code', value: codeLine(q.code, q.edition, 'pqr') },
        { label: 'Processes', value: processes.join(' + ') },
        { label: iso ? 'Welder of the test piece' : 'Welder of the coupon', value: record.welder ? `${printable(record.welder.name)} (${printable(record.welder.stamp)})` : 'not recorded', clause: q.code === 'asme-ix' ? 'QW-301.2' : undefined },
        { label: 'Laboratory report', value: orDash(q.labReportNumber) },
        { label: 'Supports WPS', value: list(record.supports.filter(s => s.status !== 'draft').map(s => `${s.number} rev. ${s.revision} (${s.status})`)) },
      ],
    },
    {
      heading: iso ? 'Parent metals' : 'Base metals', clause: c('base'),
      fields: [
        { label: iso ? 'Parent metal A' : 'Base metal A', value: metalText(record.base) },
        { label: iso ? 'Parent metal B' : 'Base metal B', value: record.baseB ? metalText(record.baseB) : `same as A (${metalText(record.base)})` },
        { label: iso ? 'Test piece thickness t' : 'Coupon thickness T', value: length(q.couponThickness, unit) },
        { label: 'Deposit thickness t, all processes', value: length(q.depositThickness, unit) },
      ],
    },
    ...(iso ? [iso.piece] : []),
    ...(iso
      ? []
      : [{
        heading: 'Position, preheat, PWHT', clause: q.code === 'asme-ix' ? 'QW-405 to QW-407' : undefined,
        fields: [
          { label: 'Position of groove', value: orDash(a.position) },
          { label: 'Progression', value: orDash(a.progression) },
          { label: 'Preheat', value: temperature(num(a.preheat), unit) },
          { label: 'Interpass', value: temperature(num(a.interpass), unit) },
          { label: 'PWHT', value: pwhtTemperature !== null ? `${pwhtTemperature} ${u.temperature}${pwhtHours !== null ? `, held ${pwhtHours} h` : ''}` : orDash(a.pwht ?? 'none recorded') },
        ],
      } satisfies SheetBlock]),
    ...record.layers.map((l, i): SheetBlock => layerBlock(q, l, i, record.layers.length, unit)),
    {
      heading: 'Pass table (values used)', clause: c('electrical'),
      table: {
        columns: ['Layer', 'Process', 'Filler', `Ø (${u.length})`, 'Polarity', 'Amps', `WFS (${u.speed})`, 'Volts', `Travel (${u.speed})`, `Heat input (${u.heat})`, `Deposit (${u.length})`],
        rows: record.layers.map((l) => {
          const heat = heatOf(q, l)
          return [printable(l.name), `${l.process}${l.transfer ? ` ${l.transfer}` : ''}`, orDash(l.filler?.classification), l.fillerSize === null ? dash : String(l.fillerSize), orDash(l.current),
            l.amps === null ? dash : String(l.amps), l.wireFeed === null ? dash : String(l.wireFeed), l.volts === null ? dash : String(l.volts),
            l.travelSpeed === null ? dash : String(l.travelSpeed), heat === null ? dash : String(Math.round(heat.value)), l.depositThickness === null ? dash : String(l.depositThickness)]
        }),
        numeric: [3, 5, 6, 7, 8, 9, 10],
      },
    },
  ]

  const area = (w: number, t: number) => w * t
  blocks.push({
    heading: 'Tension test', clause: c('tension'),
    table: {
      columns: ['Specimen', `Width (${unit})`, `Thickness (${unit})`, `Area (${unit}²)`, `Load (${unit === 'in' ? 'lbf' : 'N'})`, `Strength (${unit === 'in' ? 'psi' : 'MPa'})`, 'Break', 'Result'],
      rows: record.tensile.map(s => [printable(s.label), String(s.width), String(s.thickness), area(s.width, s.thickness).toFixed(4), String(s.load), String(Math.round(s.strength)), printable(s.breakLocation), s.accepted ? 'accepted' : 'rejected']),
      numeric: [1, 2, 3, 4, 5],
    },
    notes: record.base?.minTensilePsi && unit === 'in' ? [`Specified minimum tensile strength of the base metal: ${record.base.minTensilePsi} psi.`] : undefined,
  })
  blocks.push({
    heading: 'Guided-bend tests', clause: c('bend'),
    table: {
      columns: ['Type', `Largest open discontinuity (${unit})`, 'Result'],
      rows: record.bends.map(b => [b.type, b.largestIndication ? String(b.largestIndication) : 'none', b.accepted ? 'accepted' : 'rejected']),
      numeric: [1],
    },
  })
  blocks.push(toughnessBlock(q.toughnessRequired, q.toughness, unit, c('toughness')))
  blocks.push(...(iso ? [iso.ranges] : qualifiedBlocks(record)))

  return {
    kind: 'pqr', kindTitle: iso ? 'Welding procedure qualification record (WPQR, ISO 15614-1)' : 'Procedure qualification record (PQR)', shopName: shop, number: q.number, revision: null,
    subtitle: `${processes.join(' + ')}, ${iso ? 'test piece' : 'coupon'} ${length(q.couponThickness, unit)}, tested ${q.testDate}`,
    codeLine: codeLine(q.code, q.edition, 'pqr'), unit, status: q.status,
    banner: q.status === 'failed' ? 'FAILED · qualifies nothing' : q.status === 'recorded' ? 'NOT CERTIFIED' : null,
    blocks, statement: certification(q.code, q.edition, 'coupon', 'pqr'), ...signedParts(record.signed, origin), caution: procedureCaution(q.code, q.edition),
  }
}

type Layer = PqrRecord['layers'][number]

function heatOf(q: PqrRecord['pqr'], l: Layer): { value: number, perUnit: string, clause?: string } | null {
  const u = unitLabels(q.unit as Unit)
  if (l.heatInput !== null) return { value: l.heatInput, perUnit: u.heat }
  if (!isCode(q.code) || l.volts === null || l.amps === null || l.travelSpeed === null) return null
  const heat = evaluate({ code: q.code, check: 'heat-input', unit: q.unit, edition: q.edition, input: { volts: l.volts, amps: l.amps, travelSpeed: l.travelSpeed } })
  if ('error' in heat) return null
  return { value: heat.heatInput as number, perUnit: heat.perUnit as string, clause: (heat.reasons as Reason[])[0]?.clause }
}

/** One layer of the coupon: process, filler, the values actually used and the deposit of its process. */
function layerBlock(q: PqrRecord['pqr'], l: Layer, i: number, count: number, unit: Unit): SheetBlock {
  const u = unitLabels(unit)
  const asme = q.code === 'asme-ix'
  const heat = heatOf(q, l)
  const fields: SheetField[] = [
    { label: 'Process and transfer', value: `${l.process}${l.transfer ? ` (${l.transfer})` : ''}` },
    { label: 'Filler metal', value: l.filler ? `${printable(l.filler.specification)} ${printable(l.filler.classification)}${q.code === 'iso-15614-1' ? '' : `, F-No. ${printable(l.filler.fNumber)}${l.filler.aNumber ? `, A-No. ${printable(l.filler.aNumber)}` : ''}`}` : 'none', clause: asme ? 'QW-404' : undefined },
    { label: 'Filler size', value: l.fillerSize === null ? dash : `Ø ${length(l.fillerSize, unit)}` },
    { label: 'Deposit thickness of this layer', value: length(l.depositThickness, unit), clause: asme ? 'QW-404.30' : undefined },
    { label: 'Current and polarity', value: orDash(l.current) },
    { label: 'Amperes', value: l.amps === null ? dash : `${l.amps} A` },
    { label: 'Volts', value: l.volts === null ? dash : `${l.volts} V` },
    { label: 'Wire feed speed', value: l.wireFeed === null ? dash : `${l.wireFeed} ${u.speed}` },
    { label: 'Travel speed', value: l.travelSpeed === null ? dash : `${l.travelSpeed} ${u.speed}` },
    { label: heat && l.heatInput === null ? 'Heat input (computed)' : 'Heat input', value: heat ? `${Math.round(heat.value)} ${heat.perUnit}` : dash, clause: heat?.clause },
    { label: 'Shielding gas and flow', value: l.gas ? `${printable(l.gas)}${l.gasFlow !== null ? `, ${l.gasFlow} ${u.flow}` : ''}` : dash },
  ]
  if (l.ctwd !== null) fields.push({ label: 'Contact tip to work distance', value: length(l.ctwd, unit) })
  if (l.tungsten) fields.push({ label: 'Tungsten electrode', value: printable(l.tungsten) })
  if (l.backingGas) fields.push({ label: 'Backing gas', value: printable(l.backingGas) })
  if (l.flux) fields.push({ label: 'Flux and electrode–flux class', value: printable(l.flux) })
  return { heading: `Layer ${i + 1} of ${count}: ${printable(l.name)}, ${l.process}`, clause: asme ? 'QW-404, QW-408 to QW-410' : undefined, fields }
}

/** Impact test results as a table: the test temperature, then each specimen's notch location and absorbed energy. */
function toughnessBlock(required: boolean, toughness: unknown, unit: Unit, clause?: string): SheetBlock {
  const t = (toughness && typeof toughness === 'object' ? toughness : null) as { testTemperature?: unknown, specimens?: unknown } | null
  const specimens = Array.isArray(t?.specimens) ? t.specimens as { location?: unknown, energy?: unknown }[] : []
  const energyUnit = unit === 'in' ? 'ft·lbf' : 'J'
  return {
    heading: 'Toughness tests', clause,
    fields: [
      { label: 'Required', value: yesNo(required) },
      { label: 'Test temperature', value: typeof t?.testTemperature === 'number' ? temperature(t.testTemperature, unit) : dash },
    ],
    table: specimens.length
      ? {
          columns: ['Specimen', 'Notch location', `Absorbed energy (${energyUnit})`],
          rows: specimens.map((s, i) => [String(i + 1), orDash(s.location), typeof s.energy === 'number' ? String(s.energy) : dash]),
          numeric: [0, 2],
        }
      : undefined,
    notes: t && !specimens.length ? ['No impact specimen recorded.'] : undefined,
  }
}

/** What the coupon qualifies (QW-451.1 and the variables that narrow it), with the clause of each limit. */
function qualifiedBlocks(record: PqrRecord): SheetBlock[] {
  const processes = [...new Set(record.layers.map(l => l.process))]
  return processes.flatMap((process) => {
    const group = record.layers.filter(l => l.process === process)
    const deposit = group.every(l => l.depositThickness !== null) ? group.reduce((sum, l) => sum + l.depositThickness!, 0) : null
    return qualifiedOf(record, process, group[0]!.transfer, deposit, processes.length > 1 ? ` by ${process} (its own deposit)` : '')
  })
}

function qualifiedOf(record: PqrRecord, process: string, transfer: string | null, deposit: number | null, suffix: string): SheetBlock[] {
  const q = record.pqr
  if (!isCode(q.code)) return []
  const result = evaluate({
    code: q.code, check: 'procedure-ranges', unit: q.unit, edition: q.edition,
    input: {
      process, ...(transfer ? { transfer } : {}), couponThickness: q.couponThickness,
      ...(deposit ? { depositThickness: deposit } : {}), toughness: q.toughnessRequired,
    },
  })
  const heading = `Ranges this coupon qualifies${suffix}`
  if ('error' in result) return [{ heading, notes: [`The rules could not evaluate this coupon: ${result.error}`] }]
  const unit = q.unit as Unit
  const base = result.baseMetal as { min: number | null, max: number | null }
  const specimens = result.specimens as { tension: number, face: number, root: number, side: number }
  return [
    {
      heading,
      fields: [
        { label: 'Base metal thickness', value: rangeText(base, unit) },
        { label: 'Deposited weld metal, maximum', value: result.depositMax === null ? 'unlimited' : length(result.depositMax as number, unit) },
        { label: 'Specimens required', value: `${specimens.tension} tension, ${specimens.face} face, ${specimens.root} root, ${specimens.side} side bend` },
      ],
    },
    reasonsBlock(`Clauses behind these ranges${suffix}`, result.reasons as Reason[]),
  ]
}
