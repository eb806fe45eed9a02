import { queueMail, shopNameOf } from '../database/mail'
import { signoffRequestMail } from '../utils/mail-messages'

/** A sign-off request goes by e-mail to each account asked (once per request and account), through the outbox. */
export default defineNitroPlugin((nitroApp) => {
  nitroApp.hooks.hook('rootface:signoff-requested', async (notice) => {
    const db = await useDb()
    const shopName = await shopNameOf(db)
    const link = `${appUrl()}/dashboard`
    for (const recipient of notice.recipients) {
      await queueMail(db, signoffRequestMail({ notice, recipient, link, shopName }))
    }
    sendSoon(db)
  })
})
