import type { Locator, Page } from 'playwright-core';
import { DEMO_ACCOUNTS } from '@/server/seeders/demo';

/** Sign-in, API calls and reads shared by the browser flows; `url` is the test app's base URL. */
export const account = (role: string) => {
  const a = DEMO_ACCOUNTS.find((x) => x.role === role);
  if (!a) throw new Error(`no demo ${role}`);
  return a;
};

export async function signIn(page: Page, url: string, role = 'inspector') {
  const { email, password } = account(role);
  await page.goto(`${url}/sign-in`);
  await page.getByTestId('sign-in-email').fill(email);
  await page.getByTestId('sign-in-password').fill(password);
  await page.getByTestId('sign-in-submit').click();
  await page.getByTestId('vehicles-screen').waitFor();
}

export async function api(
  url: string,
  method: string,
  path: string,
  token: string,
  body?: unknown,
) {
  const res = await fetch(`${url}${path}`, {
    method,
    headers: { Authorization: `Bearer ${token}`, 'Content-Type': 'application/json' },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const json = (await res.json()) as Record<string, unknown>;
  if (!res.ok) throw new Error(`${method} ${path}: ${res.status} ${JSON.stringify(json)}`);
  return json;
}

export const text = async (scope: Page | Locator, testID: string) =>
  ((await scope.getByTestId(testID).first().textContent()) ?? '').trim();

/** The app scrolls inside its own scroll view, so a full-page shot shows the viewport: centre the part first. */
export const centre = (scope: Page | Locator, testID: string) =>
  scope
    .getByTestId(testID)
    .first()
    .evaluate((el) => el.scrollIntoView({ block: 'center', behavior: 'instant' }));
