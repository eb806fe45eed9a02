import { AsyncLocalStorage } from 'node:async_hooks'
import bcrypt from 'bcryptjs'
import type { H3Event } from 'h3'
import CredentialsProvider from 'next-auth/providers/credentials'
import { NuxtAuthHandler } from '#auth'
import type { Db } from '../../database/client'
import { accountForSignIn, endSessions } from '../../database/accounts'
import { reserveSignIn, signInAbandoned, signInFailed, signInSucceeded } from '../../database/sign-in'
import type { Reservation } from '../../utils/sign-in-throttle'
import { signInSchema } from '#shared/schemas/auth'

// A hash of a password nobody has (cost 10, like real ones): unknown, deactivated and invited accounts are
// compared against it, so they take the same work and time as a real account with a wrong password.
const DUMMY_HASH = bcrypt.hashSync('rootface-no-such-account', 10)

interface Attempt { outcome?: 'ok' | 'failed', accountId?: number }
const attempts = new AsyncLocalStorage<Attempt>()

/** /api/auth/*: next-auth with e-mail and password; the JWT carries role, welder id and the session generation. */
const handler = NuxtAuthHandler({
  secret: authSecret(),
  pages: { signIn: '/sign-in' },
  session: { strategy: 'jwt', maxAge: SESSION_MAX_AGE_SECONDS },
  providers: [
    // @ts-expect-error next-auth's providers are CommonJS: the function sits on .default during SSR
    CredentialsProvider.default({
      name: 'Rootface account',
      credentials: { email: { label: 'E-mail', type: 'email' }, password: { label: 'Password', type: 'password' } },
      async authorize(credentials: Record<string, string> | undefined) {
        const attempt = attempts.getStore()
        const parsed = signInSchema.safeParse(credentials ?? {})
        if (!parsed.success) {
          if (attempt) attempt.outcome = 'failed'
          return null
        }
        const db = await useDb()
        const account = await accountForSignIn(db, parsed.data.email)
        const usable = !!(account?.active && account.passwordHash)
        const matches = await bcrypt.compare(parsed.data.password, usable ? account!.passwordHash! : DUMMY_HASH)
        if (attempt) attempt.accountId = account?.id
        if (!usable || !matches) {
          if (attempt) attempt.outcome = 'failed'
          return null
        }
        if (attempt) attempt.outcome = 'ok'
        return { id: String(account!.id), name: account!.name, email: account!.email, role: account!.role, welderId: account!.welderId, generation: account!.sessionGeneration }
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) {
        token.uid = Number(user.id)
        token.role = user.role
        token.welderId = user.welderId
        token.gen = user.generation
        token.signedInAt = Math.floor(Date.now() / 1000)
        return token
      }
      // Every read of the session checks that it was not ended since: throwing here makes next-auth clear the cookie.
      if (!sessionTokenCurrent(token) || !await loadUser(token.uid!, token.gen ?? 0)) throw new Error('session ended')
      return token
    },
    session({ session, token }) {
      if (token.uid && token.role) {
        session.user = { ...session.user, id: token.uid, role: token.role, welderId: token.welderId ?? null }
      }
      return session
    },
  },
  events: {
    // Signing out ends the account's sessions on every device (a copied cookie stops working too).
    async signOut({ token }) {
      const uid = (token as { uid?: number } | null)?.uid
      if (uid) await endSessions(await useDb(), uid)
    },
  },
})

/**
 * The credentials callback goes through the sign-in throttle (server/utils/sign-in-throttle.ts) first: a locked
 * account or address gets 429 before its password is looked at.
 */
export default defineEventHandler(async (event: H3Event) => {
  if (event.method !== 'POST' || !event.path.startsWith('/api/auth/callback/credentials')) return handler(event)
  const body = await readBody<Record<string, unknown> | undefined>(event).catch(() => undefined)
  const email = typeof body?.email === 'string' ? body.email.slice(0, 254) : ''
  const db = await useDb()
  const reserved = await reserveSignIn(db, signInKeys(email, clientAddress(event)))
  if (!reserved.ok) {
    setResponseHeader(event, 'Retry-After', reserved.retryAfterSeconds)
    throw createError({
      statusCode: 429, statusMessage: 'Too many sign-in attempts',
      message: `Too many failed sign-ins for this account or from this address. Try again in ${Math.ceil(reserved.retryAfterSeconds / 60)} minutes, or reset your password.`,
    })
  }
  if (reserved.delayMs) await new Promise(resolve => setTimeout(resolve, reserved.delayMs))
  const attempt: Attempt = {}
  try {
    return await attempts.run(attempt, () => handler(event))
  }
  finally {
    await settle(db, reserved.reservation, attempt).catch((error: unknown) => console.error('[rootface] sign-in throttle', error))
  }
})

async function settle(db: Db, reservation: Reservation, attempt: Attempt) {
  if (attempt.outcome === 'ok') return signInSucceeded(db, reservation)
  if (attempt.outcome !== 'failed') return signInAbandoned(db, reservation)
  const { accountLocked } = await signInFailed(db, reservation)
  if (accountLocked && attempt.accountId) await mailAccountLocked(db, attempt.accountId)
}
