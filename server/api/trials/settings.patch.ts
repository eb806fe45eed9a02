import { trialSettingsSchema } from '#shared/schemas/trials'
import { setTrialSettings } from '../../database/trials'

/** PATCH /api/trials/settings: let welders record trials, or not (supervisor) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { welderRecordsTrials } = await validBody(event, trialSettingsSchema)
  return setTrialSettings(await useDb(), user, welderRecordsTrials)
})
