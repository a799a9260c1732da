import { expect, test, type BrowserContext, type Page } from '@playwright/test';
import type { InspectionPage, InspectionResponse } from '@yardcall/shared';
import pg from 'pg';
import { stopChild } from '../../scripts/lib/run';
import { startServer, type RunningServer } from '../../scripts/lib/server';
import { freePort } from '../../scripts/lib/stack';
import { installFakeSpeech } from './fake-speech';
import { DEMO_PASSWORD, pageHeaders, screenshot } from './support';

// From a cold start with no signal to a signed report: the service worker opens the app, the phone
// keeps what the start needs, the report is signed offline and arrives once, whole, when the
// network returns, even when the server goes down and comes back while the phone syncs.

const STRAIGHT_TRUCK = 'KV-S31';

test.use({ viewport: { width: 390, height: 844 }, hasTouch: true, isMobile: true });

// Resolves once the service worker controls the page and holds every precached file.
async function waitForServiceWorker(page: Page): Promise<void> {
  await page.evaluate(async () => {
    await navigator.serviceWorker.ready;
  });
  await expect
    .poll(() => page.evaluate(() => navigator.serviceWorker.controller !== null), { timeout: 30_000 })
    .toBe(true);
}

async function inspectionByClientId(page: Page, baseUrl: string, clientId: string): Promise<InspectionResponse | null> {
  const headers = await pageHeaders(page);
  const list = (await (
    await page.request.get(`${baseUrl}/api/inspections?limit=20`, { headers })
  ).json()) as InspectionPage;
  for (const item of list.items) {
    const detail = (await (
      await page.request.get(`${baseUrl}/api/inspections/${item.id}`, { headers })
    ).json()) as InspectionResponse;
    if (detail.clientId === clientId) return detail;
  }
  return null;
}

function expectWhole(inspection: InspectionResponse | null): void {
  expect(inspection?.status).toBe('submitted');
  const keys = inspection?.results.map((result) => result.itemKey) ?? [];
  // Every item once: none lost, none doubled.
  expect(new Set(keys).size).toBe(keys.length);
  expect([...keys].sort()).toEqual(inspection?.checklist.items.map((item) => item.key).sort());
  const driver = inspection?.signatures.find((signature) => signature.role === 'driver');
  expect(driver?.name).toBe('Tomas Reyes');
  // Signed on the phone with no signal, received later by the server.
  expect(Date.parse(driver?.signedAt ?? '')).toBeLessThanOrEqual(Date.parse(inspection?.submittedAt ?? ''));
}

// Signed in with signal: the home, the start screen and the service worker's copy of the app.
async function signInWithSignal(page: Page, baseUrl: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail address').fill('driver@yardcall.test');
  await page.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Driver home' })).toBeVisible();
  await waitForServiceWorker(page);
  await page.goto(`${baseUrl}/driver/start`);
  await expect(
    page.getByTestId('vehicle-picker').getByRole('button', { name: new RegExp(STRAIGHT_TRUCK) }),
  ).toBeVisible();
  await page.goto(`${baseUrl}/driver`);
  await expect(page.getByTestId('recent-reports').or(page.getByTestId('empty-state'))).toBeVisible();
}

// With no signal: a cold load of the start screen, a straight truck, the walk-around by voice to
// the finish, and the signature. Returns the walk-around's client id.
async function walkAroundOffline(
  firstPage: Page,
  context: BrowserContext,
  baseUrl: string,
  reloadAtTurn: number | null,
): Promise<{ clientId: string; page: Page }> {
  let page = firstPage;
  await context.setOffline(true);
  await page.reload();
  await expect(page.getByRole('heading', { level: 1, name: 'Driver home' })).toBeVisible();

  await page.goto(`${baseUrl}/driver/start`);
  await expect(page.getByTestId('kept-copy')).toBeVisible();
  await page
    .getByTestId('vehicle-picker')
    .getByRole('button', { name: new RegExp(STRAIGHT_TRUCK) })
    .click();
  await expect(page.getByTestId('glove-screen')).toBeVisible();
  const clientId = decodeURIComponent(new URL(page.url()).pathname.split('/').pop() ?? '');
  await page.getByTestId('start-walkaround').click();

  if (reloadAtTurn !== null) {
    await expect
      .poll(() => page.evaluate(() => (window as unknown as { __speechTurns: unknown[] }).__speechTurns.length))
      .toBeGreaterThanOrEqual(reloadAtTurn);
    const progress = await page.getByTestId('walkaround-progress').textContent();
    const stop = await page.getByTestId('walkaround-item').getAttribute('data-stop-key');
    // Reloaded cold in a fresh tab of the same phone (its service worker and store), whose fake
    // answers every turn to the end.
    const url = page.url();
    await page.close();
    page = await context.newPage();
    await installFakeSpeech(page, { answerTurns: null, skipAt: null, noteAt: null, lowTreadKey: null, onDevice: true });
    await page.goto(url);
    await expect(page.getByTestId('glove-screen')).toBeVisible();
    await expect(page.getByTestId('walkaround-progress')).toHaveText(progress ?? '');
    await expect(page.getByTestId('walkaround-item')).toHaveAttribute('data-stop-key', stop ?? '');
    await page.getByTestId('start-walkaround').click();
  }

  await expect(page.getByRole('heading', { level: 1, name: 'Finish and sign' })).toBeVisible({ timeout: 200_000 });
  // Answered to the end on the phone (a gap here is the walk-around's, not the outbox's).
  await expect(page.getByTestId('finish-unanswered')).toContainText('Every item is answered.');
  await page.getByLabel('Your full name').fill('Tomas Reyes');
  await page.getByTestId('submit-report').click();
  await expect(page.getByTestId('signed-waiting')).toHaveAttribute('data-sent', 'no');
  await expect(page.getByTestId('signed-waiting')).toContainText('Signed, waiting to send');
  return { clientId, page };
}

test('with no signal from a cold start: home, start, a walk-around reloaded at turn ten, signed, and sent whole when the network returns', async ({
  page: firstPage,
  context,
  baseURL,
}) => {
  test.setTimeout(300_000);
  const baseUrl = baseURL ?? '';
  await installFakeSpeech(firstPage, {
    answerTurns: 10,
    skipAt: null,
    noteAt: null,
    lowTreadKey: null,
    onDevice: true,
  });
  await signInWithSignal(firstPage, baseUrl);

  const { clientId, page } = await walkAroundOffline(firstPage, context, baseUrl, 10);

  // Reloaded with no signal: the report is still signed and waiting, and the home says so.
  await page.reload();
  await expect(page.getByTestId('signed-waiting')).toHaveAttribute('data-sent', 'no');
  await page.goto(`${baseUrl}/driver`);
  await expect(page.getByTestId('driver-signed-waiting')).toBeVisible();
  await screenshot(page, 'offline-driver-home-signed-waiting');

  await context.setOffline(false);
  await expect(page.getByTestId('driver-signed-waiting')).toHaveCount(0, { timeout: 60_000 });
  expectWhole(await inspectionByClientId(page, baseUrl, clientId));
});

// A second server of this test's own on the same database, so it can be stopped and started again.
function startOwnServer(databaseUrl: string, port: number): Promise<RunningServer> {
  return startServer({
    databaseUrl,
    port,
    quiet: true,
    env: {
      NODE_ENV: 'test',
      THROTTLE_LOGIN_LIMIT: '1000',
      JWT_SECRET: 'yardcall-offline-flow-secret-0123456789abcdef',
    },
  });
}

test('the server stopped and started again while the phone syncs: nothing lost, nothing doubled', async ({
  page,
  context,
}) => {
  test.setTimeout(300_000);
  const databaseUrl = process.env.DATABASE_URL;
  test.skip(!databaseUrl, 'needs DATABASE_URL (npm test passes the browser suite its database)');
  const port = await freePort();
  const baseUrl = `http://127.0.0.1:${port}`;
  let server = await startOwnServer(databaseUrl ?? '', port);
  const db = new pg.Client({ connectionString: databaseUrl });
  await db.connect();
  try {
    await installFakeSpeech(page, { answerTurns: null, skipAt: null, noteAt: null, lowTreadKey: null, onDevice: true });
    await signInWithSignal(page, baseUrl);
    const { clientId } = await walkAroundOffline(page, context, baseUrl, null);

    // The network returns; the server goes down as soon as the phone's first request reached it.
    await context.setOffline(false);
    await expect
      .poll(async () => (await db.query('SELECT 1 FROM inspections WHERE client_id = $1', [clientId])).rowCount, {
        timeout: 30_000,
        intervals: [20],
      })
      .toBe(1);
    // Killed outright, as a crash or a pulled plug would: requests in flight are lost mid-way.
    await stopChild(server.child, 'SIGKILL');
    await new Promise((resolve) => setTimeout(resolve, 1500));
    server = await startOwnServer(databaseUrl ?? '', port);

    // The finish screen turns into the report once the server has it.
    await expect(
      page.getByTestId('report-view').or(page.locator('[data-testid="signed-waiting"][data-sent="yes"]')),
    ).toBeVisible({
      timeout: 120_000,
    });
    expectWhole(await inspectionByClientId(page, baseUrl, clientId));
    const rows = await db.query<{ n: string }>(
      'SELECT count(*) AS n FROM item_results r JOIN inspections i ON i.id = r.inspection_id WHERE i.client_id = $1',
      [clientId],
    );
    const inspection = await inspectionByClientId(page, baseUrl, clientId);
    expect(Number(rows.rows[0]?.n)).toBe(inspection?.checklist.items.length);
  } finally {
    await db.end();
    await stopChild(server.child);
  }
});
