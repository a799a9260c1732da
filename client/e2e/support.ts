import { mkdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import AxeBuilder from '@axe-core/playwright';
import { expect, type Page } from '@playwright/test';

export const DEMO_PASSWORD = 'yardcall-demo';

export const ROLE_HOMES = [
  { role: 'driver', email: 'driver@yardcall.test', path: '/driver', heading: 'Driver home' },
  { role: 'mechanic', email: 'mechanic@yardcall.test', path: '/mechanic', heading: 'Shop' },
  { role: 'supervisor', email: 'supervisor@yardcall.test', path: '/supervisor', heading: 'Fleet board' },
  { role: 'trainer', email: 'trainer@yardcall.test', path: '/trainer', heading: 'Training' },
  { role: 'admin', email: 'admin@yardcall.test', path: '/admin', heading: 'Administration' },
] as const;

export const screenshotDir = join(dirname(fileURLToPath(import.meta.url)), '..', '..', '.test-output', 'screenshots');
mkdirSync(screenshotDir, { recursive: true });

export async function signIn(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail address').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
}

export async function expectNoAxeViolations(page: Page, context: string): Promise<void> {
  const results = await new AxeBuilder({ page }).analyze();
  const found = results.violations.map(
    (violation) =>
      `${violation.id} (${violation.impact}): ${violation.help} at ${violation.nodes.map((node) => node.target.join(' ')).join(', ')}`,
  );
  expect(found, `axe-core violations on ${context}`).toEqual([]);
}

export async function screenshot(page: Page, name: string): Promise<void> {
  await page.screenshot({ path: join(screenshotDir, `${name}.png`), fullPage: true });
}
