import { depositsOf, variablesOf } from '../database/welder-test-columns'
import { qualifiedRangesOf } from '#shared/qualification/test-ranges'
import type { Reason, Unit, WelderRangesResult } from '#shared/rules'
import type { SheetBlock, SheetField, SheetModel } from './model'
import type { WelderTestRecord } from '../database/sheet-records'
import { operatorBlocks } from './operator-block'
import { caution, certification, codeLine, reasonsBlock, signedParts } from './common'
import { dash, length, list, orDash, printable, rangeText, yesNo } from './format'
import { isoCertificateBlocks } from './iso-certificate'
import { todayIso } from '../utils/today'

type Ranges = WelderRangesResult & { reasons: Reason[] }

/** The ranges as stored with the signed record; recomputed only when the stored copy could not be evaluated. */
function rangesOf(record: WelderTestRecord): { ranges: Ranges | null, error: string | null, recomputed: boolean } {
  const stored = record.test.ranges as (Ranges | { error: string } | null)
  if (stored && !('error' in stored) && Array.isArray(stored.reasons)) return { ranges: stored, error: null, recomputed: false }
  const t = record.test
  const live = qualifiedRangesOf(variablesOf(t))
  if ('error' in live) return { ranges: null, error: String(live.error), recomputed: true }
  return { ranges: live as unknown as Ranges, error: null, recomputed: true }
}

/** The WPQ: the essential variables of QW-484 as tested, the results and the ranges qualified. */
export function wpqSheet(record: WelderTestRecord, shop: string, origin: string): SheetModel {
  const t = record.test
  const unit = t.unit as Unit
  const asme = t.code === 'asme-ix'
  const k = (clause: string) => (asme ? clause : undefined)
  const iso = t.code === 'iso-9606-1'
  const w = (asmeWords: string, isoWords: string) => (iso ? isoWords : asmeWords)
  const processes = depositsOf(t)
  const blocks: SheetBlock[] = [
    {
      heading: 'Welder',
      fields: [
        { label: 'Name', value: printable(record.welder.name) },
        { label: 'Identification stamp', value: printable(record.welder.stamp) },
        { label: 'WPS followed', value: record.procedure ? `${record.procedure.number} rev. ${record.procedure.revision}` : dash },
        { label: 'Test date', value: t.testDate },
        { label: 'Code', value: codeLine(t.code, t.edition) },
      ],
    },
    ...operatorBlocks(t),
    {
      heading: w('Test coupon as welded', 'Test piece as welded'), clause: asme ? 'QW-350' : iso ? 'ISO 9606-1, 5' : undefined,
      fields: [
        { label: w('Processes', 'Welding process (ISO 4063)'), value: processes.map(d => `${d.process}${d.transfer ? ` (${d.transfer})` : ''}`).join(' + '), clause: k('QW-355') },
        { label: w('Weld', 'Type of weld'), value: iso ? (t.weld === 'fillet' ? 'fillet weld (FW)' : 'butt weld (BW)') : t.weld },
        { label: w('Coupon form', 'Product type'), value: iso ? (t.form === 'pipe' ? 'pipe (T)' : 'plate (P)') : t.form },
        { label: w('Coupon thickness', 'Material thickness t'), value: length(t.couponThickness, unit) },
        { label: processes.length > 1 ? 'Deposit thickness, all processes' : 'Deposit thickness', value: length(t.depositThickness, unit), clause: k('QW-404.30') },
        { label: 'Layers', value: orDash(t.layers) },
        { label: 'Outside diameter', value: t.form === 'pipe' ? length(t.outsideDiameter, unit) : 'plate', clause: k('QW-403.16') },
        { label: w('Base metal P-No.', 'Parent metal group'), value: orDash(t.pNumber), clause: k('QW-403.18') },
        { label: w('Filler F-No.', 'Filler material group'), value: iso && t.fNumber ? `FM${t.fNumber}` : orDash(t.fNumber), clause: k('QW-404.15') },
        { label: 'Backing', value: yesNo(t.backing, 'with backing', 'without backing'), clause: k('QW-402.4') },
        { label: w('Test positions', 'Welding positions (ISO 6947)'), value: list(t.positions), clause: k('QW-405.1') },
        { label: 'Progression', value: orDash(t.progression), clause: k('QW-405.3') },
      ],
    },
    ...(processes.length > 1
      ? [{
        heading: 'Processes on the coupon', clause: k('QW-452.1(b)'),
        table: {
          columns: ['Order', 'Process', 'Transfer', `Deposit (${unit})`, `Deposit qualified, max (${unit})`],
          rows: processes.map((d, i) => [String(i + 1), d.process, orDash(d.transfer), d.depositThickness === null ? dash : String(d.depositThickness),
            d.error ? `cannot tell: ${printable(d.error)}` : d.depositMax === null || d.depositMax === undefined ? 'maximum to be welded' : length(d.depositMax, unit)]),
          numeric: [3],
        },
        notes: ['Each process qualifies its own deposit; the combination qualifies the sum (QW-452.1(b) and its notes).'],
      } satisfies SheetBlock]
      : []),
    ...isoCertificateBlocks(record, todayIso()),
    resultsBlock(record),
  ]
  if (record.bends.length) {
    blocks.push({
      heading: 'Guided-bend tests', clause: k('QW-452.1, QW-163'),
      table: {
        columns: ['Type', `Largest open discontinuity (${unit})`, 'At a corner', 'Result'],
        rows: record.bends.map(b => [b.type, b.largestIndication ? String(b.largestIndication) : 'none', yesNo(b.atCorner), b.accepted ? 'accepted' : 'rejected']),
        numeric: [1],
      },
    })
  }
  blocks.push(...rangeBlocks(record))
  const status = t.status
  return {
    kind: 'wpq', kindTitle: t.code === 'iso-9606-1' ? 'Welder qualification test certificate (ISO 9606-1)' : 'Welder performance qualification (WPQ)', shopName: shop, number: `WPQ-${t.id}`, revision: null,
    subtitle: `${printable(record.welder.name)} (${printable(record.welder.stamp)}), ${processes.map(d => d.process).join(' + ')}, ${list(t.positions)}, tested ${t.testDate}`,
    codeLine: codeLine(t.code, t.edition), unit, status,
    banner: status === 'failed' ? 'FAILED · qualifies nothing' : status === 'recorded' ? 'NOT CERTIFIED' : null,
    blocks, statement: certification(t.code, t.edition, 'coupon'), ...signedParts(record.signed, origin), caution: caution(t.code, t.edition),
  }
}

function resultsBlock(record: WelderTestRecord): SheetBlock {
  const t = record.test
  const fields: SheetField[] = [
    { label: 'Visual examination', value: t.visualAccepted === null ? 'not recorded' : t.visualAccepted ? 'accepted' : 'rejected', clause: t.code === 'asme-ix' ? 'QW-302.4' : undefined },
    { label: 'Visual notes', value: orDash(t.visualNotes) },
    { label: 'Examination', value: t.examination },
    { label: 'Inspector', value: orDash(record.inspector) },
  ]
  const rt = t.radiography as { indications?: { kind: string, length: number }[], accepted?: boolean, report?: string } | null
  if (t.examination === 'radiography' && rt) {
    fields.push({ label: 'Radiography', value: rt.indications?.length ? rt.indications.map(i => `${printable(i.kind)} ${i.length} ${t.unit}`).join('; ') : 'no indications' })
    if (rt.report) fields.push({ label: 'Radiography report', value: printable(rt.report) })
  }
  return { heading: 'Results', fields }
}

function rangeBlocks(record: WelderTestRecord): SheetBlock[] {
  const unit = record.test.unit as Unit
  const heading = 'Ranges qualified'
  if (record.test.status === 'failed') return [{ heading, notes: ['A failed test qualifies nothing.'] }]
  const { ranges, error, recomputed } = rangesOf(record)
  if (!ranges) return [{ heading, notes: [`The rules could not evaluate this test: ${error}`] }]
  const pos = ranges.positions
  const fields: SheetField[] = []
  if (ranges.depositMax !== undefined) fields.push({ label: 'Deposited weld metal, maximum', value: ranges.depositMax === null ? 'maximum to be welded' : length(ranges.depositMax, unit) })
  if (ranges.thickness) fields.push({ label: 'Base metal thickness', value: rangeText(ranges.thickness, unit) })
  if (ranges.filletSizeMax !== undefined) fields.push({ label: 'Fillet size, maximum', value: ranges.filletSizeMax === null ? 'all sizes' : length(ranges.filletSizeMax, unit) })
  if (ranges.diameter) fields.push({ label: 'Outside diameter', value: rangeText(ranges.diameter, unit) })
  fields.push({ label: 'Groove positions (plate and large pipe)', value: list(pos.groove) })
  if (pos.groovePipe) fields.push({ label: 'Groove positions (small pipe)', value: list(pos.groovePipe) })
  fields.push({ label: 'Fillet positions', value: list(pos.fillet) })
  if (ranges.fNumbers) fields.push({ label: 'F-Nos.', value: `${ranges.fNumbers.numbers.join(', ')} ${ranges.fNumbers.withoutBacking ? '(with and without backing)' : '(with backing only)'}` })
  if (ranges.pNumbers) fields.push({ label: 'Base metals', value: list(ranges.pNumbers) })
  return [
    { heading, fields, notes: recomputed ? ['Computed when this sheet was printed: the stored ranges could not be read.'] : undefined },
    reasonsBlock('Clauses behind these ranges', ranges.reasons),
  ]
}
