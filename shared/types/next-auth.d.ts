import type { DefaultSession } from 'next-auth'
import type { Role } from '../utils/roles'

declare module 'next-auth' {
  interface Session {
    user: DefaultSession['user'] & { id: number, role: Role, welderId: number | null }
  }
  interface User {
    role: Role
    welderId: number | null
    /** The account's session generation when it signed in (server/utils/auth.ts). */
    generation: number
  }
}

declare module 'next-auth/jwt' {
  interface JWT {
    uid?: number
    role?: Role
    welderId?: number | null
    /** Session generation of the account at sign-in; a higher one in the account row ends this session. */
    gen?: number
    /** Seconds since 1970 at sign-in: a session ends SESSION_MAX_AGE after it, however active. */
    signedInAt?: number
  }
}
