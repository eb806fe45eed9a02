import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { claimedContentType, detectContentType, displayFileName, formatBytes } from '../../../../shared/attachments/file-rules'

const bytes = (...values: (number | string)[]) => new Uint8Array(values.flatMap(v => (typeof v === 'string' ? [...v].map(c => c.charCodeAt(0)) : [v])))

describe('detectContentType', () => {
  // Signatures: ISO 32000-1:2008 §7.5.2 (PDF header "%PDF-"), PNG (ISO/IEC 15948:2004 §5.2, 8-byte signature),
  // JPEG (ITU-T T.81 Annex B, SOI marker FFD8 followed by a marker FF..), WebP (RIFF container, "WEBP" form type at offset 8; RFC 9649 §2).
  it('recognises each allowed type by its first bytes', () => {
    expect(detectContentType(bytes('%PDF-1.7\n'))).toBe('application/pdf')
    expect(detectContentType(bytes(0x89, 'PNG', 0x0D, 0x0A, 0x1A, 0x0A, 0, 0))).toBe('image/png')
    expect(detectContentType(bytes(0xFF, 0xD8, 0xFF, 0xE1))).toBe('image/jpeg')
    expect(detectContentType(bytes('RIFF', 0x24, 0, 0, 0, 'WEBPVP8 '))).toBe('image/webp')
  })

  it('refuses look-alikes and everything else', () => {
    expect(detectContentType(bytes('RIFF', 0x24, 0, 0, 0, 'WAVEfmt '))).toBeNull() // a RIFF sound file (common practice)
    expect(detectContentType(bytes(' %PDF-1.7'))).toBeNull()
    expect(detectContentType(bytes(0x89, 'PNG'))).toBeNull() // truncated signature
    expect(detectContentType(bytes('GIF89a'))).toBeNull()
    expect(detectContentType(bytes('<svg xmlns="http://www.w3.org/2000/svg"/>'))).toBeNull()
    expect(detectContentType(new Uint8Array())).toBeNull()
  })
})

describe('claimedContentType', () => {
  it('normalises parameters, case and the image/jpg alias (common practice)', () => {
    expect(claimedContentType('Application/PDF; charset=binary')).toBe('application/pdf')
    expect(claimedContentType('image/jpg')).toBe('image/jpeg')
    expect(claimedContentType('')).toBeUndefined()
  })
})

describe('displayFileName', () => {
  it('keeps only the last path segment, whichever separator', () => {
    expect(displayFileName('../../etc/passwd.pdf', 'application/pdf')).toBe('passwd.pdf')
    expect(displayFileName('C:\\Users\\qa\\RT-0412.PDF', 'application/pdf')).toBe('RT-0412.PDF')
  })

  it('drops control, bidirectional-override and reserved characters, and leading dots', () => {
    expect(displayFileName('rep\u0000ort\u202Efdp.png', 'image/png')).toBe('reportfdp.png')
    expect(displayFileName('..hidden.jpg', 'image/jpeg')).toBe('hidden.jpg')
    expect(displayFileName('a"b<c>d|e?.pdf', 'application/pdf')).toBe('abcde.pdf')
  })

  it('ends in an extension of the real type', () => {
    expect(displayFileName('coupon photo', 'image/jpeg')).toBe('coupon photo.jpg')
    expect(displayFileName('sketch.png.exe', 'image/png')).toBe('sketch.png.exe.png')
    expect(displayFileName('', 'application/pdf')).toBe('file.pdf')
    expect(displayFileName(undefined, 'image/webp')).toBe('file.webp')
  })

  it('never yields a path, a hidden name, a control character or more than 120 characters (property)', () => {
    fc.assert(fc.property(fc.string({ maxLength: 400 }), (name) => {
      const shown = displayFileName(name, 'application/pdf')
      // eslint-disable-next-line no-control-regex
      return !/[/\\\u0000-\u001F]/.test(shown) && !shown.startsWith('.') && shown.length <= 120 && shown.endsWith('.pdf')
    }))
  })
})

describe('formatBytes', () => {
  it('uses binary multiples (common practice)', () => {
    expect(formatBytes(512)).toBe('512 B')
    expect(formatBytes(1536)).toBe('1.5 KB')
    expect(formatBytes(20 * 1024 * 1024)).toBe('20.0 MB')
  })
})
