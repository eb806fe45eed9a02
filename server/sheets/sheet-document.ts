import { documentBase, PageTracker, sheetSection } from './layout'
import { sheetReference, type SheetModel } from './model'

// One sheet as a pdfmake definition, from data alone: it runs in the request thread and in the render worker alike.
export function sheetDefinition(sheet: SheetModel) {
  const tracker = new PageTracker()
  const definition = {
    ...documentBase(`${sheet.kindTitle} ${sheetReference(sheet)}`, sheet.shopName),
    content: [sheetSection(sheet, 0, tracker, { shopName: sheet.shopName, documentLine: null })],
  }
  return { definition, tracker }
}
