import { format } from 'date-fns';
import type { Page } from 'playwright-core';
import { launchBrowser, screenshot, type TestBrowser } from './support/browser';
import { startTestApp, type TestAppServer } from './support/app-server';
import { account, api, centre, signIn, text } from './support/session';

/**
 * Treatment and re-check monitoring as a workshop lives it, in headless chromium against the
 * production web export and the demo seed: an applicator on a phone records a treatment on two
 * zones picked on the drawing (the label confirmation is required), the zones turn to "treated,
 * watching" and the Due screen lists the scheduled re-checks; an inspector records clean
 * re-checks until the zone is cleared; fresh frass at the next re-check reopens it, flagged.
 * To keep this fast the owner first lowers the clearance rule to two clean checks over 0 days.
 */
let app: TestAppServer;
let browser: TestBrowser;
let vehicleId = '';

const PHONE = { width: 390, height: 844 };
const ZONES = ['sill-left', 'lock-pillar-left'];
// The seed's own treatment (right tonneau rail) has re-checks too: this test's rows name the sill.
const OWN_ROW = { hasText: /sill/i };
let seededTreatments = 0;

/** The vehicle overview opened straight on a zone, so its sheet shows the state and reason. */
async function openZone(page: Page, zone: string) {
  await page.goto(`${app.url}/vehicles/${vehicleId}?zone=${zone}&view=left`);
  const screen = page.getByTestId('vehicle-overview').last();
  await screen.getByTestId('zone-sheet').waitFor();
  return screen;
}

beforeAll(async () => {
  app = await startTestApp({ prefix: 'treat' });
  browser = await launchBrowser();
  const owner = await api(app.url, 'POST', '/api/auth/sign-in', '', {
    email: account('owner').email,
    password: account('owner').password,
  });
  const token = owner.token as string;
  const wid = (owner.memberships as { workshopId: string }[])[0].workshopId;
  await api(app.url, 'PATCH', `/api/workshops/${wid}`, token, {
    settings: {
      treatments: { clearance: { cleanChecksRequired: 2, minSpanDays: 0 } },
    },
  });
  // The seed writes the October survey's findings at start-up; the form records a treatment to
  // the minute, so date them back a day to keep them before it (as they would be in real use).
  await app.sequelize.query('UPDATE findings SET created_at = created_at - INTERVAL 1 DAY');
  const list = await api(app.url, 'GET', `/api/workshops/${wid}/vehicles`, token);
  vehicleId = (list.items as { id: string; make: string }[]).find(
    (v) => v.make === 'Aldermoor',
  )!.id;
  seededTreatments = (
    (await api(app.url, 'GET', `/api/workshops/${wid}/vehicles/${vehicleId}/treatments`, token))
      .items as unknown[]
  ).length;
}, 120_000);

afterAll(async () => {
  await browser?.close();
  await app?.close();
});

describe('treatment and re-checks on a phone (390×844)', () => {
  it('an applicator records a treatment on two zones picked on the drawing, confirming the label', async () => {
    const page = await browser.newPage(PHONE);
    await signIn(page, app.url, 'applicator');
    // "Due" is the first entry for roles that do re-checks.
    expect(
      await page
        .getByTestId('bottom-bar')
        .locator('[data-testid^="nav-"]')
        .first()
        .getAttribute('data-testid'),
    ).toBe('nav-due');
    await page.goto(`${app.url}/vehicles/${vehicleId}`);
    await page.getByTestId('vehicle-record-treatment').click();
    const form = page.getByTestId('treatment-new-screen');
    await form.waitFor();
    await form.getByTestId('view-left').click();
    for (const zone of ZONES) await form.getByTestId(`zone-${zone}`).click({ force: true });
    expect(await text(form, 'treatment-zone-count')).toBe('2 zones chosen');
    expect(await form.getByTestId(`zone-${ZONES[0]}`).getAttribute('aria-pressed')).toBe('true');
    await centre(form, 'treatment-zones');
    await screenshot(page, 'treatment-phone-01-zones-picked');

    // Recorded now: the form starts at the current date and minute.
    expect(await form.getByTestId('treatment-date').inputValue()).toBe(
      format(new Date(), 'yyyy-MM-dd'),
    );
    await form.getByTestId('treatment-product').fill('Woodguard Borate 10');
    await form.getByTestId('treatment-registration').fill('REG-0042-TEST');
    await form.getByTestId('treatment-ingredient').fill('Disodium octaborate tetrahydrate');
    await form.getByTestId('treatment-concentration').fill('40 % w/w');
    await form.getByTestId('treatment-dilution').fill('1 part to 4 parts water, as the label says');
    await form.getByTestId('treatment-method-brush').click();
    await form.getByTestId('treatment-target-anobiid-beetles').click();
    await form.getByTestId('treatment-amount').fill('1.5');
    await form.getByTestId('treatment-unit').fill('L');
    await form.getByTestId('treatment-reentry').fill('4');
    await form.getByTestId('treatment-ppe-0').click();
    await form.getByTestId('treatment-ppe-1').click();

    // The cautions are shown before saving, and fumigation adds its own.
    expect(await text(form, 'caution-label-is-law')).toMatch(/label/i);
    expect(await text(form, 'caution-foggers')).toMatch(/fogger/i);
    expect(await form.getByTestId('fumigation-caution').count()).toBe(0);
    await form.getByTestId('treatment-method-fumigation').click();
    expect(await text(form, 'fumigation-caution')).toMatch(/licensed fumigator.*clearance/is);
    await form.getByTestId('treatment-method-brush').click();

    // Saving without the label confirmation is refused beside the checkbox.
    await form.getByTestId('treatment-save').click();
    await form.getByTestId('treatment-label-confirm-error').waitFor();
    expect(await text(form, 'treatment-label-confirm-error')).toMatch(/label/i);
    await centre(form, 'treatment-cautions');
    await screenshot(page, 'treatment-phone-02-cautions');
    await centre(form, 'treatment-label-confirm');
    await screenshot(page, 'treatment-phone-03-label-required');

    await form.getByTestId('treatment-label-confirm').click();
    await form.getByTestId('treatment-save').click();
    const saved = page.getByTestId('treatment-screen');
    await saved.waitFor();
    await saved.locator('[data-testid^="recheck-row-"]').first().waitFor();
    expect(await text(saved, 'treatment-details')).toMatch(/REG-0042-TEST/);
    const scheduled = await saved.locator('[data-testid^="recheck-row-"]').count();
    expect(scheduled).toBeGreaterThanOrEqual(2);
    await screenshot(page, 'treatment-phone-04-saved');

    for (const zone of ZONES) {
      const overview = await openZone(page, zone);
      expect(await text(overview, 'zone-sheet-state-label')).toBe('Treated, watching');
      expect(await text(overview, `zone-state-${zone}`)).toBe('WATCH');
    }
    await screenshot(page, 'treatment-phone-05-treated-watching');

    await page.goto(`${app.url}/due`);
    const due = page.getByTestId('due-screen');
    await due.locator('[data-testid^="recheck-row-"]', OWN_ROW).first().waitFor();
    const rows = await due.locator('[data-testid^="recheck-row-"]', OWN_ROW).count();
    expect(rows).toBe(scheduled);
    expect(
      await due.locator('[data-testid^="recheck-row-"]', OWN_ROW).first().textContent(),
    ).toMatch(/Aldermoor/);
    await screenshot(page, 'treatment-phone-06-due');
    await page.context().close();
  }, 180_000);

  it('an inspector records clean re-checks until the zone is cleared; fresh frass reopens it, flagged', async () => {
    const page = await browser.newPage(PHONE);
    await signIn(page, app.url, 'inspector');

    async function openFirstDue() {
      await page.goto(`${app.url}/due`);
      const due = page.getByTestId('due-screen');
      await due.locator('[data-testid^="recheck-row-"]', OWN_ROW).first().waitFor();
      await due.locator('[data-testid^="recheck-row-"]', OWN_ROW).first().click();
      const screen = page.getByTestId('recheck-screen').last();
      await screen.waitFor();
      return screen;
    }

    for (let i = 0; i < 2; i++) {
      const screen = await openFirstDue();
      await screen.getByTestId('recheck-result-clean').click();
      await screen.getByTestId('recheck-frass-cleaned').click();
      await screen.getByTestId('recheck-notes').fill(`Check ${i + 1}: no new frass on the paper.`);
      if (i === 0) await screenshot(page, 'treatment-phone-07-recheck-clean');
      await screen.getByTestId('recheck-save').click();
      await page.getByText('Clean re-check recorded').waitFor();
      const overview = await openZone(page, ZONES[0]);
      // One clean check is not enough; the second meets the (lowered) clearance rule.
      expect(await text(overview, 'zone-sheet-state-label')).toBe(
        i === 0 ? 'Treated, watching' : 'Cleared',
      );
    }
    const cleared = await openZone(page, ZONES[1]);
    expect(await text(cleared, 'zone-sheet-state-label')).toBe('Cleared');
    expect(await text(cleared, `zone-state-${ZONES[1]}`)).toBe('CLEAR');
    await screenshot(page, 'treatment-phone-08-cleared');

    const screen = await openFirstDue();
    await screen.getByTestId('recheck-result-fresh-evidence').click();
    await screen.getByTestId('recheck-save').click();
    await screen.getByTestId('recheck-finding-error').waitFor();
    await screen.getByTestId(`recheck-zone-${ZONES[0]}`).click();
    await screen.getByTestId('severity-2').click();
    await screen.getByTestId('evidence-frass-powder').click();
    await screen
      .getByTestId('recheck-finding-notes')
      .fill('Fresh pale frass under the sill again.');
    await screenshot(page, 'treatment-phone-09-fresh-frass');
    await screen.getByTestId('recheck-save').click();
    await page.getByText('Fresh evidence recorded').waitFor();

    const reopened = await openZone(page, ZONES[0]);
    expect(await text(reopened, 'zone-sheet-state-label')).toBe('Active');
    expect(await text(reopened, 'zone-sheet-flagged')).toMatch(
      /possible treatment failure.*licensed/i,
    );
    expect(await text(reopened, `zone-state-${ZONES[0]}`)).toBe('! ACTIVE');
    await centre(reopened, 'zone-sheet-state');
    await screenshot(page, 'treatment-phone-10-flagged');

    // The timeline puts the treatment and its re-checks among the survey and findings.
    await reopened.getByTestId('vehicle-timeline').click();
    const timeline = page.getByTestId('timeline-screen');
    await timeline.locator('[data-testid^="timeline-treatment-"]').first().waitFor();
    expect(await timeline.locator('[data-testid^="timeline-recheck-"]').count()).toBeGreaterThan(0);
    expect(await timeline.locator('[data-testid^="timeline-survey-"]').count()).toBeGreaterThan(0);
    await screenshot(page, 'treatment-phone-11-timeline');
    await timeline.getByTestId('timeline-filter-survey').click();
    await timeline.getByTestId('timeline-filter-finding').click();
    await timeline.getByTestId('timeline-filter-recheck').click();
    // Each filter change is its own request: wait until the last answer is on screen.
    await timeline.getByTestId('timeline-updating').waitFor({ state: 'detached' });
    await page.waitForFunction(
      () =>
        document.querySelector('[data-testid="timeline-list"]') !== null &&
        document.querySelectorAll('[data-testid^="timeline-survey-"]').length === 0 &&
        document.querySelectorAll('[data-testid^="timeline-recheck-"]').length === 0,
    );
    expect(await timeline.locator('[data-testid^="timeline-finding-"]').count()).toBe(0);
    expect(await timeline.locator('[data-testid^="timeline-treatment-"]').count()).toBe(
      seededTreatments + 1,
    );
    await page.context().close();
  }, 180_000);
});
