import { importedDocumentsQuerySchema } from '#shared/schemas/records'
import { listImportedDocuments } from '../../database/imported-documents'

/** GET /api/imported-documents?kind=wps|pqr: the headers of the shop's existing WPSs or PQRs as imported (staff) */
export default defineEventHandler(async (event) => {
  await requireRole(event, staff)
  const { kind } = await validQuery(event, importedDocumentsQuerySchema)
  return listImportedDocuments(await useDb(), kind)
})
