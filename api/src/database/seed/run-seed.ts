import 'reflect-metadata';
import { appDataSource } from '../data-source';
import { seedCatalog } from './seed-catalog';
import { seedDemo } from './seed-demo';
import { seedParts } from './seed-parts';

async function run(): Promise<void> {
  await appDataSource.initialize();
  try {
    const pending = await appDataSource.showMigrations();
    if (pending) throw new Error('The database has pending migrations. Run `npm run migration:run -w api` first.');
    const result = await seedDemo(appDataSource);
    console.log(result === 'loaded' ? 'Demo data loaded: Ironbark Swap Works.' : 'Demo data already present; nothing changed.');
    const catalog = await seedCatalog(appDataSource);
    console.log(catalog.inserted > 0 ? `Demo catalog: ${catalog.inserted} records added.` : 'Demo catalog already present.');
    const parts = await seedParts(appDataSource);
    console.log(parts.inserted > 0 ? `Demo parts: ${parts.inserted} suppliers and parts added.` : 'Demo parts already present.');
  } finally {
    await appDataSource.destroy();
  }
}

run().catch((error: unknown) => {
  console.error('Seeding failed:', error instanceof Error ? error.message : error);
  process.exit(1);
});
