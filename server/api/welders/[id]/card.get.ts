import { idParamSchema } from '#shared/schemas/list'
import { sheetQuerySchema } from '#shared/schemas/sheet'
import { cardOf } from '../../../database/welder-cards'
import { readStoredFile } from '../../../utils/storage'
import { renderPdf } from '../../../sheets/pdf'
import { publicOrigin, sendPdf } from '../../../sheets/sheets'
import { cardDefinition } from '../../../sheets/welder-card'

/**
 * GET /api/welders/:id/card: the welder's ID card, a two-sided credit-card PDF (?format=json: what it prints and whether
 * its public page is on). Staff any welder's; a welder their own (404 for another's).
 */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'welder'])
  const { id } = await validParams(event, idParamSchema)
  const { format } = await validQuery(event, sheetQuerySchema)
  const card = orThrow(await cardOf(await useDb(), user, id, todayIso()))
  const publicUrl = card.link.token ? `${publicOrigin(event)}/card/${card.link.token}` : null
  if (format === 'json') return { ...card, photo: !!card.photo, publicUrl }
  const bytes = card.photo && /^image\/(jpeg|png)$/.test(card.photo.contentType) ? await readStoredFile(card.photo.storageKey) : null
  const photo = bytes ? `data:${card.photo!.contentType};base64,${bytes.toString('base64')}` : null
  const pdf = await renderPdf(cardDefinition({ shopName: card.shopName, welder: card.welder, today: card.today, lines: card.lines, photo, publicUrl }))
  return sendPdf(event, pdf, `ID-card-${card.welder.stamp}.pdf`)
})
