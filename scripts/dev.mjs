#!/usr/bin/env node
// npm run dev: the fake SMTP server, then `nuxt dev` with SMTP_URL pointing at it. Ctrl-C stops both.
// With SMTP_URL already set (a real server, or another fake), no fake is started.
import { spawn } from 'node:child_process'
import { startFakeSmtp } from './fake-smtp.mjs'

const env = { ...process.env }
// The demo shop is seeded into an empty database only on request; development asks for it.
env.NUXT_SEED_DEMO ??= 'true'
let smtp
if (!env.SMTP_URL) {
  const port = Number(env.FAKE_SMTP_PORT ?? 2525)
  try {
    smtp = await startFakeSmtp({ port, log: line => console.log(line) })
  }
  catch {
    smtp = await startFakeSmtp({ port: 0, log: line => console.log(line) }) // the usual port is taken
  }
  env.SMTP_URL = smtp.url
  env.NUXT_MAIL_TEST_CLOCK ??= 'true'
  env.NUXT_MAIL_SHOW_LINKS ??= 'true'
  console.log(`[dev] fake SMTP server on ${smtp.url}: mail is kept in memory and listed on /mail (sign in as the quality manager)`)
}

const nuxt = spawn(process.execPath, [new URL('../node_modules/nuxt/bin/nuxt.mjs', import.meta.url).pathname, 'dev', ...process.argv.slice(2)], { stdio: 'inherit', env })

let stopping = false
async function stop(code) {
  if (stopping) return
  stopping = true
  if (nuxt.exitCode === null) nuxt.kill('SIGTERM')
  await smtp?.close()
  process.exit(code)
}
for (const signal of ['SIGINT', 'SIGTERM']) process.on(signal, () => stop(0))
nuxt.on('exit', code => stop(code ?? 0))
