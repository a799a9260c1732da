import { expect, test, type APIRequestContext, type Browser, type Page } from '@playwright/test';
import type { InspectionPage, InspectionResponse, VehicleResponse } from '@yardcall/shared';
import { installFakeSpeech } from './fake-speech';
import {
  apiHeaders,
  audioFixture,
  drawSignature,
  expectNoAxeViolations,
  screenshot,
  signIn,
  withFakeMicrophone,
} from './support';

const UNIT = 'KV-102';
// The steer tire's tread, said below the 4/32 in a steer tire needs (49 CFR 393.75(b)).
const LOW_TREAD_KEY = 'u1.axle1.left.tire.tread';
const DRIVER_WORDS = 'worn to the wear bars on the outside edge';
const REPAIR_NOTE = 'Replaced the left steer tire; new tread 18/32 in.';

// The mechanic plays the driver's note without a click on the player's own shadow button; the
// driver's phone records from the fake microphone.
test.use(withFakeMicrophone(audioFixture('en-note.wav'), { autoplay: true }));

async function vehicleByUnit(request: APIRequestContext, headers: Record<string, string>): Promise<VehicleResponse> {
  const vehicles = (await (await request.get('/api/vehicles', { headers })).json()) as VehicleResponse[];
  const vehicle = vehicles.find((v) => v.unitNumber === UNIT);
  if (!vehicle) throw new Error(`No ${UNIT} in the demo fleet.`);
  return vehicle;
}

async function newPage(browser: Browser, mobile: boolean): Promise<Page> {
  const context = await browser.newContext(
    mobile ? { viewport: { width: 390, height: 844 }, hasTouch: true, isMobile: true } : {},
  );
  return context.newPage();
}

// The driver's walk-around by voice alone on a phone, with the scripted recogniser and the fake
// microphone: a note at the left steer tire in the driver's words, its tread said below the limit
// and confirmed, then the report signed and submitted.
async function driverReportsLowTreadByVoice(browser: Browser, request: APIRequestContext): Promise<InspectionResponse> {
  const phone = await newPage(browser, true);
  await installFakeSpeech(phone, {
    answerTurns: null,
    skipAt: null,
    noteAt: null,
    lowTreadKey: LOW_TREAD_KEY,
    noteKey: LOW_TREAD_KEY,
    noteWords: DRIVER_WORDS,
  });
  await signIn(phone, 'tomas.reyes@yardcall.test');
  await expect(phone.getByRole('heading', { level: 1, name: 'Driver home' })).toBeVisible();
  await phone.goto('/driver/start');
  await phone
    .getByTestId('vehicle-picker')
    .getByRole('button', { name: new RegExp(UNIT) })
    .click();
  await phone.getByTestId('no-trailer').click();
  await expect(phone.getByTestId('glove-screen')).toBeVisible();
  const clientId = decodeURIComponent(new URL(phone.url()).pathname.split('/').pop() ?? '');
  await phone.getByTestId('start-walkaround').click();
  await expect(phone.getByRole('heading', { level: 1, name: 'Finish and sign' })).toBeVisible({ timeout: 200_000 });
  await phone.getByLabel('Your full name').fill('Tomas Reyes');
  await drawSignature(phone);
  await phone.getByTestId('submit-report').click();
  await expect(phone.getByTestId('report-view')).toBeVisible({ timeout: 30_000 });
  await phone.context().close();

  const headers = await apiHeaders(request, 'tomas.reyes@yardcall.test');
  const list = (await (await request.get('/api/inspections', { headers })).json()) as InspectionPage;
  for (const item of list.items) {
    const detail = (await (await request.get(`/api/inspections/${item.id}`, { headers })).json()) as InspectionResponse;
    if (detail.clientId === clientId) return detail;
  }
  throw new Error(`The walk-around ${clientId} did not reach the server.`);
}

test('a safety defect from a walk-around: the mechanic certifies it, the unit returns to service, the next driver acknowledges', async ({
  browser,
  request,
}) => {
  test.setTimeout(300_000);
  const report = await driverReportsLowTreadByVoice(browser, request);
  expect(report.status).toBe('submitted');
  expect(report.notes.map((note) => note.itemKey)).toEqual([LOW_TREAD_KEY]);
  expect(report.defects.map((d) => d.itemKey)).toEqual([LOW_TREAD_KEY]);
  expect(report.defects[0]?.safety).toBe(true);
  const driverHeaders = await apiHeaders(request, 'tomas.reyes@yardcall.test');
  expect((await vehicleByUnit(request, driverHeaders)).status).toBe('out_of_service');

  // The shop.
  const shop = await newPage(browser, false);
  await signIn(shop, 'mechanic@yardcall.test');
  await expect(shop.getByRole('heading', { level: 1, name: 'Shop' })).toBeVisible();
  const unit = shop.getByTestId('defect-unit').filter({ hasText: `Unit ${UNIT}` });
  await expect(unit).toBeVisible();
  await expect(unit.getByTestId('vehicle-status')).toHaveText(/Out of service/);
  const defect = unit.getByTestId('open-defect');
  await expect(defect).toHaveCount(1);
  // The driver's words come with the note recorded at the item.
  await expect(defect).toContainText(DRIVER_WORDS);
  await expect(defect.getByTestId('defect-measurement')).toHaveText('1 thirty-second');
  await expect(defect.getByTestId('defect-limit')).toContainText('49 CFR 393.75');
  await expect(defect.getByTestId('safety-caution')).toContainText('limits it checks are minimums');
  const audio = defect.getByTestId('defect-note-audio');
  await expect(audio).toHaveAttribute('data-ready', 'true');
  const played = await audio.evaluate(async (element: HTMLAudioElement) => {
    element.muted = true;
    await element.play();
    await new Promise((resolve) => setTimeout(resolve, 400));
    element.pause();
    return { time: element.currentTime, duration: element.duration };
  });
  expect(played.time).toBeGreaterThan(0);
  expect(played.duration).toBeGreaterThan(0.5);
  await screenshot(shop, 'mechanic-open-defects');
  await expectNoAxeViolations(shop, "the mechanic's open defects");

  await defect.getByTestId('record-repair').click();
  const form = defect.getByTestId('repair-form');
  // A safety defect cannot be deferred: the option is not there and the reason is said.
  await expect(form.getByRole('radio', { name: 'Deferred' })).toHaveCount(0);
  await expect(form).toContainText('Deferral is not offered');
  await form.getByRole('radio', { name: 'Repaired' }).check();
  await form.getByLabel('What was done').fill(REPAIR_NOTE);
  await form.getByLabel('Your full name').fill('Rui Almeida');
  await form.getByTestId('certify-defect').click();
  await expect(form.getByText('Draw your signature in the box to certify.')).toBeVisible();
  await drawSignature(shop);
  await screenshot(shop, 'mechanic-repair-form');
  await expectNoAxeViolations(shop, 'the repair form');
  await form.getByTestId('certify-defect').click();

  const notice = shop.getByTestId('certified-notice');
  await expect(notice).toContainText(`on unit ${UNIT}: Repaired`);
  await expect(notice.getByTestId('vehicle-status')).toHaveText(/In service/);
  await expect(shop.getByTestId('defect-unit').filter({ hasText: `Unit ${UNIT}` })).toHaveCount(0);
  await expect(shop.getByTestId('recent-repair').first()).toContainText(UNIT);
  await expect(shop.getByTestId('recent-repair').first()).toContainText(REPAIR_NOTE);
  await screenshot(shop, 'mechanic-certified');
  await expectNoAxeViolations(shop, 'the shop after the certification');
  expect((await vehicleByUnit(request, driverHeaders)).status).toBe('in_service');
  await shop.context().close();

  // The next driver, on a phone.
  const cab = await newPage(browser, true);
  await signIn(cab, 'driver@yardcall.test');
  await expect(cab.getByRole('heading', { level: 1, name: 'Driver home' })).toBeVisible();
  await cab.goto('/driver/start');
  await cab
    .getByTestId('vehicle-picker')
    .getByRole('button', { name: new RegExp(UNIT) })
    .click();
  await cab.getByTestId('no-trailer').click();
  const review = cab.getByTestId('pending-acknowledgement');
  await expect(review).toBeVisible();
  await expect(review.getByTestId('ack-blocked')).toContainText(`The pre-trip of unit ${UNIT} starts only after`);
  const repaired = review.getByTestId('acknowledged-defect');
  await expect(repaired).toHaveCount(1);
  await expect(repaired.getByTestId('ack-action')).toHaveText('Repaired');
  await expect(repaired).toContainText(REPAIR_NOTE);
  await expect(repaired).toContainText('Rui Almeida');
  // Nothing starts before the review is signed.
  await expect(cab.getByTestId('glove-screen')).toHaveCount(0);
  await screenshot(cab, 'next-driver-review');
  await expectNoAxeViolations(cab, "the next driver's review");

  await review.getByLabel('Your full name').fill('Dana Okafor');
  await drawSignature(cab);
  await review.getByTestId('sign-acknowledgement').click();
  await expect(cab.getByTestId('glove-screen')).toBeVisible({ timeout: 30_000 });
  const signatures = (await (
    await request.get(`/api/inspections/${report.id}`, {
      headers: await apiHeaders(request, 'supervisor@yardcall.test'),
    })
  ).json()) as InspectionResponse;
  expect(signatures.signatures.map((s) => s.role).sort()).toEqual(['driver', 'mechanic', 'next_driver']);
  await cab.context().close();
});
