import { Inject, Injectable, OnApplicationBootstrap } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, In } from 'typeorm';
import { verifyPassword } from '../auth/password';
import { APP_CONFIG, type AppConfig } from '../config/app-config';
import { PUBLISHED_DEFAULTS } from '../config/fail-closed';
import { readDemoUsers } from './demo-users.seed';
import { User } from './user.entity';

/** Active demo accounts that still open with a published demo password. */
export async function demoAccountsWithPublishedPassword(dataSource: DataSource): Promise<string[]> {
  const accounts = await dataSource
    .getRepository(User)
    .createQueryBuilder('user')
    .addSelect('user.passwordHash')
    .where({ email: In(readDemoUsers().map((user) => user.email)), status: 'active' })
    .getMany();
  const open: string[] = [];
  for (const account of accounts) {
    for (const password of PUBLISHED_DEFAULTS.DEMO_PASSWORD) {
      if (account.passwordHash && (await verifyPassword(password, account.passwordHash))) open.push(account.email);
    }
  }
  return open.sort();
}

/** A production server does not start while anyone can sign in to a demo account with the published password. */
@Injectable()
export class DemoAccountsCheck implements OnApplicationBootstrap {
  constructor(
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    @InjectDataSource() private readonly dataSource: DataSource,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    if (this.config.nodeEnv !== 'production') return;
    const open = await demoAccountsWithPublishedPassword(this.dataSource);
    if (open.length > 0) {
      throw new Error(
        `Refusing to start with NODE_ENV=production: the demo account(s) ${open.join(', ')} still accept the published demo password ` +
          '(DEMO_PASSWORD default); change their passwords or deactivate them first',
      );
    }
  }
}
