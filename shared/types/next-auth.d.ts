import type { DefaultSession } from 'next-auth'
import type { Role } from '../utils/roles'

declare module 'next-auth' {
  interface Session {
    user: DefaultSession['user'] & { id: number, role: Role, welderId: number | null }
  }
  interface User {
    role: Role
    welderId: number | null
  }
}

declare module 'next-auth/jwt' {
  interface JWT {
    uid?: number
    role?: Role
    welderId?: number | null
  }
}
