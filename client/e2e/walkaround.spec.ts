import { execFileSync } from 'node:child_process';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { expect, test, type Page } from '@playwright/test';
import { DEFAULT_DISPLAY_SETTINGS, type InspectionPage, type InspectionResponse } from '@yardcall/shared';
import config from '../playwright.config';
import { installFakeSpeech } from './fake-speech';
import { expectNoAxeViolations, screenshot, signIn } from './support';

const here = dirname(fileURLToPath(import.meta.url));
const root = join(here, '..', '..');
const NOTE_WAV = join(root, 'test-audio', 'fixtures', 'en-note-cracked-marker-lens.wav');
// The server suite's PDF text extractor (pdfjs-dist in plain Node).
const PDF_TEXT = join(root, 'server', 'test', 'pdf-text.mjs');

const configArgs = config.use?.launchOptions?.args ?? [];
test.use({
  viewport: { width: 390, height: 844 },
  hasTouch: true,
  isMobile: true,
  launchOptions: {
    ...config.use?.launchOptions,
    args: [
      ...configArgs,
      '--use-fake-ui-for-media-stream',
      '--use-fake-device-for-media-stream',
      `--use-file-for-fake-audio-capture=${NOTE_WAV}%noloop`,
    ],
  },
});

async function token(page: Page): Promise<string> {
  const value = await page.evaluate(() => localStorage.getItem('yardcall.token'));
  expect(value).toBeTruthy();
  return value ?? '';
}

async function latestInspection(page: Page): Promise<InspectionResponse> {
  const headers = { Authorization: `Bearer ${await token(page)}` };
  const list = (await (await page.request.get('/api/inspections', { headers })).json()) as InspectionPage;
  const first = list.items[0];
  expect(first).toBeTruthy();
  const response = await page.request.get(`/api/inspections/${first?.id ?? ''}`, { headers });
  expect(response.status()).toBe(200);
  return (await response.json()) as InspectionResponse;
}

async function startUnit(page: Page, unit: string, trailer: 'none' | null): Promise<void> {
  await page.goto('/driver/start');
  await expect(page.getByRole('heading', { level: 1, name: 'Start an inspection' })).toBeVisible();
  await page
    .getByTestId('vehicle-picker')
    .getByRole('button', { name: new RegExp(unit) })
    .click();
  if (trailer === 'none') await page.getByTestId('no-trailer').click();
  await expect(page.getByTestId('glove-screen')).toBeVisible();
}

async function drawSignature(page: Page): Promise<void> {
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

test('a walk-around by voice alone after one tap: skip and return, a low steer tread confirmed, a note, then sign, submit and the PDF', async ({
  page,
}) => {
  test.setTimeout(240_000);
  const lowTreadKey = 'u1.axle1.left.tire.tread';
  await installFakeSpeech(page, { answerTurns: null, skipAt: 3, noteAt: 6, lowTreadKey });
  await signIn(page, 'driver@yardcall.test');
  await expect(page.getByRole('heading', { level: 1, name: 'Driver home' })).toBeVisible();
  await startUnit(page, 'KV-101', 'none');
  await expectNoAxeViolations(page, 'the glove screen before the start');

  // The one tap; from here the walk-around runs by voice until the finish screen.
  await page.getByTestId('start-walkaround').click();
  await expect(page.getByTestId('walkaround-item')).toHaveAttribute('data-phase', /asking|confirming|noting/);
  await expectNoAxeViolations(page, 'the glove screen while running');
  await expect(page.getByRole('heading', { level: 1, name: 'Finish and sign' })).toBeVisible({ timeout: 200_000 });

  const turns = await page.evaluate(
    () => (window as unknown as { __speechTurns: { key: string; answer: string | null }[] }).__speechTurns,
  );
  const skippedKey = turns.find((turn) => turn.answer === 'skip')?.key ?? '';
  expect(skippedKey).not.toBe('');
  // Returned to at the end: the last answer of the walk-around is for the skipped item.
  expect(turns.filter((turn) => turn.key === skippedKey).at(-1)?.answer).toBe('good');
  expect(turns.at(-1)?.key).toBe(skippedKey);

  await expect(page.getByTestId('finish-defects')).toContainText('1 defect');
  await expectNoAxeViolations(page, 'the finish screen');
  await page.getByLabel('Odometer (miles, optional)').fill('412508');
  await page.getByLabel('Your full name').fill('Tomas Reyes');
  await drawSignature(page);
  await page.getByTestId('submit-report').click();
  await expect(page.getByTestId('report-view')).toBeVisible({ timeout: 30_000 });
  await expect(page.getByTestId('report-defects')).toContainText('1 defect');

  const inspection = await latestInspection(page);
  expect(inspection.status).toBe('submitted');
  expect(inspection.odometer).toBe(412508);
  expect(inspection.results).toHaveLength(inspection.checklist.items.length);
  const tread = inspection.results.find((result) => result.itemKey === lowTreadKey);
  expect(tread?.measurement).toMatchObject({ value: 1 });
  expect(tread?.verdict).toBe('out_of_limit');
  expect(inspection.defects.map((defect) => defect.itemKey)).toEqual([lowTreadKey]);
  expect(inspection.notes).toHaveLength(1);
  expect(inspection.notes[0]?.heard).toContain('marker lens is cracked');
  expect(inspection.notes[0]?.sizeBytes ?? 0).toBeGreaterThan(1000);
  expect(inspection.signatures.find((s) => s.role === 'driver')?.hasDrawing).toBe(true);

  const pdf = await page.request.get(`/api/inspections/${inspection.id}/report.pdf`, {
    headers: { Authorization: `Bearer ${await token(page)}` },
  });
  expect(pdf.status()).toBe(200);
  expect(pdf.headers()['content-type']).toContain('application/pdf');
  const { text } = JSON.parse(execFileSync('node', [PDF_TEXT], { input: await pdf.body() }).toString()) as {
    text: string;
  };
  const treadItem = inspection.checklist.items.find((item) => item.key === lowTreadKey);
  expect(text).toContain('KV-101');
  expect(text).toContain(treadItem?.title ?? 'missing');
  expect(text).toContain('Tomas Reyes');
});

test('a reload mid-run resumes at the same item', async ({ page }) => {
  await installFakeSpeech(page, { answerTurns: 6, skipAt: null, noteAt: null, lowTreadKey: null });
  await signIn(page, 'driver@yardcall.test');
  await expect(page.getByRole('heading', { level: 1, name: 'Driver home' })).toBeVisible();
  // A straight truck starts at once: one tap.
  await startUnit(page, 'KV-S31', null);
  await page.getByTestId('start-walkaround').click();
  await expect(page.getByTestId('walkaround-progress')).toContainText('6 of');
  const item = page.getByTestId('walkaround-item');
  const key = await item.getAttribute('data-item-key');
  expect(key).toBeTruthy();
  const url = page.url();

  await page.reload();
  expect(page.url()).toBe(url);
  await expect(item).toHaveAttribute('data-item-key', key ?? '');
  await expect(page.getByTestId('walkaround-progress')).toContainText('6 of');
  await expect(page.getByTestId('start-walkaround')).toHaveText('Resume the walk-around');
});

test('the glove screen at 390 x 844 in night theme at 200 % text', async ({ page }) => {
  await installFakeSpeech(page, { answerTurns: 2, skipAt: null, noteAt: null, lowTreadKey: null });
  await signIn(page, 'driver@yardcall.test');
  await expect(page.getByRole('heading', { level: 1, name: 'Driver home' })).toBeVisible();
  await page.goto('/settings');
  // Each setting is changed (away and back if an earlier flow left it so), so a save always follows.
  await page.getByRole('radio', { name: 'Day' }).check();
  await page.getByRole('radio', { name: 'Night (dim)' }).check();
  const slider = page.getByRole('slider', { name: 'Text size' });
  await slider.focus();
  await page.keyboard.press('Home');
  await page.keyboard.press('End');
  const glove = page.getByRole('switch', { name: 'Glove mode' });
  await expect(glove).toBeVisible();
  // An earlier flow may have left glove mode on for this driver: the page shows what is saved.
  if (!(await page.locator('html').evaluate((html) => html.classList.contains('glove')))) await glove.click();
  await expect(page.locator('html')).toHaveClass(/theme-night/);
  await expect(page.locator('html')).toHaveClass(/glove/);
  await expect.poll(() => page.evaluate(() => document.documentElement.style.fontSize)).toBe('200%');
  // Saved to the account, so the next page load keeps them.
  await expect(page.getByTestId('settings-save-status')).toHaveText('Saved to your account.');

  await startUnit(page, 'KV-S31', null);
  await expect(page.locator('html')).toHaveClass(/theme-night/);
  await page.getByTestId('start-walkaround').click();
  await expect(page.getByTestId('walkaround-progress')).toContainText('2 of');
  const targets = page.getByTestId('targets').getByRole('button');
  await expect(targets).toHaveCount(3);
  const boxes = await Promise.all([0, 1, 2].map(async (n) => targets.nth(n).boundingBox()));
  for (const box of boxes) {
    // 20 mm is 75.6 CSS px at 96 px per inch; the screen keeps them inside the phone's width.
    expect(box?.height ?? 0).toBeGreaterThanOrEqual(76);
    expect((box?.x ?? -1) >= 0 && (box?.x ?? 0) + (box?.width ?? 0) <= 390).toBe(true);
  }
  // 8 mm apart (about 30 CSS px).
  expect((boxes[1]?.y ?? 0) - ((boxes[0]?.y ?? 0) + (boxes[0]?.height ?? 0))).toBeGreaterThanOrEqual(30);
  await screenshot(page, 'glove-night-200');
  await expectNoAxeViolations(page, 'the glove screen in night theme at 200 %');

  // The demo driver's settings go back to the defaults, so no later flow starts from this test's.
  const reset = await page.request.patch('/api/auth/me/settings', {
    headers: { Authorization: `Bearer ${await token(page)}` },
    data: DEFAULT_DISPLAY_SETTINGS,
  });
  expect(reset.ok()).toBe(true);
});

async function inspectionByClientId(page: Page, clientId: string): Promise<InspectionResponse> {
  const headers = { Authorization: `Bearer ${await token(page)}` };
  const list = (await (await page.request.get('/api/inspections', { headers })).json()) as InspectionPage;
  for (const item of list.items) {
    const detail = (await (
      await page.request.get(`/api/inspections/${item.id}`, { headers })
    ).json()) as InspectionResponse;
    if (detail.clientId === clientId) return detail;
  }
  throw new Error(`No inspection with client id ${clientId} on the server.`);
}

test('with the network cut halfway and restored, nothing is lost and nothing is doubled', async ({ page, context }) => {
  test.setTimeout(240_000);
  await installFakeSpeech(page, { answerTurns: null, skipAt: null, noteAt: 60, lowTreadKey: null });
  await signIn(page, 'driver@yardcall.test');
  await expect(page.getByRole('heading', { level: 1, name: 'Driver home' })).toBeVisible();
  await startUnit(page, 'KV-102', 'none');
  const clientId = decodeURIComponent(new URL(page.url()).pathname.split('/').pop() ?? '');
  await page.getByTestId('start-walkaround').click();
  const progress = page.getByTestId('walkaround-progress');
  await expect(progress).toContainText(/^(2\d|[3-9]\d|1\d\d) of/, { timeout: 60_000 });

  await context.setOffline(true);
  // Answers keep coming and wait on the phone.
  await expect(page.getByTestId('sync-status')).toContainText(/[1-9]\d* waiting to sync/, { timeout: 60_000 });
  await expect(progress).toContainText(/^(8\d|9\d|1\d\d) of/, { timeout: 60_000 });
  await context.setOffline(false);

  await expect(page.getByRole('heading', { level: 1, name: 'Finish and sign' })).toBeVisible({ timeout: 200_000 });
  await page.getByLabel('Your full name').fill('Tomas Reyes');
  await page.getByTestId('submit-report').click();
  await expect(page.getByTestId('report-view')).toBeVisible({ timeout: 30_000 });

  const inspection = await inspectionByClientId(page, clientId);
  expect(inspection.status).toBe('submitted');
  const keys = inspection.results.map((result) => result.itemKey);
  expect(new Set(keys).size).toBe(keys.length);
  expect(keys.sort()).toEqual(inspection.checklist.items.map((item) => item.key).sort());
  expect(inspection.notes).toHaveLength(1);
  expect(inspection.defects).toEqual([]);
});
