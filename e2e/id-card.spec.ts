import { execFileSync } from 'node:child_process'
import { mkdtempSync, readFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { expect, test } from '@playwright/test'
import jsQR from 'jsqr'
import { signIn } from './support/sign-in'

/** Reads the QR code off page 2 of a PDF as a phone camera would see it: rendered to pixels (poppler), then decoded. */
function scanBackSide(pdf: string): string {
  const dir = mkdtempSync(join(tmpdir(), 'rootface-card-'))
  execFileSync('pdftoppm', ['-f', '2', '-l', '2', '-r', '300', '-singlefile', pdf, join(dir, 'back')])
  // PPM (P6): "P6 width height 255" then RGB bytes
  const ppm = readFileSync(join(dir, 'back.ppm'))
  const header = ppm.subarray(0, 40).toString('latin1').match(/^P6\s+(\d+)\s+(\d+)\s+255\s/)
  if (!header) throw new Error('not a PPM picture')
  const [width, height] = [Number(header[1]), Number(header[2])]
  const rgb = ppm.subarray(header[0].length)
  const rgba = new Uint8ClampedArray(width * height * 4)
  for (let i = 0; i < width * height; i++) {
    rgba[i * 4] = rgb[i * 3]!
    rgba[i * 4 + 1] = rgb[i * 3 + 1]!
    rgba[i * 4 + 2] = rgb[i * 3 + 2]!
    rgba[i * 4 + 3] = 255
  }
  const code = jsQR(rgba, width, height)
  if (!code) throw new Error('no QR code found on the back of the card')
  return code.data
}

test('the quality manager turns a welder\'s card page on, prints the card, and a phone scanning it sees the welder\'s status', async ({ page, browser }) => {
  test.setTimeout(120_000) // the PDF and its 300 dpi picture take a while on a busy machine
  await signIn(page, 'supervisor@demo.rootface.test')
  await expect(page).toHaveURL(/\/dashboard$/)
  await page.goto('/welders')
  await page.getByRole('link', { name: 'KB-01', exact: true }).click()
  const panel = page.getByTestId('id-card-panel')
  await expect(panel.getByTestId('card-page-state')).toContainText('Public page off')
  await panel.getByRole('button', { name: 'Turn the public page on' }).click()
  await expect(panel.getByTestId('card-page-state')).toContainText('Public page on')
  const shown = await panel.getByTestId('card-public-link').textContent()

  const download = page.waitForEvent('download')
  await panel.getByRole('link', { name: 'Download the card (PDF)' }).click()
  const file = join(mkdtempSync(join(tmpdir(), 'rootface-card-')), 'card.pdf')
  await (await download).saveAs(file)
  const scanned = scanBackSide(file)
  expect(scanned).toBe(shown?.trim())

  // A phone, not signed in, opens what it scanned.
  const phone = await browser.newContext({ viewport: { width: 375, height: 740 } })
  const view = await phone.newPage()
  await view.goto(scanned)
  await expect(view.getByTestId('card-stamp')).toHaveText('KB-01')
  await expect(view.getByText('the inspector have the final word')).toBeVisible()

  // The shop turns the page off: the same scan now shows nothing about the welder.
  await panel.getByRole('button', { name: 'Turn the public page off' }).click()
  await expect(panel.getByTestId('card-page-state')).toContainText('Public page off')
  await view.reload()
  await expect(view.getByTestId('card-off')).toBeVisible()
  await expect(view.getByTestId('card-stamp')).toHaveCount(0)
  await phone.close()
})
