import { signedSheetPdf } from '../sheets/stored'
import { pqrSheetOf, procedureSheet, publicOrigin, welderTestSheet } from '../sheets/sheets'

// The routes that sign a record, and the sheet each one signs.
const signing: { path: RegExp, sheet: typeof welderTestSheet }[] = [
  { path: /^\/api\/tests\/(\d+)\/certify\/?$/, sheet: welderTestSheet },
  { path: /^\/api\/pqrs\/(\d+)\/certify\/?$/, sheet: pqrSheetOf },
  { path: /^\/api\/procedures\/(\d+)\/approve\/?$/, sheet: procedureSheet },
]

/**
 * A signed sheet is rendered once, at signing: after a signing route answered, the sheet is laid out in the render worker
 * and kept in file storage (server/sheets/stored.ts), so the first download is served from storage too. A failure here only
 * means the first download renders it instead.
 */
export default defineNitroPlugin((nitroApp) => {
  nitroApp.hooks.hook('afterResponse', (event) => {
    if (event.method !== 'POST' || getResponseStatus(event) >= 300) return
    const path = event.path.split('?')[0] ?? ''
    const route = signing.find(r => r.path.test(path))
    if (!route) return
    const id = Number(route.path.exec(path)![1])
    const origin = publicOrigin(event)
    void (async () => {
      const sheet = await route.sheet(await useDb(), id, origin)
      if (sheet) await signedSheetPdf(sheet, 'worker')
    })().catch((error: unknown) => console.error(`[rootface] rendering the signed sheet of ${path} failed`, error))
  })
})
