import { groupedCode } from './format'
import { documentBase, PageTracker, pageFooter, pageHeader, sheetSection, styles } from './layout'
import { sheetReference, type SheetModel } from './model'
import type { PacketPlan, WelderGap } from './packet'

// The packet as a pdfmake definition, from data alone (no database, no server): it runs in the render worker too.

/** One sheet of the packet; `page` is its first packet page when the sheets are merged after the front (packet-merge.ts). */
export interface PacketEntry { sheet: SheetModel, group: string, page?: number }

export interface PacketDocumentInput {
  plan: PacketPlan
  shop: string
  entries: PacketEntry[]
  gaps: WelderGap[]
  preparedBy: string
  preparedOn: string
}

export function packetDefinition(input: PacketDocumentInput) {
  const { plan, shop, entries, gaps } = input
  const tracker = new PageTracker()
  const furniture = { shopName: shop, documentLine: `Packet ${plan.project.number}` }
  const front = (content: unknown[], section: number, anchor?: string) => ({
    section: anchor ? [{ text: '', id: anchor }, ...content] : content,
    header: (page: number) => {
      tracker.seen(page, section)
      return pageHeader(shop, `Project ${plan.project.number}`, furniture.documentLine)
    },
    footer: (page: number, pages: number) => {
      tracker.total = pages
      return pageFooter(`Project ${plan.project.number} · ${plan.project.name}`, `Packet page ${page} of ${pages}`)
    },
  })
  const definition = {
    ...documentBase(`Packet ${plan.project.number}`, shop),
    content: [
      front(coverContent(input), 0),
      front(indexContent(entries), 1),
      front(gapContent(plan, gaps), 2, 'not-current'),
      ...entries.map((e, i) => sheetSection(e.sheet, i + 3, tracker, furniture, `sheet-${i}`)),
    ],
    styles,
  }
  return { definition, tracker }
}

/**
 * The packet's front alone (cover, index, summary of welders not current), the sheets merged after it: the index prints
 * each entry's `page`. Its pages are numbered as packet pages, since the front comes first.
 */
export function packetFrontDefinition(input: PacketDocumentInput) {
  const { plan, shop, entries, gaps } = input
  const tracker = new PageTracker()
  const front = (content: unknown[], anchor?: string) => ({
    section: anchor ? [{ text: '', id: anchor }, ...content] : content,
    header: () => pageHeader(shop, `Project ${plan.project.number}`, `Packet ${plan.project.number}`),
    footer: (_page: number, pages: number) => {
      tracker.total = pages
      return pageFooter(`Project ${plan.project.number} · ${plan.project.name}`, '')
    },
  })
  const definition = {
    ...documentBase(`Packet ${plan.project.number}`, shop),
    content: [front(coverContent(input)), front(indexContent(entries)), front(gapContent(plan, gaps), 'not-current')],
    styles,
  }
  return { definition, tracker }
}

function coverContent({ plan, shop, entries, gaps, preparedBy, preparedOn }: PacketDocumentInput) {
  const sheets = entries.length
  const row = (label: string, value: string) => [{ text: label, style: 'label', margin: [0, 3, 0, 3] }, { text: value, style: 'value', margin: [0, 2, 0, 2] }]
  return [
    { text: shop, fontSize: 13, bold: true, margin: [0, 60, 0, 4] },
    { text: 'PROJECT PACKET', style: 'kind', margin: [0, 30, 0, 2] },
    { text: plan.project.number, fontSize: 30, bold: true },
    { text: plan.project.name, fontSize: 14, margin: [0, 2, 0, 24] },
    {
      table: {
        widths: [130, '*'],
        body: [
          row('Customer', plan.project.customer),
          row('Period', `${plan.period.from} to ${plan.period.to}`),
          row('Procedures (WPS)', String(plan.procedureIds.length)),
          row('Procedure qualifications (PQR)', String(plan.pqrIds.length)),
          row('Welders', String(plan.welders.length)),
          row('Sheets', String(sheets)),
          row('Welders not current on a day of the period', gaps.length ? `${new Set(gaps.map(g => g.stamp)).size} (see the summary)` : 'none'),
          row('Prepared', `${preparedOn} by ${preparedBy}`),
        ],
      },
      layout: { hLineWidth: () => 0.5, vLineWidth: () => 0, hLineColor: () => '#d4d1c7' },
    },
    {
      text: 'Each sheet carries its own signatures, the SHA-256 of its signed content and a code with a QR code: '
        + 'the verification page tells whether the record is still as it was signed.',
      style: 'value', margin: [0, 24, 0, 8],
    },
    { table: { widths: ['*'], body: [[{ text: genericCaution, style: 'caution', fillColor: '#f7ecd2', margin: [6, 5, 6, 5] }]] }, layout: 'noBorders' },
  ]
}

const genericCaution = 'Rootface helps; it does not qualify anyone. Each sheet names the code edition its ranges follow; the governing code '
  + 'edition, the shop\'s quality manual, the contract and the Authorized Inspector or certified welding inspector have the final word.'

const shortKinds = { wps: 'WPS', pqr: 'PQR', wpq: 'WPQ', continuity: 'Continuity log', register: 'Weld register' } as const

function indexContent(entries: PacketEntry[]) {
  const body: unknown[][] = [[
    { text: 'Sheet', style: 'th' }, { text: 'Reference', style: 'th' }, { text: 'Subject', style: 'th' }, { text: 'Code', style: 'th' }, { text: 'Page', style: 'th', alignment: 'right' },
  ]]
  body.push([{ text: 'Welders not current in the period', style: 'cell', colSpan: 4, bold: true }, {}, {}, {}, { text: '00', pageReference: 'not-current', style: 'cell', alignment: 'right' }])
  let group = ''
  entries.forEach((e, i) => {
    if (e.group !== group) {
      group = e.group
      body.push([{ text: group, style: 'cell', bold: true, colSpan: 5, margin: [0, 4, 0, 0] }, {}, {}, {}, {}])
    }
    body.push([
      { text: shortKinds[e.sheet.kind], style: 'cell' },
      { text: sheetReference(e.sheet), style: 'cell', bold: true },
      { text: e.sheet.subtitle, style: 'cell' },
      { text: e.sheet.verify ? groupedCode(e.sheet.verify.code) : 'not signed', style: 'cell' },
      e.page === undefined ? { text: '00', pageReference: `sheet-${i}`, style: 'cell', alignment: 'right' } : { text: String(e.page), style: 'cell', alignment: 'right' },
    ])
  })
  return [
    { text: 'INDEX', style: 'kind', margin: [0, 0, 0, 2] },
    { text: 'Sheets in this packet', style: 'number', fontSize: 16, margin: [0, 0, 0, 8] },
    {
      table: { headerRows: 1, widths: [64, 84, '*', 66, 28], body, dontBreakRows: true },
      layout: { hLineWidth: (i: number) => (i === 0 ? 0 : 0.4), vLineWidth: () => 0, hLineColor: () => '#d4d1c7', paddingTop: () => 2, paddingBottom: () => 2 },
    },
  ]
}

/**
 * The summary's two lists: the days a welder was not current for a process they hold or came to hold, and, once per
 * welder and process, a process they never held (no certified test of it up to the end of the period): that is not a
 * lapse, and may only mean they did not weld it on this project.
 */
export function summaryOf(gaps: WelderGap[]) {
  const neverHeld = gaps.filter(g => g.why === 'never-held')
    .map(g => `${g.welder} (${g.stamp}) holds no qualification for ${g.process}: may not have welded it on this project`)
  return { lapses: gaps.filter(g => g.why !== 'never-held'), neverHeld: [...new Set(neverHeld)] }
}

function gapContent(plan: PacketPlan, all: WelderGap[]) {
  const { lapses: gaps, neverHeld } = summaryOf(all)
  const rows = gaps.map(g => [
    { text: `${g.welder} (${g.stamp})`, style: 'cell' }, { text: g.process, style: 'cell' },
    { text: g.from, style: 'cell' }, { text: g.to, style: 'cell' },
    { text: g.why === 'no-test' ? 'no certified test of this process on record yet' : g.why === 'revoked' ? `qualification revoked (QW-322.1(b)): ${g.reason ?? ''}` : 'qualification lapsed (no use within six months, or not renewed)', style: 'cell' },
  ])
  return [
    { text: 'SUMMARY', style: 'kind', margin: [0, 0, 0, 2] },
    { text: 'Welders not current on a day of the period', style: 'number', fontSize: 16, margin: [0, 0, 0, 4] },
    {
      text: `For each welder of the project and each process of its WPSs (${plan.processes.join(', ') || 'none'}), the days from ${plan.period.from} to ${plan.period.to} `
        + 'on which the welder was not current, from the certified tests and the continuity log (ASME IX QW-322). A welder who did not weld a process '
        + 'on the project need not hold it: read each line with the project\'s weld map.',
      style: 'value', margin: [0, 0, 0, 8],
    },
    gaps.length
      ? {
          table: {
            headerRows: 1, widths: [120, 40, 58, 58, '*'],
            body: [[{ text: 'Welder', style: 'th' }, { text: 'Process', style: 'th' }, { text: 'From', style: 'th' }, { text: 'To', style: 'th' }, { text: 'Why', style: 'th' }], ...rows],
          },
          layout: { hLineWidth: (i: number) => (i === 0 ? 0 : 0.4), vLineWidth: () => 0, hLineColor: () => '#d4d1c7' },
        }
      : { text: neverHeld.length ? 'No lapse in the period for a process a welder holds.' : 'Every welder was current for every process of the project on every day of the period.', bold: true },
    ...(neverHeld.length
      ? [
          { text: 'Processes of the project a welder holds no qualification for', style: 'label', bold: true, margin: [0, 10, 0, 2] },
          { ul: neverHeld, style: 'value' },
        ]
      : []),
    { table: { widths: ['*'], body: [[{ text: genericCaution, style: 'caution', fillColor: '#f7ecd2', margin: [6, 5, 6, 5] }]] }, layout: 'noBorders', margin: [0, 14, 0, 0] },
  ]
}
