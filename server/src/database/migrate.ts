import { DataSource } from 'typeorm';
import { buildDataSourceOptions } from './data-source';

// Runs every pending migration, each in its own transaction; answers the names of those it ran.
export async function runMigrations(databaseUrl: string): Promise<string[]> {
  const dataSource = await new DataSource({ ...buildDataSourceOptions(databaseUrl), logging: ['error'] }).initialize();
  try {
    const ran = await dataSource.runMigrations({ transaction: 'each' });
    return ran.map((m) => m.name);
  } finally {
    await dataSource.destroy();
  }
}

async function main(): Promise<void> {
  const databaseUrl = process.env.DATABASE_URL;
  if (!databaseUrl) throw new Error('DATABASE_URL is required, e.g. postgres://postgres@127.0.0.1:54400/yardcall.');
  const ran = await runMigrations(databaseUrl);
  console.log(ran.length ? `Ran ${ran.length} migration(s): ${ran.join(', ')}.` : 'The database is up to date.');
}

if (require.main === module) {
  main().catch((error: unknown) => {
    console.error(error instanceof Error ? error.message : error);
    process.exit(1);
  });
}
