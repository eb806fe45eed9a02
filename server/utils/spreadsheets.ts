import ExcelJS from 'exceljs'
import Papa from 'papaparse'

// Tables in and out as CSV or XLSX (exceljs). A cell that holds an object or a list goes out as its JSON text.

export type SheetFormat = 'csv' | 'xlsx'

const cellText = (v: unknown) => (v === null || v === undefined ? '' : typeof v === 'object' ? JSON.stringify(v) : String(v))

export function toCsv(columns: string[], rows: Record<string, unknown>[]): string {
  return Papa.unparse({ fields: columns, data: rows.map(r => columns.map(c => cellText(r[c]))) }, { delimiter: ',', newline: '\r\n' })
}

export async function toXlsx(sheetName: string, columns: string[], rows: Record<string, unknown>[]): Promise<Buffer> {
  const book = new ExcelJS.Workbook()
  book.creator = 'Rootface'
  const sheet = book.addWorksheet(sheetName.slice(0, 31))
  sheet.addRow(columns)
  sheet.getRow(1).font = { bold: true }
  for (const r of rows) {
    sheet.addRow(columns.map((c) => {
      const v = r[c]
      return typeof v === 'number' || typeof v === 'boolean' ? v : cellText(v)
    }))
  }
  return Buffer.from(await book.xlsx.writeBuffer())
}

export interface ReadSheet { headers: string[], rows: { line: number, cells: Record<string, string> }[] }

/** The text of an XLSX cell as a person typed it: dates as yyyy-mm-dd, formulas as their result. */
function xlsxCellText(value: ExcelJS.CellValue): string {
  if (value === null || value === undefined) return ''
  if (value instanceof Date) return value.toISOString().slice(0, 10)
  if (typeof value === 'object') {
    if ('result' in value) return xlsxCellText(value.result as ExcelJS.CellValue)
    if ('richText' in value) return value.richText.map(t => t.text).join('')
    if ('text' in value) return String(value.text)
    return ''
  }
  return String(value)
}

/** The first sheet of a CSV text or an XLSX file: its header line and every following non-empty line, with line numbers. */
export async function readSheet(content: string, format: SheetFormat): Promise<ReadSheet> {
  if (format === 'csv') {
    const parsed = Papa.parse<string[]>(content.replace(/^\uFEFF/, ''), { delimiter: ',', skipEmptyLines: false })
    const [head = [], ...body] = parsed.data
    const headers = head.map(h => h.trim())
    const rows: ReadSheet['rows'] = []
    body.forEach((cells, i) => {
      if (cells.every(c => c.trim() === '')) return
      rows.push({ line: i + 2, cells: Object.fromEntries(headers.map((h, j) => [h, (cells[j] ?? '').trim()])) })
    })
    return { headers: headers.filter(Boolean), rows }
  }
  const book = new ExcelJS.Workbook()
  await book.xlsx.load(Buffer.from(content, 'base64') as unknown as ArrayBuffer)
  const sheet = book.worksheets[0]
  if (!sheet) return { headers: [], rows: [] }
  const headers: string[] = []
  sheet.getRow(1).eachCell({ includeEmpty: true }, (cell, col) => {
    headers[col - 1] = xlsxCellText(cell.value).trim()
  })
  const rows: ReadSheet['rows'] = []
  sheet.eachRow({ includeEmpty: false }, (row, line) => {
    if (line === 1) return
    const cells: Record<string, string> = {}
    headers.forEach((h, j) => {
      if (h) cells[h] = xlsxCellText(row.getCell(j + 1).value).trim()
    })
    if (Object.values(cells).some(v => v !== '')) rows.push({ line, cells })
  })
  return { headers: headers.filter(Boolean), rows }
}
