import type { SheetBlock, SheetModel } from './model'
import { sheetReference } from './model'
import { groupedCode, meaningWords, moment } from './format'
import { qrCanvas } from './qr'

// Rootface's own sheet: a ruled header band, variables in label/value grids grouped under their code paragraph,
// signatures, then the verification panel (QR, code, hash) and the caution. Colours mirror the screen tokens.
const ink = '#1d2327'
const muted = '#545d63'
const rule = '#d4d1c7'
const accent = '#1f5f7a'
const warn = '#a3322a'

export const styles = {
  kind: { fontSize: 9, color: accent, bold: true, characterSpacing: 0.6 },
  number: { fontSize: 20, bold: true, color: ink },
  subtitle: { fontSize: 10.5, color: ink },
  meta: { fontSize: 8.5, color: muted },
  heading: { fontSize: 10, bold: true, color: ink },
  clause: { fontSize: 8, color: accent },
  label: { fontSize: 7.5, color: muted },
  value: { fontSize: 9, color: ink },
  cell: { fontSize: 8.5, color: ink },
  th: { fontSize: 7.5, color: muted, bold: true },
  note: { fontSize: 8, color: muted, italics: true },
  small: { fontSize: 7.5, color: muted },
  mono: { fontSize: 7.5, color: ink, characterSpacing: 0.2 },
  caution: { fontSize: 8, color: ink },
}

const ruled = {
  hLineWidth: (i: number) => (i === 0 ? 0 : 0.5),
  vLineWidth: () => 0,
  hLineColor: () => rule,
  paddingLeft: (i: number) => (i === 0 ? 0 : 4),
  paddingRight: () => 4,
  paddingTop: () => 2.5,
  paddingBottom: () => 2.5,
}

const boxed = {
  hLineWidth: () => 0.6,
  vLineWidth: () => 0.6,
  hLineColor: () => rule,
  vLineColor: () => rule,
  paddingLeft: () => 6,
  paddingRight: () => 6,
  paddingTop: () => 5,
  paddingBottom: () => 5,
}

function blockHeading(block: SheetBlock) {
  return {
    margin: [0, 9, 0, 3],
    table: {
      widths: ['*', 'auto'],
      body: [[
        { text: block.heading, style: 'heading', border: [false, false, false, true] },
        { text: block.clause ?? '', style: 'clause', alignment: 'right', border: [false, false, false, true] },
      ]],
    },
    layout: { hLineWidth: () => 0.8, vLineWidth: () => 0, hLineColor: () => ink, paddingLeft: () => 0, paddingRight: () => 0, paddingTop: () => 0, paddingBottom: () => 2 },
  }
}

/** Label/value pairs three to a row; the clause sits beside its label. */
function fieldGrid(fields: NonNullable<SheetBlock['fields']>) {
  const cells = fields.map(f => ({
    stack: [
      { text: [{ text: f.label }, f.clause ? { text: `  ${f.clause}`, color: accent } : ''], style: 'label' },
      { text: f.value || '—', style: 'value' },
    ],
    margin: [0, 1, 6, 2],
  }))
  const rows: unknown[][] = []
  for (let i = 0; i < cells.length; i += 3) rows.push([cells[i], cells[i + 1] ?? { text: '' }, cells[i + 2] ?? { text: '' }])
  return { table: { widths: ['*', '*', '*'], body: rows, dontBreakRows: true }, layout: 'noBorders' }
}

function dataTable(table: NonNullable<SheetBlock['table']>) {
  const numeric = new Set(table.numeric ?? [])
  const head = table.columns.map((c, i) => ({ text: c, style: 'th', alignment: numeric.has(i) ? 'right' : 'left' }))
  const body = table.rows.length
    ? table.rows.map(r => r.map((v, i) => ({ text: v, style: 'cell', alignment: numeric.has(i) ? 'right' : 'left' })))
    : [[{ text: 'None recorded.', style: 'note', colSpan: table.columns.length }, ...table.columns.slice(1).map(() => ({}))]]
  return {
    table: { headerRows: 1, widths: table.widths ?? table.columns.map(() => '*'), body: [head, ...body], dontBreakRows: true },
    layout: ruled,
  }
}

function blockContent(block: SheetBlock) {
  const parts: unknown[] = [blockHeading(block)]
  if (block.fields?.length) parts.push(fieldGrid(block.fields))
  if (block.table) parts.push({ ...dataTable(block.table), margin: [0, 2, 0, 0] })
  for (const note of block.notes ?? []) parts.push({ text: note, style: 'note', margin: [0, 2, 0, 0] })
  return { stack: parts, unbreakable: !block.table || block.table.rows.length < 8 }
}

function titleBand(sheet: SheetModel, anchor?: string) {
  const statusColor = /draft|failed|recorded|superseded/.test(sheet.status) ? warn : accent
  // The welder's photograph (ISO 9606-1 certificates), as identification beside the title.
  const photo = sheet.photo
    ? [{ stack: [{ image: sheet.photo.dataUrl, fit: [56, 70] }, { text: sheet.photo.caption, style: 'small', margin: [0, 1, 0, 0] }], border: [false, false, false, false], margin: [0, 0, 8, 0] }]
    : []
  return {
    table: {
      widths: [...(photo.length ? ['auto'] : []), '*', 'auto'],
      body: [[
        ...photo,
        {
          stack: [
            { text: sheet.kindTitle.toUpperCase(), style: 'kind', ...(anchor ? { id: anchor } : {}) },
            { text: sheet.number, style: 'number' },
            { text: sheet.subtitle, style: 'subtitle' },
            { text: [sheet.codeLine ?? '', sheet.unit ? `${sheet.codeLine ? ' · ' : ''}units as recorded: ${sheet.unit === 'in' ? 'inch' : 'millimetre'}` : ''], style: 'meta', margin: [0, 2, 0, 0] },
          ],
          border: [false, false, false, false],
        },
        {
          stack: [
            { text: sheet.revision === null ? ' ' : `Revision ${sheet.revision}`, bold: true, fontSize: 11, alignment: 'right' },
            {
              table: { body: [[{ text: `Status: ${sheet.status}`, bold: true, fontSize: 9, color: statusColor, margin: [4, 1, 4, 1] }]] },
              layout: { hLineWidth: () => 1, vLineWidth: () => 1, hLineColor: () => statusColor, vLineColor: () => statusColor },
              margin: [0, 4, 0, 0], alignment: 'right',
            },
          ],
          border: [false, false, false, false],
        },
      ]],
    },
    layout: 'noBorders',
    margin: [0, 0, 0, 4],
  }
}

function signatureBlock(sheet: SheetModel) {
  const rows = sheet.signatures.map(s => [meaningWords[s.meaning] ?? s.meaning, s.name, moment(s.at), String(s.version)])
  return {
    stack: [
      blockHeading({ heading: 'Signatures' }),
      sheet.statement ? { text: sheet.statement, style: 'value', margin: [0, 0, 0, 4] } : '',
      rows.length
        ? dataTable({ columns: ['Meaning', 'Signed by', 'When', 'Record version'], rows, widths: [70, '*', 110, 70], numeric: [3] })
        : { text: 'Not signed. This sheet shows the record as it stands and cannot be verified.', bold: true, color: warn, fontSize: 9 },
    ],
    unbreakable: true,
  }
}

function verifyPanel(sheet: SheetModel) {
  const hashState = sheet.hash.matchesSigned === false
    ? { text: 'The record as stored no longer hashes to the signed value: it has changed since it was signed.', color: warn, bold: true, fontSize: 8 }
    : ''
  const text = {
    stack: [
      { text: 'Verify this sheet', style: 'heading' },
      sheet.verify
        ? { text: [{ text: 'Code ', style: 'small' }, { text: groupedCode(sheet.verify.code), bold: true, fontSize: 12, characterSpacing: 1 }], margin: [0, 2, 0, 0] }
        : { text: 'No verification code: the record is not signed.', style: 'small' },
      sheet.verify ? { text: sheet.verify.url, style: 'small', link: sheet.verify.url } : '',
      { text: sheet.hash.label, style: 'small', margin: [0, 4, 0, 0] },
      { text: sheet.hash.value, style: 'mono' },
      hashState,
    ],
  }
  return {
    margin: [0, 12, 0, 0],
    unbreakable: true,
    stack: [
      {
        table: {
          widths: sheet.verify ? [78, '*'] : ['*'],
          body: [sheet.verify ? [qrCanvas(sheet.verify.url, 74), text] : [text]],
        },
        layout: boxed,
      },
      {
        table: { widths: ['*'], body: [[{ text: sheet.caution, style: 'caution' }]] },
        layout: { ...boxed, fillColor: () => '#f7ecd2', hLineColor: () => '#8a5a00', vLineColor: () => '#8a5a00', vLineWidth: (i: number) => (i === 0 ? 3 : 0), hLineWidth: () => 0 },
        margin: [0, 6, 0, 0],
      },
    ],
  }
}

/** The body of one sheet, without page furniture. */
export function sheetContent(sheet: SheetModel, anchor?: string) {
  return [
    titleBand(sheet, anchor),
    ...(sheet.banner ? [{ text: sheet.banner, bold: true, color: warn, fontSize: 10, margin: [0, 0, 0, 2] }] : []),
    ...sheet.blocks.map(blockContent),
    signatureBlock(sheet),
    verifyPanel(sheet),
  ]
}

/**
 * Tracks which pages belong to which sheet. pdfmake lays out every page, then calls all headers, then all footers:
 * headers record the page of each sheet, so footers can print "page x of y" of the sheet itself.
 */
export class PageTracker {
  private sectionOf = new Map<number, number>()
  total = 0
  seen(page: number, section: number) {
    this.sectionOf.set(page, section)
  }

  position(page: number, section: number) {
    const pages = [...this.sectionOf].filter(([, s]) => s === section).map(([p]) => p).sort((a, b) => a - b)
    return { index: pages.indexOf(page) + 1, count: pages.length }
  }
}

export interface Furniture {
  shopName: string
  /** A line for every page of the document (packet title); null on single sheets */
  documentLine: string | null
}

const shortKind = { wps: 'WPS', pqr: 'PQR', wpq: 'WPQ', continuity: 'Continuity log', register: 'Weld register' } as const

/** "WPS KB-W02 rev. 1", but "PQR-K101" rather than "PQR PQR-K101". */
export function labelled(kind: string, reference: string) {
  return reference.toUpperCase().startsWith(kind.toUpperCase()) ? reference : `${kind} ${reference}`
}

/** One sheet as a section: its own header, footer and banner watermark on every page it takes. */
/** `anchor` names the sheet's first line, for the page numbers of a packet's index. */
export function sheetSection(sheet: SheetModel, section: number, tracker: PageTracker, furniture: Furniture, anchor?: string) {
  const reference = labelled(shortKind[sheet.kind], sheetReference(sheet))
  return {
    section: sheetContent(sheet, anchor),
    header: (page: number) => {
      tracker.seen(page, section)
      return pageHeader(furniture.shopName, reference, furniture.documentLine)
    },
    footer: (page: number, pages: number) => {
      tracker.total = pages
      const own = tracker.position(page, section)
      return pageFooter(
        `${reference} · ${sheet.verify ? `code ${groupedCode(sheet.verify.code)}` : 'not signed'}`,
        `Sheet page ${own.index} of ${own.count}${furniture.documentLine ? ` · packet page ${page} of ${pages}` : ''}`,
      )
    },
    ...(sheet.banner ? { watermark: { text: sheet.banner, color: warn, opacity: 0.08, bold: true, fontSize: 54 } } : {}),
  }
}

export function pageHeader(shop: string, right: string, middle: string | null) {
  return {
    margin: [40, 22, 40, 0],
    table: {
      widths: ['*', 'auto'],
      body: [[
        { text: [{ text: shop, bold: true, color: ink }, middle ? { text: `  ·  ${middle}`, color: muted } : ''], fontSize: 8.5, border: [false, false, false, true] },
        { text: right, fontSize: 8.5, color: muted, alignment: 'right', border: [false, false, false, true] },
      ]],
    },
    layout: { hLineWidth: () => 0.6, vLineWidth: () => 0, hLineColor: () => rule, paddingLeft: () => 0, paddingRight: () => 0, paddingBottom: () => 3 },
  }
}

export function pageFooter(left: string, right: string) {
  return {
    margin: [40, 14, 40, 0],
    columns: [
      { text: left, fontSize: 7.5, color: muted },
      { text: 'The code edition, the quality manual and the inspector decide.', fontSize: 7, color: muted, alignment: 'center', width: 'auto' },
      { text: right, fontSize: 7.5, color: muted, alignment: 'right' },
    ],
    columnGap: 10,
  }
}

export function documentBase(title: string, shopName: string) {
  return {
    pageSize: 'LETTER',
    pageMargins: [40, 52, 40, 46],
    info: { title, author: shopName, creator: 'Rootface', producer: 'Rootface' },
    defaultStyle: { font: 'SourceSans', fontSize: 9, lineHeight: 1.12, color: ink },
    styles,
  }
}
