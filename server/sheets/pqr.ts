import { evaluate } from '#shared/rules'
import type { Reason, Unit } from '#shared/rules/types'
import type { SheetBlock, SheetField, SheetModel } from './model'
import type { PqrRecord } from './records'
import { caution, certification, codeLine, groupClause, isCode, reasonsBlock, signedParts } from './common'
import { length, list, orDash, printable, rangeText, temperature, yesNo } from './format'

const knownActuals = ['amps', 'volts', 'wireFeed', 'travelSpeed', 'gas', 'gasFlow', 'position', 'progression', 'preheat', 'interpass', 'pwht']

/** The PQR: the values actually used on the coupon (QW-483), the test results and what the coupon qualifies. */
export function pqrSheet(record: PqrRecord, shop: string, origin: string): SheetModel {
  const q = record.pqr
  const unit = q.unit as Unit
  const a = (q.actuals && typeof q.actuals === 'object' ? q.actuals : {}) as Record<string, unknown>
  const c = (g: Parameters<typeof groupClause>[1]) => groupClause(q.code, g)
  const num = (v: unknown) => (typeof v === 'number' ? v : null)
  const speedUnit = unit === 'in' ? 'in/min' : 'mm/min'
  const blocks: SheetBlock[] = [
    {
      heading: 'Record',
      fields: [
        { label: 'Test date', value: q.testDate },
        { label: 'Code', value: codeLine(q.code, q.edition) },
        { label: 'Process', value: q.process },
        { label: 'Transfer mode', value: orDash(q.transfer) },
        { label: 'Laboratory report', value: orDash(q.labReportNumber) },
        { label: 'Supports WPS', value: list(record.supports.filter(s => s.status !== 'draft').map(s => `${s.number} rev. ${s.revision} (${s.status})`)) },
      ],
    },
    {
      heading: 'Base metal', clause: c('base'),
      fields: [
        { label: 'Specification and grade', value: record.base ? `${printable(record.base.specification)} ${printable(record.base.grade)}` : '—' },
        { label: 'P-No. / Group No.', value: record.base ? `P-No. ${record.base.pNumber}${record.base.groupNumber ? ` Group ${record.base.groupNumber}` : ''}` : '—' },
        { label: 'Coupon thickness T', value: length(q.couponThickness, unit) },
        { label: 'Deposit thickness t', value: length(q.depositThickness, unit) },
      ],
    },
    {
      heading: 'Filler metal', clause: c('filler'),
      fields: [
        { label: 'Specification (SFA)', value: orDash(record.filler?.specification) },
        { label: 'Classification', value: orDash(record.filler?.classification) },
        { label: 'F-No.', value: orDash(record.filler?.fNumber) },
        { label: 'A-No.', value: orDash(record.filler?.aNumber) },
      ],
    },
    {
      heading: 'Position, preheat, PWHT, gas', clause: q.code === 'asme-ix' ? 'QW-405 to QW-408' : undefined,
      fields: [
        { label: 'Position of groove', value: orDash(a.position) },
        { label: 'Progression', value: orDash(a.progression) },
        { label: 'Preheat', value: temperature(num(a.preheat), unit) },
        { label: 'Interpass', value: temperature(num(a.interpass), unit) },
        { label: 'PWHT', value: orDash(a.pwht ?? 'none recorded') },
        { label: 'Shielding gas', value: a.gas ? `${printable(String(a.gas))}${a.gasFlow ? `, ${a.gasFlow} ${unit === 'in' ? 'ft³/h' : 'l/min'}` : ''}` : '—' },
      ],
    },
    electricalBlock(q.code, q.edition, unit, a, speedUnit, c('electrical')),
  ]
  const others: SheetField[] = Object.entries(a).filter(([k]) => !knownActuals.includes(k)).map(([k, v]) => ({ label: printable(k), value: orDash(typeof v === 'object' ? JSON.stringify(v) : v) }))
  if (others.length) blocks.push({ heading: 'Other values used', fields: others })

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
  blocks.push({
    heading: 'Toughness tests', clause: c('toughness'),
    fields: [
      { label: 'Required', value: yesNo(q.toughnessRequired) },
      ...(q.toughness ? Object.entries(q.toughness as Record<string, unknown>).map(([k, v]) => ({ label: printable(k), value: orDash(typeof v === 'object' ? JSON.stringify(v) : v) })) : []),
    ],
  })
  blocks.push(...qualifiedBlocks(record))

  return {
    kind: 'pqr', kindTitle: 'Procedure qualification record (PQR)', shopName: shop, number: q.number, revision: null,
    subtitle: `${q.process}${q.transfer ? ` (${q.transfer})` : ''}, coupon ${length(q.couponThickness, unit)}, tested ${q.testDate}`,
    codeLine: codeLine(q.code, q.edition), unit, status: q.status,
    banner: q.status === 'failed' ? 'FAILED · qualifies nothing' : q.status === 'recorded' ? 'NOT CERTIFIED' : null,
    blocks, statement: certification(q.code, q.edition, 'coupon'), ...signedParts(record.signed, origin), caution: caution(q.code, q.edition),
  }
}

function electricalBlock(code: string, edition: string, unit: Unit, a: Record<string, unknown>, speedUnit: string, clause?: string): SheetBlock {
  const fields: SheetField[] = [
    { label: 'Amperes', value: a.amps ? `${a.amps} A` : '—' },
    { label: 'Volts', value: a.volts ? `${a.volts} V` : '—' },
    { label: 'Wire feed speed', value: a.wireFeed ? `${a.wireFeed} ${unit === 'in' ? 'in/min' : 'm/min'}` : '—' },
    { label: 'Travel speed', value: a.travelSpeed ? `${a.travelSpeed} ${speedUnit}` : '—' },
  ]
  if (isCode(code) && typeof a.volts === 'number' && typeof a.amps === 'number' && typeof a.travelSpeed === 'number') {
    const heat = evaluate({ code, check: 'heat-input', unit, edition, input: { volts: a.volts, amps: a.amps, travelSpeed: a.travelSpeed } })
    if (!('error' in heat)) {
      const reason = (heat.reasons as Reason[])[0]
      fields.push({ label: 'Heat input (computed)', value: `${Math.round(heat.heatInput as number)} ${heat.perUnit as string}`, clause: reason?.clause })
    }
  }
  return { heading: 'Electrical characteristics', clause, fields }
}

/** What the coupon qualifies (QW-451.1 and the variables that narrow it), with the clause of each limit. */
function qualifiedBlocks(record: PqrRecord): SheetBlock[] {
  const q = record.pqr
  if (!isCode(q.code)) return []
  const result = evaluate({
    code: q.code, check: 'procedure-ranges', unit: q.unit, edition: q.edition,
    input: {
      process: q.process, ...(q.transfer ? { transfer: q.transfer } : {}), couponThickness: q.couponThickness,
      ...(q.depositThickness ? { depositThickness: q.depositThickness } : {}), toughness: q.toughnessRequired,
    },
  })
  const heading = 'Ranges this coupon qualifies'
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
    reasonsBlock('Clauses behind these ranges', result.reasons as Reason[]),
  ]
}
