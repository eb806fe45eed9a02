import type { CardLine } from '../../shared/qualification/id-card'
import { cardCaution } from '../../shared/qualification/id-card'
import { qrCanvas } from './qr'

// The welder's ID card: credit-card size (ISO/IEC 7810 ID-1, 85.6 × 54 mm), two pages for the two sides.
// Front: shop, photo (optional), name and stamp. Back: current processes in a few plain words, the QR of the public
// page (when the shop has it on) and the caution.
const mm = (v: number) => (v * 72) / 25.4
export const cardSize = { width: mm(85.6), height: mm(54) }
const ink = '#1d2327'
const muted = '#545d63'
const accent = '#1f5f7a'
const shownLines = 4

export interface CardInput {
  shopName: string
  welder: { name: string, stamp: string, status: string }
  today: string
  lines: CardLine[]
  /** A JPEG or PNG as a data URL, or null. */
  photo: string | null
  /** The public page's address, or null while the shop has it off. */
  publicUrl: string | null
}

function front(input: CardInput) {
  const photo = input.photo
    ? { image: input.photo, fit: [mm(20), mm(26)], width: mm(20) }
    : { table: { widths: [mm(19)], heights: [mm(25)], body: [[{ text: 'no photo', color: muted, fontSize: 6, alignment: 'center', margin: [0, mm(10), 0, 0] }]] }, layout: { hLineColor: muted, vLineColor: muted } }
  return [
    { canvas: [{ type: 'rect', x: -mm(4), y: -mm(4), w: cardSize.width, h: mm(9), color: accent }], absolutePosition: { x: mm(4), y: mm(4) } },
    { text: input.shopName, color: '#ffffff', bold: true, fontSize: 8, absolutePosition: { x: mm(4), y: mm(5.2) } },
    { columns: [{ width: cardSize.width - mm(8), text: 'WELDER ID', color: '#ffffff', fontSize: 5.5, alignment: 'right' }], absolutePosition: { x: mm(4), y: mm(5.8) } },
    {
      margin: [0, mm(8), 0, 0],
      columns: [
        { width: mm(22), stack: [photo] },
        {
          width: '*',
          stack: [
            { text: input.welder.name, bold: true, fontSize: 10 },
            { text: [{ text: 'Stamp ', color: muted }, { text: input.welder.stamp, bold: true }], fontSize: 9, margin: [0, 2, 0, 0] },
            { text: [{ text: 'Processes today ', color: muted }, input.lines.map(l => l.process).join(', ') || 'none current'], fontSize: 7, margin: [0, 4, 0, 0] },
            { text: `Printed ${input.today}${input.welder.status === 'active' ? '' : ' · inactive on the roster'}`, fontSize: 6, color: muted, margin: [0, 4, 0, 0] },
          ],
        },
      ],
    },
  ]
}

function back(input: CardInput) {
  const lines = input.lines.slice(0, shownLines)
  const more = input.lines.length - lines.length
  const words = lines.length
    ? [
        ...lines.map(l => ({ text: [{ text: `${l.process} `, bold: true }, `${l.positions}; ${l.thickness}; lapses ${l.lapsesOn}`], fontSize: 5.8, margin: [0, 0, 0, 1.5] })),
        ...(more > 0 ? [{ text: `and ${more} more: see the page behind the QR code`, fontSize: 5.5, color: muted }] : []),
      ]
    : [{ text: 'No process current on the day of printing.', fontSize: 6 }]
  const qrSide = mm(22)
  const qr = input.publicUrl
    ? { stack: [{ ...qrCanvas(input.publicUrl, qrSide) }, { text: 'Scan for today\'s status', fontSize: 5, alignment: 'center', color: muted }] }
    : { text: 'Public page off: ask the shop for the current status.', fontSize: 5.5, color: muted }
  return [
    {
      pageBreak: 'before',
      columns: [
        { width: '*', stack: [{ text: 'Qualified and current for', bold: true, fontSize: 6.5, margin: [0, 0, 0, 2] }, ...words] },
        { width: qrSide, stack: [qr] },
      ],
      columnGap: mm(2),
    },
    { columns: [{ width: cardSize.width - mm(8), text: cardCaution, fontSize: 4.6, color: muted }], absolutePosition: { x: mm(4), y: cardSize.height - mm(9) } },
  ]
}

/** The pdfmake definition of the two-sided card. */
export function cardDefinition(input: CardInput) {
  return {
    pageSize: cardSize,
    pageMargins: [mm(4), mm(4), mm(4), mm(4)],
    info: { title: `ID card ${input.welder.stamp}`, author: input.shopName, creator: 'Rootface', producer: 'Rootface' },
    defaultStyle: { font: 'SourceSans', fontSize: 7, lineHeight: 1.05, color: ink },
    content: [...front(input), ...back(input)],
  }
}
