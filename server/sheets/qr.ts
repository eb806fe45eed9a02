import QRCode from 'qrcode'

/** A QR code as vector rectangles (one per run of dark modules in a row): sharp at any zoom, no image decoding. */
export function qrCanvas(text: string, size: number) {
  const qr = QRCode.create(text, { errorCorrectionLevel: 'M' })
  const n = qr.modules.size
  const quiet = 2
  const cell = size / (n + 2 * quiet)
  const rects: Record<string, unknown>[] = [{ type: 'rect', x: 0, y: 0, w: size, h: size, color: '#ffffff' }]
  for (let row = 0; row < n; row++) {
    let start = -1
    for (let col = 0; col <= n; col++) {
      const dark = col < n && qr.modules.get(row, col)
      if (dark && start < 0) start = col
      if (!dark && start >= 0) {
        rects.push({ type: 'rect', x: (quiet + start) * cell, y: (quiet + row) * cell, w: (col - start) * cell + 0.01, h: cell + 0.01, color: '#000000' })
        start = -1
      }
    }
  }
  return { canvas: rects, width: size, height: size }
}
