import { NestFactory } from '@nestjs/core';
import { AppModule } from '../app.module';
import { DEFAULT_DEMO_PASSWORD } from '../config/app-config';
import { createCliDataSource } from './data-source';
import { seedDemoCases } from './demo-cases.seeder';
import { DEMO_ORGANISATION } from './seed-data';
import { seedDemoData } from './seeder';

/** Seeds the demo scenario into the database named by DB_* (run the migrations first). */
async function main(): Promise<void> {
  const password = process.env.SITEBAND_DEMO_PASSWORD || DEFAULT_DEMO_PASSWORD;
  if (process.env.NODE_ENV === 'production' && !process.env.SITEBAND_DEMO_PASSWORD) {
    throw new Error('Refusing to seed demo users with the published default password in production: set SITEBAND_DEMO_PASSWORD');
  }
  const dataSource = createCliDataSource();
  await dataSource.initialize();
  try {
    const report = await seedDemoData(dataSource, password);
    console.log(`Seed: ${DEMO_ORGANISATION.name}`);
    console.log(
      `Seed: users created ${report.created.length}, updated ${report.updated.length}, unchanged ${report.unchanged.length}`,
    );
    for (const email of report.created) console.log(`Seed: created ${email}`);
    for (const email of report.updated) console.log(`Seed: updated ${email}`);
  } finally {
    await dataSource.destroy();
  }
  // The demo cases go through the API's own services (sync, uploads, recomputation, review), so they need
  // the whole application (database and object storage), without its HTTP server.
  const app = await NestFactory.createApplicationContext(AppModule, { logger: ['error', 'warn'] });
  try {
    const cases = await seedDemoCases(app);
    console.log(`Seed: demo cases created ${cases.created.length}, unchanged ${cases.unchanged.length}`);
    for (const site of cases.created) console.log(`Seed: created case ${site}`);
  } finally {
    await app.close();
  }
}

main().catch((error: unknown) => {
  console.error('Seed failed:', error instanceof Error ? error.message : error);
  process.exit(1);
});
