import type { DataSource } from 'typeorm';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import type { AppConfig } from '../config/app-config';
import type { Role } from '../common/roles';
import { hashPassword } from '../auth/password';
import { User } from './user.entity';

interface DemoUser {
  id: number;
  email: string;
  name: string;
  role: Role;
}

export const readDemoUsers = (): DemoUser[] => JSON.parse(readFileSync(resolve('catalog-seed/users.json'), 'utf8'));

/** Demo accounts from catalog-seed/users.json with stable ids, only when SEED_DEMO_ACCOUNTS=1; passwords only set when the account is new. */
export async function seedDemoUsers(dataSource: DataSource, config: AppConfig): Promise<string> {
  if (!config.seedDemoAccounts) return 'skipped (created only with SEED_DEMO_ACCOUNTS=1)';
  const demo = readDemoUsers();
  const repo = dataSource.getRepository(User);
  let created = 0;
  for (const user of demo) {
    if (await repo.existsBy({ email: user.email })) continue;
    await repo.insert({ ...user, status: 'active', passwordHash: await hashPassword(config.demoPassword) });
    created += 1;
  }
  return `${created} created, ${demo.length - created} already present`;
}

/** The id of the demo account with this role when it exists, else null, so demo data never names a real user. */
export async function demoAccountId(dataSource: DataSource, role: Role): Promise<number | null> {
  const email = readDemoUsers().find((user) => user.role === role)?.email;
  if (!email) return null;
  return (await dataSource.getRepository(User).findOne({ select: { id: true }, where: { email } }))?.id ?? null;
}
