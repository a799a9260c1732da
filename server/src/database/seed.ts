import { validateVehicle } from '@yardcall/shared';
import { DataSource } from 'typeorm';
import { hashPassword } from '../auth/password';
import { Organization } from '../organizations/entities/organization.entity';
import { User } from '../users/entities/user.entity';
import { Vehicle } from '../vehicles/entities/vehicle.entity';
import { buildDataSourceOptions } from './data-source';
import { seedDemoInspection } from './seed-inspections';
import { DEMO_PASSWORD, SEED_ORGANIZATIONS } from './seed-data';

export interface SeedResult {
  organizations: number;
  users: number;
  vehicles: number;
  inspections: number;
}

// Idempotent: finds each organisation, user and vehicle by its natural key and creates only what is missing;
// existing rows are left exactly as they are (a second run changes nothing).
export async function seed(dataSource: DataSource): Promise<SeedResult> {
  const created: SeedResult = { organizations: 0, users: 0, vehicles: 0, inspections: 0 };
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
      created.inspections += await seedDemoInspection(manager, organization.id);
    }
  });
  return created;
}

async function main(): Promise<void> {
  const databaseUrl = process.env.DATABASE_URL;
  if (!databaseUrl) throw new Error('DATABASE_URL is required, e.g. postgres://postgres@127.0.0.1:54400/yardcall.');
  const dataSource = await new DataSource(buildDataSourceOptions(databaseUrl)).initialize();
  try {
    const created = await seed(dataSource);
    console.log(
      `Seed done: created ${created.organizations} organisations, ${created.users} users, ${created.vehicles} vehicles, ${created.inspections} demo reports (existing rows untouched). Demo password: ${DEMO_PASSWORD}`,
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
