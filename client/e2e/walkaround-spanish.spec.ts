import { expect, test } from '@playwright/test';
import { installFakeSpeech } from './fake-speech';
import { inspectionByClientId, pretripChecklist, signIn, startUnit } from './support';

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
  const checklist = await pretripChecklist(page, 'KV-S31', 'en');
  const [first, second, ...rest] = checklist.stops;
  if (!first || !second) throw new Error('The straight truck has fewer than two stops.');
  // After the switch the driver answers in Spanish; the stop that was pending is asked again.
  const script: Record<string, string[]> = {
    [`stop:${first.key}`]: ['good'],
    [`stop:${second.key}`]: ['español', 'bien'],
  };
  for (const stop of rest) script[`stop:${stop.key}`] = ['bien'];
  await installFakeSpeech(page, { answerTurns: null, skipAt: null, noteAt: null, lowTreadKey: null, script });

  await startUnit(page, 'KV-S31', null);
  const clientId = decodeURIComponent(new URL(page.url()).pathname.split('/').pop() ?? '');
  expect(scripts.filter((path) => SPANISH_WORDS.test(path))).toEqual([]);

  await page.getByTestId('start-walkaround').click();
  await expect(page.getByRole('heading', { level: 1, name: 'Finish and sign' })).toBeVisible({ timeout: 150_000 });
  const { spoken, turns } = await page.evaluate(() => {
    const w = window as unknown as { __spoken: string[]; __speechTurns: { answer: string | null }[] };
    return { spoken: w.__spoken, turns: w.__speechTurns };
  });
  // From the switch on the stops are said in Spanish, beginning with the one that was pending.
  const spanish = await pretripChecklist(page, 'KV-S31', 'es');
  const switched = spoken.findIndex((text) => text.startsWith('Cambiando a español.'));
  expect(spoken[switched]).toContain(spanish.stops[1]?.prompt);
  expect(spoken.slice(switched + 1)).toContain(spanish.stops[2]?.prompt);
  // Every answer after the switch was understood at once: nothing asked again, no waiting.
  expect(turns.map((turn) => turn.answer)).toEqual(['good', 'español', 'bien', ...rest.map(() => 'bien')]);
  expect(scripts.filter((path) => SPANISH_WORDS.test(path))).toHaveLength(1);

  await page.getByLabel('Your full name').fill('Tomas Reyes');
  await page.getByTestId('submit-report').click();
  await expect(page.getByTestId('report-view')).toBeVisible({ timeout: 30_000 });
  const inspection = await inspectionByClientId(page, clientId);
  expect(inspection.results).toHaveLength(checklist.items.length);
  expect(inspection.results.filter((result) => result.answer !== 'pass')).toEqual([]);
});
