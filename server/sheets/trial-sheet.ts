import type { Db } from '../database/client'
import { seriesDetail } from '../database/trials'
import { shopName } from '../database/sheet-records'
import { documentBase, pageFooter, pageHeader } from './layout'
import { isFailure } from '#shared/types/outcome'
import { trialJointWords } from '#shared/vocabulary/trial-joints'
import { wireSize } from '#shared/trials/words'

// The sheet of a trial series: header, both plots (the same SVG the page shows), the bead table and the caution.
// It is a working record, not signed: no hash or verification code.

type Detail = Exclude<Awaited<ReturnType<typeof seriesDetail>>, { fail: string }>

const dash = (v: number | string | null | undefined, unit = '') => (v === null || v === undefined || v === '' ? '—' : `${v}${unit ? ` ${unit}` : ''}`)

export function trialSheetDefinition(detail: Detail, shop: string) {
  const s = detail.series
  const u = s.unit
  const fields: [string, string][] = [
    ['Process', `${s.process}${s.transfer ? `, ${s.transfer}` : ''}`],
    ['Wire', `${s.wireClass} × ${wireSize(s.wireDiameter, u)}`],
    ['Gas and flow', `${dash(s.gas)} · ${dash(s.gasFlow, u === 'in' ? 'ft³/h' : 'L/min')}`],
    ['Base metal', `${s.baseMetal}, ${s.thickness} ${u}${s.gauge ? ` (${s.gauge})` : ''}`],
    ['Joint', `${trialJointWords[s.joint]}${s.rootGap !== null ? `, gap ${s.rootGap} ${u}` : ''}`],
    ['Position', `${s.position}${s.progression ? `, ${s.progression}` : ''}`],
  ]
  const head = ['#', 'V', `WFS ${u}/min`, 'A', `CTWD ${u}`, `Travel ${u}/min`, `Heat input ${u === 'in' ? 'J/in' : 'J/mm'}`, 'Result', 'Notes']
  const rows = detail.beads.map(b => [
    String(b.number), String(b.volts), String(b.wireFeed), dash(b.amps), dash(b.ctwd),
    dash(b.heat.kind === 'value' ? b.heat.travelSpeed : b.travelSpeed),
    b.heat.kind === 'value' ? `${b.heat.heatInput} (${b.heat.reasons[0]?.clause ?? ''})` : `cannot tell: ${b.heat.because}`,
    b.verdictDetail.kind === 'accepted' ? 'accepted' : b.verdictDetail.kind === 'rejected' ? `rejected: ${b.verdictDetail.because.join(', ')}` : `not judged: ${b.verdictDetail.because}`,
    b.notes ?? '',
  ])
  return {
    ...documentBase(`Trial series ${s.title}`, shop),
    pageOrientation: 'landscape',
    header: () => pageHeader(shop, `Trial series ${s.id}`, null),
    footer: (page: number, pages: number) => pageFooter('Working record, not signed', `Page ${page} of ${pages}`),
    content: [
      { text: 'TRIAL RUNS', style: 'kind' },
      { text: s.title, style: 'number' },
      { text: `${detail.counts.accepted} accepted · ${detail.counts.rejected} rejected · ${detail.counts.notJudged} not judged`, style: 'meta', margin: [0, 0, 0, 6] },
      { columns: fields.map(([label, value]) => ({ stack: [{ text: label, style: 'label' }, { text: value, style: 'value' }] })), columnGap: 8, margin: [0, 0, 0, 8] },
      {
        columns: [
          { svg: detail.plots.svg.wireFeed, width: 340, font: 'SourceSans' },
          { svg: detail.plots.svg.ctwd, width: 340, font: 'SourceSans' },
        ],
        columnGap: 12,
      },
      ...(detail.plots.ctwd.leftOff.length ? [{ text: `No CTWD recorded on beads ${detail.plots.ctwd.leftOff.join(', ')}: left off the CTWD view.`, style: 'note' }] : []),
      { text: 'Accepted: a filled circle; rejected: a cross; not judged: an open square. The shaded area is the convex hull of the accepted beads.', style: 'note', margin: [0, 2, 0, 6] },
      {
        table: { headerRows: 1, widths: [16, 26, 44, 28, 38, 44, 90, '*', 120], body: [head.map(text => ({ text, style: 'th' })), ...rows.map(r => r.map(text => ({ text, style: 'cell' })))] },
        layout: 'lightHorizontalLines',
      },
      { text: 'Heat input by ASME IX QW-409.1: (a) volts × amps × 60 / travel speed; (c) arc energy, or power × arc time, over the bead length.', style: 'small', margin: [0, 6, 0, 0] },
      { text: 'Trials find settings; they qualify nothing. The governing code edition, the shop\'s quality manual and the inspector have the final word; the PQR\'s tests decide.', style: 'caution', margin: [0, 6, 0, 0] },
    ],
  }
}

/** The sheet of one series: its pdfmake definition and file name, or the series' Failure. */
export async function trialSheet(db: Db, id: number) {
  const detail = await seriesDetail(db, id)
  if (isFailure(detail)) return detail
  const name = `trials-${detail.series.id}-${detail.series.title}`.replace(/[^\w.-]+/g, '-').slice(0, 80)
  return { definition: trialSheetDefinition(detail, await shopName(db)), fileName: `${name}.pdf` }
}
