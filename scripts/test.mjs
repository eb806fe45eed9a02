#!/usr/bin/env node
// npm test: lint, typecheck, build, unit tests, API tests against the built server, then the browser tests.
import { spawnSync } from 'node:child_process'
import { existsSync } from 'node:fs'

const chromium = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium'
if (!existsSync(chromium)) {
  const root = process.getuid?.() === 0
  if (root && existsSync('/usr/bin/apt-get')) {
    console.log('Chromium is missing: installing Debian\'s package for the browser tests…')
    const update = spawnSync('apt-get', ['update', '-qq'], { stdio: 'inherit' })
    const install = update.status === 0 && spawnSync('apt-get', ['install', '-y', '-qq', 'chromium'], { stdio: 'inherit' })
    if (!install || install.status !== 0) process.exit(1)
  }
  else {
    console.error('The browser tests need Debian\'s Chromium. Install it with:\n\n  sudo apt-get install -y chromium\n')
    process.exit(1)
  }
}

const steps = [
  ['lint', 'npx', ['eslint', '.']],
  ['typecheck', 'npx', ['nuxt', 'typecheck']],
  ['build', 'npx', ['nuxt', 'build']],
  ['unit tests', 'npx', ['vitest', 'run', '--project', 'unit']],
  ['API tests', 'npx', ['vitest', 'run', '--project', 'api']],
  ['browser tests', 'npx', ['playwright', 'test']],
]
const only = process.argv.slice(2)
for (const [name, command, args] of steps) {
  if (only.length && !only.some(o => name.startsWith(o))) continue
  const started = Date.now()
  console.log(`\n▶ ${name}`)
  const result = spawnSync(command, args, { stdio: 'inherit', env: process.env })
  console.log(`${result.status === 0 ? '✓' : '✕'} ${name} (${((Date.now() - started) / 1000).toFixed(1)} s)`)
  if (result.status !== 0) process.exit(result.status ?? 1)
}
