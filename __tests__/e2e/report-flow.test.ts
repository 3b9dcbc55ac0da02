import crypto from 'node:crypto';
import fs from 'node:fs';
import type { Page } from 'playwright-core';
import { waitForMail } from '@/server/mail/outbox';
import { launchBrowser, screenshot, type TestBrowser } from './support/browser';
import { startTestApp, type TestAppServer } from './support/app-server';
import { account, api, signIn, text } from './support/session';

/**
 * Reports as a workshop hands them over, in headless chromium against the production web export
 * and the demo seed: an inspector on a phone generates both reports of the demo tourer, shares
 * the buyer's report by e-mail; the buyer opens the link from the mail sink without an account,
 * reads the summary and downloads the PDF (its bytes are the stored report's); the inspector
 * withdraws the link and the page then says it is no longer available. At 1440×900 the reports
 * screen, and the public verification page checking the downloaded file (and a changed copy).
 */
let app: TestAppServer;
let browser: TestBrowser;
let wid = '';
let vehicleId = '';
let token = '';
let downloaded: Buffer | null = null;

const PHONE = { width: 390, height: 844 };
const WIDE = { width: 1440, height: 900 };
const BUYER = 'buyer.halloway@example.test';
const READY = 'Ready';
const FAILED = 'Could not be prepared';

/** Waits until the newest version of a kind is ready or failed, and returns its status words. */
async function settled(page: Page, kind: string) {
  const id = `report-status-${kind}`;
  await page.waitForFunction(
    ([testId, done]) =>
      [...document.querySelectorAll(`[data-testid="${testId}"]`)].some((el) =>
        done.includes((el.textContent ?? '').trim()),
      ),
    [id, [READY, FAILED]] as [string, string[]],
    { timeout: 120_000 },
  );
  return text(page.getByTestId('reports-screen').last(), id);
}

beforeAll(async () => {
  app = await startTestApp({ prefix: 'report' });
  browser = await launchBrowser();
  const { email, password } = account('inspector');
  const session = await api(app.url, 'POST', '/api/auth/sign-in', '', { email, password });
  token = session.token as string;
  wid = (session.memberships as { workshopId: string }[])[0].workshopId;
  const list = await api(app.url, 'GET', `/api/workshops/${wid}/vehicles`, token);
  vehicleId = (list.items as { id: string; make: string; model: string }[]).find(
    (v) => v.make === 'Aldermoor' && v.model === 'Fourteen Tourer',
  )!.id;
}, 120_000);

afterAll(async () => {
  await browser?.close();
  await app?.close();
});

describe('reports and sharing', () => {
  it('an inspector on a phone generates both reports, shares the buyer’s by e-mail, the buyer reads and downloads it, the link is withdrawn', async () => {
    const page = await browser.newPage(PHONE);
    await signIn(page, app.url);
    await page.goto(`${app.url}/vehicles/${vehicleId}`);
    await page.getByTestId('vehicle-overview').last().getByTestId('vehicle-reports').click();
    const reports = page.getByTestId('reports-screen').last();
    await reports.getByTestId('reports-empty').waitFor();
    await screenshot(page, 'report-phone-01-none-yet');

    await reports.getByTestId('report-generate-repair-scope').click();
    await reports.getByTestId('report-status-repair-scope').waitFor();
    await screenshot(page, 'report-phone-02-generating');
    expect(await settled(page, 'repair-scope')).toBe(READY);
    await reports.getByTestId('report-generate-condition').click();
    expect(await settled(page, 'condition')).toBe(READY);
    expect(await text(reports, 'report-grade-condition')).toMatch(/grade [1-5] of 5/);
    expect(await text(reports, 'report-shortid-condition')).toMatch(/^SF-[0-9A-Z]{4}-[0-9A-Z]{4}$/);
    expect(await text(reports, 'report-facts-repair-scope')).toMatch(/\d+ pages/);
    await screenshot(page, 'report-phone-03-both-ready');

    const listed = await api(
      app.url,
      'GET',
      `/api/workshops/${wid}/vehicles/${vehicleId}/reports`,
      token,
    );
    const buyerReport = (listed.items as { kind: string; sha256: string; shortId: string }[]).find(
      (r) => r.kind === 'condition',
    )!;
    expect(buyerReport.shortId).toBe(await text(reports, 'report-shortid-condition'));

    await reports.getByTestId('report-share-condition').click();
    const share = page.getByTestId('report-screen').last();
    await share.getByTestId('share-list-empty').waitFor();
    await share.getByTestId('share-email').fill(BUYER);
    await share
      .getByTestId('share-message')
      .fill('The condition report we spoke about, before you view the car.');
    await share.getByTestId('share-submit').click();
    await share.getByTestId('share-link').waitFor();
    const shownLink = await text(share, 'share-link');
    expect(await text(share, 'share-emailed')).toBe(`E-mailed to ${BUYER}.`);
    await share.locator('[data-testid^="share-row-"]').first().waitFor();
    await screenshot(page, 'report-phone-04-shared');

    const mail = await waitForMail(app.mailDir, (m) => m.to.includes(BUYER), 10_000);
    const link = mail.links.find((l) => l.includes('/shared/'));
    expect(link).toBe(shownLink);

    // The buyer: a fresh browser context, no cookies, no account.
    const buyer = await browser.newPage(PHONE);
    expect(await buyer.context().cookies()).toEqual([]);
    await buyer.goto(link!);
    const summary = buyer.getByTestId('public-summary');
    await summary.waitFor();
    expect(await text(summary, 'public-vehicle')).toMatch(/Aldermoor Fourteen Tourer/);
    expect(await text(summary, 'public-report-line')).toContain(buyerReport.shortId);
    expect(await text(summary, 'public-grade')).toMatch(/grade [1-5] of 5/);
    expect(await text(summary, 'public-primary')).toMatch(/\d+ of \d+ \(\d+ %\)/);
    expect(await text(summary, 'public-verify-line')).toContain(buyerReport.shortId);
    expect(await buyer.getByTestId('bottom-bar').count()).toBe(0);
    // The drawing with the report's severities: the demo tourer's left sill is at severity 4.
    await summary.getByTestId('public-body-diagram').waitFor();
    await summary.getByTestId('zone-sill-left').click();
    expect(await text(summary, 'public-diagram-zone')).toMatch(/^Left sill: worst severity 4/);
    await screenshot(buyer, 'report-phone-05-public-summary');
    await summary
      .getByTestId('public-verify-line')
      .evaluate((el) => el.scrollIntoView({ block: 'end', behavior: 'instant' }));
    await screenshot(buyer, 'report-phone-06-public-download');

    const [download] = await Promise.all([
      buyer.waitForEvent('download'),
      summary.getByTestId('public-download').click(),
    ]);
    downloaded = fs.readFileSync((await download.path())!);
    expect(downloaded.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect(crypto.createHash('sha256').update(downloaded).digest('hex')).toBe(buyerReport.sha256);

    // The same link on a wide screen (another reader, another view counted).
    const wideBuyer = await browser.newPage(WIDE);
    await wideBuyer.goto(link!);
    await wideBuyer.getByTestId('public-body-diagram').waitFor();
    await screenshot(wideBuyer, 'report-wide-00-public-summary');
    await wideBuyer.context().close();

    // Back as the inspector: the views and the one download were counted; withdraw the link,
    // with the confirm step.
    await page.reload();
    const again = page.getByTestId('report-screen').last();
    await again.locator('[data-testid^="share-views-"]').first().waitFor();
    expect(await again.locator('[data-testid^="share-views-"]').first().textContent()).toMatch(
      /Opened (once|\d+ times).* · PDF downloaded once$/,
    );
    await again.locator('[data-testid^="share-revoke-"]').first().click();
    await page.getByTestId('confirm-ok').click();
    await page.getByText('Link withdrawn.').waitFor();
    await page.getByTestId('confirm-dialog').waitFor({ state: 'detached' });
    expect(await again.locator('[data-testid^="share-status-"]').first().textContent()).toBe(
      'Withdrawn',
    );
    await again
      .getByTestId('share-list')
      .evaluate((el) => el.scrollIntoView({ block: 'start', behavior: 'instant' }));
    await screenshot(page, 'report-phone-07-withdrawn');

    await buyer.reload();
    await buyer.getByTestId('shared-unavailable').waitFor();
    expect(await text(buyer, 'shared-unavailable')).toBe('This link is no longer available');
    expect(await buyer.getByTestId('public-summary').count()).toBe(0);
    expect(await buyer.locator('body').textContent()).not.toContain('Aldermoor');
    await screenshot(buyer, 'report-phone-08-no-longer-available');
    await buyer.context().close();
    await page.context().close();
  }, 300_000);

  it('at 1440×900: the reports screen, and the verification page checks the downloaded file and a changed copy', async () => {
    expect(downloaded).not.toBeNull();
    const page = await browser.newPage(WIDE);
    await signIn(page, app.url);
    await page.goto(`${app.url}/vehicles/${vehicleId}/reports`);
    const reports = page.getByTestId('reports-screen').last();
    await reports.getByTestId('report-grade-repair-scope').waitFor();
    await reports.getByTestId('report-grade-condition').waitFor();
    await screenshot(page, 'report-wide-01-reports');
    await page.context().close();

    const visitor = await browser.newPage(WIDE);
    await visitor.goto(`${app.url}/verify`);
    const verify = visitor.getByTestId('verify-screen');
    await verify.getByTestId('verify-drop').waitFor();
    await verify.getByTestId('verify-file').setInputFiles({
      name: 'condition-report.pdf',
      mimeType: 'application/pdf',
      buffer: downloaded!,
    });
    await verify.getByTestId('verify-result').waitFor();
    expect(await text(verify, 'verify-outcome')).toBe('Genuine and unchanged');
    expect(await text(verify, 'verify-version')).toBe('Version 1, the newest.');
    await screenshot(visitor, 'report-wide-02-verified');

    // One byte changed in the middle of the file: no longer the issued report.
    const changed = Buffer.from(downloaded!);
    const at = Math.floor(changed.length / 2);
    changed[at] = changed[at] ^ 0x01;
    await verify.getByTestId('verify-file').setInputFiles({
      name: 'condition-report-edited.pdf',
      mimeType: 'application/pdf',
      buffer: changed,
    });
    await visitor.getByText('Checked condition-report-edited.pdf').waitFor();
    expect(await text(verify, 'verify-outcome')).toBe(
      'Changed: this file differs from the report that was issued',
    );
    expect(await text(verify, 'verify-message')).toMatch(/changed since it was generated/);
    await screenshot(visitor, 'report-wide-03-changed');
    await visitor.context().close();
  }, 180_000);
});
