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

/** Demo accounts from catalog-seed/users.json with stable ids; passwords only set when the account is new. */
export async function seedDemoUsers(dataSource: DataSource, config: AppConfig): Promise<string> {
  const demo: DemoUser[] = JSON.parse(readFileSync(resolve('catalog-seed/users.json'), 'utf8'));
  const repo = dataSource.getRepository(User);
  let created = 0;
  for (const user of demo) {
    if (await repo.existsBy({ email: user.email })) continue;
    await repo.insert({ ...user, status: 'active', passwordHash: await hashPassword(config.demoPassword) });
    created += 1;
  }
  return `${created} created, ${demo.length - created} already present`;
}
