import 'reflect-metadata';
import { writeFileSync } from 'node:fs';
import { randomBytes } from 'node:crypto';
import { NestFactory } from '@nestjs/core';
import { AppModule } from './app.module';
import { buildApiDocument } from './api-document';
import { loadConfig } from './config/app-config';

/** Writes the OpenAPI document to the given file (scripts/api-types.sh); preview mode reads the metadata without a database. */
async function main(target: string): Promise<void> {
  // Preview mode connects to nothing; a throwaway loopback configuration only satisfies the modules' wiring.
  const config = loadConfig({ NODE_ENV: 'test', HOST: '127.0.0.1', JWT_SECRET: randomBytes(32).toString('hex') });
  const app = await NestFactory.create(AppModule.forRoot(config), { preview: true, logger: false, abortOnError: false });
  app.setGlobalPrefix('api');
  writeFileSync(target, `${JSON.stringify(buildApiDocument(app), null, 2)}\n`);
  await app.close();
}

main(process.argv[2] ?? 'openapi.json').catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
