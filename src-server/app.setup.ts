import type { INestApplication } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { SwaggerModule } from '@nestjs/swagger';
import helmet from 'helmet';
import { AppModule } from './app.module';
import { buildApiDocument } from './api-document';
import { APP_CONFIG, type AppConfig } from './config/app-config';
import { JsonLogger } from './common/json-logger';
import { requestIdMiddleware } from './common/request-context';
import { verifyJsonBody } from './common/json-body';

/** Everything main.ts does except listen, so the tests run the production app. */
export function configureApp(app: INestApplication): INestApplication {
  const config = app.get<AppConfig>(APP_CONFIG);
  // X-Forwarded-For is believed only when the direct peer is a proxy on this machine (README, "Behind a proxy").
  app.getHttpAdapter().getInstance().set('trust proxy', 'loopback');
  app.use(requestIdMiddleware);
  // Registered here (Nest then skips its default) so every app, tests included, refuses over-deep JSON and lone surrogates.
  // Nest's option type leaves out `verify` because its rawBody mode uses it; this app does not use rawBody.
  (app as NestExpressApplication).useBodyParser('json', { verify: verifyJsonBody } as Record<string, unknown>);
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          // Blueprint positions popovers and table cells with inline styles.
          styleSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          fontSrc: ["'self'", 'data:'],
          connectSrc: ["'self'"],
          objectSrc: ["'none'"],
          frameAncestors: ["'none'"],
          upgradeInsecureRequests: null,
        },
      },
    }),
  );
  // Only the app's own origin may call the API from a browser.
  app.enableCors({ origin: [config.appUrl], credentials: false });
  app.setGlobalPrefix('api');
  app.enableShutdownHooks();
  SwaggerModule.setup('api/docs', app, buildApiDocument(app), { jsonDocumentUrl: 'api/docs-json' });
  return app;
}

export async function createApp(config: AppConfig): Promise<NestExpressApplication> {
  const app = await NestFactory.create<NestExpressApplication>(AppModule.forRoot(config), { logger: new JsonLogger() });
  configureApp(app);
  return app;
}
