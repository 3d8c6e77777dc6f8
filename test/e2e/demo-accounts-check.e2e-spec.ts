import type { INestApplication } from '@nestjs/common';
import { getDataSourceToken } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import { loadConfig, type AppConfig } from '../../src-server/config/app-config';
import { DemoAccountsCheck, demoAccountsWithPublishedPassword } from '../../src-server/users/demo-accounts.check';
import { createApiApp, DEMO } from '../support/api-app';

// The test database holds the demo accounts (the test scripts seed them), with the published password unless DEMO_PASSWORD says otherwise.
const seededWithPublishedPassword = (process.env.DEMO_PASSWORD ?? 'bandwright-demo') === 'bandwright-demo';
const withPublished = seededWithPublishedPassword ? it : it.skip;

describe(DemoAccountsCheck.name, () => {
  let app: INestApplication;
  let dataSource: DataSource;
  beforeAll(async () => {
    app = await createApiApp();
    dataSource = app.get<DataSource>(getDataSourceToken());
  });
  afterAll(async () => app?.close());

  withPublished('finds every active demo account that opens with the published demo password', async () => {
    expect(await demoAccountsWithPublishedPassword(dataSource)).toEqual(Object.values(DEMO).sort());
  });

  withPublished('stops a production start while those accounts exist', async () => {
    const production: AppConfig = { ...loadConfig(), nodeEnv: 'production' };
    await expect(new DemoAccountsCheck(production, dataSource).onApplicationBootstrap()).rejects.toThrow(/admin@bandwright\.test/);
  });

  it('lets development and test starts through', async () => {
    await expect(new DemoAccountsCheck(loadConfig(), dataSource).onApplicationBootstrap()).resolves.toBeUndefined();
  });
});
