import bcrypt from 'bcryptjs'
import { eq, sql } from 'drizzle-orm'
import CredentialsProvider from 'next-auth/providers/credentials'
import { NuxtAuthHandler } from '#auth'
import { accounts } from '../../database/schema'
import { signInSchema } from '#shared/schemas/auth'

const config = useRuntimeConfig()

/** /api/auth/*: next-auth with e-mail and password; the JWT carries role and welder id. */
export default NuxtAuthHandler({
  secret: process.env.AUTH_SECRET || config.authSecret,
  pages: { signIn: '/sign-in' },
  session: { strategy: 'jwt', maxAge: 12 * 60 * 60 },
  providers: [
    // @ts-expect-error next-auth's providers are CommonJS: the function sits on .default during SSR
    CredentialsProvider.default({
      name: 'Rootface account',
      credentials: { email: { label: 'E-mail', type: 'email' }, password: { label: 'Password', type: 'password' } },
      async authorize(credentials: Record<string, string> | undefined, request: { headers?: Record<string, string | string[] | undefined> }) {
        const parsed = signInSchema.safeParse(credentials ?? {})
        if (!parsed.success) return null
        const email = parsed.data.email.toLowerCase()
        const forwarded = request?.headers?.['x-forwarded-for']
        const address = (Array.isArray(forwarded) ? forwarded[0] : forwarded)?.split(',')[0]?.trim()
        const keys = [`email:${email}`, ...(address ? [`address:${address}`] : [])]
        const delay = signInDelayMs(keys)
        if (delay) await new Promise(resolve => setTimeout(resolve, delay))

        const db = await useDb()
        const [account] = await db.select().from(accounts).where(eq(sql`lower(${accounts.email})`, email)).limit(1)
        const ok = account?.active && account.passwordHash
          && await bcrypt.compare(parsed.data.password, account.passwordHash)
        if (!ok || !account) {
          recordSignInFailure(keys)
          return null
        }
        clearSignInFailures(keys)
        return { id: String(account.id), name: account.name, email: account.email, role: account.role, welderId: account.welderId }
      },
    }),
  ],
  callbacks: {
    jwt({ token, user }) {
      if (user) {
        token.uid = Number(user.id)
        token.role = user.role
        token.welderId = user.welderId
      }
      return token
    },
    session({ session, token }) {
      if (token.uid && token.role) {
        session.user = { ...session.user, id: token.uid, role: token.role, welderId: token.welderId ?? null }
      }
      return session
    },
  },
})
