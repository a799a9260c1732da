import {
  buildChecklist,
  canonicalUnitOf,
  evaluateMeasurement,
  scoreNarration,
  summarizeInspection,
  type CertificationAction,
  type Checklist,
  type ChecklistItem,
  type InspectionKind,
  type ItemResult as SharedItemResult,
  type NarrationSegment,
  type Quantity,
  type SpotFix,
  type TrainingItemMark,
} from '@yardcall/shared';
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { In, type EntityManager } from 'typeorm';
import { Defect } from '../defects/entities/defect.entity';
import { Repair } from '../defects/entities/repair.entity';
import { defectsOfReport } from '../defects/defects.service';
import { refreshVehicleStatus } from '../defects/vehicle-status';
import { InspectionVehicle } from '../inspections/entities/inspection-vehicle.entity';
import { Inspection } from '../inspections/entities/inspection.entity';
import { ItemResult } from '../inspections/entities/item-result.entity';
import { Signature } from '../inspections/entities/signature.entity';
import { recurringDefectsOf } from '../inspections/review';
import { driverStatement, mechanicStatement, nextDriverStatement } from '../inspections/statements';
import { Photo } from '../notes/entities/photo.entity';
import { VoiceNote } from '../notes/entities/voice-note.entity';
import type { ObjectStorage } from '../storage/object-storage';
import { TrainingAttempt } from '../training/entities/training-attempt.entity';
import { TrainingReview } from '../training/entities/training-review.entity';
import { User } from '../users/entities/user.entity';
import { Vehicle } from '../vehicles/entities/vehicle.entity';

// The demo organisation's invented history: about eight weeks of walk-arounds, built with the shared
// checklists, limits and summary, so every row is one the product itself would have stored. Times are
// relative to the seeding moment; a fixed random seed makes the same history on every machine.

const HISTORY_DAYS = 56;
const RANDOM_SEED = 0x6b657374;
const HOUR_MS = 3_600_000;
const DAY_MS = 24 * HOUR_MS;
// Every seeded row's client id starts so: the history is there when one of them is.
export const HISTORY_CLIENT_PREFIX = 'seed-history-';

// The committed media (test-audio/make-demo-media.sh makes them; never made at run time).
const MEDIA_DIR = join(__dirname, '..', '..', '..', 'test-audio', 'demo');

// A stop answered at the common pace: about 15 s a stop (about 15 minutes for a tractor and trailer's 60
// stops; common practice, no published source). Each stop here takes 9 to 21 s.
const PACE_SECONDS = { min: 9, max: 21 };
// The one rushed walk-around: 4 s a stop, under RUSHED_RULE's 7.5 s a stop and its 5 s median gap.
const RUSHED_SECONDS_PER_STOP = 4;
const RESULT_BATCH = 8000;

// Mulberry32: small, fast and the same on every platform.
function randomFrom(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4_294_967_296;
  };
}

interface People {
  byEmail: Map<string, User>;
  mechanic: User;
  trainer: User;
}

interface Reading {
  itemKey: string;
  value: number;
  heard: string;
}

interface FoundDefectSpec {
  itemKey: string;
  detail: string;
  heard: string;
  // A reading that put it out of limit, in the quantity's canonical unit.
  value?: number;
  // A voice note recorded at the item: its file in test-audio/demo/.
  note?: string;
  photo?: string;
}

interface RepairSpec {
  action: CertificationAction;
  note: string;
  afterHours: number;
  // For a deferral: how long the shop defers it.
  deferDays?: number;
}

interface SpotFixSpec {
  itemKey: string;
  foundValue: number;
  fixedValue: number;
  detail: string;
  action: string;
  heard: string;
}

interface WalkaroundSpec {
  tag: string;
  driverEmail: string;
  units: string[];
  kind: InspectionKind;
  startedAt: Date;
  secondsPerStop?: number;
  readings?: Reading[];
  defects?: FoundDefectSpec[];
  fix?: SpotFixSpec;
  // The shop's word on every defect of the report; none leaves them open.
  repair?: RepairSpec;
  // Whether the next driver's review is left waiting (the demo's KV-103); by default it is signed
  // before the unit's next walk-around.
  reviewWaits?: boolean;
}

export interface HistoryCounts {
  inspections: number;
  itemResults: number;
  defects: number;
  voiceNotes: number;
  photos: number;
  trainingAttempts: number;
}

// Who drives what: the tractor and trailer each driver takes out (the straight truck goes local).
const CREWS = [
  { driverEmail: 'driver@yardcall.test', units: ['KV-101', 'KV-T21'] },
  { driverEmail: 'tomas.reyes@yardcall.test', units: ['KV-102', 'KV-T22'] },
  { driverEmail: 'aiyana.brooks@yardcall.test', units: ['KV-103', 'KV-T23'] },
] as const;

const LOCATION = 'Kestrel Valley yard';

function isWeekday(date: Date): boolean {
  const day = date.getUTCDay();
  return day !== 0 && day !== 6;
}

// The whole story, oldest first: routine pre-trips with a few readings, Friday post-trips, and the
// events the demo is about on the working days named here (1 = the last working day before today).
function historyPlan(now: Date, random: () => number): WalkaroundSpec[] {
  const today = Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate());
  const at = (daysAgo: number, hour: number, jitterMinutes = 25) =>
    new Date(today - daysAgo * DAY_MS + hour * HOUR_MS + Math.floor(random() * jitterMinutes) * 60_000);
  const plan: WalkaroundSpec[] = [];
  const special = new Map<string, (spec: WalkaroundSpec) => WalkaroundSpec>();
  // Tomas's trailer air line, found on his post-trip two days ago: KV-T22 is out of service since.
  special.set('2:post:tomas.reyes@yardcall.test', (spec) => ({
    ...spec,
    defects: [
      {
        itemKey: 'u2.coupling.air_lines',
        detail: 'service air line chafed through at the glad hand, leaking',
        heard: 'defect, the service line is chafed through at the glad hand and leaking',
        note: 'note-air-line-chafed.ogg',
      },
    ],
  }));
  // Yesterday's KV-103: a worn left steer tire, replaced; the next driver's review waits.
  special.set('1:pre:aiyana.brooks@yardcall.test', (spec) => ({
    ...spec,
    units: ['KV-103'],
    defects: [
      {
        itemKey: 'u1.axle1.left.tire.tread',
        // Below the 4/32 in a steer tire needs (49 CFR 393.75(b)).
        value: 3,
        detail: 'three thirty-seconds on the left steer',
        heard: 'good except three thirty-seconds',
      },
    ],
    repair: { action: 'repaired', note: 'Replaced the left steer tire; new tread 18/32 in.', afterHours: 3 },
    reviewWaits: true,
  }));
  // A torn mud flap on KV-101, deferred by the shop (not a safety item).
  special.set('9:pre:driver@yardcall.test', (spec) => ({
    ...spec,
    defects: [
      {
        itemKey: 'u1.left.mud_flap',
        detail: 'left mud flap torn halfway',
        heard: 'good except the mud flap is torn',
        note: 'note-mud-flap.ogg',
      },
    ],
    repair: {
      action: 'deferred',
      note: 'Flap on order; still covers the wheel. Replace at the next service.',
      afterHours: 4,
      deferDays: 21,
    },
  }));
  // KV-102's left headlamp, out twice in three weeks: the second report is flagged as recurring.
  for (const workdaysAgo of [33, 12]) {
    special.set(`${workdaysAgo}:pre:tomas.reyes@yardcall.test`, (spec) => ({
      ...spec,
      defects: [
        {
          itemKey: 'u1.lights.headlamps',
          detail: 'left low beam out',
          heard: 'good except the left low beam is out',
        },
      ],
      repair: {
        action: 'repaired',
        note:
          workdaysAgo === 33
            ? 'Replaced the left low-beam bulb.'
            : 'Replaced the bulb again; cleaned a corroded connector.',
        afterHours: 5,
      },
    }));
  }
  // A cracked marker lens on KV-T23, with a photo and a voice note; replaced the same day.
  special.set('20:pre:aiyana.brooks@yardcall.test', (spec) => ({
    ...spec,
    defects: [
      {
        itemKey: 'u2.right.lights.side_markers',
        detail: 'side marker lens cracked, still lights',
        heard: 'good except the marker lens is cracked',
        note: 'note-marker-lens.ogg',
        photo: 'photo-marker-lens.png',
      },
    ],
    repair: { action: 'repaired', note: 'Replaced the marker lens.', afterHours: 6 },
  }));
  // The one rushed walk-around.
  special.set('16:pre:tomas.reyes@yardcall.test', (spec) => ({ ...spec, secondsPerStop: RUSHED_SECONDS_PER_STOP }));
  // A brake that needed the shop and was found fine: certified as needing no repair.
  special.set('27:pre:aiyana.brooks@yardcall.test', (spec) => ({
    ...spec,
    defects: [
      {
        itemKey: 'u1.axle2.left.brake.chamber',
        detail: 'brake chamber looks wet',
        heard: 'defect, the chamber looks wet',
      },
    ],
    repair: {
      action: 'no_repair_needed',
      note: 'Washer fluid run-off, no leak; chamber holds 100 psi.',
      afterHours: 2,
    },
  }));

  // Working days back from yesterday, newest first: the story's events are keyed by how many working
  // days ago they happened, so the same story fits whatever weekday the seed runs on.
  const workdays: { daysAgo: number; workdaysAgo: number }[] = [];
  for (let daysAgo = 1; daysAgo <= HISTORY_DAYS; daysAgo += 1) {
    if (isWeekday(new Date(today - daysAgo * DAY_MS))) workdays.push({ daysAgo, workdaysAgo: workdays.length + 1 });
  }
  let straightTruckRuns = 0;
  for (const { daysAgo, workdaysAgo } of workdays.reverse()) {
    const day = new Date(today - daysAgo * DAY_MS);
    CREWS.forEach((crew, index) => {
      // After KV-T22 went out of service Tomas takes the straight truck on local runs.
      const onStraightTruck = crew.driverEmail === 'tomas.reyes@yardcall.test' && workdaysAgo < 2;
      const pre: WalkaroundSpec = {
        tag: `${workdaysAgo}:pre:${crew.driverEmail}`,
        driverEmail: crew.driverEmail,
        units: onStraightTruck ? ['KV-S31'] : [...crew.units],
        kind: 'pre_trip',
        startedAt: at(daysAgo, 5.25 + index * 0.35),
        readings: workdaysAgo % 3 === index % 3 ? routineReadings(random) : undefined,
      };
      plan.push((special.get(pre.tag) ?? ((s) => s))(pre));
      if (day.getUTCDay() === 5 || special.has(`${workdaysAgo}:post:${crew.driverEmail}`)) {
        const post: WalkaroundSpec = {
          tag: `${workdaysAgo}:post:${crew.driverEmail}`,
          driverEmail: crew.driverEmail,
          units: [...crew.units],
          kind: 'post_trip',
          startedAt: at(daysAgo, 15.5 + index * 0.3),
        };
        plan.push((special.get(post.tag) ?? ((s) => s))(post));
      }
    });
    // The straight truck's local runs on Tuesdays and Thursdays; a tire filled on the spot on its fourth.
    if (day.getUTCDay() === 2 || day.getUTCDay() === 4) {
      straightTruckRuns += 1;
      const fixDay = straightTruckRuns === 4;
      plan.push({
        tag: `${workdaysAgo}:pre:kv-s31`,
        driverEmail: 'driver@yardcall.test',
        units: ['KV-S31'],
        kind: 'pre_trip',
        startedAt: at(daysAgo, 11),
        fix: fixDay
          ? {
              itemKey: 'u1.axle1.left.tire.inflation',
              foundValue: 88,
              fixedValue: 106,
              detail: 'left steer tire low, eighty-eight psi',
              action: 'added air, now one oh six',
              heard: 'fixed, added air, now one oh six',
            }
          : undefined,
      });
    }
  }
  return plan;
}

// Today's walk-arounds, placed between the start of the day and now: a pre-trip of KV-101 and KV-T21,
// and an en-route check of the straight truck with no pre-trip before it (the supervisor sees it).
function todayPlan(now: Date): WalkaroundSpec[] {
  const dayStart = Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate());
  const elapsed = now.getTime() - dayStart;
  // Too early in the day for a walk-around to have finished: today stays empty.
  if (elapsed < HOUR_MS) return [];
  return [
    {
      tag: '0:pre:driver@yardcall.test',
      driverEmail: 'driver@yardcall.test',
      units: ['KV-101', 'KV-T21'],
      kind: 'pre_trip',
      // About 05:35, or earlier in the day's first hours.
      startedAt: new Date(dayStart + Math.floor(Math.min(5.6 * HOUR_MS, elapsed * 0.55))),
      readings: [{ itemKey: 'u1.axle1.left.tire.tread', value: 11, heard: 'good, eleven thirty-seconds' }],
    },
    {
      tag: '0:en_route:tomas.reyes@yardcall.test',
      driverEmail: 'tomas.reyes@yardcall.test',
      units: ['KV-S31'],
      kind: 'en_route',
      startedAt: new Date(dayStart + Math.floor(Math.min(9.5 * HOUR_MS, elapsed * 0.75))),
    },
  ];
}

function routineReadings(random: () => number): Reading[] {
  const tread = 9 + Math.floor(random() * 6);
  const words = ['nine', 'ten', 'eleven', 'twelve', 'thirteen', 'fourteen'][tread - 9] ?? String(tread);
  return [{ itemKey: 'u1.axle1.left.tire.tread', value: tread, heard: `good, ${words} thirty-seconds` }];
}

interface Judged {
  quantity: Quantity;
  value: number;
  unit: string;
  verdict: ReturnType<typeof evaluateMeasurement>['verdict'];
  limit: number;
  limitUnit: string;
  source: string;
}

function judge(item: ChecklistItem, value: number): Judged {
  if (item.expects.type !== 'measure') throw new Error(`The demo reads ${item.key}, which takes no reading.`);
  const quantity = item.expects.quantity;
  const unit = canonicalUnitOf(quantity);
  const judged = evaluateMeasurement(quantity, value, unit, item.limitContext ?? {});
  return {
    quantity,
    value,
    unit,
    verdict: judged.verdict,
    limit: judged.limit,
    limitUnit: judged.unit,
    source: judged.source,
  };
}

class HistoryWriter {
  readonly counts: HistoryCounts = {
    inspections: 0,
    itemResults: 0,
    defects: 0,
    voiceNotes: 0,
    photos: 0,
    trainingAttempts: 0,
  };
  private readonly vehicles = new Map<string, Vehicle>();
  // Each vehicle's last report with certified defects whose next driver has not signed yet.
  private readonly awaitingReview = new Map<string, { inspection: Inspection; certifiedAt: Date }>();
  private readonly media = new Map<string, Buffer>();
  private pendingResults: ItemResult[] = [];
  // The same units and kind make the same checklist: built once.
  private readonly checklists = new Map<string, Checklist>();

  constructor(
    private readonly manager: EntityManager,
    private readonly organizationId: string,
    private readonly people: People,
    vehicles: Vehicle[],
    private readonly storage: ObjectStorage,
    private readonly random: () => number,
  ) {
    for (const vehicle of vehicles) this.vehicles.set(vehicle.unitNumber, vehicle);
  }

  private person(email: string): User {
    const user = this.people.byEmail.get(email);
    if (!user) throw new Error(`The demo history needs the seeded user ${email}.`);
    return user;
  }

  private vehicle(unitNumber: string): Vehicle {
    const vehicle = this.vehicles.get(unitNumber);
    if (!vehicle) throw new Error(`The demo history needs the seeded vehicle ${unitNumber}.`);
    return vehicle;
  }

  private file(name: string): Buffer {
    let bytes = this.media.get(name);
    if (!bytes) {
      bytes = readFileSync(join(MEDIA_DIR, name));
      this.media.set(name, bytes);
    }
    return bytes;
  }

  async walkaround(spec: WalkaroundSpec): Promise<void> {
    const driver = this.person(spec.driverEmail);
    const units = spec.units.map((unit) => this.vehicle(unit));
    const snapshot: Inspection['vehicles'] = units.map((v) => ({
      id: v.id,
      unitNumber: v.unitNumber,
      kind: v.kind,
      config: v.config,
    }));
    const checklistKey = `${spec.kind}:${spec.units.join('+')}`;
    const checklist = this.checklists.get(checklistKey) ?? buildChecklist(snapshot, spec.kind, 'en');
    this.checklists.set(checklistKey, checklist);
    const byKey = new Map(checklist.items.map((item) => [item.key, item]));
    // Every item the story names must be on the checklist: an answer to no item is refused, never dropped.
    const named = [...(spec.defects ?? []), ...(spec.readings ?? []), ...(spec.fix ? [spec.fix] : [])];
    for (const { itemKey } of named) {
      if (!byKey.has(itemKey)) {
        throw new Error(`${spec.tag}: ${itemKey} is not on the checklist of ${spec.units.join(' + ')}.`);
      }
    }
    // The next driver reviews the units' last reports before this walk-around begins.
    for (const vehicle of units) await this.signPendingReview(vehicle, driver, spec.startedAt);

    const startMs = spec.startedAt.getTime();
    const stopTimes = this.stopTimes(checklist, startMs, spec.secondsPerStop);
    const defects = new Map((spec.defects ?? []).map((d) => [d.itemKey, d]));
    const readings = new Map((spec.readings ?? []).map((r) => [r.itemKey, r]));
    const inspection = this.manager.create(Inspection, {
      organizationId: this.organizationId,
      driverId: driver.id,
      kind: spec.kind,
      status: 'submitted',
      locale: 'en',
      clientId: `${HISTORY_CLIENT_PREFIX}${spec.tag}`,
      startedAt: spec.startedAt,
      odometer: null,
      location: LOCATION,
      vehicles: snapshot,
      requiredReadings: [],
      createdAt: spec.startedAt,
      updatedAt: spec.startedAt,
    });
    const rows: ItemResult[] = [];
    for (const item of checklist.items) {
      const answeredAt = stopTimes.get(item.stopKey) ?? new Date(startMs);
      const found = defects.get(item.key);
      const reading = readings.get(item.key);
      const fix = spec.fix?.itemKey === item.key ? spec.fix : undefined;
      const measured = item.expects.type === 'measure';
      const value = found?.value ?? reading?.value ?? fix?.foundValue;
      const judged = value !== undefined ? judge(item, value) : null;
      let fixed: SpotFix | null = null;
      if (fix) {
        const after = judge(item, fix.fixedValue);
        // A new reading still out of limit is no fix (the product refuses it the same way).
        if (after.verdict === 'out_of_limit') throw new Error(`${spec.tag}: the fixed reading is still out of limit.`);
        fixed = {
          action: fix.action,
          measurement: { quantity: after.quantity, value: after.value, unit: after.unit },
          verdict: after.verdict,
          heard: fix.heard,
          at: new Date(answeredAt.getTime() + 90_000).toISOString(),
        };
      }
      const isDefect = Boolean(found) || Boolean(fix);
      rows.push(
        this.manager.create(ItemResult, {
          itemKey: item.key,
          clientId: `${HISTORY_CLIENT_PREFIX}${item.key}`.slice(0, 64),
          answer: isDefect ? 'defect' : 'pass',
          measurementQuantity: judged?.quantity ?? null,
          measurementValue: judged?.value ?? null,
          measurementUnit: judged?.unit ?? null,
          verdict: judged?.verdict ?? null,
          limitValue: judged?.limit ?? null,
          limitUnit: judged?.limitUnit ?? null,
          limitSource: judged?.source ?? null,
          // A measured check passed without a value was checked by eye (no reading is required here).
          noReading: measured && !isDefect && !judged ? 'visual' : null,
          fixed,
          detail: found?.detail ?? fix?.detail ?? null,
          heard: found?.heard ?? reading?.heard ?? fix?.heard ?? 'all good',
          confidence: 0.82 + Math.round(this.random() * 15) / 100,
          answeredAt,
          receivedAt: answeredAt,
        }),
      );
    }
    const shared: SharedItemResult[] = rows.map((r) => ({
      itemKey: r.itemKey,
      answer: r.answer,
      answeredAt: r.answeredAt.toISOString(),
      ...(r.verdict ? { verdict: r.verdict } : {}),
      ...(r.measurementQuantity && r.measurementValue !== null && r.measurementUnit
        ? { measurement: { quantity: r.measurementQuantity, value: r.measurementValue, unit: r.measurementUnit } }
        : {}),
      ...(r.noReading ? { noReading: r.noReading } : {}),
      ...(r.fixed ? { fixed: r.fixed } : {}),
      ...(r.detail ? { detail: r.detail } : {}),
    }));
    const summary = summarizeInspection(checklist, shared, { startedAt: spec.startedAt.toISOString() });
    const lastAnswer = Math.max(...rows.map((r) => r.answeredAt.getTime()));
    const submittedAt = new Date(lastAnswer + 40_000);
    inspection.submittedAt = submittedAt;
    inspection.rushed = summary.rushed.rushed;
    inspection.defectCount = summary.defects.length;
    inspection.durationSeconds = summary.totalDurationMs !== null ? Math.round(summary.totalDurationMs / 1000) : null;
    inspection.odometer = units[0] ? this.odometerOf(units[0], startMs) : null;
    inspection.updatedAt = submittedAt;
    await this.manager.save(inspection);
    await this.manager.insert(
      InspectionVehicle,
      units.map((v, position) => ({ inspectionId: inspection.id, position, vehicleId: v.id })),
    );
    for (const row of rows) row.inspectionId = inspection.id;
    this.pendingResults.push(...rows);
    if (this.pendingResults.length >= RESULT_BATCH) await this.flushResults();
    this.counts.inspections += 1;
    this.counts.itemResults += rows.length;

    await this.manager.insert(Signature, {
      inspectionId: inspection.id,
      defectId: null,
      role: 'driver',
      signerId: driver.id,
      name: driver.name,
      drawing: null,
      statement: driverStatement('en', {
        name: driver.name,
        units: spec.units,
        date: spec.startedAt,
        defectCount: summary.defects.length,
      }),
      signedAt: submittedAt,
    });

    // The shop's defects, as the submit makes them, dated when the report was submitted.
    const found = defectsOfReport(this.manager, { inspection, summary, byKey, results: rows });
    for (const defect of found) Object.assign(defect, { createdAt: submittedAt, updatedAt: submittedAt });
    const savedDefects = found.length > 0 ? await this.manager.save(Defect, found) : [];
    this.counts.defects += savedDefects.length;
    if (savedDefects.length > 0) {
      const recurring = await recurringDefectsOf(this.manager, inspection, checklist, summary);
      if (recurring.length > 0) await this.manager.update(Inspection, inspection.id, { recurringDefect: true });
    }
    await this.attachMedia(inspection, spec, answeredAtOf(rows));
    if (spec.repair && savedDefects.length > 0) {
      const certifiedAt = await this.certify(inspection, savedDefects, spec.repair, submittedAt, spec.units);
      for (const vehicle of units) {
        if (spec.reviewWaits) this.awaitingReview.delete(vehicle.id);
        else this.awaitingReview.set(vehicle.id, { inspection, certifiedAt });
      }
    } else {
      for (const vehicle of units) this.awaitingReview.delete(vehicle.id);
    }
  }

  async flushResults(): Promise<void> {
    if (this.pendingResults.length === 0) return;
    await insertItemResults(this.manager, this.pendingResults);
    this.pendingResults = [];
  }

  private stopTimes(checklist: Checklist, startMs: number, secondsPerStop?: number): Map<string, Date> {
    const times = new Map<string, Date>();
    let t = startMs;
    for (const stop of checklist.stops) {
      const seconds =
        secondsPerStop ?? PACE_SECONDS.min + Math.floor(this.random() * (PACE_SECONDS.max - PACE_SECONDS.min + 1));
      t += seconds * 1000;
      times.set(stop.key, new Date(t));
    }
    return times;
  }

  // About 450 miles a working day from an invented starting figure per unit.
  private odometerOf(vehicle: Vehicle, atMs: number): number | null {
    if (vehicle.kind === 'trailer') return null;
    const base = 300_000 + (vehicle.unitNumber.charCodeAt(vehicle.unitNumber.length - 1) % 10) * 41_117;
    return base + Math.floor((atMs / DAY_MS) % 10_000) * 450;
  }

  private async attachMedia(inspection: Inspection, spec: WalkaroundSpec, answeredAt: Map<string, Date>) {
    for (const found of spec.defects ?? []) {
      const at = answeredAt.get(found.itemKey) ?? inspection.startedAt;
      if (found.note) {
        const upload = await this.upload(inspection, found.itemKey, 'notes', found.note, 'audio/ogg', at);
        await this.manager.insert(VoiceNote, {
          ...upload,
          durationMs: opusDurationMs(this.file(found.note)),
          heard: wordsOf(found.note),
        });
        this.counts.voiceNotes += 1;
      }
      if (found.photo) {
        await this.manager.insert(
          Photo,
          await this.upload(inspection, found.itemKey, 'photos', found.photo, 'image/png', at),
        );
        this.counts.photos += 1;
      }
    }
  }

  // Stores a committed file as an upload of the item and answers the columns its row needs.
  private async upload(
    inspection: Inspection,
    itemKey: string,
    folder: 'notes' | 'photos',
    file: string,
    mimeType: string,
    createdAt: Date,
  ) {
    const bytes = this.file(file);
    const objectKey = `${folder}/${inspection.id}/${HISTORY_CLIENT_PREFIX}${itemKey}${file.slice(file.lastIndexOf('.'))}`;
    await this.storage.put(objectKey, bytes, { contentType: mimeType });
    return {
      organizationId: this.organizationId,
      inspectionId: inspection.id,
      itemKey,
      clientId: `${HISTORY_CLIENT_PREFIX}${folder}-${itemKey}`.slice(0, 64),
      objectKey,
      mimeType,
      sizeBytes: bytes.length,
      sha256: createHash('sha256').update(bytes).digest('hex'),
      createdAt,
    };
  }

  private async certify(
    inspection: Inspection,
    defects: Defect[],
    repair: RepairSpec,
    submittedAt: Date,
    units: string[],
  ): Promise<Date> {
    const mechanic = this.people.mechanic;
    const signedAt = new Date(submittedAt.getTime() + repair.afterHours * HOUR_MS);
    const deferredUntil = repair.deferDays ? new Date(signedAt.getTime() + repair.deferDays * DAY_MS) : null;
    for (const defect of defects) {
      await this.manager.insert(Repair, {
        defectId: defect.id,
        action: repair.action,
        note: repair.note,
        deferredUntil,
        mechanicId: mechanic.id,
        signedAt,
      });
      await this.manager.update(Defect, defect.id, { status: repair.action, updatedAt: signedAt });
      await this.manager.insert(Signature, {
        inspectionId: inspection.id,
        defectId: defect.id,
        role: 'mechanic',
        signerId: mechanic.id,
        name: mechanic.name,
        drawing: null,
        statement: mechanicStatement('en', {
          name: mechanic.name,
          unit: units[0] ?? '',
          defect: `${defect.title} (${defect.positionLabel})`,
          action: repair.action,
          deferredUntil,
        }),
        signedAt,
      });
    }
    return signedAt;
  }

  private async signPendingReview(vehicle: Vehicle, driver: User, before: Date): Promise<void> {
    const pending = this.awaitingReview.get(vehicle.id);
    if (!pending) return;
    this.awaitingReview.delete(vehicle.id);
    // One review signs the report for every unit it covered.
    for (const [id, other] of this.awaitingReview) {
      if (other.inspection.id === pending.inspection.id) this.awaitingReview.delete(id);
    }
    const signedAt = new Date(Math.max(before.getTime() - 4 * 60_000, pending.certifiedAt.getTime() + 60_000));
    await this.manager.insert(Signature, {
      inspectionId: pending.inspection.id,
      defectId: null,
      role: 'next_driver',
      signerId: driver.id,
      name: driver.name,
      drawing: null,
      statement: nextDriverStatement('en', {
        name: driver.name,
        units: pending.inspection.vehicles.map((v) => v.unitNumber),
        date: pending.inspection.submittedAt ?? pending.inspection.startedAt,
      }),
      signedAt,
    });
  }

  // Practice walk-arounds narrated by the two students: one reviewed by the trainer, one waiting.
  async practice(now: Date): Promise<void> {
    // The tractor and trailer the students practise on: the narrations speak of both.
    const snapshot: Inspection['vehicles'] = ['KV-101', 'KV-T21'].map((unit) => {
      const v = this.vehicle(unit);
      return { id: v.id, unitNumber: v.unitNumber, kind: v.kind, config: v.config };
    });
    const checklist = buildChecklist(snapshot, 'practice', 'en');
    const attempts = [
      {
        email: 'student@yardcall.test',
        file: 'practice-jordan.ogg',
        daysAgo: 3,
        review: {
          grade: 'needs_practice' as const,
          comment:
            'Good engine compartment and front. Say where each check is, and go on past the steer wheel next time.',
        },
      },
      { email: 'noor.haddad@yardcall.test', file: 'practice-noor.ogg', daysAgo: 1, review: null },
    ];
    for (const spec of attempts) {
      const student = this.person(spec.email);
      const bytes = this.file(spec.file);
      const durationMs = opusDurationMs(bytes);
      const startedAt = new Date(now.getTime() - spec.daysAgo * DAY_MS - 5 * HOUR_MS);
      const segments = narrationSegments(wordsOf(spec.file), durationMs);
      const score = scoreNarration(segments, checklist);
      const attempt = await this.manager.save(
        this.manager.create(TrainingAttempt, {
          organizationId: this.organizationId,
          studentId: student.id,
          clientId: `${HISTORY_CLIENT_PREFIX}practice-${spec.daysAgo}`,
          kind: 'practice',
          status: 'finished',
          locale: 'en',
          vehicles: snapshot,
          startedAt,
          finishedAt: new Date(startedAt.getTime() + durationMs),
          durationMs,
          segments: segments.map((s, seq) => ({ ...s, seq })),
          score,
          createdAt: startedAt,
          updatedAt: startedAt,
        }),
      );
      const sha256 = createHash('sha256').update(bytes).digest('hex');
      const objectKey = `training/${attempt.id}/${sha256}.ogg`;
      await this.storage.put(objectKey, bytes, { contentType: 'audio/ogg' });
      await this.manager.update(TrainingAttempt, attempt.id, {
        audioObjectKey: objectKey,
        audioMimeType: 'audio/ogg',
        audioSizeBytes: bytes.length,
        audioSha256: sha256,
        audioDurationMs: durationMs,
      });
      this.counts.trainingAttempts += 1;
      if (!spec.review) continue;
      // The trainer marks what the score says was missed, and one item said well.
      const marks: TrainingItemMark[] = score.items
        .filter((i) => i.status !== 'named')
        .slice(0, 3)
        .map((i) => ({ itemKey: i.itemKey, mark: 'missed', comment: 'Not said: name it and where it is.' }));
      const named = score.items.find((i) => i.status === 'named');
      if (named) marks.unshift({ itemKey: named.itemKey, mark: 'named', comment: 'Clear and complete.' });
      const reviewedAt = new Date(startedAt.getTime() + 26 * HOUR_MS);
      await this.manager.insert(TrainingReview, {
        organizationId: this.organizationId,
        attemptId: attempt.id,
        trainerId: this.people.trainer.id,
        marks,
        grade: spec.review.grade,
        comment: spec.review.comment,
        reviewedAt,
        createdAt: reviewedAt,
        updatedAt: reviewedAt,
      });
    }
  }

  // Since when each held unit is out of service: the time its oldest open safety defect was reported.
  async settleVehicleStatus(): Promise<void> {
    const ids = [...this.vehicles.values()].map((v) => v.id);
    await refreshVehicleStatus(this.manager, ids);
    const open = await this.manager.find(Defect, {
      where: { vehicleId: In(ids), status: 'open', safety: true },
      order: { createdAt: 'ASC' },
    });
    for (const defect of open) {
      await this.manager
        .createQueryBuilder()
        .update(Vehicle)
        .set({ statusSince: defect.createdAt })
        .where('id = :id AND status_since > :at', { id: defect.vehicleId, at: defect.createdAt })
        .execute();
    }
  }
}

// A few thousand answers a statement: about 40 000 through the entity layer took several seconds.
async function insertItemResults(manager: EntityManager, rows: readonly ItemResult[]): Promise<void> {
  const records = rows.map((r) => ({
    inspection_id: r.inspectionId,
    item_key: r.itemKey,
    client_id: r.clientId,
    answer: r.answer,
    measurement_quantity: r.measurementQuantity,
    measurement_value: r.measurementValue,
    measurement_unit: r.measurementUnit,
    verdict: r.verdict,
    limit_value: r.limitValue,
    limit_unit: r.limitUnit,
    limit_source: r.limitSource,
    no_reading: r.noReading,
    fixed: r.fixed,
    detail: r.detail,
    heard: r.heard,
    confidence: r.confidence,
    answered_at: r.answeredAt.toISOString(),
  }));
  await manager.query(
    `INSERT INTO item_results (inspection_id, item_key, client_id, answer, measurement_quantity, measurement_value,
            measurement_unit, verdict, limit_value, limit_unit, limit_source, no_reading, fixed, detail, heard,
            confidence, answered_at, received_at)
     SELECT inspection_id, item_key, client_id, answer::item_answer, measurement_quantity, measurement_value,
            measurement_unit, verdict::item_verdict, limit_value, limit_unit, limit_source, no_reading::item_no_reading,
            fixed, detail, heard, confidence, answered_at, answered_at
       FROM jsonb_to_recordset($1::jsonb) AS r(inspection_id uuid, item_key varchar, client_id varchar, answer text,
            measurement_quantity varchar, measurement_value double precision, measurement_unit varchar, verdict text,
            limit_value double precision, limit_unit varchar, limit_source varchar, no_reading text, fixed jsonb,
            detail text, heard text, confidence real, answered_at timestamptz)`,
    [JSON.stringify(records)],
  );
}

function answeredAtOf(rows: readonly ItemResult[]): Map<string, Date> {
  return new Map(rows.map((r) => [r.itemKey, r.answeredAt]));
}

// What each recording says: the same list make-demo-media.sh speaks.
let spokenWords: Map<string, string> | null = null;
function wordsOf(file: string): string {
  spokenWords ??= new Map(
    (
      JSON.parse(readFileSync(join(MEDIA_DIR, '..', 'demo-media.json'), 'utf8')) as { file: string; text: string }[]
    ).map((m) => [m.file, m.text]),
  );
  const words = spokenWords.get(file);
  if (words === undefined) throw new Error(`test-audio/demo-media.json has no words for ${file}.`);
  return words;
}

// The recogniser's segments: one a sentence, spread over the recording by their length.
function narrationSegments(words: string, durationMs: number): NarrationSegment[] {
  const sentences = words
    .split(/(?<=\.)\s+/)
    .map((s) => s.trim())
    .filter(Boolean);
  const total = sentences.reduce((n, s) => n + s.length, 0) || 1;
  let t = 250;
  const usable = Math.max(durationMs - 500, 1000);
  return sentences.map((text) => {
    const length = Math.round((text.length / total) * usable);
    const segment = { text, startMs: t, endMs: t + length };
    t += length;
    return segment;
  });
}

// An Ogg Opus file's length from its last page's granule position (48 kHz samples; RFC 7845 4).
export function opusDurationMs(bytes: Buffer): number {
  const last = bytes.lastIndexOf('OggS');
  if (last < 0) throw new Error('Not an Ogg file.');
  const granule = Number(bytes.readBigUInt64LE(last + 6));
  const head = bytes.indexOf('OpusHead');
  const preSkip = head >= 0 ? bytes.readUInt16LE(head + 10) : 0;
  return Math.round(((granule - preSkip) / 48_000) * 1000);
}

// Idempotent: writes the whole history once (in the caller's transaction) and answers how many rows;
// zero counts when it is there already or the demo people and units are missing.
export async function seedDemoHistory(
  manager: EntityManager,
  organizationId: string,
  storage: ObjectStorage,
  now = new Date(),
): Promise<HistoryCounts | null> {
  const [marker] = await manager.query<{ n: number }[]>(
    `SELECT count(*)::int AS n FROM inspections WHERE organization_id = $1 AND client_id LIKE $2`,
    [organizationId, `${HISTORY_CLIENT_PREFIX}%`],
  );
  if ((marker?.n ?? 0) > 0) return null;
  const users = await manager.findBy(User, { organizationId });
  const byEmail = new Map(users.map((u) => [u.email, u]));
  const mechanic = byEmail.get('mechanic@yardcall.test');
  const trainer = byEmail.get('trainer@yardcall.test');
  const vehicles = await manager.findBy(Vehicle, { organizationId });
  if (!mechanic || !trainer || vehicles.length === 0) return null;
  const random = randomFrom(RANDOM_SEED);
  const writer = new HistoryWriter(manager, organizationId, { byEmail, mechanic, trainer }, vehicles, storage, random);
  for (const spec of [...historyPlan(now, random), ...todayPlan(now)]) await writer.walkaround(spec);
  await writer.flushResults();
  await writer.practice(now);
  await writer.settleVehicleStatus();
  return writer.counts;
}
