import ExcelJS from 'exceljs'
import { expect, test } from '@playwright/test'
import { signIn } from './support/sign-in'

/** A shop's roster as its own spreadsheet: 500 invented welders, under its own header words ("Welder no." for the stamp). */
function roster(bad: boolean) {
  return Array.from({ length: 500 }, (_, i) => {
    const n = String(i + 1).padStart(3, '0')
    let row = [`XL-${n}`, `Spreadsheet Welder ${n}`, `B-${7000 + i}`, `xl${n}@example.test`]
    // Two bad lines: line 18 (row 17) has no name, line 402 (row 401) an e-mail that is not one.
    if (bad && i === 16) row = [`XL-${n}`, '', `B-${7000 + i}`, `xl${n}@example.test`]
    if (bad && i === 400) row = [`XL-${n}`, `Spreadsheet Welder ${n}`, `B-${7000 + i}`, 'xl401 at example']
    return row
  })
}

async function workbook(bad: boolean) {
  const book = new ExcelJS.Workbook()
  const sheet = book.addWorksheet('Welders')
  sheet.addRow(['Welder no.', 'Full name', 'Badge', 'E-mail'])
  for (const r of roster(bad)) sheet.addRow(r)
  return Buffer.from(await book.xlsx.writeBuffer())
}

const xlsx = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet'

test('the quality manager brings in a 500-welder spreadsheet: maps a column, sees two bad lines, fixes them, imports all 500', async ({ page }) => {
  test.setTimeout(120_000)
  await signIn(page, 'supervisor@demo.rootface.test')
  await expect(page).toHaveURL(/\/dashboard$/)
  await page.goto('/welders')
  const before = await page.request.get('/api/welders?pageSize=1').then(r => r.json()) as { total: number }

  await page.goto('/import')
  await page.getByLabel('What the file holds').selectOption('roster')
  await page.getByTestId('import-file').setInputFiles({ name: 'welders.xlsx', mimeType: xlsx, buffer: await workbook(true) })
  // "Welder no." is not a header Rootface guesses: the dry run asks for the stamp column
  const errors = page.getByTestId('row-errors')
  await expect(errors).toContainText('Choose the column that holds stamp')
  await page.getByLabel('Stamp', { exact: true }).selectOption('Welder no.')
  await expect(page.getByLabel('Name', { exact: true })).toHaveValue('Full name')
  await page.getByRole('button', { name: 'Check again (dry run)' }).click()

  // the dry run: 498 to create, the two bad lines named with their line, column, value and problem
  await expect(page.getByTestId('dry-run-summary')).toContainText('500 lines read: 498 will be created, 2 row errors')
  await expect(errors.locator('tbody tr')).toHaveCount(2)
  await expect(errors.locator('tbody tr').nth(0)).toContainText('18')
  await expect(errors.locator('tbody tr').nth(0)).toContainText('Full name')
  await expect(errors.locator('tbody tr').nth(1)).toContainText('402')
  await expect(errors.locator('tbody tr').nth(1)).toContainText('xl401 at example')
  await expect(page.getByTestId('to-create')).toContainText('the first 200 of 498')
  // all or nothing: with errors the import cannot start
  await expect(page.getByRole('button', { name: /^Import \d+ records?$/ })).toBeDisabled()
  await page.screenshot({ path: 'test-results/records-import-dry-run.png', fullPage: false })

  // the file fixed in the spreadsheet and chosen again: the column chosen for the stamp is kept
  await page.getByTestId('import-file').setInputFiles({ name: 'welders-fixed.xlsx', mimeType: xlsx, buffer: await workbook(false) })
  await expect(page.getByTestId('dry-run-summary')).toContainText('500 lines read: 500 will be created.')
  await expect(errors).toHaveCount(0)
  await page.getByRole('button', { name: 'Import 500 records' }).click()
  await expect(page.getByTestId('import-done')).toContainText('500 records imported.')

  // the roster has them, under the stamps and names of the file
  const after = await page.request.get('/api/welders?pageSize=1').then(r => r.json()) as { total: number }
  expect(after.total).toBe(before.total + 500)
  await page.goto('/welders?q=XL-402')
  await expect(page.getByRole('link', { name: 'XL-402', exact: true })).toBeVisible()
  await expect(page.getByText('Spreadsheet Welder 402')).toBeVisible()
})
