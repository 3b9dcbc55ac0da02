import { repairPlanResponse } from '@/shared/schemas/repair-plan';
import { launchBrowser, screenshot, type TestBrowser } from './support/browser';
import { startTestApp, type TestAppServer } from './support/app-server';
import { account, api, signIn, text } from './support/session';

/**
 * The repair plan of the demo tourer in headless chromium: the inspector opens it from the
 * vehicle, sees every structural and cosmetic decision the API answers in its own group, the
 * timber to buy and the order of work, and goes from an item to that member's decision.
 */
let app: TestAppServer;
let browser: TestBrowser;
let vehicleId = '';
let plan: ReturnType<typeof repairPlanResponse.parse>;

beforeAll(async () => {
  app = await startTestApp({ prefix: 'plan' });
  browser = await launchBrowser();
  const { email, password } = account('inspector');
  const session = await api(app.url, 'POST', '/api/auth/sign-in', '', { email, password });
  const token = session.token as string;
  const wid = (session.memberships as { workshopId: string }[])[0].workshopId;
  const list = await api(app.url, 'GET', `/api/workshops/${wid}/vehicles`, token);
  vehicleId = (list.items as { id: string; make: string; model: string }[]).find(
    (v) => v.make === 'Aldermoor' && v.model === 'Fourteen Tourer',
  )!.id;
  plan = repairPlanResponse.parse(
    await api(app.url, 'GET', `/api/workshops/${wid}/vehicles/${vehicleId}/repair-plan`, token),
  );
}, 120_000);

afterAll(async () => {
  await browser?.close();
  await app?.close();
});

describe('repair plan', () => {
  it('lists the tourer’s decisions by class with totals and timber, on a phone and a wide screen', async () => {
    // The demo tourer has structural and cosmetic decisions and a replacement to cut timber for.
    expect(plan.structural.length).toBeGreaterThan(0);
    expect(plan.cosmetic.length).toBeGreaterThan(0);
    expect(plan.cutList.length).toBeGreaterThan(0);

    for (const [size, tag] of [
      [{ width: 390, height: 844 }, 'phone'],
      [{ width: 1440, height: 900 }, 'wide'],
    ] as const) {
      const page = await browser.newPage(size);
      await signIn(page, app.url);
      await page.goto(`${app.url}/vehicles/${vehicleId}`);
      await page.getByTestId('vehicle-overview').last().getByTestId('vehicle-plan').click();
      const screen = page.getByTestId('plan-screen').last();
      await screen.getByTestId('plan-structural').waitFor();
      const structural = screen.getByTestId('plan-structural');
      const cosmetic = screen.getByTestId('plan-cosmetic');
      expect(await structural.locator('[data-testid^="plan-item-"]').count()).toBe(
        plan.structural.length,
      );
      expect(await cosmetic.locator('[data-testid^="plan-item-"]').count()).toBe(
        plan.cosmetic.length,
      );
      // No structural member shows up under cosmetic.
      for (const i of plan.structural)
        expect(await cosmetic.getByTestId(`plan-item-${i.zoneKey}`).count()).toBe(0);
      expect(await text(screen, 'plan-structural-total')).toMatch(
        new RegExp(`^${plan.totals.structural.count} members? · `),
      );
      expect(await screen.locator('[data-testid^="plan-cut-row-"]').count()).toBe(
        plan.cutList.length,
      );
      expect(await text(screen, 'plan-grade')).toMatch(/grade [1-5] of 5/);
      await screenshot(page, `plan-${tag}-01`);

      await structural.getByTestId(`plan-item-${plan.structural[0].zoneKey}`).click();
      await page.getByTestId('decision-screen').last().waitFor();
      await page.context().close();
    }
  }, 180_000);
});
