import type { DataSource } from 'typeorm';
import { loadConfig } from '../config/app-config';
import { demoAccountId, seedDemoUsers } from './demo-users.seed';

/** A data source whose users table starts empty and records what is inserted. */
function fakeUsers() {
  const inserted: { email: string; role: string }[] = [];
  const repo = {
    existsBy: jest.fn(async ({ email }: { email: string }) => inserted.some((user) => user.email === email)),
    insert: jest.fn(async (user: { email: string; role: string }) => void inserted.push(user)),
    findOne: jest.fn(async ({ where }: { where: { email: string } }) => (inserted.some((user) => user.email === where.email) ? { id: 2 } : null)),
  };
  const dataSource = { getRepository: jest.fn(() => repo) } as unknown as DataSource;
  return { dataSource, repo, inserted };
}

describe(seedDemoUsers.name, () => {
  it('creates no account unless SEED_DEMO_ACCOUNTS=1', async () => {
    for (const flag of [undefined, '0']) {
      const { dataSource, repo } = fakeUsers();
      await seedDemoUsers(dataSource, loadConfig({ NODE_ENV: 'test', SEED_DEMO_ACCOUNTS: flag }));
      expect(repo.insert).not.toHaveBeenCalled();
      expect(await demoAccountId(dataSource, 'engineer')).toBeNull();
    }
  });

  it('creates the three demo accounts once when asked', async () => {
    const { dataSource, inserted } = fakeUsers();
    const config = loadConfig({ NODE_ENV: 'test', SEED_DEMO_ACCOUNTS: '1' });
    await seedDemoUsers(dataSource, config);
    await seedDemoUsers(dataSource, config);
    expect(inserted.map((user) => user.role).sort()).toEqual(['admin', 'engineer', 'procurement']);
    expect(await demoAccountId(dataSource, 'engineer')).toBe(2);
  });
});
