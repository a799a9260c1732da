import { expect, test } from '@playwright/test';
import { buildChecklist, type InspectionPage, type InspectionResponse, type VehicleResponse } from '@yardcall/shared';
import { installFakeSpeech } from './fake-speech';
import { signIn } from './support';

// The Spanish answer words are a chunk of their own, fetched when a walk-around first needs them.
const SPANISH_WORDS = /\/assets\/es-[\w-]+\.js$/;

test('a driver who says "español" at the second stop goes on in Spanish, prompts and answers; the Spanish words load only then', async ({
  page,
}) => {
  test.setTimeout(180_000);
  const scripts: string[] = [];
  page.on('request', (request) => {
    if (request.resourceType() === 'script') scripts.push(new URL(request.url()).pathname);
  });
  await signIn(page, 'driver@yardcall.test');
  await expect(page.getByRole('heading', { level: 1, name: 'Driver home' })).toBeVisible();
  const token = (await page.evaluate(() => localStorage.getItem('yardcall.token'))) ?? '';
  const headers = { Authorization: `Bearer ${token}` };
  const vehicles = (await (await page.request.get('/api/vehicles', { headers })).json()) as VehicleResponse[];
  const truck = vehicles.find((vehicle) => vehicle.unitNumber === 'KV-S31');
  if (!truck) throw new Error('The demo fleet has no KV-S31.');
  const checklist = buildChecklist(
    [{ unitNumber: truck.unitNumber, kind: truck.kind, config: truck.config }],
    'pre_trip',
    'en',
  );
  const [first, second, ...rest] = checklist.stops;
  if (!first || !second) throw new Error('The straight truck has fewer than two stops.');
  // After the switch the driver answers in Spanish; the stop that was pending is asked again.
  const script: Record<string, string[]> = {
    [`stop:${first.key}`]: ['good'],
    [`stop:${second.key}`]: ['español', 'bien'],
  };
  for (const stop of rest) script[`stop:${stop.key}`] = ['bien'];
  await installFakeSpeech(page, { answerTurns: null, skipAt: null, noteAt: null, lowTreadKey: null, script });

  await page.goto('/driver/start');
  await page
    .getByTestId('vehicle-picker')
    .getByRole('button', { name: /KV-S31/ })
    .click();
  await expect(page.getByTestId('glove-screen')).toBeVisible();
  const clientId = decodeURIComponent(new URL(page.url()).pathname.split('/').pop() ?? '');
  expect(scripts.filter((path) => SPANISH_WORDS.test(path))).toEqual([]);

  await page.getByTestId('start-walkaround').click();
  await expect(page.getByRole('heading', { level: 1, name: 'Finish and sign' })).toBeVisible({ timeout: 150_000 });
  const { spoken, turns } = await page.evaluate(() => {
    const w = window as unknown as { __spoken: string[]; __speechTurns: { answer: string | null }[] };
    return { spoken: w.__spoken, turns: w.__speechTurns };
  });
  // From the switch on the stops are said in Spanish, beginning with the one that was pending.
  const spanish = buildChecklist(
    [{ unitNumber: truck.unitNumber, kind: truck.kind, config: truck.config }],
    'pre_trip',
    'es',
  );
  const switched = spoken.findIndex((text) => text.startsWith('Cambiando a español.'));
  expect(spoken[switched]).toContain(spanish.stops[1]?.prompt);
  expect(spoken.slice(switched + 1)).toContain(spanish.stops[2]?.prompt);
  // Every answer after the switch was understood at once: nothing asked again, no waiting.
  expect(turns.map((turn) => turn.answer)).toEqual(['good', 'español', 'bien', ...rest.map(() => 'bien')]);
  expect(scripts.filter((path) => SPANISH_WORDS.test(path))).toHaveLength(1);

  await page.getByLabel('Your full name').fill('Tomas Reyes');
  await page.getByTestId('submit-report').click();
  await expect(page.getByTestId('report-view')).toBeVisible({ timeout: 30_000 });
  const list = (await (await page.request.get('/api/inspections', { headers })).json()) as InspectionPage;
  const inspection = (await (
    await page.request.get(`/api/inspections/${list.items[0]?.id ?? ''}`, { headers })
  ).json()) as InspectionResponse;
  expect(inspection.clientId).toBe(clientId);
  expect(inspection.results).toHaveLength(checklist.items.length);
  expect(inspection.results.filter((result) => result.answer !== 'pass')).toEqual([]);
});
