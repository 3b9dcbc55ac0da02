import type { Page } from 'playwright-core';
import { correctedMoisture, decayRisk, residualSection, VERDICT_OPTIONS } from '@/shared/wood';
import { DECAY_RISK_LABELS } from '@/src/components/wood/labels';
import { launchBrowser, screenshot, type TestBrowser } from './support/browser';
import { startTestApp, type TestAppServer } from './support/app-server';
import { centre, signIn, text } from './support/session';

/**
 * The wood-science slice as an inspector uses it, in headless chromium against the production
 * web export and the demo seed: a moisture reading read live in the finding form, then a member
 * decision for the demo tourer's left sill, overridden with a reason, saved and found again
 * after a reload. Phone first, then the same screens on a wide screen.
 */
let app: TestAppServer;
let browser: TestBrowser;

async function openTourerSill(page: Page) {
  await page.locator('[data-testid^="vehicle-row-"]', { hasText: 'Aldermoor' }).first().click();
  await page.getByTestId('vehicle-overview').waitFor();
  await page.getByTestId('view-left').click();
  await page.getByTestId('zone-sill-left').click({ force: true });
  await page.getByTestId('zone-sheet').waitFor();
}

const oneDecimal = (n: number) => `${(Math.round(n * 10) / 10).toFixed(1)} %`;
const floorPercent = (r: number) => `${Math.floor(r * 100 + 1e-9)} %`;

beforeAll(async () => {
  app = await startTestApp({ prefix: 'decide' });
  browser = await launchBrowser();
}, 120_000);

afterAll(async () => {
  await browser?.close();
  await app?.close();
});

let decisionUrl = '';

describe('inspector on a phone (390×844)', () => {
  it('sees a moisture reading corrected and rated as it is typed', async () => {
    const page = await browser.newPage({ width: 390, height: 844 });
    await signIn(page, app.url);
    await openTourerSill(page);
    await page.getByTestId('zone-log-finding').click();
    await page.getByTestId('finding-new-screen').waitFor();
    // The survey recorded its shop climate, so the panel can compare with it from the start.
    expect(await text(page, 'moisture-emc')).toMatch(/equilibrium moisture content/);
    expect(await page.getByTestId('moisture-corrected').count()).toBe(0);

    await page.getByTestId('finding-meter').fill('28');
    await page.getByTestId('finding-wood-temp').fill('12');
    // The meter is set for the sill's usual timber until the inspector picks another.
    const expected = correctedMoisture({ meterReading: 28, woodTempC: 12, species: 'white-oak' });
    await page.getByTestId('moisture-corrected').waitFor();
    expect(await text(page, 'moisture-corrected')).toBe(oneDecimal(expected.corrected));
    expect(await text(page, 'moisture-risk-level')).toBe(
      DECAY_RISK_LABELS[decayRisk(expected.corrected).level].label,
    );
    // Far wetter than 16.5 °C and 62 % RH explain: the panel says to look for water.
    expect(await text(page, 'moisture-hint')).toMatch(/water source/);
    await centre(page, 'moisture-panel');
    await screenshot(page, 'decision-phone-01-moisture-panel');

    await page.getByTestId('evidence-frass-powder').click();
    await page.getByTestId('finding-hole').fill('1.2');
    await page.getByTestId('agents-panel').waitFor();
    expect(await text(page, 'agents-confirm-note')).toMatch(
      /licensed pest-control operator confirm before treating/,
    );
    await centre(page, 'agents-panel');
    await screenshot(page, 'decision-phone-02-likely-agents');
    await page.context().close();
  }, 120_000);

  it('decides the left sill: decay depths in, section and recommendation out, an override saved and found after a reload', async () => {
    const page = await browser.newPage({ width: 390, height: 844 });
    await signIn(page, app.url);
    await openTourerSill(page);
    await page.getByTestId('zone-decide').click();
    await page.getByTestId('decision-screen').waitFor();
    decisionUrl = page.url();
    // Prefilled from the sill's nominal section (110 × 55 mm) and its worst finding.
    expect(await page.getByTestId('decision-width').inputValue()).toBe('110');
    expect(await page.getByTestId('decision-depth').inputValue()).toBe('55');
    expect(await page.getByTestId('decision-affected-length').inputValue()).toBe('620');

    const decay = { top: 10, bottom: 8, left: 0, right: 12 };
    for (const [face, mm] of Object.entries(decay))
      await page.getByTestId(`decision-decay-${face}`).fill(mm ? String(mm) : '');
    const section = residualSection({ width: 110, depth: 55, decay });
    await page.waitForFunction(
      (want) => document.querySelector('[data-testid="ratio-modulus"]')?.textContent === want,
      floorPercent(section.sectionModulusRatio),
    );
    expect(await text(page, 'ratio-area')).toBe(floorPercent(section.areaRatio));
    expect(await text(page, 'ratio-stiffness')).toBe(floorPercent(section.momentOfInertiaRatio));
    expect(await page.getByTestId('decay-band-top').count()).toBe(1);
    expect(await page.getByTestId('decay-band-left').count()).toBe(0);
    expect(await text(page, 'length-bar-text')).toMatch(/620 mm of 1710 mm/);

    const recommended = await text(page, 'recommendation-option');
    expect(recommended.length).toBeGreaterThan(0);
    const reasons = page.getByTestId('recommendation-reasons');
    expect(await reasons.textContent()).toMatch(/section modulus/);
    // Severity 4 at a joint: new wood, so there is timber to order.
    await page.getByTestId('cut-list-line-0').waitFor();
    expect(await text(page, 'cut-list-line-0')).toMatch(/White oak, \d+\/4 rough.*board feet/);
    await centre(page, 'cross-section');
    await screenshot(page, 'decision-phone-03-section');
    await centre(page, 'recommendation');
    await screenshot(page, 'decision-phone-04-recommendation');

    // Choose something other than the recommendation: a reason is then required.
    expect(await text(page, 'decision-choice-status')).toBe('Following the recommendation.');
    const marked = await page
      .locator('[data-testid^="decision-option-"]', { hasText: '(recommended)' })
      .getAttribute('data-testid');
    const recommendedKey = marked!.replace('decision-option-', '');
    const other = recommendedKey === 'splice' ? 'replace-member' : 'splice';
    expect(VERDICT_OPTIONS).toContain(recommendedKey);
    expect(await text(page, 'recommendation-option')).toBe(recommended);
    await page.getByTestId(`decision-option-${other}`).click();
    expect(await text(page, 'decision-choice-status')).toMatch(/^Chosen: /);
    await page.getByTestId('decision-save').click();
    expect(await text(page, 'decision-override-reason-error')).toMatch(/say why/i);
    const reason = 'Owner wants the original timber kept where the hinge plate can be let in';
    await page.getByTestId('decision-override-reason').fill(reason);
    if (other === 'splice') await page.getByTestId('splice-card').waitFor();
    await centre(page, 'decision-choice-status');
    await screenshot(page, 'decision-phone-05-override');
    await centre(page, 'decision-estimate');
    await screenshot(page, 'decision-phone-06-estimate');
    await page.getByTestId('decision-save').click();
    await page.getByTestId('decision-saved-at').waitFor();
    expect(await text(page, 'decision-saved-at')).toMatch(/Saved by Tobias Venn/);

    const [[row]] = (await app.sequelize.query(
      'SELECT chosen_option, recommended_option, override_reason FROM member_decisions WHERE zone_key = ?',
      { replacements: ['sill-left'] },
    )) as unknown as [
      [{ chosen_option: string; recommended_option: string; override_reason: string }],
    ];
    expect(row).toEqual({
      chosen_option: other,
      recommended_option: recommendedKey,
      override_reason: reason,
    });

    await page.reload();
    await page.getByTestId('decision-screen').waitFor();
    await page.getByTestId('decision-saved-at').waitFor();
    const chosenStatus = await text(page, 'decision-choice-status');
    expect(chosenStatus).toMatch(/^Chosen: /);
    expect(chosenStatus.toLowerCase()).toContain(
      other === 'splice' ? 'splice in new wood' : 'replace the member',
    );
    expect(await page.getByTestId('decision-override-reason').inputValue()).toBe(reason);
    expect(await page.getByTestId('decision-decay-top').inputValue()).toBe('10');
    expect(await page.getByTestId('decision-decay-right').inputValue()).toBe('12');
    await centre(page, 'decision-choice-status');
    await screenshot(page, 'decision-phone-07-after-reload');

    // The zone sheet now shows the decision to everyone who opens the zone.
    await page.goto(decisionUrl.split('/decisions/')[0]);
    await page.getByTestId('vehicle-overview').waitFor();
    await page.getByTestId('view-left').click();
    await page.getByTestId('zone-sill-left').click({ force: true });
    await page.getByTestId('decision-summary').waitFor();
    expect(await text(page, 'decision-summary-override')).toContain(reason);
    await centre(page, 'decision-summary');
    await screenshot(page, 'decision-phone-08-zone-sheet');
    await page.context().close();
  }, 180_000);
});

describe('inspector on a wide screen (1440×900)', () => {
  it('shows the finding form with its moisture panel, and the decision in two columns', async () => {
    const page = await browser.newPage({ width: 1440, height: 900 });
    await signIn(page, app.url);
    await openTourerSill(page);
    await page.getByTestId('zone-log-finding').click();
    await page.getByTestId('finding-new-screen').waitFor();
    await page.getByTestId('finding-meter').fill('19');
    await page.getByTestId('finding-wood-temp').fill('14');
    await page.getByTestId('moisture-corrected').waitFor();
    await centre(page, 'moisture-panel');
    await screenshot(page, 'decision-wide-01-moisture-panel');

    await page.goto(decisionUrl);
    await page.getByTestId('decision-screen').waitFor();
    await page.getByTestId('cross-section').waitFor();
    const inputs = await page.getByTestId('decision-width').boundingBox();
    const drawing = await page.getByTestId('cross-section').boundingBox();
    // Measurements on the left, the drawing beside them on the right.
    expect(drawing!.x).toBeGreaterThan(inputs!.x + inputs!.width);
    await screenshot(page, 'decision-wide-02-decision');
    await centre(page, 'decision-estimate');
    await screenshot(page, 'decision-wide-03-estimate');

    await page.getByTestId('side-nav-settings').click();
    await page.getByTestId('settings-screen').waitFor();
    expect(await page.getByTestId('settings-view').textContent()).toMatch(
      /Common practice defaults, yours to change/,
    );
    await screenshot(page, 'decision-wide-04-settings-read-only');
    await page.context().close();
  }, 120_000);
});

describe('owner', () => {
  it('changes the scarf slope in the settings, is stopped by a threshold that contradicts another, and finds the change after a reload', async () => {
    const page = await browser.newPage({ width: 390, height: 844 });
    await signIn(page, app.url, 'owner');
    await page.getByTestId('nav-settings').click();
    await page.getByTestId('settings-screen').waitFor();
    expect(await text(page, 'settings-thresholds')).toMatch(
      /Common practice defaults, yours to change/,
    );
    await screenshot(page, 'decision-phone-09-settings');

    // Consolidating above the keep threshold would make no sense: refused beside the field.
    await page.getByTestId('settings-consolidate').fill('95');
    await page.getByTestId('settings-scarf-slope').fill('12');
    await page.getByTestId('settings-save').click();
    expect(await text(page, 'settings-consolidate-error')).toMatch(/keep threshold/);
    await centre(page, 'settings-consolidate');
    await screenshot(page, 'decision-phone-10-settings-error');
    await page.getByTestId('settings-consolidate').fill('75');
    await page.getByTestId('settings-save').click();
    await page.getByTestId('toast').filter({ hasText: 'Settings saved' }).waitFor();

    await page.reload();
    await page.getByTestId('settings-screen').waitFor();
    expect(await page.getByTestId('settings-scarf-slope').inputValue()).toBe('12');
    const [[row]] = (await app.sequelize.query(
      'SELECT settings FROM workshops LIMIT 1',
    )) as unknown as [[{ settings: string | { wood: { scarfSlope: number } } }]];
    const saved = typeof row.settings === 'string' ? JSON.parse(row.settings) : row.settings;
    expect(saved.wood.scarfSlope).toBe(12);
    await page.context().close();

    const wide = await browser.newPage({ width: 1440, height: 900 });
    await signIn(wide, app.url, 'owner');
    await wide.getByTestId('side-nav-settings').click();
    await wide.getByTestId('settings-screen').waitFor();
    await screenshot(wide, 'decision-wide-05-settings-owner');
    await wide.context().close();
  }, 120_000);
});
