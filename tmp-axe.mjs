import { chromium } from '@playwright/test'
import AxeBuilder from '@axe-core/playwright'
const base = 'http://127.0.0.1:3300'
const roles = {
  supervisor: ['/dashboard', '/procedures', '/procedures/1', '/procedures/new', '/pqrs', '/pqrs/1', '/pqrs/new', '/tests', '/tests/1', '/tests/new', '/welders', '/welders/1', '/welders/new', '/continuity', '/continuity/new', '/continuity/import', '/coverage', '/projects', '/projects/1', '/accounts', '/accounts/1', '/accounts/invite', '/catalogue', '/mail', '/audit', '/about'],
  inspector: ['/dashboard', '/tests', '/tests/new', '/continuity', '/procedures'],
  welder: ['/me'],
  auditor: ['/projects', '/projects/1'],
}
const emails = { supervisor: 'supervisor@demo.rootface.test', inspector: 'inspector@demo.rootface.test', welder: 'welder@demo.rootface.test', auditor: 'auditor@demo.rootface.test' }
const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'] })
const summary = {}
for (const [role, paths] of Object.entries(roles)) {
  const ctx = await browser.newContext({ viewport: { width: 1280, height: 900 } })
  const page = await ctx.newPage()
  await page.goto(base + '/sign-in'); await page.waitForLoadState('networkidle')
  await page.getByLabel('E-mail').fill(emails[role]); await page.getByLabel('Password').fill('rootface-demo')
  await page.getByRole('button', { name: 'Sign in' }).click(); await page.waitForURL(u => !u.pathname.startsWith('/sign-in'))
  for (const p of paths) {
    await page.goto(base + p); await page.waitForLoadState('networkidle')
    const r = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze()
    for (const v of r.violations) { const k = `${v.id}`; summary[k] ??= { help: v.help, pages: new Set(), nodes: [] }; summary[k].pages.add(`${role}${p}`); if (summary[k].nodes.length < 4) summary[k].nodes.push(v.nodes[0].target.join(' ') + ' :: ' + v.nodes[0].failureSummary.slice(0, 160)) }
    if (process.env.SHOTS) await page.screenshot({ path: `/tmp/shots/${role}${p.replaceAll('/', '_')}.png`, fullPage: false })
  }
  await ctx.close()
}
for (const [k, v] of Object.entries(summary)) console.log(k, '|', v.help, '|', v.pages.size, 'pages:', [...v.pages].slice(0, 6).join(' '), '\n   ', v.nodes.join('\n    '))
await browser.close()
