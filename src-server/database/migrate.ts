import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { loadConfig } from '../config/app-config';
import { dataSourceOptions } from './data-source-options';

/** Runs pending migrations (no TypeORM CLI needed); `--revert` undoes the last one. */
async function migrate(): Promise<void> {
  const dataSource = new DataSource(dataSourceOptions(loadConfig()));
  await dataSource.initialize();
  try {
    if (process.argv.includes('--revert')) {
      await dataSource.undoLastMigration({ transaction: 'each' });
    } else {
      const ran = await dataSource.runMigrations({ transaction: 'each' });
      console.log(ran.length ? `applied ${ran.map((m) => m.name).join(', ')}` : 'schema up to date');
    }
  } finally {
    await dataSource.destroy();
  }
}

migrate().catch((error) => {
  console.error(`migration failed: ${error instanceof Error ? error.message : error}`);
  process.exit(1);
});
