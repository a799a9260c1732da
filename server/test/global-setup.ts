import './env';
import { DataSource } from 'typeorm';
import { buildDataSourceOptions } from '../src/database/data-source';
import { runMigrations } from '../src/database/migrate';
import { seed, type SeedResult } from '../src/database/seed';

export interface SetupRecord {
  tablesBefore: number;
  migrationsRan: string[];
  // From an empty database only: tables left after reverting every migration, then ran up again.
  tablesAfterRevert: string[] | null;
  firstSeed: SeedResult;
  secondSeed: SeedResult;
  countsAfterFirst: Record<string, number>;
  countsAfterSecond: Record<string, number>;
}

const TABLES = [
  'organizations',
  'users',
  'invitations',
  'vehicles',
  'inspections',
  'item_results',
  'defects',
  'repairs',
  'signatures',
];

async function countRows(dataSource: DataSource): Promise<Record<string, number>> {
  const counts: Record<string, number> = {};
  for (const table of TABLES) {
    const [row] = await dataSource.query<{ n: number }[]>(`SELECT count(*)::int AS n FROM "${table}"`);
    counts[table] = row?.n ?? -1;
  }
  return counts;
}

// Proves every down() works: revert them all and list what is left (only the migrations table should be).
async function revertAll(databaseUrl: string, count: number): Promise<string[]> {
  const dataSource = await new DataSource({ ...buildDataSourceOptions(databaseUrl), logging: false }).initialize();
  try {
    for (let i = 0; i < count; i += 1) await dataSource.undoLastMigration({ transaction: 'each' });
    const rows = await dataSource.query<{ table_name: string }[]>(
      "SELECT table_name FROM information_schema.tables WHERE table_schema = 'public' ORDER BY table_name",
    );
    return rows.map((r) => r.table_name);
  } finally {
    await dataSource.destroy();
  }
}

// Runs the migrations up from the (fresh, empty) test database and seeds it twice; the specs assert the record.
export default async function globalSetup(): Promise<void> {
  const databaseUrl = process.env.DATABASE_URL;
  if (!databaseUrl) throw new Error('DATABASE_URL must name the test database (a fresh, empty PostgreSQL database).');

  const probe = await new DataSource({ ...buildDataSourceOptions(databaseUrl), logging: false }).initialize();
  const [tables] = await probe.query<{ n: number }[]>(
    "SELECT count(*)::int AS n FROM information_schema.tables WHERE table_schema = 'public'",
  );
  await probe.destroy();

  const migrationsRan = await runMigrations(databaseUrl);
  let tablesAfterRevert: string[] | null = null;
  if (tables?.n === 0) {
    tablesAfterRevert = await revertAll(databaseUrl, migrationsRan.length);
    await runMigrations(databaseUrl);
  }

  const dataSource = await new DataSource({ ...buildDataSourceOptions(databaseUrl), logging: false }).initialize();
  try {
    const firstSeed = await seed(dataSource);
    const countsAfterFirst = await countRows(dataSource);
    const secondSeed = await seed(dataSource);
    const countsAfterSecond = await countRows(dataSource);
    const record: SetupRecord = {
      tablesBefore: tables?.n ?? -1,
      migrationsRan,
      tablesAfterRevert,
      firstSeed,
      secondSeed,
      countsAfterFirst,
      countsAfterSecond,
    };
    // Environment variables set here reach the test files.
    process.env.YARDCALL_SETUP_RECORD = JSON.stringify(record);
  } finally {
    await dataSource.destroy();
  }
}
