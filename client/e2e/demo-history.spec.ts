import { expect, test, type Locator, type Page } from '@playwright/test';
import { ROLE_HOMES, screenshot, signIn } from './support';

// On a freshly seeded server every role's home already shows the demo organisation's history
// (server/src/database/seed-history.ts): weeks of walk-arounds, the shop's defects, the supervisor's
// day, practice walk-arounds and the outbox. Screenshots go to .test-output/screenshots/demo-*.png.

const home = (role: (typeof ROLE_HOMES)[number]['role']) => ROLE_HOMES.find((h) => h.role === role)!;

async function openHome(page: Page, role: (typeof ROLE_HOMES)[number]['role']): Promise<void> {
  const { email, path, heading } = home(role);
  await signIn(page, email);
  await expect(page).toHaveURL(new RegExp(`${path}$`));
  await expect(page.getByRole('heading', { level: 1, name: heading })).toBeVisible();
}

// The length Chromium decodes from a player's audio: real Opus from test-audio/demo/, not a stand-in.
async function decodedSeconds(player: Locator): Promise<number> {
  return player.evaluate(
    (element: HTMLAudioElement) =>
      new Promise<number>((resolve) => {
        const settle = () => resolve(Number.isFinite(element.duration) ? element.duration : 0);
        if (element.readyState >= 1) settle();
        else element.addEventListener('loadedmetadata', settle, { once: true });
      }),
  );
}

test.use({ viewport: { width: 1280, height: 900 } });

test("the driver's home shows their walk-arounds, today's pre-trip first", async ({ page }) => {
  await openHome(page, 'driver');
  await expect(page.getByText('Units KV-101, KV-T21').first()).toBeVisible();
  await expect(page.getByText('Units KV-S31').first()).toBeVisible();
  await screenshot(page, 'demo-driver-home');
});

test("the shop shows the open air line that keeps KV-T22 out of service, with the driver's voice note, and the deferred mud flap", async ({
  page,
}) => {
  await openHome(page, 'mechanic');
  await expect(page.getByText('Trailer air lines').first()).toBeVisible();
  await expect(page.getByText(/KV-T22/).first()).toBeVisible();
  const note = page.getByTestId('defect-note-audio').first();
  await expect(note).toHaveAttribute('data-ready', 'true');
  expect(await decodedSeconds(note)).toBeGreaterThan(3);
  await expect(page.getByTestId('defect-note').first()).toContainText('chafed through the outer cover');
  await expect(page.getByText('Deferred until').first()).toBeVisible();
  await screenshot(page, 'demo-mechanic-home');
});

test("the supervisor's board shows today: a pre-trip, a unit used without one, and KV-T22 out of service since its report and why", async ({
  page,
}) => {
  await openHome(page, 'supervisor');
  const summary = page.getByTestId('board-today-summary');
  await expect(summary).toContainText('Used without a pre-trip: 1');
  await expect(summary).toContainText(
    'a post-trip or en-route inspection of the unit today with no pre-trip before it',
  );
  const unit = (name: string) => page.locator(`[data-testid="board-unit"][data-unit="${name}"]`);
  await expect(unit('KV-T22')).toHaveAttribute('data-status', 'out_of_service');
  await expect(unit('KV-T22')).toContainText('Out of service since');
  await expect(unit('KV-T22')).toContainText('Trailer air lines');
  await expect(unit('KV-S31').getByTestId('board-today')).toHaveAttribute('data-today', 'used-without-pre-trip');
  await expect(unit('KV-S31').getByTestId('board-today')).toContainText('Tomas Reyes');
  await expect(unit('KV-101').getByTestId('board-today')).toHaveAttribute('data-today', 'pre-trip');
  await expect(unit('KV-T21').getByTestId('board-today')).toHaveAttribute('data-today', 'pre-trip');
  await expect(unit('KV-102').getByTestId('board-today')).toHaveAttribute('data-today', 'none');
  await screenshot(page, 'demo-supervisor-home');
});

test('the trainer sees one practice walk-around reviewed and one waiting, each with its recording', async ({
  page,
}) => {
  await openHome(page, 'trainer');
  await expect(page.getByText('Jordan Pike').first()).toBeVisible();
  await expect(page.getByText('Needs practice').first()).toBeVisible();
  await screenshot(page, 'demo-trainer-home');
  await page
    .getByText(/Noor Haddad · KV-101/)
    .first()
    .click();
  const recording = page.getByTestId('attempt-audio');
  await expect(recording).toBeVisible();
  expect(await decodedSeconds(recording)).toBeGreaterThan(10);
  await expect(page.getByTestId('attempt-item').first()).toBeVisible();
});

test("the admin's outbox holds the history's safety-defect e-mails", async ({ page }) => {
  await openHome(page, 'admin');
  await screenshot(page, 'demo-admin-home');
  await page
    .getByRole('link', { name: /outbox/i })
    .first()
    .click();
  await expect(page.getByText(/Safety defect on unit KV-T22/).first()).toBeVisible();
  await screenshot(page, 'demo-admin-outbox');
});
