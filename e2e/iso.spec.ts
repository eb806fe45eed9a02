import dayjs from 'dayjs'
import { expect, test, type Page } from '@playwright/test'
import { signIn } from './support/sign-in'

// The ISO shop's "done when": an inspector records an ISO 9606-1 test, certifies it, confirms it six months on (9.2) and
// reads its expiry by the 9.3 route chosen; the quality manager drafts an ISO 15609-1 WPS that the ISO 15614-1 WPQR
// supports. Expected dates are computed with dayjs from the dates typed (ISO 9606-1, 9.2: six months; 9.3 b): two years).
test.setTimeout(180_000)

async function shoot(page: Page, name: string) {
  for (const width of [1280, 375]) {
    await page.setViewportSize({ width, height: 900 })
    await page.screenshot({ path: `test-results/iso-${name}-${width}.png`, fullPage: true })
  }
  await page.setViewportSize({ width: 1280, height: 900 })
}

test('an inspector records an ISO 9606-1 test, certifies it, confirms it six months on and sees its expiry by route b', async ({ page }) => {
  const tested = dayjs().subtract(7, 'month')
  const confirmed = tested.add(5, 'month')
  await signIn(page, 'inspector@demo.rootface.test')
  await expect(page).toHaveURL(/\/dashboard$/)
  await page.goto('/tests/new')
  await page.getByRole('combobox', { name: 'Welder' }).fill('KB-07')
  await page.getByRole('option', { name: /KB-07/ }).first().click()
  await page.getByLabel('Test date').fill(tested.format('YYYY-MM-DD'))
  await page.getByLabel('Code').selectOption('iso-9606-1')
  await page.getByLabel('Edition').selectOption('2017')
  // Only ISO 4063 numbers are offered for an ISO 9606-1 test.
  await expect(page.getByRole('combobox', { name: 'Process 1' }).locator('option')).toContainText(['111', '135', '141'])
  await page.getByRole('combobox', { name: 'Process 1' }).selectOption('135')
  await page.getByLabel('Transfer (GMAW, FCAW)').selectOption('short-circuit')
  await page.getByLabel('Filler group (5.5)').selectOption('1')
  await page.getByLabel('Filler type (5.6)').selectOption('S')
  await page.getByLabel('Weld details (5.9)').selectOption('ss nb')
  await page.getByRole('group', { name: 'Test position(s) (ISO 6947)' }).getByRole('checkbox', { name: 'PF' }).check()
  await page.getByLabel('Examiner', { exact: true }).fill('R. Examiner')
  await page.getByLabel('Examining body').fill('Nordkreis Weld Examinations')
  await page.getByRole('checkbox', { name: /^VT / }).check()
  await page.getByRole('checkbox', { name: /^BT / }).check()
  await page.getByLabel('Revalidation (9.3)').selectOption('b')
  await page.getByLabel('Coupon thickness (mm)').fill('10')
  await expect(page.getByText('ISO 9606-1 135 P BW FM1 S t10 PF ss nb')).toBeVisible()
  await page.getByRole('radio', { name: 'Accepted' }).first().check()
  for (const [i, type] of ['face', 'root'].entries()) {
    await page.getByRole('button', { name: 'Add bend specimen' }).click()
    await page.getByLabel(`Specimen ${i + 1} type`).selectOption(type)
    await page.getByLabel(`Specimen ${i + 1} largest open discontinuity`).fill('0')
  }
  await shoot(page, 'test-form')
  await page.getByRole('button', { name: 'Save test' }).click()
  await expect(page).toHaveURL(/\/tests\/\d+$/)

  await page.getByRole('button', { name: /^Certify result/ }).click()
  await page.getByRole('button', { name: 'Sign', exact: true }).click()
  const validity = page.getByTestId('iso-validity')
  await expect(validity).toContainText('9.3 b)')
  await expect(validity).toContainText('Valid until (9.3)')
  await expect(page.getByTestId('iso-designation-shown')).toContainText('135 P BW FM1 S t10 PF ss nb')

  // 9.2: the confirmation five months after the test; the next is due six months after it, the end of 9.3 b) two years on.
  const form = page.getByTestId('iso-confirm-form')
  await form.getByLabel('Date').fill(confirmed.format('YYYY-MM-DD'))
  await form.getByRole('button', { name: 'Sign this record' }).click()
  await page.getByRole('button', { name: 'Sign', exact: true }).click()
  await expect(validity.getByRole('table')).toContainText(confirmed.format('YYYY-MM-DD'))
  await expect(validity).toContainText(`before ${confirmed.add(6, 'month').format('YYYY-MM-DD')}`)
  await expect(validity).toContainText(tested.add(2, 'year').format('YYYY-MM-DD'))
  await expect(page.getByText('it does not qualify').first()).toBeVisible()
  await shoot(page, 'certificate')
})

test('the quality manager drafts an ISO 15609-1 WPS that the ISO 15614-1 WPQR supports, offered only the procedure codes', async ({ page }) => {
  await signIn(page, 'supervisor@demo.rootface.test')
  await expect(page).toHaveURL(/\/dashboard$/)
  await page.goto('/procedures/new')
  // A WPS names ISO 15614-1, never ISO 9606-1 (the welder standard).
  const codes = page.getByLabel('Code', { exact: true }).locator('option')
  await expect(codes).toContainText(['ISO 15614-1 (WPQR) / ISO 15609-1 (WPS)'])
  await expect(codes).not.toContainText(['ISO 9606-1'])
  await page.getByRole('combobox', { name: 'Add a supporting PQR' }).fill('WPQR-ISO-07')
  await page.getByRole('option', { name: /^WPQR-ISO-07 / }).click()
  await page.getByLabel('WPS number').fill('KB-ISO-135-02')
  await page.getByLabel('Title').fill('MAG 135 plate butt welds, PA and PF')
  await page.getByRole('button', { name: 'Fill from WPQR-ISO-07' }).click()
  await expect(page.getByLabel('Code', { exact: true })).toHaveValue('iso-15614-1')
  await expect(page.getByLabel('Edition')).toHaveValue('2017')
  // What the WPQR qualifies fills the thickness: t = 15 mm → 7.5 to 30 mm (ISO 15614-1:2017 Table 6, from memory).
  await expect(page.getByLabel('Groove welds, base metal, from')).toHaveValue('7.5')
  await page.getByRole('group', { name: 'Positions (ISO 6947)' }).getByRole('checkbox', { name: 'PF' }).check()
  await page.getByLabel('Joint type').fill('butt')
  await expect(page.getByTestId('support-verdict')).toHaveText(/Within support/)
  await shoot(page, 'wps-form')
  await page.getByRole('button', { name: 'Save draft' }).click()
  await expect(page).toHaveURL(/\/procedures\/\d+$/)
  await expect(page.getByText('ISO 15609-1 (WPS), qualified to ISO 15614-1').first()).toBeVisible()
  await expect(page.getByText('Within support').first()).toBeVisible()
  await shoot(page, 'wps')
})
