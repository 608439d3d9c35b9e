import 'reflect-metadata';
import { appDataSource } from '../data-source';
import { seedDemo } from './seed-demo';

async function run(): Promise<void> {
  await appDataSource.initialize();
  try {
    const pending = await appDataSource.showMigrations();
    if (pending) throw new Error('The database has pending migrations. Run `npm run migration:run -w api` first.');
    const result = await seedDemo(appDataSource);
    console.log(result === 'loaded' ? 'Demo data loaded: Ironbark Swap Works.' : 'Demo data already present; nothing changed.');
  } finally {
    await appDataSource.destroy();
  }
}

run().catch((error: unknown) => {
  console.error('Seeding failed:', error instanceof Error ? error.message : error);
  process.exit(1);
});
