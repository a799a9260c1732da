import { validateVehicle } from '@yardcall/shared';
import { DataSource } from 'typeorm';
import { hashPassword } from '../auth/password';
import { Organization } from '../organizations/entities/organization.entity';
import { User } from '../users/entities/user.entity';
import { Vehicle } from '../vehicles/entities/vehicle.entity';
import { readStorageEnv } from '../config/env.validation';
import { LocalObjectStorage } from '../storage/local-object-storage';
import type { ObjectStorage } from '../storage/object-storage';
import { createS3Client, S3ObjectStorage } from '../storage/s3-object-storage';
import { buildDataSourceOptions } from './data-source';
import { DEMO_PASSWORD, SEED_ORGANIZATIONS } from './seed-data';
import { seedDemoHistory, type HistoryCounts } from './seed-history';

export interface SeedResult {
  organizations: number;
  users: number;
  vehicles: number;
  inspections: number;
  // What the demo history added (its item results, defects, notes, photos, practice attempts).
  history: Omit<HistoryCounts, 'inspections'> | null;
}

// Where the demo history's voice notes and photos go: the store the server is configured with.
export async function storageFromEnv(env: Record<string, unknown> = process.env): Promise<ObjectStorage> {
  const settings = readStorageEnv(env);
  if (settings.driver === 's3') return new S3ObjectStorage(createS3Client(settings), settings.bucket);
  const local = new LocalObjectStorage(settings.dir);
  await local.ensureRoot();
  return local;
}

// Idempotent: finds each organisation, user and vehicle by its natural key and creates only what is missing;
// existing rows are left exactly as they are (a second run changes nothing). The demo organisation also
// gets its history once (seed-history.ts).
export async function seed(dataSource: DataSource, storage?: ObjectStorage, now = new Date()): Promise<SeedResult> {
  const created: SeedResult = { organizations: 0, users: 0, vehicles: 0, inspections: 0, history: null };
  const store = storage ?? (await storageFromEnv());
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  await dataSource.transaction(async (manager) => {
    for (const spec of SEED_ORGANIZATIONS) {
      let organization = await manager.findOneBy(Organization, { name: spec.name });
      if (!organization) {
        organization = await manager.save(manager.create(Organization, { name: spec.name }));
        created.organizations += 1;
      }
      for (const user of spec.users) {
        const exists = await manager
          .createQueryBuilder(User, 'user')
          .where('lower(user.email) = lower(:email)', { email: user.email })
          .getExists();
        if (exists) continue;
        await manager.save(
          manager.create(User, {
            organizationId: organization.id,
            email: user.email,
            name: user.name,
            role: user.role,
            isStudent: user.isStudent ?? false,
            passwordHash,
            status: 'active',
            settings: {},
          }),
        );
        created.users += 1;
      }
      for (const vehicle of spec.vehicles) {
        const problems = validateVehicle(vehicle);
        if (problems.length > 0) {
          throw new Error(`Seed vehicle ${vehicle.unitNumber} breaks the vehicle rules: ${JSON.stringify(problems)}`);
        }
        const exists = await manager.existsBy(Vehicle, {
          organizationId: organization.id,
          unitNumber: vehicle.unitNumber,
        });
        if (exists) continue;
        await manager.save(
          manager.create(Vehicle, {
            organizationId: organization.id,
            ...vehicle,
            status: 'in_service',
            statusReason: null,
          }),
        );
        created.vehicles += 1;
      }
      if (!spec.history) continue;
      const history = await seedDemoHistory(manager, organization.id, store, now);
      if (history) {
        const { inspections, ...rest } = history;
        created.inspections += inspections;
        created.history = rest;
      }
    }
  });
  return created;
}

async function main(): Promise<void> {
  const databaseUrl = process.env.DATABASE_URL;
  if (!databaseUrl) throw new Error('DATABASE_URL is required, e.g. postgres://postgres@127.0.0.1:54400/yardcall.');
  const dataSource = await new DataSource(buildDataSourceOptions(databaseUrl)).initialize();
  try {
    const started = Date.now();
    const created = await seed(dataSource);
    const history = created.history
      ? ` (${created.history.itemResults} answers, ${created.history.defects} defects, ${created.history.voiceNotes} voice notes, ${created.history.photos} photos, ${created.history.trainingAttempts} practice walk-arounds)`
      : '';
    console.log(
      `Seed done in ${((Date.now() - started) / 1000).toFixed(1)} s: created ${created.organizations} organisations, ${created.users} users, ${created.vehicles} vehicles, ${created.inspections} demo reports${history} (existing rows untouched). Demo password: ${DEMO_PASSWORD}`,
    );
  } finally {
    await dataSource.destroy();
  }
}

if (require.main === module) {
  main().catch((error: unknown) => {
    console.error(error instanceof Error ? error.message : error);
    process.exit(1);
  });
}
