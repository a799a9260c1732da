import { expect, test, type Page } from '@playwright/test';
import { DEFAULT_DISPLAY_SETTINGS, type TrainingAttemptListItem } from '@yardcall/shared';
import { installScriptedNarration } from './fake-speech';
import { audioFixture, expectNoAxeViolations, pageHeaders, screenshot, signIn, withFakeMicrophone } from './support';

// Any spoken fixture will do: the recording only needs sound in it; it loops while the student talks.
const MIC_WAV = audioFixture('en-note-cracked-marker-lens.wav');
const STUDENT = 'student@yardcall.test';
const TRAINER = 'trainer@yardcall.test';

// What the student says, phrase by phrase, as a recogniser would hand it over.
const NARRATION = [
  'starting at the front of the tractor checking the headlights and the windshield',
  'engine oil level is good coolant level is good',
  'left steer tire tread depth looks good no cuts or bulges',
];

test.use(withFakeMicrophone(MIC_WAV, { loop: true }));

async function signInAs(page: Page, email: string, heading: string): Promise<void> {
  await page.goto('/sign-in');
  await page.evaluate(() => localStorage.clear());
  await signIn(page, email);
  await expect(page.getByRole('heading', { level: 1, name: heading })).toBeVisible();
}

test('a student narrates a practice walk-around, the trainer reviews it, the student reads the feedback', async ({
  page,
}) => {
  test.setTimeout(420_000);
  await installScriptedNarration(page, NARRATION);

  // The student: pick a unit, start, narrate, stop.
  await signInAs(page, STUDENT, 'Driver home');
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Practice' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Practice walk-around' })).toBeVisible();
  await page.getByLabel('Unit').selectOption({ label: 'KV-101' });
  await screenshot(page, 'training-practice-start');
  await expectNoAxeViolations(page, 'the practice start screen');

  const start = page.getByTestId('practice-start');
  const box = await start.boundingBox();
  // 20 mm is about 76 CSS px.
  expect(box?.height ?? 0).toBeGreaterThanOrEqual(76);
  await start.click();
  await expect(page.getByTestId('practice-status')).toContainText('Recording');
  const heard = page.getByTestId('practice-heard-list').getByRole('listitem');
  await expect(heard).toHaveCount(NARRATION.length, { timeout: 30_000 });
  await expect(heard.last()).toContainText('left steer tire tread depth');
  await expect(page.getByTestId('practice-elapsed')).not.toHaveText('0:00');
  await screenshot(page, 'training-practice-recording');
  await expectNoAxeViolations(page, 'the practice screen while recording');
  await page.getByTestId('practice-stop').click();
  await expect(page.getByTestId('practice-done')).toBeVisible({ timeout: 30_000 });
  await expect(page.getByTestId('practice-done')).toContainText(/You named \d+ of \d+ items/);
  await screenshot(page, 'training-practice-done');
  await expectNoAxeViolations(page, 'the practice screen once sent');

  const mine = (await (
    await page.request.get('/api/training/attempts', { headers: await pageHeaders(page) })
  ).json()) as TrainingAttemptListItem[];
  const attempt = mine[0];
  expect(attempt?.status).toBe('finished');
  expect(attempt?.coverage?.named ?? 0).toBeGreaterThan(0);

  // The trainer: the attempt waits for review; open it, hear a named item, mark, grade, save.
  await signInAs(page, TRAINER, 'Training');
  const waiting = page.getByTestId('attempts-waiting-list');
  // The demo history holds another student's attempt waiting and one of Jordan's already reviewed.
  await expect(waiting.getByTestId('attempt-row').filter({ hasText: 'Jordan Pike' })).toHaveCount(1);
  await expect(page.getByTestId('training-student').filter({ hasText: 'Jordan Pike' })).toContainText('2 attempts');
  await screenshot(page, 'training-trainer-home');
  await expectNoAxeViolations(page, "the trainer's home");
  await waiting.getByRole('link', { name: /Jordan Pike/ }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Review a practice walk-around' })).toBeVisible();

  await expect(page.locator('[data-testid="attempt-item"][data-status="named"]').first()).toBeVisible();
  await expect(page.locator('[data-testid="attempt-item"][data-status="missed"]').first()).toBeVisible();
  const audio = page.getByTestId('attempt-audio');
  await expect(audio).toBeVisible({ timeout: 30_000 });

  const named = page.locator('[data-testid="attempt-item"][data-status="named"]').first();
  const play = named.getByTestId('item-play');
  const ms = Number(await play.getAttribute('data-ms'));
  expect(ms).toBeGreaterThan(0);
  await play.click();
  await expect(page.getByTestId('playing-from')).toBeVisible();
  const seconds = await audio.evaluate((element) => (element as HTMLAudioElement).currentTime);
  // Where playback stands: at the moment named, or just after it if it already played a little.
  expect(seconds).toBeGreaterThanOrEqual(ms / 1000 - 0.05);
  expect(seconds).toBeLessThan(ms / 1000 + 2);
  await audio.evaluate((element) => (element as HTMLAudioElement).pause());

  await named.getByTestId('item-comment').fill('Good: you said the position and what you looked for.');
  const missed = page.locator('[data-testid="attempt-item"][data-status="missed"]').first();
  await missed.getByTestId('item-comment').fill('Say this one out loud next time.');
  await page.getByRole('radio', { name: 'Needs practice' }).check();
  await page.getByTestId('review-comment').fill('A good start. Name every tire position as you reach it.');
  await screenshot(page, 'training-trainer-review');
  await expectNoAxeViolations(page, "the trainer's review page");
  await page.getByTestId('review-save').click();
  await expect(page.getByText('Review saved. The student can see it now.')).toBeVisible();

  // The student reads the grade, the comments and their progress.
  await signInAs(page, STUDENT, 'Driver home');
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'My feedback' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'My feedback' })).toBeVisible();
  // This attempt and the one the demo history holds.
  await expect(page.getByTestId('progress-point')).toHaveCount(2);
  await expect(page.getByTestId('progress-chart')).toContainText('Needs practice');
  await expect(page.getByTestId('feedback-attempt-list').getByTestId('attempt-row').first()).toContainText(
    'Needs practice',
  );
  await screenshot(page, 'training-student-feedback');
  await expectNoAxeViolations(page, "the student's feedback list");
  await page.getByTestId('feedback-attempt-list').getByRole('link').first().click();
  await expect(page.getByTestId('feedback-comment')).toHaveText(
    'A good start. Name every tire position as you reach it.',
  );
  await expect(page.getByTestId('item-feedback').filter({ hasText: 'Say this one out loud next time.' })).toBeVisible();
  await screenshot(page, 'training-student-attempt');
  await expectNoAxeViolations(page, "the student's attempt feedback");

  // Night theme at 200 % text: the same page stays readable and passes axe.
  const headers = await pageHeaders(page);
  const night = await page.request.patch('/api/auth/me/settings', {
    headers,
    data: { ...DEFAULT_DISPLAY_SETTINGS, theme: 'night', textScale: 200 },
  });
  expect(night.ok()).toBe(true);
  await page.reload();
  await expect(page.locator('html')).toHaveClass(/theme-night/);
  await expect(page.getByTestId('feedback-comment')).toBeVisible();
  await screenshot(page, 'training-student-attempt-night-200');
  await expectNoAxeViolations(page, "the student's attempt feedback in night theme at 200 %");
  const reset = await page.request.patch('/api/auth/me/settings', { headers, data: DEFAULT_DISPLAY_SETTINGS });
  expect(reset.ok()).toBe(true);
});
