import {
  buildChecklist,
  formatZonedTime,
  safetyCaution,
  summarizeInspection,
  type Checklist,
  type ChecklistItem,
  type InspectionResponse,
  type PendingAcknowledgement,
  type VehicleResponse,
  type DefectResponse,
  type ItemResultResponse,
  type VoiceNoteResponse,
} from '@yardcall/shared';
import { sampleTractor, sampleTrailer } from '@yardcall/shared/testing';
import { randomInt, randomUUID } from 'node:crypto';
import request from 'supertest';
import { renderInspectionReport, type InspectionReport } from '../src/reports/inspection-report';
import { pathBounds } from '../src/reports/signature-drawing';
import {
  bearer,
  binary,
  bodyOf,
  createVehicle,
  errorBody,
  OTHER_ORG_ADMIN,
  signIn,
  startInspection,
  suiteApp,
  tractorRequest,
} from './helpers';
import { makePng } from './media-fixtures';
import { pdfText, squash } from './pdf-text';

const PNG_DRAWING = `data:image/png;base64,${makePng().toString('base64')}`;

// The tractor and trailer of the hand-made reports: 281 items.
function tractorAndTrailer(): Checklist {
  return buildChecklist(
    [
      { unitNumber: 'KV-118', kind: 'tractor', config: sampleTractor().config },
      { unitNumber: 'KV-T40', kind: 'trailer', config: sampleTrailer().config },
    ],
    'pre_trip',
    'en',
  );
}

// Finds each stop's label, then each of its items' titles, in walk-around order in the text.
function missingInOrder(text: string, checklist: Checklist): string[] {
  const squashed = squash(text);
  const titleOf = new Map(checklist.items.map((i) => [i.key, i.title]));
  const missing: string[] = [];
  let cursor = 0;
  for (const stop of checklist.stops) {
    const at = squashed.indexOf(squash(stop.label), cursor);
    if (at < 0) {
      missing.push(stop.label);
      continue;
    }
    cursor = at;
    for (const key of stop.itemKeys) {
      const found = squashed.indexOf(squash(titleOf.get(key) ?? key), cursor);
      if (found < 0) missing.push(`${stop.label}: ${titleOf.get(key) ?? key}`);
    }
  }
  return missing;
}

function treadDefect(): DefectResponse {
  return {
    id: randomUUID(),
    inspectionId: 'a1b2c3d4-0000-4000-8000-000000000001',
    vehicle: { id: randomUUID(), unitNumber: 'KV-118', kind: 'tractor' },
    itemKey: 'u0.axle0.left.tire.tread',
    title: 'Tread depth',
    positionLabel: 'Tractor, steer axle, left tire',
    safety: true,
    detail: 'tread worn down to the wear bars on the outer edge',
    measurement: { quantity: 'tread_depth', value: 3, unit: 'in/32' },
    limit: { value: 4, unit: 'in/32', source: '49 CFR 393.75(b)' },
    status: 'repaired',
    createdAt: '2026-11-03T06:21:00.000Z',
    repair: {
      action: 'repaired',
      note: 'Replaced the left steer tire, torqued lug nuts to spec',
      deferredUntil: null,
      mechanic: { id: randomUUID(), name: 'Priya Natarajan' },
      signedAt: '2026-11-03T09:40:00.000Z',
    },
  };
}

function handMadeReport(defects: DefectResponse[]): InspectionReport {
  const heard: ItemResultResponse = {
    id: randomUUID(),
    clientId: 'r1',
    itemKey: 'u0.axle0.left.tire.tread',
    answer: 'defect',
    measurement: { quantity: 'tread_depth', value: 3, unit: 'in/32' },
    verdict: 'out_of_limit',
    limit: { value: 4, unit: 'in/32', source: '49 CFR 393.75(b)' },
    noReading: null,
    fixed: null,
    detail: null,
    heard: 'three thirty seconds',
    confidence: 0.92,
    answeredAt: '2026-11-03T06:20:00.000Z',
  };
  const note: VoiceNoteResponse = {
    id: randomUUID(),
    clientId: 'n1',
    itemKey: 'u0.axle0.left.tire.tread',
    heard: 'cupping on the shoulder as well',
    durationMs: 4200,
    mimeType: 'audio/webm',
    sizeBytes: 33600,
    sha256: 'ab'.repeat(32),
    createdAt: '2026-11-03T06:20:30.000Z',
    audioUrl: '/api/notes/x/audio',
  };
  return {
    organizationName: 'Kestrel Valley Freight',
    generatedAt: '2026-11-03T10:00:00.000Z',
    vehicles: [
      { unitNumber: 'KV-118', kind: 'tractor', vin: '7YCTA3K28SN100217', plate: 'KVF 9101' },
      { unitNumber: 'KV-T40', kind: 'trailer', vin: '7YCVD2F10SN200114', plate: 'KVT 9102' },
    ],
    inspection: {
      id: 'a1b2c3d4-0000-4000-8000-000000000001',
      kind: 'pre_trip',
      status: 'submitted',
      locale: 'en',
      startedAt: '2026-11-03T06:02:00.000Z',
      submittedAt: '2026-11-03T06:31:00.000Z',
      odometer: 412803,
      location: 'Kestrel Valley yard, bay 3',
      driver: { id: randomUUID(), name: 'Dana Okafor' },
      defects,
      results: [heard],
      notes: [note],
      requiredReadings: [],
      checklist: tractorAndTrailer(),
      summary: { fixedOnTheSpot: [], checkedWithoutReading: [], noGauge: [] },
    },
    signatures: [
      {
        role: 'driver',
        name: 'Dana Okafor',
        signerName: 'Dana Okafor',
        statement: 'I inspected units KV-118 and KV-T40 and report the defects listed.',
        signedAt: '2026-11-03T06:31:00.000Z',
        drawing: 'M10 40 C 20 10, 40 10, 50 40 S 80 70, 90 40 l 30 -5 h 10 v 8 z',
      },
      {
        role: 'mechanic',
        name: 'Priya Natarajan',
        signerName: 'Priya Natarajan',
        statement: 'The defect was repaired.',
        signedAt: '2026-11-03T09:40:00.000Z',
        drawing: PNG_DRAWING,
      },
      {
        role: 'next_driver',
        name: 'Tomas Reyes',
        signerName: 'Tomas Reyes',
        statement: 'I reviewed the last report and the repair certification.',
        signedAt: '2026-11-03T11:05:00.000Z',
        drawing: null,
      },
    ],
  };
}

describe('inspection report PDF (built from a hand-made inspection)', () => {
  // One render of the full report serves the tests that only read it.
  let pdf: Buffer;
  let text: string;
  beforeAll(async () => {
    pdf = await renderInspectionReport(handMadeReport([treadDefect()]));
    text = (await pdfText(pdf)).text;
  });

  it('lists the organisation, vehicles, driver, times, odometer and location', () => {
    for (const expected of [
      'Pre-trip inspection report',
      'Kestrel Valley Freight',
      'Unit KV-118 (Tractor)',
      'VIN 7YCTA3K28SN100217',
      'Plate KVF 9101',
      'Unit KV-T40 (Trailer)',
      'Driver: Dana Okafor',
      'Started: 2026-11-03 06:02 UTC',
      'Submitted: 2026-11-03 06:31 UTC',
      'Odometer: 412,803',
      'Location: Kestrel Valley yard, bay 3',
    ]) {
      expect({ expected, found: squash(text).includes(squash(expected)) }).toEqual({ expected, found: true });
    }
  });

  it("shows each defect with its position, the driver's words, the measurement, its limit and source, and the repair", () => {
    for (const expected of [
      'Defects (1)',
      'Tread depth: Tractor, steer axle, left tire (unit KV-118), safety item',
      'Driver\'s words: "tread worn down to the wear bars on the outer edge"',
      'Heard: "three thirty seconds"',
      'Voice note (4.2 s): "cupping on the shoulder as well"',
      '49 CFR 393.75(b)',
      'Status: Repaired',
      'by Priya Natarajan, 2026-11-03 09:40 UTC: Replaced the left steer tire, torqued lug nuts to spec',
    ]) {
      expect({ expected, found: squash(text).includes(squash(expected)) }).toEqual({ expected, found: true });
    }
    expect(text).toMatch(/Measured:\s*3\b[^;]*;\s*limit\s*4\b/);
  });

  it('carries the safety caution and every signature with its statement', async () => {
    for (const expected of [
      safetyCaution('en'),
      'Driver: Dana Okafor, 2026-11-03 06:31 UTC',
      'I inspected units KV-118 and KV-T40 and report the defects listed.',
      'Mechanic: Priya Natarajan, 2026-11-03 09:40 UTC',
      'Next driver: Tomas Reyes, 2026-11-03 11:05 UTC',
      'I reviewed the last report and the repair certification.',
    ]) {
      expect({ expected, found: squash(text).includes(squash(expected)) }).toEqual({ expected, found: true });
    }
    // The mechanic's PNG drawing is embedded as an image; without drawings there is none.
    expect(pdf.includes('/Subtype /Image')).toBe(true);
    const plain = handMadeReport([treadDefect()]);
    plain.signatures = plain.signatures.map((s) => ({ ...s, drawing: null }));
    expect((await renderInspectionReport(plain)).includes('/Subtype /Image')).toBe(false);
  });

  it('says so when no defect was found', async () => {
    const { text } = await pdfText(await renderInspectionReport(handMadeReport([])));
    expect(squash(text)).toContain(squash('Defects (0)'));
    expect(squash(text)).toContain(squash('No defect was found or reported on this inspection.'));
  });

  it('keeps the typed name and says so when a drawing cannot be shown', async () => {
    const report = handMadeReport([]);
    report.signatures = [{ ...report.signatures[0]!, drawing: '<script>alert(1)</script>' }];
    const { text } = await pdfText(await renderInspectionReport(report));
    expect(squash(text)).toContain(squash('Driver: Dana Okafor'));
    expect(squash(text)).toContain(squash('The drawn signature could not be shown; the typed name stands.'));
  });

  it('runs onto more pages for many defects, numbering each page', async () => {
    const many = Array.from({ length: 30 }, (_, i) => ({ ...treadDefect(), title: `Defect number ${i + 1}` }));
    const { pages, text } = await pdfText(await renderInspectionReport(handMadeReport(many)));
    expect(pages).toBeGreaterThan(2);
    expect(squash(text)).toContain(squash(`page ${pages} of ${pages}`));
    expect(squash(text)).toContain(squash('30. Defect number 30'));
  });
});

// A report with a tire fixed at the air line, a tread checked by eye and a pressure required but not gauged.
function readingsReport(): InspectionReport {
  const report = handMadeReport([]);
  const tire = { zone: 'left_side', safety: true };
  report.inspection.requiredReadings = ['tire_pressure'];
  report.inspection.summary = {
    fixedOnTheSpot: [
      {
        ...tire,
        itemKey: 'u1.axle0.left.outer.tire.pressure',
        title: 'Tire pressure',
        positionLabel: 'Trailer, axle 1, left outer tire',
        category: 'tires',
        reasons: ['reported', 'out_of_limit'],
        detail: 'low on the outer dual',
        measurement: { quantity: 'tire_pressure', value: 88, unit: 'psi' },
        verdict: 'out_of_limit',
        answeredAt: '2026-11-03T06:10:00.000Z',
        action: 'added air at the yard line',
        newMeasurement: { quantity: 'tire_pressure', value: 101, unit: 'psi' },
        newVerdict: 'ok',
        fixedAt: '2026-11-03T06:14:00.000Z',
        heard: 'fixed, added air, one oh one',
      },
    ],
    checkedWithoutReading: [
      {
        ...tire,
        itemKey: 'u0.axle1.right.outer.tire.tread',
        title: 'Tread depth',
        positionLabel: 'Tractor, axle 2, right outer tire',
        reason: 'visual',
      },
    ],
    noGauge: [
      {
        ...tire,
        itemKey: 'u0.axle1.right.outer.tire.pressure',
        title: 'Tire pressure',
        positionLabel: 'Tractor, axle 2, right outer tire',
        reason: 'no_gauge',
      },
    ],
  };
  return report;
}

describe('inspection report PDF: readings and fixes on the spot', () => {
  let text: string;
  beforeAll(async () => {
    text = squash((await pdfText(await renderInspectionReport(readingsReport()))).text);
  });

  it('lists each fix on the spot apart from the defects: item, what was done and the new reading', () => {
    for (const expected of [
      'Defects (0)',
      'Fixed on the spot (1)',
      'no shop defect was opened',
      '1. Tire pressure: Trailer, axle 1, left outer tire, safety item',
      'Found: "low on the outer dual"',
      'Reading found: 88 psi, out of limit',
      'What was done: added air at the yard line, 2026-11-03 06:14 UTC',
      'New reading: 101 psi, within limit',
      'Heard: "fixed, added air, one oh one"',
    ]) {
      expect({ expected, found: text.includes(squash(expected)) }).toEqual({ expected, found: true });
    }
    expect(text.indexOf(squash('Fixed on the spot'))).toBeGreaterThan(text.indexOf(squash('Defects (0)')));
  });

  it('says for each measured check without a value whether it was checked without a reading or had no gauge', () => {
    for (const expected of [
      'Required readings: every tire pressure, with a gauge',
      'Measured checks passed without a reading (2): no gauge 1, checked without a reading 1.',
      'Tire pressure: Tractor, axle 2, right outer tire: no gauge (reading required)',
    ]) {
      expect({ expected, found: text.includes(squash(expected)) }).toEqual({ expected, found: true });
    }
  });

  it('says no reading is required by default and shows no fixes section when nothing was fixed', async () => {
    const plain = squash((await pdfText(await renderInspectionReport(handMadeReport([treadDefect()])))).text);
    expect(plain).toContain(squash('Required readings: none (a measured check may be passed without a reading)'));
    expect(plain).toContain(squash('Every measured check that was passed has its reading.'));
    expect(plain).not.toContain(squash('Fixed on the spot'));
  });
});

// A clean tractor and trailer: every item passed, measured checks by eye, one stop every 14 s.
function cleanReport(timeZone: string): InspectionReport {
  const report = handMadeReport([]);
  const checklist = tractorAndTrailer();
  const start = Date.parse('2026-11-03T12:02:00.000Z');
  const results: ItemResultResponse[] = checklist.stops.flatMap((stop, n) =>
    stop.itemKeys.map((key) => {
      const item = checklist.items.find((i) => i.key === key)!;
      return {
        id: randomUUID(),
        clientId: key,
        itemKey: key,
        answer: 'pass' as const,
        measurement: null,
        verdict: null,
        limit: null,
        noReading: item.expects.type === 'measure' ? ('visual' as const) : null,
        fixed: null,
        detail: null,
        heard: 'all good',
        confidence: 0.9,
        answeredAt: new Date(start + (n + 1) * 14_000).toISOString(),
      };
    }),
  );
  const summary = summarizeInspection(
    checklist,
    results.map((r) => ({ itemKey: r.itemKey, answer: r.answer, answeredAt: r.answeredAt, noReading: r.noReading! })),
    { startedAt: new Date(start).toISOString() },
  );
  report.timeZone = timeZone;
  report.inspection = {
    ...report.inspection,
    startedAt: new Date(start).toISOString(),
    submittedAt: new Date(start + 15 * 60_000).toISOString(),
    checklist,
    results,
    notes: [],
    summary,
  };
  report.signatures = [report.signatures[0]!];
  return report;
}

describe('inspection report PDF: every item checked', () => {
  it('lists all 281 items of a clean tractor and trailer by stop, with stop times in the zone, on two pages', async () => {
    const report = cleanReport('America/Chicago');
    const { pages, text } = await pdfText(await renderInspectionReport(report));
    expect(report.inspection.checklist.items).toHaveLength(281);
    expect(missingInOrder(text, report.inspection.checklist)).toEqual([]);
    expect(squash(text)).toContain(squash('Items checked (281 of 281)'));
    // 12:02 UTC is 06:02 in Chicago in November (CST, UTC-6); the first stop was answered 14 s later.
    expect(squash(text)).toContain(squash('Started: 2026-11-03 06:02 CST'));
    expect(squash(text)).toContain(squash(`${report.inspection.checklist.stops[0]!.label} 06:02:`));
    expect(squash(text)).not.toContain(squash('12:02'));
    expect(pages).toBe(2);
    expect(squash(text)).toContain(squash('page 2 of 2'));
  });

  it('prints a reading with its limit and source, and a defect with the words heard', async () => {
    const report = cleanReport('UTC');
    const checklist = report.inspection.checklist;
    const tread = checklist.items.find((i) => i.expects.type === 'measure' && i.expects.quantity === 'tread_depth')!;
    const lamp = checklist.items.find((i) => i.expects.type === 'check' && !i.safety)!;
    report.inspection.results = report.inspection.results.map((r) =>
      r.itemKey === tread.key
        ? {
            ...r,
            noReading: null,
            measurement: { quantity: 'tread_depth', value: 9, unit: 'in/32' },
            verdict: 'ok',
            limit: { value: 4, unit: 'in/32', source: '49 CFR 393.75(b)' },
          }
        : r.itemKey === lamp.key
          ? { ...r, answer: 'defect', detail: 'lens cracked', heard: 'good except the lens is cracked' }
          : r,
    );
    const text = squash((await pdfText(await renderInspectionReport(report))).text);
    expect(text).toContain(squash(`${tread.title}: 9`));
    expect(text).toContain(squash('9 thirty-seconds (limit 4 thirty-seconds, 49 CFR 393.75(b)), within limit'));
    expect(text).toContain(squash(`${lamp.title}: DEFECT, "lens cracked", heard "good except the lens is cracked"`));
    expect(missingInOrder(text, checklist)).toEqual([]);
  });
});

describe('signature path bounds', () => {
  it('follows absolute and relative commands', () => {
    expect(pathBounds('M10 20 L30 5 l5 5 h-50 v40 z')).toEqual({ minX: -15, minY: 5, width: 50, height: 45 });
  });

  it('refuses text that is not path data', () => {
    expect(pathBounds('hello')).toBeNull();
    expect(pathBounds('M10')).toBeNull();
  });
});

describe('GET /api/inspections/:id/report.pdf', () => {
  const { t, tokens } = suiteApp();

  it("answers the submitted report with the driver's defect words and signature, and 404 to another organisation", async () => {
    const unit = `RP-${randomInt(10_000, 99_999)}`;
    // The report below is read for this VIN.
    const vehicle = await createVehicle(t.url, tokens.admin, tractorRequest(unit, { vin: '7YCTA3K28SN100217' }));
    const inspection = await startInspection(t.url, tokens.driver, {
      vehicleIds: [vehicle.id],
      kind: 'post_trip',
      location: 'North gate',
    });
    const item = inspection.checklist.items.find((i) => i.expects.type === 'check')!;
    // A post-trip measures tire pressures only: one fixed on the spot, one passed without a reading.
    const [pressure, measured] = inspection.checklist.items.filter(
      (i) => i.expects.type === 'measure' && i.expects.quantity === 'tire_pressure',
    ) as [ChecklistItem, ChecklistItem];
    const specPsi = pressure.limitContext!.specPsi!;
    const results = await request(t.url)
      .put(`/api/inspections/${inspection.id}/results`)
      .set(bearer(tokens.driver))
      .send({
        results: [
          {
            itemKey: item.key,
            answer: 'defect',
            detail: 'cracked lens, water inside',
            answeredAt: new Date().toISOString(),
            clientId: randomUUID(),
          },
          // "Good" at a measured check: a pass checked without a reading.
          { itemKey: measured.key, answer: 'pass', answeredAt: new Date().toISOString(), clientId: randomUUID() },
          {
            itemKey: pressure.key,
            answer: 'defect',
            measurement: { quantity: 'tire_pressure', value: specPsi - 20, unit: 'psi' },
            fixed: {
              action: 'added air',
              measurement: { quantity: 'tire_pressure', value: specPsi, unit: 'psi' },
              at: new Date().toISOString(),
            },
            answeredAt: new Date().toISOString(),
            clientId: randomUUID(),
          },
        ],
      });
    expect(results.status).toBe(200);
    const submit = await request(t.url)
      .post(`/api/inspections/${inspection.id}/submit`)
      .set(bearer(tokens.driver))
      .send({ signature: { name: 'Dana Okafor', drawing: 'M10 10 L40 20 L60 5' }, odometer: 98765 });
    expect(submit.status).toBeLessThan(300);

    const response = await binary(
      request(t.url).get(`/api/inspections/${inspection.id}/report.pdf`).set(bearer(tokens.supervisor)),
    );
    expect(response.status).toBe(200);
    expect(response.headers['content-type']).toBe('application/pdf');
    expect(response.headers['content-disposition']).toMatch(/^inline; filename="yardcall-post_trip-RP-\d+-/);
    const { text } = await pdfText(response.body as Buffer);
    for (const expected of [
      'Post-trip inspection report',
      `Unit ${unit} (Tractor)`,
      'VIN 7YCTA3K28SN100217',
      'Odometer: 98,765',
      'Location: North gate',
      item.title,
      item.positionLabel,
      'Driver\'s words: "cracked lens, water inside"',
      'Driver: Dana Okafor',
      'Defects (1)',
      'Fixed on the spot (1)',
      `1. ${pressure.title}: ${pressure.positionLabel}`,
      'What was done: added air',
      `New reading: ${specPsi} psi, within limit`,
    ]) {
      expect({ expected, found: squash(text).includes(squash(expected)) }).toEqual({ expected, found: true });
    }
    // The check passed without a value is marked so among the items (alone, or beside a defect at its stop).
    expect(squash(text)).toMatch(new RegExp(`${squash(measured.title)}(\\(byeye\\)|:ok,byeye)`));

    const other = await signIn(t.url, OTHER_ORG_ADMIN);
    const foreign = await request(t.url).get(`/api/inspections/${inspection.id}/report.pdf`).set(bearer(other));
    expect(foreign.status).toBe(404);
    expect(errorBody(foreign).message).toMatch(/inspection/i);
  });

  it("prints every item of a seeded demo report, and its times in the organisation's zone", async () => {
    const vehicles = bodyOf<VehicleResponse[]>(
      await request(t.url).get('/api/vehicles?q=KV-103').set(bearer(tokens.driver)),
    );
    const kv103 = vehicles.find((v) => v.unitNumber === 'KV-103')!;
    const pending = bodyOf<PendingAcknowledgement>(
      await request(t.url).get(`/api/vehicles/${kv103.id}/pending-acknowledgement`).set(bearer(tokens.driver)),
    );
    const zone = (timeZone: string) =>
      request(t.url).patch('/api/organizations/time-zone').set(bearer(tokens.admin)).send({ timeZone });
    expect((await zone('America/Denver')).status).toBe(200);
    try {
      const inspection = bodyOf<InspectionResponse>(
        await request(t.url).get(`/api/inspections/${pending.inspectionId}`).set(bearer(tokens.supervisor)),
      );
      const response = await binary(
        request(t.url).get(`/api/inspections/${pending.inspectionId}/report.pdf`).set(bearer(tokens.supervisor)),
      );
      expect(response.status).toBe(200);
      const { text } = await pdfText(response.body as Buffer);
      expect(missingInOrder(text, inspection.checklist)).toEqual([]);
      const denver = (iso: string) =>
        new Intl.DateTimeFormat('en-GB', {
          timeZone: 'America/Denver',
          hour: '2-digit',
          minute: '2-digit',
          hourCycle: 'h23',
        }).format(new Date(iso));
      expect(squash(text)).toContain(
        squash(`Started: ${formatZonedTime(new Date(inspection.startedAt), 'America/Denver')}`),
      );
      expect(formatZonedTime(new Date(inspection.startedAt), 'America/Denver')).toMatch(/M[SD]T$/);
      const lastAnswer = inspection.results
        .map((r) => r.answeredAt)
        .sort()
        .at(-1)!;
      expect(squash(text)).toContain(squash(`${inspection.checklist.stops.at(-1)!.label} ${denver(lastAnswer)}:`));
      // The steer tire's reading, its limit and source, and the repair signed by the shop.
      expect(squash(text)).toContain(
        squash('3 thirty-seconds (limit 4 thirty-seconds, 49 CFR 393.75(b)), out of limit'),
      );
      expect(squash(text)).toMatch(/Certifiedrepaired.*byRuiAlmeida/);
    } finally {
      expect((await zone('UTC')).status).toBe(200);
    }
  });
});
