import 'reflect-metadata';
import { writeFileSync } from 'node:fs';
import { NestFactory } from '@nestjs/core';
import { AppModule } from './app.module';
import { buildApiDocument } from './api-document';

/** Writes the OpenAPI document to the given file (scripts/api-types.sh); preview mode reads the metadata without a database. */
async function main(target: string): Promise<void> {
  const app = await NestFactory.create(AppModule, { preview: true, logger: false, abortOnError: false });
  app.setGlobalPrefix('api');
  writeFileSync(target, `${JSON.stringify(buildApiDocument(app), null, 2)}\n`);
  await app.close();
}

main(process.argv[2] ?? 'openapi.json').catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
