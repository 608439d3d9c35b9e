import type { Page } from 'playwright-core';
import { expectVisible } from './expect-page';

/** Runs the fit check on the open fit page and answers the new report's id. */
export async function runFitCheck(page: Page): Promise<string> {
  const ran = page.waitForResponse((r) => /\/api\/projects\/[^/]+\/fit-reports$/.test(r.url()) && r.request().method() === 'POST');
  await page.getByRole('button', { name: 'Run fit check' }).click();
  const response = await ran;
  expect(response.status()).toBe(201);
  return ((await response.json()) as { id: string }).id;
}

/**
 * Waits until the report on screen is the one with this id. The fit page opens on the newest stored report, which may
 * be an older run (another journey's, with other parts), and keeps showing it until the run's answer is in; the
 * history, which loads with a query of its own, tags the row of the report on screen "Showing".
 */
export async function expectReportShown(page: Page, reportId: string): Promise<void> {
  await expectVisible(page.getByTestId('report-history').locator(`tr[data-row-key="${reportId}"]`).getByText('Showing', { exact: true }));
}
