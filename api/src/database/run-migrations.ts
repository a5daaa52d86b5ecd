import { createCliDataSource } from './data-source';

/** Applies every pending committed migration to the database named by DB_*; prints what it ran. */
async function main(): Promise<void> {
  const dataSource = createCliDataSource();
  await dataSource.initialize();
  try {
    const applied = await dataSource.runMigrations({ transaction: 'each' });
    if (applied.length === 0) console.log('Migrations: the database is up to date.');
    for (const migration of applied) console.log(`Migrations: applied ${migration.name}`);
  } finally {
    await dataSource.destroy();
  }
}

main().catch((error: unknown) => {
  console.error('Migrations failed:', error instanceof Error ? error.message : error);
  process.exit(1);
});
