import { idParamSchema } from '#shared/schemas/list'
import { renderPdf } from '../../../sheets/pdf'
import { sendPdf } from '../../../sheets/sheets'
import { trialSheet } from '../../../sheets/trial-sheet'

/** GET /api/trials/:id/sheet: the series as a PDF sheet: header, both plots, the beads (not signed) */
export default defineEventHandler(async (event) => {
  await requireTrialUser(event)
  const { id } = await validParams(event, idParamSchema)
  const sheet = orThrow(await trialSheet(await useDb(), id))
  return sendPdf(event, await renderPdf(sheet.definition), sheet.fileName)
})
