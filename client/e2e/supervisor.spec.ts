import { readFileSync } from 'node:fs';
import { expect, test, type APIRequestContext, type Page } from '@playwright/test';
import {
  INSPECTION_CSV_COLUMNS,
  type ChecklistItem,
  type InspectionResponse,
  type ResultUpsert,
  type VehicleResponse,
  type VoiceNoteResponse,
} from '@yardcall/shared';
import {
  apiHeaders,
  audioFixture,
  DEMO_PASSWORD,
  expectNoAxeViolations,
  pdfText,
  screenshot,
  withFakeMicrophone,
} from './support';

const DRIVER_EMAIL = 'driver@yardcall.test';
const SUPERVISOR_EMAIL = 'supervisor@yardcall.test';
// The demo fleet's straight truck: one unit, no trailer to pick.
const UNIT = 'KV-S31';
const RUSHED_UNIT = 'KV-103';
const WEBM_MAGIC = [0x1a, 0x45, 0xdf, 0xa3];

test.use({
  viewport: { width: 1280, height: 900 },
  acceptDownloads: true,
  // The reviewer presses "play" by hand; the test's clicks count as that gesture.
  ...withFakeMicrophone(audioFixture('en-note-cracked-marker-lens.wav'), { autoplay: true }),
});

// The first test's inspection with its voice note, for the second.
let notedInspectionId = '';

interface Prepared {
  inspection: InspectionResponse;
  note: VoiceNoteResponse;
  defectItem: ChecklistItem;
  vehicle: VehicleResponse;
}

// A real WebM/Opus note, recorded by Chromium's MediaRecorder from the fake microphone.
async function recordWebm(page: Page): Promise<Buffer> {
  await page.goto('/');
  const base64 = await page.evaluate(async () => {
    const stream = await navigator.mediaDevices.getUserMedia({
      audio: { autoGainControl: false, echoCancellation: false, noiseSuppression: false },
    });
    const recorder = new MediaRecorder(stream, { mimeType: 'audio/webm;codecs=opus' });
    const chunks: Blob[] = [];
    recorder.ondataavailable = (event) => chunks.push(event.data);
    const stopped = new Promise((resolve) => (recorder.onstop = resolve));
    recorder.start();
    await new Promise((resolve) => setTimeout(resolve, 3500));
    recorder.stop();
    await stopped;
    for (const track of stream.getTracks()) track.stop();
    const bytes = new Uint8Array(await new Blob(chunks).arrayBuffer());
    let binary = '';
    for (const byte of bytes) binary += String.fromCharCode(byte);
    return btoa(binary);
  });
  return Buffer.from(base64, 'base64');
}

// Starts, answers, notes and submits a walk-around as the driver would, over the real HTTP API.
async function submitInspection(
  request: APIRequestContext,
  headers: Record<string, string>,
  vehicle: VehicleResponse,
  options: { secondsPerAnswer: number; defect: boolean; note?: Buffer },
): Promise<{
  inspection: InspectionResponse;
  note: VoiceNoteResponse | null;
  defectItem: ChecklistItem | null;
} | null> {
  const clientId = `h4-${vehicle.unitNumber}-${Date.now().toString(36)}`;
  const answerCountGuess = 200;
  const started = new Date(Date.now() - answerCountGuess * options.secondsPerAnswer * 1000 - 60_000);
  const created = await request.post('/api/inspections', {
    headers,
    data: { vehicleIds: [vehicle.id], kind: 'pre_trip', startedAt: started.toISOString(), clientId, locale: 'en' },
  });
  if (created.status() === 409) return null;
  expect(created.status(), await created.text()).toBe(201);
  const inspection = (await created.json()) as InspectionResponse;
  const checklist = inspection.checklist.items;
  // A steer-tire tread depth below its limit: 2/32 in against 4/32 in (49 CFR 393.75(b)).
  const treadItem = checklist.find(
    (item) =>
      item.expects.type === 'measure' &&
      item.expects.quantity === 'tread_depth' &&
      item.position?.axleIndex === 0 &&
      item.unitIndex === 0,
  );
  const defectItem = options.defect
    ? (checklist.find((item) => item.safety && item.expects.type === 'check' && item.category === 'tires') ??
      checklist.find((item) => item.safety && item.expects.type === 'check'))
    : undefined;
  const results: ResultUpsert[] = checklist.map((item, index) => {
    const answeredAt = new Date(started.getTime() + (index + 1) * options.secondsPerAnswer * 1000).toISOString();
    const base = { itemKey: item.key, clientId: `${clientId}-r${index}`, answeredAt, confidence: 0.93 };
    if (options.defect && item.key === defectItem?.key) {
      return {
        ...base,
        answer: 'defect',
        detail: 'sidewall bulge on the outside',
        heard: 'defect sidewall bulge on the outside',
      };
    }
    if (options.defect && item.key === treadItem?.key) {
      return {
        ...base,
        answer: 'defect',
        measurement: { quantity: 'tread_depth', value: 2, unit: 'in/32' },
        heard: 'two thirty-seconds',
      };
    }
    return { ...base, answer: 'pass', heard: 'good' };
  });
  const put = await request.put(`/api/inspections/${inspection.id}/results`, { headers, data: { results } });
  expect(put.status(), await put.text()).toBe(200);

  let note: VoiceNoteResponse | null = null;
  if (options.note && defectItem) {
    const uploaded = await request.post(`/api/inspections/${inspection.id}/notes`, {
      headers,
      multipart: {
        file: { name: 'note.webm', mimeType: 'audio/webm', buffer: options.note },
        itemKey: defectItem.key,
        clientId: `${clientId}-note`,
        durationMs: '3500',
        heard: 'the marker lens is cracked on the left side',
      },
    });
    expect(uploaded.status(), await uploaded.text()).toBe(201);
    note = (await uploaded.json()) as VoiceNoteResponse;
  }

  const submitted = await request.post(`/api/inspections/${inspection.id}/submit`, {
    headers,
    data: { signature: { name: 'Marisol Vance' }, odometer: 184_220 },
  });
  expect(submitted.status(), await submitted.text()).toBe(200);
  return { inspection: (await submitted.json()) as InspectionResponse, note, defectItem: defectItem ?? null };
}

// The first unit (preferred ones first) whose walk-around may start now: the seed may hold a report
// that waits for the next driver's review (409), which this test does not sign.
async function submitOnFirstFreeUnit(
  request: APIRequestContext,
  headers: Record<string, string>,
  candidates: VehicleResponse[],
  options: { secondsPerAnswer: number; defect: boolean; note?: Buffer },
) {
  for (const vehicle of candidates) {
    const made = await submitInspection(request, headers, vehicle, options);
    if (made) return { ...made, vehicle };
  }
  throw new Error(`No unit of ${candidates.map((vehicle) => vehicle.unitNumber).join(', ')} can be inspected now.`);
}

async function prepare(page: Page): Promise<Prepared> {
  const headers = await apiHeaders(page.request, DRIVER_EMAIL);
  const vehicles = (await (await page.request.get('/api/vehicles', { headers })).json()) as VehicleResponse[];
  const single = vehicles.filter((vehicle) => vehicle.kind !== 'trailer');
  const preferred = (unit: string) => [
    ...single.filter((vehicle) => vehicle.unitNumber === unit),
    ...single.filter((vehicle) => vehicle.unitNumber !== unit),
  ];
  const webm = await recordWebm(page);
  expect(webm.subarray(0, 4)).toEqual(Buffer.from(WEBM_MAGIC));
  const made = await submitOnFirstFreeUnit(page.request, headers, preferred(UNIT), {
    secondsPerAnswer: 12,
    defect: true,
    note: webm,
  });
  // A second, rushed walk-around on another unit: one second per answer.
  await submitOnFirstFreeUnit(
    page.request,
    headers,
    preferred(RUSHED_UNIT).filter((vehicle) => vehicle.id !== made.vehicle.id),
    { secondsPerAnswer: 1, defect: false },
  );
  expect(made.note).toBeTruthy();
  return {
    inspection: made.inspection,
    note: made.note as VoiceNoteResponse,
    defectItem: made.defectItem as ChecklistItem,
    vehicle: made.vehicle,
  };
}

// Opens the app at its root and signs in there. Screens below are reached through the app's own
// links, as a person would.
async function signIn(page: Page, email: string): Promise<void> {
  await page.goto('/');
  await page.getByLabel('E-mail address').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
}

function audioState(page: Page) {
  return page.evaluate(() => {
    const audio = document.querySelector<HTMLAudioElement>('[data-testid="waveform-audio"]');
    return audio ? { paused: audio.paused, currentTime: audio.currentTime, playbackRate: audio.playbackRate } : null;
  });
}

// The last field of each CSV row is the inspection id (a UUID holds no comma or quote).
function csvInspectionIds(csv: string): { header: string; ids: string[] } {
  const lines = csv
    .replace(/^\uFEFF/, '')
    .split(/\r?\n/)
    .filter(Boolean);
  const header = lines[0] ?? '';
  const ids = lines.slice(1).map((line) => line.slice(line.lastIndexOf(',') + 1).replace(/"/g, ''));
  return { header, ids };
}

test('a supervisor finds a defect report on the board and in the list, replays, trims and exports it', async ({
  page,
}) => {
  test.setTimeout(180_000);
  const prepared = await prepare(page);
  notedInspectionId = prepared.inspection.id;

  // Fleet board: the unit just parked comes first, with why, since when and the inspection.
  await signIn(page, SUPERVISOR_EMAIL);
  await expect(page.getByRole('heading', { level: 1, name: 'Fleet board' })).toBeVisible();
  const units = page.getByTestId('board-unit');
  await expect(units.first()).toHaveAttribute('data-status', 'out_of_service');
  const parked = page.locator(`[data-testid="board-unit"][data-unit="${UNIT}"]`);
  await expect(parked).toHaveAttribute('data-status', 'out_of_service');
  await expect(parked.getByTestId('vehicle-status')).toHaveText(/Out of service/);
  await expect(parked.getByText(/Out of service since/)).toBeVisible();
  await expect(parked.getByTestId('board-defects')).toContainText(prepared.defectItem.title);
  await expect(parked.getByTestId('board-last-inspection')).toBeVisible();
  await expect(parked).toContainText('by ');
  await screenshot(page, 'supervisor-board');
  await expectNoAxeViolations(page, 'the fleet board');

  // Inspections: filter by unit and defects; the address keeps the filters.
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Inspections' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Inspections' })).toBeVisible();
  await expect(page.getByTestId('inspection-row').first()).toBeVisible();
  await page.getByLabel('Unit', { exact: true }).selectOption(prepared.vehicle.id);
  await page.getByLabel('With defects only').check();
  await expect(page).toHaveURL(new RegExp(`vehicleId=${prepared.vehicle.id}`));
  await expect(page).toHaveURL(/hasDefects=true/);
  const rows = page.getByTestId('inspection-row');
  await expect(rows).toHaveCount(1);
  await expect(rows.first()).toHaveAttribute('data-inspection-id', prepared.inspection.id);
  await screenshot(page, 'supervisor-inspections-filtered');
  await expectNoAxeViolations(page, 'the inspections table');

  // The rushed flag filter finds the other walk-around and not this one.
  await page.getByTestId('clear-filters').click();
  await page.getByLabel('Rushed only').check();
  await expect(page).toHaveURL(/rushed=true/);
  await expect(page.getByTestId('inspection-row').first()).toBeVisible();
  await expect(page.locator(`[data-inspection-id="${prepared.inspection.id}"]`)).toHaveCount(0);
  await page.getByLabel('Rushed only').uncheck();
  await page.getByLabel('Unit', { exact: true }).selectOption(prepared.vehicle.id);
  await page.getByLabel('With defects only').check();
  await expect(rows).toHaveCount(1);

  // CSV export holds exactly the rows the table shows.
  const shownIds = await rows.evaluateAll((elements) =>
    elements.map((element) => element.getAttribute('data-inspection-id')),
  );
  const csvDownload = page.waitForEvent('download');
  await page.getByTestId('export-csv').click();
  const csvFile = await (await csvDownload).path();
  const csv = csvInspectionIds(readFileSync(csvFile, 'utf8'));
  expect(csv.header.replace(/"/g, '')).toBe(INSPECTION_CSV_COLUMNS.join(','));
  expect(csv.ids).toEqual(shownIds);

  // The inspection: header, flags, route, answers, notes.
  await rows.first().getByTestId('inspection-link').click();
  await expect(page.getByRole('heading', { level: 1, name: new RegExp(UNIT) })).toBeVisible();
  await expect(page.getByTestId('fact-units')).toContainText(UNIT);
  await expect(page.getByTestId('timeline-zone').first()).toBeVisible();
  const defectRow = page.locator(`[data-testid="inspection-item"][data-item-key="${prepared.defectItem.key}"]`);
  await expect(defectRow).toHaveAttribute('data-trouble', 'true');
  await expect(defectRow).toContainText('Needs attention');
  await expect(defectRow).toContainText('sidewall bulge');
  await expect(page.getByText('Out of limit', { exact: false }).first()).toBeVisible();
  await expect(page.locator('[data-testid="waveform-player"][data-ready="true"]')).toBeVisible({ timeout: 20_000 });
  await screenshot(page, 'supervisor-inspection');
  await expectNoAxeViolations(page, 'the inspection page');

  // Narrowed to what needs attention: the two defect items (one holds the note) and nothing else.
  await page.getByLabel('Show only items that need attention or have a note').check();
  await expect(page.getByTestId('inspection-item')).toHaveCount(2);
  await screenshot(page, 'supervisor-inspection-focused');

  // "Play note" on the item plays that note in the waveform player.
  await defectRow.getByTestId('play-item-note').click();
  await expect.poll(async () => (await audioState(page))?.paused, { timeout: 10_000 }).toBe(false);
  await expect.poll(async () => (await audioState(page))?.currentTime ?? 0, { timeout: 10_000 }).toBeGreaterThan(0.3);
  await expect(page.getByTestId('waveform')).toBeFocused();
  await page.getByLabel('Speed').selectOption('1.5');
  await expect.poll(async () => (await audioState(page))?.playbackRate).toBe(1.5);
  await screenshot(page, 'supervisor-note-playing');
  await page.getByTestId('play-pause').click();
  await expect.poll(async () => (await audioState(page))?.paused).toBe(true);

  // Trim 0.5 s to 2.0 s and download the clip through ffmpeg.wasm.
  await page.getByLabel('Clip start (seconds)').fill('0.5');
  await page.getByLabel('Clip end (seconds)').fill('2');
  await page.getByLabel('File type').selectOption('webm');
  const clipDownload = page.waitForEvent('download', { timeout: 90_000 });
  await page.getByTestId('download-clip').click();
  // Either the clip arrives, or the player says why not (then the test fails with those words).
  const trimmer = page.getByTestId('clip-trimmer');
  const outcome = await Promise.race([
    clipDownload,
    trimmer
      .getByRole('alert')
      .waitFor({ timeout: 90_000 })
      .then(async () => (await trimmer.getByRole('alert').textContent()) ?? 'error'),
  ]);
  if (typeof outcome === 'string') throw new Error(`The clip was not made: ${outcome}`);
  const clip = outcome;
  expect(clip.suggestedFilename()).toMatch(/^note-.*-clip-0m00\.5s-0m02\.0s\.webm$/);
  const clipBytes = readFileSync(await clip.path());
  expect(clipBytes.length).toBeGreaterThan(1000);
  expect([...clipBytes.subarray(0, 4)]).toEqual(WEBM_MAGIC);
  // The clip is shorter than the note it came from.
  expect(clipBytes.length).toBeLessThan(prepared.note.sizeBytes);
  await screenshot(page, 'supervisor-clip-made');

  // The report PDF holds what the page shows: the unit, each defect with the driver's words, the note.
  const pdfDownload = page.waitForEvent('download');
  await page.getByTestId('download-pdf').click();
  const pdfPath = await (await pdfDownload).path();
  const flat = pdfText(readFileSync(pdfPath)).replace(/\s+/g, ' ');
  expect(flat).toContain(UNIT);
  expect(flat).toContain(prepared.defectItem.title);
  expect(flat).toContain('sidewall bulge');
  expect(flat).toContain('the marker lens is cracked');

  // The same page at 200 % text.
  await page.evaluate(() => (document.documentElement.style.fontSize = '200%'));
  await screenshot(page, 'supervisor-inspection-200');
  await expectNoAxeViolations(page, 'the inspection page at 200 % text');
});

test('a note this browser says it cannot play is converted with ffmpeg.wasm, with progress, then plays', async ({
  page,
}) => {
  test.setTimeout(120_000);
  // As a browser without WebM would answer: "" for WebM, the others unchanged.
  await page.addInitScript(() => {
    const prototype = HTMLMediaElement.prototype;
    const original = Object.getOwnPropertyDescriptor(prototype, 'canPlayType')?.value as (
      this: HTMLMediaElement,
      type: string,
    ) => CanPlayTypeResult;
    prototype.canPlayType = function (this: HTMLMediaElement, type: string) {
      return type.toLowerCase().startsWith('audio/webm') ? '' : original.call(this, type);
    };
  });
  const headers = await apiHeaders(page.request, SUPERVISOR_EMAIL);
  const list = (await (
    await page.request.get('/api/inspections', { headers, params: { hasDefects: true } })
  ).json()) as { items: { id: string }[] };
  const withNote = list.items.find((item) => item.id === notedInspectionId);
  test.skip(!withNote, 'runs after the first test made a noted inspection');
  await signIn(page, SUPERVISOR_EMAIL);
  await expect(page.getByRole('heading', { level: 1, name: 'Fleet board' })).toBeVisible();
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Inspections' }).click();
  await page.getByLabel('With defects only').check();
  // Watched from before the page opens: on loopback the conversion may take a fraction of a second.
  const progressShown = page.waitForSelector('[data-testid="ffmpeg-progress"]', { timeout: 30_000 });
  await page.locator(`[data-inspection-id="${notedInspectionId}"]`).getByTestId('inspection-link').click();
  await progressShown;
  await expect(page.locator('[data-testid="waveform-player"][data-ready="true"]')).toBeVisible({ timeout: 60_000 });
  await page.getByTestId('play-pause').click();
  await expect.poll(async () => (await audioState(page))?.currentTime ?? 0, { timeout: 10_000 }).toBeGreaterThan(0.3);
});
