import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { loadConfig } from '../config/app-config';
import { dataSourceOptions } from './data-source-options';
import { SEEDERS } from './seeders';

/** Loads the demo data from catalog-seed/; running it twice duplicates nothing. */
async function seed(): Promise<void> {
  const config = loadConfig();
  const dataSource = new DataSource(dataSourceOptions(config));
  await dataSource.initialize();
  try {
    for (const [name, seeder] of SEEDERS) {
      const summary = await seeder(dataSource, config);
      console.log(`seed ${name}: ${summary}`);
    }
  } finally {
    await dataSource.destroy();
  }
}

seed().catch((error) => {
  console.error(`seeding failed: ${error instanceof Error ? error.stack : error}`);
  process.exit(1);
});
