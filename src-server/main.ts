import 'reflect-metadata';
import { existsSync } from 'node:fs';
import { loadConfig } from './config/app-config';
import { createApp } from './app.setup';

async function main(): Promise<void> {
  if (existsSync('.env')) process.loadEnvFile('.env');
  const config = loadConfig();
  const app = await createApp(config);
  await app.listen(config.port, config.host);
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
