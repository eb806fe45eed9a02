// Helpers for attached files that touch no database: response headers and thumbnails. Queries and access checks are in
// server/database/attachments.ts.

/** Content-Disposition with an ASCII fallback and the exact name in RFC 5987 form. */
export function contentDisposition(kind: 'attachment' | 'inline', fileName: string) {
  const fallback = fileName.normalize('NFKD').replace(/[^\x20-\x7E]/g, '').replace(/["\\]/g, '') || 'file'
  return `${kind}; filename="${fallback}"; filename*=UTF-8''${encodeURIComponent(fileName).replace(/['()*]/g, c => `%${c.charCodeAt(0).toString(16).toUpperCase()}`)}`
}

/** Where the thumbnail of an image attachment is kept, beside the file itself. */
export const thumbnailKey = (storageKey: string) => `${storageKey}.thumbnail`

/**
 * A small WebP of an image for the record view: turned upright from its EXIF orientation, at most 320 px, without
 * the original's metadata. Throws when the bytes cannot be decoded as the image they claim to be.
 */
export async function makeThumbnail(image: Buffer): Promise<Buffer> {
  const { default: sharp } = await import('sharp')
  return sharp(image, { failOn: 'error', limitInputPixels: 120_000_000 })
    .rotate().resize(320, 320, { fit: 'inside', withoutEnlargement: true }).webp({ quality: 72 }).toBuffer()
}
