import { execFileSync } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import AxeBuilder from '@axe-core/playwright';
import { expect, type APIRequestContext, type LaunchOptions, type Page } from '@playwright/test';
import {
  buildChecklist,
  type Checklist,
  type InspectionPage,
  type InspectionResponse,
  type Locale,
  type LoginResponse,
  type VehicleResponse,
} from '@yardcall/shared';
import { CHROMIUM_ARGS, CHROMIUM_PATH } from './chromium';

export const DEMO_PASSWORD = 'yardcall-demo';

export const ROLE_HOMES = [
  { role: 'driver', email: 'driver@yardcall.test', path: '/driver', heading: 'Driver home' },
  { role: 'mechanic', email: 'mechanic@yardcall.test', path: '/mechanic', heading: 'Shop' },
  { role: 'supervisor', email: 'supervisor@yardcall.test', path: '/supervisor', heading: 'Fleet board' },
  { role: 'trainer', email: 'trainer@yardcall.test', path: '/trainer', heading: 'Training' },
  { role: 'admin', email: 'admin@yardcall.test', path: '/admin', heading: 'Administration' },
] as const;

export const repoRoot = join(dirname(fileURLToPath(import.meta.url)), '..', '..');

export const screenshotDir = join(repoRoot, '.test-output', 'screenshots');
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

// A spoken recording from test-audio/fixtures.
export function audioFixture(name: string): string {
  return join(repoRoot, 'test-audio', 'fixtures', name);
}

// Chromium with a fake microphone that plays `audioFile` (once, or over and over) and grants the
// microphone without asking; `autoplay` lets audio play without a click on the player itself.
export function withFakeMicrophone(
  audioFile: string,
  options: { loop?: boolean; autoplay?: boolean } = {},
): { launchOptions: LaunchOptions } {
  return {
    launchOptions: {
      executablePath: CHROMIUM_PATH,
      args: [
        ...CHROMIUM_ARGS,
        ...(options.autoplay ? ['--autoplay-policy=no-user-gesture-required'] : []),
        '--use-fake-ui-for-media-stream',
        '--use-fake-device-for-media-stream',
        `--use-file-for-fake-audio-capture=${audioFile}${options.loop ? '' : '%noloop'}`,
      ],
    },
  };
}

export type AuthHeaders = Record<string, string>;

// Signs in through the API (no page) and gives the headers its calls need.
export async function apiHeaders(request: APIRequestContext, email: string): Promise<AuthHeaders> {
  const response = await request.post('/api/auth/login', { data: { email, password: DEMO_PASSWORD } });
  expect(response.status(), await response.text()).toBe(200);
  const { accessToken } = (await response.json()) as LoginResponse;
  return { Authorization: `Bearer ${accessToken}` };
}

// The headers of the person signed in on this page (the app keeps the token in localStorage).
export async function pageHeaders(page: Page): Promise<AuthHeaders> {
  const token = await page.evaluate(() => localStorage.getItem('yardcall.token'));
  expect(token).toBeTruthy();
  return { Authorization: `Bearer ${token ?? ''}` };
}

// A stroke across the signature pad, as a finger or a mouse would draw it.
export async function drawSignature(page: Page): Promise<void> {
  const pad = page.getByTestId('signature-pad');
  await pad.scrollIntoViewIfNeeded();
  const box = await pad.boundingBox();
  if (!box) throw new Error('The signature pad has no box.');
  await page.mouse.move(box.x + 20, box.y + box.height / 2);
  await page.mouse.down();
  await page.mouse.move(box.x + box.width / 2, box.y + 20, { steps: 5 });
  await page.mouse.move(box.x + box.width - 20, box.y + box.height - 20, { steps: 5 });
  await page.mouse.up();
}

// A PDF's text, read by the server suite's extractor (pdfjs-dist in plain Node).
export function pdfText(pdf: Buffer): string {
  const output = execFileSync('node', [join(repoRoot, 'server', 'test', 'pdf-text.mjs')], { input: pdf });
  return (JSON.parse(output.toString()) as { text: string }).text;
}

// The pre-trip checklist the phone builds for one demo unit, in a language: what a flow expects to hear.
export async function pretripChecklist(page: Page, unitNumber: string, locale: Locale): Promise<Checklist> {
  const headers = await pageHeaders(page);
  const vehicles = (await (await page.request.get('/api/vehicles', { headers })).json()) as VehicleResponse[];
  const unit = vehicles.find((vehicle) => vehicle.unitNumber === unitNumber);
  if (!unit) throw new Error(`The demo fleet has no ${unitNumber}.`);
  return buildChecklist([{ unitNumber: unit.unitNumber, kind: unit.kind, config: unit.config }], 'pre_trip', locale);
}

export async function startUnit(page: Page, unit: string, trailer: 'none' | null): Promise<void> {
  await page.goto('/driver/start');
  await expect(page.getByRole('heading', { level: 1, name: 'Start an inspection' })).toBeVisible();
  await page
    .getByTestId('vehicle-picker')
    .getByRole('button', { name: new RegExp(unit) })
    .click();
  if (trailer === 'none') await page.getByTestId('no-trailer').click();
  await expect(page.getByTestId('glove-screen')).toBeVisible();
}

export async function latestInspection(page: Page): Promise<InspectionResponse> {
  const headers = await pageHeaders(page);
  const list = (await (await page.request.get('/api/inspections', { headers })).json()) as InspectionPage;
  const first = list.items[0];
  expect(first).toBeTruthy();
  const response = await page.request.get(`/api/inspections/${first?.id ?? ''}`, { headers });
  expect(response.status()).toBe(200);
  return (await response.json()) as InspectionResponse;
}

export async function inspectionByClientId(page: Page, clientId: string): Promise<InspectionResponse> {
  const headers = await pageHeaders(page);
  const list = (await (await page.request.get('/api/inspections', { headers })).json()) as InspectionPage;
  for (const item of list.items) {
    const detail = (await (
      await page.request.get(`/api/inspections/${item.id}`, { headers })
    ).json()) as InspectionResponse;
    if (detail.clientId === clientId) return detail;
  }
  throw new Error(`No inspection with client id ${clientId} on the server.`);
}
