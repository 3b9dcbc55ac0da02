import sharp from 'sharp';
import type { Page } from 'playwright-core';
import { launchBrowser, screenshot, type TestBrowser } from './support/browser';
import { startTestApp, type TestAppServer } from './support/app-server';
import { signIn } from './support/session';

/**
 * The survey slice as a person does it, in headless chromium against the production web export
 * served by Express with the demo seed: phone first, then a wide screen, then a client.
 */
let app: TestAppServer;
let browser: TestBrowser;

async function openVehicle(page: Page, text: string) {
  await page.locator('[data-testid^="vehicle-row-"]').first().waitFor();
  await page.locator('[data-testid^="vehicle-row-"]', { hasText: text }).first().click();
  await page.getByTestId('vehicle-overview').waitFor();
  await page.getByTestId('body-diagram').waitFor();
}

/** A phone photo: JPEG with GPS in its EXIF, as a camera would write it. */
async function phonePhoto(): Promise<Buffer> {
  return sharp({ create: { width: 1600, height: 1200, channels: 3, background: '#8a6a44' } })
    .jpeg()
    .withExif({ IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '51/1 30/1 0/1' } })
    .toBuffer();
}

beforeAll(async () => {
  app = await startTestApp({ prefix: 'flow' });
  browser = await launchBrowser();
}, 120_000);

afterAll(async () => {
  await browser?.close();
  await app?.close();
});

describe('inspector on a phone (390×844)', () => {
  it('logs a finding with frass, severity 3 and a photo on a roof rail and sees it on the diagram and in the history', async () => {
    const page = await browser.newPage({ width: 390, height: 844 });
    await signIn(page, app.url, 'inspector');
    await screenshot(page, 'phone-01-vehicles');
    expect(await page.getByTestId('bottom-bar').isVisible()).toBe(true);

    await openVehicle(page, 'Heathland');
    // The header's buttons wrap on a phone: none of them runs past the screen's edge.
    for (const id of [
      'vehicle-record-treatment',
      'vehicle-reports',
      'vehicle-timeline',
      'vehicle-edit',
    ]) {
      const box = (await page.getByTestId(id).boundingBox())!;
      expect(box.x + box.width).toBeLessThanOrEqual(390);
    }
    await page.getByTestId('view-left').click();
    const zone = page.getByTestId('zone-roof-rail-left');
    await zone.waitFor();
    // The demo estate has nothing logged on this rail yet.
    expect(await zone.getAttribute('aria-label')).toMatch(/nothing logged|no findings/i);
    await screenshot(page, 'phone-02-left-view');

    await zone.click({ force: true });
    await page.getByTestId('zone-sheet').waitFor();
    expect(await page.getByTestId('zone-sheet-title').textContent()).toMatch(/roof rail/i);
    await screenshot(page, 'phone-03-zone-sheet');

    await page.getByTestId('zone-log-finding').click();
    await page.getByTestId('finding-new-screen').waitFor();
    await page.getByTestId('severity-3').click();
    await page.getByTestId('evidence-frass-powder').click();
    const [chooser] = await Promise.all([
      page.waitForEvent('filechooser'),
      page.getByTestId('photo-add').click(),
    ]);
    await chooser.setFiles({
      name: 'roof-rail.jpg',
      mimeType: 'image/jpeg',
      buffer: await phonePhoto(),
    });
    await page.getByTestId('photo-queued-0').waitFor();
    await screenshot(page, 'phone-04-finding-form');

    await page.getByTestId('finding-save').click();
    await page.getByTestId('vehicle-overview').waitFor({ timeout: 20_000 });
    await page.getByTestId('view-left').click();
    const marked = page.getByTestId('zone-roof-rail-left');
    await page.waitForFunction(
      () =>
        /severity 3, 1 finding/.test(
          document
            .querySelector('[data-testid="zone-roof-rail-left"]')
            ?.getAttribute('aria-label') ?? '',
        ),
      undefined,
      { timeout: 15_000 },
    );
    // The non-colour cue: the severity number is drawn inside the zone.
    expect(await marked.textContent()).toContain('3');
    await screenshot(page, 'phone-05-zone-marked-3');

    await marked.click({ force: true });
    await page.getByTestId('zone-history').click();
    await page.getByTestId('zone-history-screen').waitFor();
    const historyScreen = page.getByTestId('zone-history-screen');
    const thumb = historyScreen.locator('[data-testid^="photo-thumb-"]').first();
    await thumb.waitFor({ timeout: 20_000 });
    await page.waitForFunction(
      () =>
        Array.from(
          document.querySelectorAll(
            '[data-testid="zone-history-screen"] [data-testid^="photo-thumb-"] img',
          ),
        ).some(
          (img) => (img as HTMLImageElement).complete && (img as HTMLImageElement).naturalWidth > 0,
        ),
      undefined,
      { timeout: 20_000 },
    );
    const history = await historyScreen.textContent();
    expect(history).toMatch(/frass/i);
    await screenshot(page, 'phone-06-zone-history');

    // The stored renditions were re-encoded: the GPS the phone wrote is gone.
    const thumbUrl = await page.evaluate(async () => {
      const img = document.querySelector(
        '[data-testid="zone-history-screen"] [data-testid^="photo-thumb-"] img',
      ) as HTMLImageElement | null;
      return img?.src ?? '';
    });
    expect(thumbUrl).toMatch(/\/api\/workshops\/.+\/photos\/.+\/thumb/);
    const res = await page.request.get(thumbUrl);
    expect(res.status()).toBe(200);
    const meta = await sharp(await res.body()).metadata();
    expect(meta.exif).toBeUndefined();
    expect(Math.max(meta.width ?? 0, meta.height ?? 0)).toBeLessThanOrEqual(320);
    await page.context().close();
  }, 120_000);
});

describe('inspector on a wide screen (1440×900)', () => {
  it('shows the side navigation, and the diagram and zone sheet side by side', async () => {
    const page = await browser.newPage({ width: 1440, height: 900 });
    await signIn(page, app.url, 'inspector');
    expect(await page.getByTestId('side-nav').isVisible()).toBe(true);
    expect(await page.getByTestId('bottom-bar').count()).toBe(0);
    await screenshot(page, 'wide-01-vehicles');

    await openVehicle(page, 'Silverline');
    await page.getByTestId('view-left').click();
    await page.getByTestId('zone-roof-rail-left').click({ force: true });
    await page.getByTestId('zone-sheet').waitFor();
    const diagram = await page.getByTestId('body-diagram').boundingBox();
    const sheet = await page.getByTestId('zone-sheet').boundingBox();
    expect(diagram && sheet).toBeTruthy();
    // Side by side: the sheet starts right of the diagram and the two overlap vertically.
    expect(sheet!.x).toBeGreaterThanOrEqual(diagram!.x + diagram!.width - 1);
    expect(sheet!.y).toBeLessThan(diagram!.y + diagram!.height);
    await screenshot(page, 'wide-02-diagram-and-sheet');
    await page.context().close();
  }, 120_000);
});

describe('client (read only)', () => {
  it('sees the shared vehicle with no edit controls, and a direct API write is refused with 403', async () => {
    const page = await browser.newPage({ width: 390, height: 844 });
    await signIn(page, app.url, 'client');
    const rows = page.locator('[data-testid^="vehicle-row-"]');
    await rows.first().waitFor();
    expect(await rows.count()).toBe(1);
    await screenshot(page, 'client-01-vehicles');

    await rows.first().click();
    await page.getByTestId('vehicle-overview').waitFor();
    await page.getByTestId('body-diagram').waitFor();
    await page.getByTestId('zone-sill-left').click({ force: true });
    await page.getByTestId('zone-sheet').waitFor();
    expect(await page.getByTestId('zone-log-finding').count()).toBe(0);
    expect(await page.getByTestId('vehicle-edit').count()).toBe(0);
    expect(await page.getByText('Start a survey').count()).toBe(0);
    await screenshot(page, 'client-02-zone-sheet-read-only');

    const vehicleId = page.url().split('/vehicles/')[1].split(/[/?#]/)[0];
    const status = await page.evaluate(async (vid) => {
      const session = await (await fetch('/api/auth/session')).json();
      const csrf = session.csrfToken as string;
      const wid = session.memberships[0].workshopId as string;
      const res = await fetch(`/api/workshops/${wid}/vehicles/${vid}/surveys`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json', 'x-csrf-token': csrf },
        body: JSON.stringify({ date: '2026-12-01', purpose: 'progress' }),
      });
      return res.status;
    }, vehicleId);
    expect(status).toBe(403);
    const [[{ n }]] = (await app.sequelize.query(
      'SELECT COUNT(*) AS n FROM surveys WHERE vehicle_id = ? AND purpose = ?',
      { replacements: [vehicleId, 'progress'] },
    )) as unknown as [[{ n: number }]];
    expect(Number(n)).toBe(0);
    await page.context().close();
  }, 120_000);
});
