import type { INestApplication } from '@nestjs/common';
import { Test } from '@nestjs/testing';
import request from 'supertest';
import { AppModule } from '../../src-server/app.module';
import { configureApp } from '../../src-server/app.setup';
import { loadConfig } from '../../src-server/config/app-config';
import { testClientAddress } from './client-address';

export { testClientAddress };

export const DEMO_PASSWORD = process.env.DEMO_PASSWORD ?? 'bandwright-demo';
export const DEMO = {
  admin: 'admin@bandwright.test',
  engineer: 'engineer@bandwright.test',
  procurement: 'buyer@bandwright.test',
} as const;
export type DemoRole = keyof typeof DEMO;

/** The production app module, in-process, against the test database the test command prepared; configuration from the environment unless given. */
export async function createApiApp(config = loadConfig()): Promise<INestApplication> {
  const moduleRef = await Test.createTestingModule({ imports: [AppModule.forRoot(config)] }).compile();
  const app = moduleRef.createNestApplication({ logger: ['error'] });
  configureApp(app);
  await app.init();
  return app;
}

export async function tokenFor(app: INestApplication, email: string, password = DEMO_PASSWORD): Promise<string> {
  const res = await request(app.getHttpServer()).post('/api/auth/login').set('X-Forwarded-For', testClientAddress()).send({ email, password });
  if (res.status !== 200) throw new Error(`login as ${email} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.accessToken;
}

/** Bearer tokens for the three demo roles. */
export async function demoTokens(app: INestApplication): Promise<Record<DemoRole, string>> {
  const [admin, engineer, procurement] = await Promise.all([tokenFor(app, DEMO.admin), tokenFor(app, DEMO.engineer), tokenFor(app, DEMO.procurement)]);
  return { admin, engineer, procurement };
}

/** A unique suffix so tests never collide with each other or with the demo data. */
export const unique = (prefix: string) => `${prefix}-${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 7)}`;
