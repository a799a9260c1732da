import { expect, test } from '@playwright/test';
import { DEFAULT_DISPLAY_SETTINGS, type ChecklistStop } from '@yardcall/shared';
import { installFakeSpeech } from './fake-speech';
import {
  audioFixture,
  drawSignature,
  expectNoAxeViolations,
  inspectionByClientId,
  latestInspection,
  pageHeaders,
  pdfText,
  pretripChecklist,
  screenshot,
  signIn,
  startUnit,
  withFakeMicrophone,
} from './support';

const NOTE_WAV = audioFixture('en-note-cracked-marker-lens.wav');

test.use({ viewport: { width: 390, height: 844 }, hasTouch: true, isMobile: true, ...withFakeMicrophone(NOTE_WAV) });

test('a tractor and trailer pre-trip by voice as a competent driver answers: one answer a stop, skip and return, a low steer tread confirmed, then sign, submit and the PDF', async ({
  page,
}) => {
  test.setTimeout(240_000);
  const lowTreadKey = 'u1.axle1.left.tire.tread';
  await installFakeSpeech(page, { answerTurns: null, skipAt: 3, noteAt: null, lowTreadKey });
  await signIn(page, 'driver@yardcall.test');
  await expect(page.getByRole('heading', { level: 1, name: 'Driver home' })).toBeVisible();
  await page.goto('/driver/start');
  await page
    .getByTestId('vehicle-picker')
    .getByRole('button', { name: /KV-101/ })
    .click();
  await page.getByRole('button', { name: /KV-T21/ }).click();
  await expect(page.getByTestId('glove-screen')).toBeVisible();
  await expectNoAxeViolations(page, 'the glove screen before the start');

  // The one tap; from here the walk-around runs by voice until the finish screen.
  await page.getByTestId('start-walkaround').click();
  await expect(page.getByTestId('walkaround-item')).toHaveAttribute('data-phase', /asking|confirming/);
  await expectNoAxeViolations(page, 'the glove screen while running');
  await expect(page.getByRole('heading', { level: 1, name: 'Finish and sign' })).toBeVisible({ timeout: 200_000 });

  const turns = await page.evaluate(
    () =>
      (window as unknown as { __speechTurns: { stop: string; mode: string; answer: string | null }[] }).__speechTurns,
  );
  expect(turns.some((turn) => turn.answer === 'skip')).toBe(true);
  // The skipped stop's items are asked again at the end, one by one, after "yes" to the offer.
  expect(turns.filter((turn) => turn.mode === 'item').length).toBeGreaterThan(0);

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
  const { items, stops } = inspection.checklist;
  expect(inspection.results).toHaveLength(items.length);
  // One answer a stop.
  const stopAnswers = turns.filter((turn) => turn.mode === 'stop' && turn.answer !== null).length;
  expect(stopAnswers).toBeLessThanOrEqual(stops.length + 1);
  const tread = inspection.results.find((result) => result.itemKey === lowTreadKey);
  expect(tread?.measurement).toMatchObject({ value: 1 });
  expect(tread?.verdict).toBe('out_of_limit');
  expect(inspection.defects.map((defect) => defect.itemKey)).toEqual([lowTreadKey]);
  // Measured checks passed with "good" are recorded as checked without a reading.
  expect(inspection.results.filter((result) => result.noReading === 'visual').length).toBeGreaterThan(20);
  expect(inspection.signatures.find((s) => s.role === 'driver')?.hasDrawing).toBe(true);

  const pdf = await page.request.get(`/api/inspections/${inspection.id}/report.pdf`, {
    headers: await pageHeaders(page),
  });
  expect(pdf.status()).toBe(200);
  expect(pdf.headers()['content-type']).toContain('application/pdf');
  const text = pdfText(await pdf.body());
  const treadItem = items.find((item) => item.key === lowTreadKey);
  expect(text).toContain('KV-101');
  expect(text).toContain(treadItem?.title ?? 'missing');
  expect(text).toContain('Tomas Reyes');
});

test('a straight truck by voice the way drivers talk: good except, one by one, fixed on the spot, three unclear answers then resume, a note ended inside its sentence', async ({
  page,
}) => {
  test.setTimeout(240_000);
  await signIn(page, 'driver@yardcall.test');
  await expect(page.getByRole('heading', { level: 1, name: 'Driver home' })).toBeVisible();
  const checklist = await pretripChecklist(page, 'KV-S31', 'en');
  const stopWith = (itemKey: string) => {
    const item = checklist.items.find((i) => i.key === itemKey);
    const stop = checklist.stops.find((s) => s.key === item?.stopKey);
    if (!item || !stop) throw new Error(`No stop for ${itemKey}.`);
    return { item, stop, next: checklist.stops[checklist.stops.indexOf(stop) + 1] as ChecklistStop };
  };
  const plate = stopWith('u1.lights.plate');
  const brake = stopWith('u1.axle1.left.brake.lining');
  const tire = stopWith('u1.axle2.left.outer.tire.inflation');
  const spec = tire.item.limitContext?.specPsi ?? 100;
  const unclearStop = checklist.stops[2] as ChecklistStop;
  const noteStop = stopWith('u1.left.lights.side_markers');
  await installFakeSpeech(page, {
    answerTurns: null,
    skipAt: null,
    noteAt: null,
    lowTreadKey: null,
    noteKey: noteStop.item.key,
    noteWords: 'the marker lens is cracked on the left side',
    noteEndsInSentence: true,
    script: {
      [`stop:${unclearStop.key}`]: ['um', 'banana', 'let me see', 'good'],
      'phase:paused': ['so anyway', 'resume'],
      [`stop:${plate.stop.key}`]: ['good except the license plate light is out'],
      [`stop:${brake.stop.key}`]: ['one by one'],
      [`stop:${tire.stop.key}`]: [`good, ${spec - 25} psi`],
      [`stop:${tire.next.key}`]: [`corrected, added air, now ${spec} psi`, 'good'],
    },
  });
  await startUnit(page, 'KV-S31', null);
  const clientId = decodeURIComponent(new URL(page.url()).pathname.split('/').pop() ?? '');
  await page.getByTestId('start-walkaround').click();
  await expect(page.getByRole('heading', { level: 1, name: 'Finish and sign' })).toBeVisible({ timeout: 200_000 });
  const { turns, spoken } = await page.evaluate(() => {
    const w = window as unknown as { __speechTurns: { phase: string; answer: string | null }[]; __spoken: string[] };
    return { turns: w.__speechTurns, spoken: w.__spoken };
  });
  // After three unclear answers the app says once that it waits, then nothing until "resume".
  const waiting = spoken.filter((s) => s.includes("I'll wait."));
  expect(waiting).toHaveLength(1);
  expect(spoken[spoken.indexOf(waiting[0] as string) + 1]).toMatch(/^Going on\./);
  expect(turns.filter((turn) => turn.phase === 'paused').map((turn) => turn.answer)).toEqual(['so anyway', 'resume']);
  // The brake was walked item by item.
  expect(spoken.some((s) => s.startsWith('One by one.'))).toBe(true);

  await page.getByLabel('Your full name').fill('Tomas Reyes');
  await page.getByTestId('submit-report').click();
  await expect(page.getByTestId('report-view')).toBeVisible({ timeout: 30_000 });
  const inspection = await inspectionByClientId(page, clientId);
  expect(inspection.results).toHaveLength(checklist.items.length);
  const result = (key: string) => inspection.results.find((r) => r.itemKey === key);
  expect(result(plate.item.key)).toMatchObject({ answer: 'defect' });
  expect(result(plate.item.key)?.detail).toContain('out');
  for (const key of plate.stop.itemKeys.filter((k) => k !== plate.item.key)) expect(result(key)?.answer).toBe('pass');
  // Fixed on the spot: on the report, no shop defect, the unit stays in service.
  expect(result(tire.item.key)).toMatchObject({
    answer: 'defect',
    fixed: { action: expect.stringContaining('added air') },
  });
  expect(result(tire.item.key)?.fixed?.measurement?.value).toBe(spec);
  expect(inspection.defects.map((d) => d.itemKey)).toEqual([plate.item.key]);
  expect(inspection.notes).toHaveLength(1);
  expect(inspection.notes[0]?.heard).toBe('the marker lens is cracked on the left side');
});

test('a reload mid-run resumes at the same stop', async ({ page }) => {
  await installFakeSpeech(page, { answerTurns: 6, skipAt: null, noteAt: null, lowTreadKey: null });
  await signIn(page, 'driver@yardcall.test');
  await expect(page.getByRole('heading', { level: 1, name: 'Driver home' })).toBeVisible();
  // A straight truck starts at once: one tap.
  await startUnit(page, 'KV-S31', null);
  await page.getByTestId('start-walkaround').click();
  await expect
    .poll(() => page.evaluate(() => (window as unknown as { __speechTurns: unknown[] }).__speechTurns.length))
    .toBeGreaterThanOrEqual(7);
  const item = page.getByTestId('walkaround-item');
  const progress = await page.getByTestId('walkaround-progress').textContent();
  const key = await item.getAttribute('data-stop-key');
  expect(key).toBeTruthy();
  const url = page.url();

  await page.reload();
  expect(page.url()).toBe(url);
  await expect(item).toHaveAttribute('data-stop-key', key ?? '');
  await expect(page.getByTestId('walkaround-progress')).toHaveText(progress ?? '');
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
  await expect(page.getByTestId('walkaround-progress')).toContainText(/^[1-9]\d* of/);
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
    headers: await pageHeaders(page),
    data: DEFAULT_DISPLAY_SETTINGS,
  });
  expect(reset.ok()).toBe(true);
});

test('with the network cut halfway and restored, nothing is lost and nothing is doubled', async ({ page, context }) => {
  test.setTimeout(240_000);
  // Slower answers, so the network is cut while the walk-around runs.
  await installFakeSpeech(page, {
    answerTurns: null,
    skipAt: null,
    noteAt: 10,
    lowTreadKey: null,
    answerMs: 400,
    onDevice: true,
  });
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

test('with no signal and a recogniser that needs one, the prompts go on and the buttons answer; the driver is told once', async ({
  page,
  context,
}) => {
  await installFakeSpeech(page, { answerTurns: null, skipAt: null, noteAt: null, lowTreadKey: null, answerMs: 60_000 });
  await signIn(page, 'driver@yardcall.test');
  await expect(page.getByRole('heading', { level: 1, name: 'Driver home' })).toBeVisible();
  await startUnit(page, 'KV-S31', null);
  await context.setOffline(true);
  await page.getByTestId('start-walkaround').click();
  const progress = page.getByTestId('walkaround-progress');
  await expect(page.getByText(/No signal: speech recognition needs one here/)).toBeVisible();
  await page.getByRole('button', { name: 'All good' }).click();
  await expect(progress).not.toContainText(/^0 of/);
  const first = await progress.textContent();
  await page.getByRole('button', { name: 'All good' }).click();
  await expect(progress).not.toHaveText(first ?? '');
  const spoken = await page.evaluate(() => (window as unknown as { __spoken: string[] }).__spoken);
  expect(spoken.filter((s) => s.startsWith('No signal'))).toHaveLength(1);
  // Nothing was heard: every answer came from a tap.
  const turns = await page.evaluate(() => (window as unknown as { __speechTurns: unknown[] }).__speechTurns);
  expect(turns).toHaveLength(0);
  await context.setOffline(false);
});
