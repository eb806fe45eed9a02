// What an upload may be: checked from the file's own bytes, never from its name or the browser's claim.

export const maxAttachmentBytes = 20 * 1024 * 1024

export const attachmentContentTypes = ['application/pdf', 'image/png', 'image/jpeg', 'image/webp'] as const
export type AttachmentContentType = typeof attachmentContentTypes[number]

const extensionsOf: Record<AttachmentContentType, readonly string[]> = {
  'application/pdf': ['pdf'],
  'image/png': ['png'],
  'image/jpeg': ['jpg', 'jpeg'],
  'image/webp': ['webp'],
}

export const contentTypeWords: Record<AttachmentContentType, string> = {
  'application/pdf': 'PDF',
  'image/png': 'PNG image',
  'image/jpeg': 'JPEG image',
  'image/webp': 'WebP image',
}

const startsWith = (bytes: Uint8Array, signature: readonly number[], offset = 0) =>
  bytes.length >= offset + signature.length && signature.every((b, i) => bytes[offset + i] === b)

const ascii = (text: string) => [...text].map(c => c.charCodeAt(0))

/** The type the bytes say they are (their "magic" signature), or null when they are none of the allowed ones. */
export function detectContentType(bytes: Uint8Array): AttachmentContentType | null {
  if (startsWith(bytes, ascii('%PDF-'))) return 'application/pdf'
  if (startsWith(bytes, [0x89, 0x50, 0x4E, 0x47, 0x0D, 0x0A, 0x1A, 0x0A])) return 'image/png'
  if (startsWith(bytes, [0xFF, 0xD8, 0xFF])) return 'image/jpeg'
  if (startsWith(bytes, ascii('RIFF')) && startsWith(bytes, ascii('WEBP'), 8)) return 'image/webp'
  return null
}

export function isImageType(type: string): boolean {
  return type === 'image/png' || type === 'image/jpeg' || type === 'image/webp'
}

/** The browser's claim, normalised ('image/jpg' is a common alias of 'image/jpeg'). */
export function claimedContentType(type: string | undefined): string | undefined {
  const bare = type?.split(';')[0]?.trim().toLowerCase()
  return bare === 'image/jpg' || bare === 'image/pjpeg' ? 'image/jpeg' : bare || undefined
}

// Control characters, bidirectional overrides and characters that mean something to a file system or a header.
// eslint-disable-next-line no-control-regex
const unsafe = /[\u0000-\u001F\u007F\u202A-\u202E\u2066-\u2069"*:<>?|]/g

/**
 * The original file name as display text only: the last path segment, without control, bidi or reserved characters,
 * at most 120 characters, ending in an extension of the type the content really is. Never used as a path.
 */
export function displayFileName(original: string | undefined, type: AttachmentContentType): string {
  const last = (original ?? '').split(/[/\\]/).pop() ?? ''
  let name = last.replace(unsafe, '').replace(/\s+/g, ' ').trim().replace(/^[.\s]+/, '')
  const extensions = extensionsOf[type]
  const dot = name.lastIndexOf('.')
  const extension = dot > 0 ? name.slice(dot + 1).toLowerCase() : ''
  if (!extensions.includes(extension)) name = `${name || 'file'}.${extensions[0]}`
  if (name.length > 120) {
    const tail = name.slice(name.lastIndexOf('.'))
    name = name.slice(0, 120 - tail.length).trimEnd() + tail
  }
  return name
}

export function formatBytes(size: number): string {
  if (size < 1024) return `${size} B`
  if (size < 1024 * 1024) return `${(size / 1024).toFixed(1)} KB`
  return `${(size / 1024 / 1024).toFixed(1)} MB`
}
