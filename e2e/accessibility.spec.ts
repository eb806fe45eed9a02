import AxeBuilder from '@axe-core/playwright'
import { expect, test, type Page } from '@playwright/test'
import { signIn } from './support/sign-in'

/**
 * WCAG 2.1 AA (axe-core rules tagged wcag2a, wcag2aa, wcag21a, wcag21aa) on every page of every role, at the desk
 * width and, for the welder's and the auditor's pages, at a phone's 375 px. Record pages use the first record the
 * role's own list returns, so the check follows the data rather than fixed ids.
 */
const staffLists = ['procedures', 'pqrs', 'tests', 'welders', 'accounts'] as const
const supervisorPages = [
  '/dashboard', '/procedures', '/procedures/new', '/pqrs', '/pqrs/new', '/tests', '/tests/new', '/welders', '/welders/new',
  '/continuity', '/continuity/new', '/continuity/import', '/coverage', '/projects', '/accounts', '/accounts/invite',
  '/catalogue', '/mail', '/audit', '/about',
]
const inspectorPages = ['/dashboard', '/procedures', '/pqrs', '/tests', '/tests/new', '/welders', '/continuity', '/continuity/new', '/coverage']

async function firstIds(page: Page, lists: readonly string[]): Promise<string[]> {
  const paths: string[] = []
  for (const list of lists) {
    const res = await page.request.get(`/api/${list}`)
    if (!res.ok()) continue
    const body = await res.json() as { items?: { id: number }[] } | { id: number }[]
    const rows = Array.isArray(body) ? body : body.items ?? []
    if (rows[0]) paths.push(`/${list}/${rows[0].id}`)
  }
  return paths
}

async function expectNoViolations(page: Page, path: string) {
  await page.goto(path)
  await page.waitForLoadState('networkidle')
  await expect(page.locator('main')).toBeVisible()
  const result = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze()
  const found = result.violations.map(v => `${path}: ${v.id} (${v.nodes.length}) ${v.nodes[0]?.target.join(' ')}`)
  expect(found).toEqual([])
}

test('supervisor pages have no WCAG 2.1 AA violations', async ({ page }) => {
  test.setTimeout(180_000)
  await signIn(page, 'supervisor@demo.rootface.test')
  await page.waitForURL(url => !url.pathname.startsWith('/sign-in'))
  const records = await firstIds(page, [...staffLists, 'projects'])
  expect(records.length).toBe(staffLists.length + 1)
  for (const path of [...supervisorPages, ...records]) await expectNoViolations(page, path)
})

test('inspector pages have no WCAG 2.1 AA violations', async ({ page }) => {
  test.setTimeout(120_000)
  await signIn(page, 'inspector@demo.rootface.test')
  await page.waitForURL(url => !url.pathname.startsWith('/sign-in'))
  const records = await firstIds(page, ['tests', 'welders'])
  expect(records.length).toBe(2)
  for (const path of [...inspectorPages, ...records]) await expectNoViolations(page, path)
})

for (const width of [1280, 375]) {
  test(`welder and auditor pages have no WCAG 2.1 AA violations at ${width} px`, async ({ browser }) => {
    test.setTimeout(90_000)
    for (const [email, paths, lists] of [
      ['welder@demo.rootface.test', ['/me'], ['tests']],
      ['auditor@demo.rootface.test', ['/projects'], ['projects']],
    ] as const) {
      const context = await browser.newContext({ viewport: { width, height: 800 } })
      const page = await context.newPage()
      await signIn(page, email)
      await page.waitForURL(url => !url.pathname.startsWith('/sign-in'))
      const records = await firstIds(page, lists)
      expect(records.length).toBe(1)
      for (const path of [...paths, ...records]) await expectNoViolations(page, path)
      await context.close()
    }
  })
}

test('the public pages have no WCAG 2.1 AA violations', async ({ page }) => {
  for (const path of ['/sign-in', '/forgot-password', '/verify']) await expectNoViolations(page, path)
})

test('a skip link takes the keyboard straight to the page content', async ({ page }) => {
  await signIn(page, 'supervisor@demo.rootface.test')
  await page.waitForURL(url => !url.pathname.startsWith('/sign-in'))
  await page.goto('/procedures')
  await page.waitForLoadState('networkidle')
  await page.keyboard.press('Tab')
  const skip = page.getByRole('link', { name: 'Skip to content' })
  await expect(skip).toBeFocused()
  await page.keyboard.press('Enter')
  await expect(page.locator('main')).toBeFocused()
})
