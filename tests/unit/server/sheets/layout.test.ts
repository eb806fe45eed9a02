import QRCode from 'qrcode'
import { describe, expect, it } from 'vitest'
import { PageTracker } from '../../../../server/sheets/layout'
import { qrCanvas } from '../../../../server/sheets/qr'

describe('page numbers of a sheet inside a packet', () => {
  it('counts each sheet\'s own pages from the headers pdfmake draws', () => {
    const tracker = new PageTracker()
    for (const [page, section] of [[1, 0], [2, 1], [3, 1], [4, 1], [5, 2]] as const) tracker.seen(page, section)
    expect(tracker.position(3, 1)).toEqual({ index: 2, count: 3 })
    expect(tracker.position(5, 2)).toEqual({ index: 1, count: 1 })
  })
})

describe('the QR code drawn as rectangles', () => {
  it('covers exactly the dark modules of the code, row by row', () => {
    const text = 'https://rootface.example/verify/ABCDE23456'
    const size = 74
    const { canvas } = qrCanvas(text, size)
    const modules = QRCode.create(text, { errorCorrectionLevel: 'M' }).modules
    const n = modules.size
    const cell = size / (n + 4)
    const dark = new Set<string>()
    for (const r of canvas.slice(1) as { x: number, y: number, w: number }[]) {
      const row = Math.round(r.y / cell) - 2
      const start = Math.round(r.x / cell) - 2
      for (let c = start; c < start + Math.round((r.w - 0.01) / cell); c++) dark.add(`${row},${c}`)
    }
    let expected = 0
    for (let row = 0; row < n; row++) {
      for (let col = 0; col < n; col++) {
        if (modules.get(row, col)) {
          expected++
          expect(dark.has(`${row},${col}`)).toBe(true)
        }
      }
    }
    expect(dark.size).toBe(expected)
  })
})
