// What a production server must be given before it starts: a strong AUTH_SECRET (the development default, or a short
// one, would let anyone who reads it forge a session) and AUTH_ORIGIN. Registered first among the Nitro plugins
// (nuxt.config.ts), so it speaks before any module fails on the same settings; one line per missing setting.

export function productionConfigProblems(env: Record<string, string | undefined>, secret: string): string[] {
  const problems: string[] = []
  if (!secret || secret === DEVELOPMENT_AUTH_SECRET || secret.length < 32) {
    problems.push('AUTH_SECRET: set a random secret of at least 32 characters (e.g. the output of `openssl rand -base64 48`); the server will not start without it')
  }
  if (!env.AUTH_ORIGIN) {
    problems.push('AUTH_ORIGIN: set the public address of the sign-in routes, e.g. https://rootface.example.com/api/auth; the server will not start without it')
  }
  return problems
}

export default defineNitroPlugin(() => {
  if (import.meta.dev && process.env.NODE_ENV !== 'production') return
  const problems = productionConfigProblems(process.env, authSecret())
  if (!problems.length) return
  for (const problem of problems) console.error(`[rootface] ${problem}`)
  process.exit(1)
})
