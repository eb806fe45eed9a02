import { expect, test, type Browser, type Page } from '@playwright/test'
import { signIn } from './support/sign-in'

// The joint tag on a phone: a welder opens it from its QR code and sees the WPS (its windows and pass table) and whether
// they may weld the joint today; the inspector records the visual result there. Joints are found through the API as the
// quality manager, so the test depends on no database id; the answers on the page are compared with the server's own.

const phone = { width: 375, height: 740 }

async function phonePage(browser: Browser, email: string): Promise<Page> {
  const context = await browser.newContext({ viewport: phone, hasTouch: true, isMobile: true })
  const page = await context.newPage()
  await signIn(page, email)
  await expect(page).not.toHaveURL(/sign-in/)
  return page
}

async function jointId(page: Page, query: string) {
  const res = await page.request.get(`/api/projects/1/joints?${query}`)
  expect(res.ok()).toBe(true)
  const list = await res.json() as { items: { id: number, mark: string }[] }
  expect(list.items.length, `a joint for ${query}`).toBeGreaterThan(0)
  return list.items[0]!
}

/** Nothing wider than the phone: no sideways scrolling of the page itself. */
async function fitsThePhone(page: Page) {
  const width = await page.evaluate(() => document.documentElement.scrollWidth)
  expect(width).toBeLessThanOrEqual(phone.width)
}

test('a welder opens a joint tag on a phone: the WPS with its windows and passes, and whether they may weld it today', async ({ page, browser }) => {
  await signIn(page, 'supervisor@demo.rootface.test')
  await expect(page).toHaveURL(/\/dashboard$/)
  const joint = await jointId(page, 'status=open&q=V204-C4') // an open joint of KB-2611, whose crew holds the demo welder

  const welder = await phonePage(browser, 'welder@demo.rootface.test')
  await welder.goto(`/tag/${joint.id}`)
  await expect(welder.getByRole('heading', { level: 1 })).toHaveText(joint.mark)
  type Tag = { procedure: { number: string, revision: number }, check: { ok: boolean, refusals: unknown[] } | null }
  const tag = await (await welder.request.get(`/api/tags/${joint.id}`)).json() as Tag
  // The WPS, its windows and its pass table
  const wps = `WPS ${tag.procedure.number} rev. ${tag.procedure.revision}`
  await expect(welder.getByText(wps, { exact: true })).toBeVisible()
  await expect(welder.getByRole('heading', { name: `${wps}: windows and passes` })).toBeVisible()
  await expect(welder.getByRole('table').first()).toBeVisible()
  await expect(welder.getByRole('link', { name: `Open the whole WPS ${tag.procedure.number}` })).toBeVisible()
  // May I weld it today? The page says what the server's check says, never a yes the check did not give
  await expect(welder.getByRole('heading', { name: /May I weld it today\?/ })).toBeVisible()
  expect(tag.check).not.toBeNull()
  if (tag.check!.ok) {
    await expect(welder.getByRole('status')).toContainText('✓ Yes')
    await expect(welder.getByText('The check refuses this joint')).toHaveCount(0)
  }
  else {
    await expect(welder.getByRole('alert')).toContainText('The check refuses this joint')
    await expect(welder.getByText('✓ Yes')).toHaveCount(0)
  }
  await expect(welder.getByText(/the inspector have the final word/).first()).toBeVisible()
  await fitsThePhone(welder)
  // The welder records nothing here
  await expect(welder.getByRole('button', { name: 'Record the result' })).toHaveCount(0)

  // Another project's joint, off the welder's crew, is not found
  const other = await (await page.request.get('/api/projects/2/joints')).json() as { items: { id: number }[] }
  await welder.goto(`/tag/${other.items[0]!.id}`)
  await expect(welder.getByRole('heading', { name: 'Joint not found' })).toBeVisible()
})

test('the inspector records the visual result of a welded joint from its tag on a phone', async ({ page, browser }) => {
  await signIn(page, 'supervisor@demo.rootface.test')
  await expect(page).toHaveURL(/\/dashboard$/)
  const joint = await jointId(page, 'status=welded&sort=mark')

  const inspector = await phonePage(browser, 'inspector@demo.rootface.test')
  await inspector.goto(`/tag/${joint.id}`)
  await expect(inspector.getByRole('heading', { level: 1 })).toHaveText(joint.mark)
  await expect(inspector.getByText(/● Welded on \d{4}-\d{2}-\d{2}/)).toBeVisible()
  await expect(inspector.getByRole('heading', { name: 'Record the visual result' })).toBeVisible()
  const results = inspector.getByTestId('tag-results')
  const before = await results.count() ? await results.getByRole('listitem').count() : 0

  const report = `VT-E2E-${Date.now() % 100000}`
  await inspector.getByLabel('Method').selectOption('VT')
  await inspector.getByLabel('Report number').fill(report)
  await inspector.getByLabel('Examined on').fill(new Date().toISOString().slice(0, 10))
  await inspector.getByRole('button', { name: 'Record the result' }).click()
  await expect(results.getByRole('listitem')).toHaveCount(before + 1)
  await expect(results).toContainText(`✓ Accepted · Visual`)
  await expect(results).toContainText(`report ${report}`)
  await fitsThePhone(inspector)

  // The register keeps it: the joint's own page lists the same result
  const view = await (await page.request.get(`/api/projects/1/joints/${joint.id}`)).json() as { examinations: { reportNumber: string | null, method: string, accepted: boolean }[] }
  expect(view.examinations).toEqual(expect.arrayContaining([expect.objectContaining({ reportNumber: report, method: 'VT', accepted: true })]))
})

test('the weld registers are in the side navigation of the quality manager, the inspector and the auditor', async ({ browser }) => {
  for (const email of ['supervisor@demo.rootface.test', 'inspector@demo.rootface.test', 'auditor@demo.rootface.test']) {
    const context = await browser.newContext({ viewport: { width: 1280, height: 800 } })
    const page = await context.newPage()
    await signIn(page, email)
    await expect(page).not.toHaveURL(/sign-in/)
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Weld registers' }).click()
    await expect(page).toHaveURL(/\/registers$/)
    await expect(page.getByRole('heading', { name: 'Weld registers', level: 1 })).toBeVisible()
    await context.close()
  }
})
