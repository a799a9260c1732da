import {
  buildChecklist,
  canonicalUnitOf,
  evaluateMeasurement,
  summarizeInspection,
  type ItemResult as SharedItemResult,
} from '@yardcall/shared';
import type { EntityManager } from 'typeorm';
import { Defect } from '../defects/entities/defect.entity';
import { Repair } from '../defects/entities/repair.entity';
import { InspectionVehicle } from '../inspections/entities/inspection-vehicle.entity';
import { Inspection } from '../inspections/entities/inspection.entity';
import { ItemResult } from '../inspections/entities/item-result.entity';
import { Signature } from '../inspections/entities/signature.entity';
import { driverStatement, mechanicStatement } from '../inspections/statements';
import { User } from '../users/entities/user.entity';
import { Vehicle } from '../vehicles/entities/vehicle.entity';

// The invented demo story: yesterday's pre-trip of KV-103 found a worn left steer tire; the shop replaced
// it and signed. The next driver to take KV-103 out is asked to review and sign that report first.
const DEMO_REPORT = {
  clientId: 'seed-demo-report-kv103',
  unitNumber: 'KV-103',
  driverEmail: 'aiyana.brooks@yardcall.test',
  mechanicEmail: 'mechanic@yardcall.test',
  startedAt: '2026-11-30T05:40:00.000Z',
  // Each stop answered at once at about 15 s a stop, the common pace (about 15 minutes for a tractor
  // and trailer's 60 stops; common practice, no published source).
  secondsPerStop: 15,
  // Below the 4/32 in a steer tire needs (49 CFR 393.75(b)).
  treadThirtySeconds: 3,
  repairNote: 'Replaced the left steer tire; new tread 18/32 in.',
} as const;

// Idempotent: answers 1 when it created the demo report, 0 when it was there already (or its people are missing).
export async function seedDemoInspection(manager: EntityManager, organizationId: string): Promise<number> {
  const driver = await manager.findOneBy(User, { organizationId, email: DEMO_REPORT.driverEmail });
  const mechanic = await manager.findOneBy(User, { organizationId, email: DEMO_REPORT.mechanicEmail });
  const vehicle = await manager.findOneBy(Vehicle, { organizationId, unitNumber: DEMO_REPORT.unitNumber });
  if (!driver || !mechanic || !vehicle) return 0;
  if (await manager.existsBy(Inspection, { driverId: driver.id, clientId: DEMO_REPORT.clientId })) return 0;

  const snapshot = [{ id: vehicle.id, unitNumber: vehicle.unitNumber, kind: vehicle.kind, config: vehicle.config }];
  const checklist = buildChecklist(snapshot, 'pre_trip', 'en');
  const startMs = Date.parse(DEMO_REPORT.startedAt);
  // The items of one stop share the time of its answer.
  const answeredAt = new Map(
    checklist.stops.flatMap((stop, n) =>
      stop.itemKeys.map((key) => [key, new Date(startMs + (n + 1) * DEMO_REPORT.secondsPerStop * 1000)] as const),
    ),
  );
  const tread = checklist.items.find(
    (i) => i.expects.type === 'measure' && i.expects.quantity === 'tread_depth' && i.limitContext?.axle === 'steer',
  );
  if (!tread) throw new Error(`The demo checklist of ${DEMO_REPORT.unitNumber} has no steer tread item.`);
  const judged = evaluateMeasurement('tread_depth', DEMO_REPORT.treadThirtySeconds, 'in/32', tread.limitContext ?? {});

  const inspection = await manager.save(
    manager.create(Inspection, {
      organizationId,
      driverId: driver.id,
      kind: 'pre_trip',
      status: 'submitted',
      locale: 'en',
      clientId: DEMO_REPORT.clientId,
      startedAt: new Date(startMs),
      submittedAt: new Date(startMs + (checklist.stops.length + 1) * DEMO_REPORT.secondsPerStop * 1000),
      odometer: 388_214,
      location: 'Kestrel Valley yard, bay 2',
      vehicles: snapshot,
      rushed: false,
      defectCount: 1,
    }),
  );
  await manager.insert(InspectionVehicle, { inspectionId: inspection.id, position: 0, vehicleId: vehicle.id });
  const rows = checklist.items.map((item) => {
    const measured = item.key === tread.key;
    const at = answeredAt.get(item.key);
    if (!at) throw new Error(`The demo checklist's item ${item.key} is at no stop.`);
    return manager.create(ItemResult, {
      inspectionId: inspection.id,
      itemKey: item.key,
      clientId: `seed-${item.key}`,
      answer: 'pass',
      measurementQuantity: measured ? 'tread_depth' : null,
      measurementValue: measured ? DEMO_REPORT.treadThirtySeconds : null,
      measurementUnit: measured ? canonicalUnitOf('tread_depth') : null,
      verdict: measured ? judged.verdict : null,
      limitValue: measured ? judged.limit : null,
      limitUnit: measured ? judged.unit : null,
      limitSource: measured ? judged.source : null,
      detail: null,
      heard: measured ? 'three thirty-seconds' : 'good',
      confidence: 0.9,
      answeredAt: at,
    });
  });
  await manager.save(ItemResult, rows, { chunk: 100 });
  const shared: SharedItemResult[] = rows.map((r) => ({
    itemKey: r.itemKey,
    answer: r.answer,
    answeredAt: r.answeredAt.toISOString(),
    ...(r.verdict ? { verdict: r.verdict } : {}),
  }));
  const summary = summarizeInspection(checklist, shared, { startedAt: DEMO_REPORT.startedAt });
  const submittedAt = inspection.submittedAt ?? new Date(startMs);
  await manager.insert(Signature, {
    inspectionId: inspection.id,
    defectId: null,
    role: 'driver',
    signerId: driver.id,
    name: driver.name,
    drawing: null,
    statement: driverStatement('en', {
      name: driver.name,
      units: [vehicle.unitNumber],
      date: inspection.startedAt,
      defectCount: summary.defects.length,
    }),
    signedAt: submittedAt,
  });
  const repairedAt = new Date(submittedAt.getTime() + 3 * 3_600_000);
  for (const found of summary.defects) {
    const defect = await manager.save(
      manager.create(Defect, {
        organizationId,
        inspectionId: inspection.id,
        vehicleId: vehicle.id,
        itemKey: found.itemKey,
        title: found.title,
        positionLabel: found.positionLabel,
        safety: found.blocksDriving,
        detail: null,
        measurement: { quantity: 'tread_depth', value: DEMO_REPORT.treadThirtySeconds, unit: 'in/32' },
        measurementLimit: { value: judged.limit, unit: judged.unit, source: judged.source },
        status: 'repaired',
      }),
    );
    await manager.insert(Repair, {
      defectId: defect.id,
      action: 'repaired',
      note: DEMO_REPORT.repairNote,
      deferredUntil: null,
      mechanicId: mechanic.id,
      signedAt: repairedAt,
    });
    await manager.insert(Signature, {
      inspectionId: inspection.id,
      defectId: defect.id,
      role: 'mechanic',
      signerId: mechanic.id,
      name: mechanic.name,
      drawing: null,
      statement: mechanicStatement('en', {
        name: mechanic.name,
        unit: vehicle.unitNumber,
        defect: `${found.title} (${found.positionLabel})`,
        action: 'repaired',
        deferredUntil: null,
      }),
      signedAt: repairedAt,
    });
  }
  return 1;
}
