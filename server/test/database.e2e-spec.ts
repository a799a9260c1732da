import { DataSource } from 'typeorm';
import { buildDataSourceOptions } from '../src/database/data-source';
import { MIGRATIONS } from '../src/database/migrations';
import { seed } from '../src/database/seed';
import { SEED_ORGANIZATIONS } from '../src/database/seed-data';
import type { SetupRecord } from './global-setup';

const record = JSON.parse(process.env.YARDCALL_SETUP_RECORD ?? 'null') as SetupRecord | null;

describe('database', () => {
  let dataSource: DataSource;
  beforeAll(async () => {
    dataSource = await new DataSource({
      ...buildDataSourceOptions(process.env.DATABASE_URL!),
      logging: false,
    }).initialize();
  });
  afterAll(async () => {
    await dataSource.destroy();
  });

  it('ran the migrations up (global setup) and recorded every one of them', async () => {
    expect(record).not.toBeNull();
    // The test runner hands over a fresh, empty database: then every migration ran in this run.
    if (record!.tablesBefore === 0) {
      expect(record!.migrationsRan).toEqual(MIGRATIONS.map((m) => m.name));
      // ...and reverting them all left only TypeORM's own bookkeeping table before they ran up again.
      expect(record!.tablesAfterRevert).toEqual(['migrations']);
    }
    const rows = await dataSource.query<{ name: string }[]>('SELECT name FROM migrations ORDER BY id');
    expect(rows.map((r) => r.name)).toEqual(MIGRATIONS.map((m) => m.name));
    expect(await dataSource.showMigrations()).toBe(false);
  });

  it('has no drift between the entities and the migrated schema (what migration:generate --check checks)', async () => {
    const sql = await dataSource.driver.createSchemaBuilder().log();
    expect(sql.upQueries.map((q) => q.query)).toEqual([]);
  });

  it('keeps e-mail addresses unique whatever their case', async () => {
    const [org] = await dataSource.query<{ id: string }[]>('SELECT id FROM organizations LIMIT 1');
    await expect(
      dataSource.query(
        `INSERT INTO users (organization_id, email, name, role) VALUES ($1, 'DRIVER@YARDCALL.TEST', 'x', 'driver')`,
        [org!.id],
      ),
    ).rejects.toThrow(/UQ_users_email_lower/);
  });

  it('seeded the demo data, and the second seed in global setup changed nothing', () => {
    const expectedUsers = SEED_ORGANIZATIONS.reduce((n, o) => n + o.users.length, 0);
    const expectedVehicles = SEED_ORGANIZATIONS.reduce((n, o) => n + o.vehicles.length, 0);
    if (record!.tablesBefore === 0) {
      expect(record!.firstSeed).toMatchObject({
        organizations: SEED_ORGANIZATIONS.length,
        users: expectedUsers,
        vehicles: expectedVehicles,
        // The demo organisation's history (seed-history.ts): weeks of walk-arounds with notes, a photo
        // and two practice attempts.
        history: { voiceNotes: 3, photos: 1, trainingAttempts: 2 },
      });
      expect(record!.firstSeed.inspections).toBeGreaterThan(100);
    }
    expect(record!.secondSeed).toEqual({ organizations: 0, users: 0, vehicles: 0, inspections: 0, history: null });
    expect(record!.countsAfterSecond).toEqual(record!.countsAfterFirst);
  });

  it('changes nothing when run once more', async () => {
    const snapshot = async () =>
      dataSource.query<unknown[]>(
        `SELECT (SELECT json_agg(o ORDER BY o.id) FROM organizations o) AS orgs,
                (SELECT json_agg(u ORDER BY u.id) FROM users u) AS users,
                (SELECT json_agg(v ORDER BY v.id) FROM vehicles v) AS vehicles`,
      );
    const before = await snapshot();
    await expect(seed(dataSource)).resolves.toEqual({
      organizations: 0,
      users: 0,
      vehicles: 0,
      inspections: 0,
      history: null,
    });
    expect(await snapshot()).toEqual(before);
  });
});
