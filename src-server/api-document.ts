import type { INestApplication } from '@nestjs/common';
import { DocumentBuilder, type OpenAPIObject, SwaggerModule } from '@nestjs/swagger';

/** The OpenAPI document of the app: served at /api/docs-json and the source of src-client/lib/api-types.ts. */
export function buildApiDocument(app: INestApplication): OpenAPIObject {
  return SwaggerModule.createDocument(
    app,
    new DocumentBuilder()
      .setTitle('Bandwright API')
      .setDescription('Antenna catalogue, band library and compatibility checks. Each route lists the roles that may call it under x-roles.')
      .setVersion('0.1')
      .addBearerAuth()
      .build(),
  );
}
