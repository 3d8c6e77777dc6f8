import type { INestApplication } from '@nestjs/common';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { DataSource } from 'typeorm';
import { createApiApp } from '../support/api-app';

const script = resolve(__dirname, '../../scripts/db-backup.sh');
const run = (...args: string[]) => execFileSync('bash', [script, ...args], { env: { ...process.env }, stdio: 'pipe', timeout: 120000 }).toString();

describe('npm run db:backup / db:restore', () => {
  let app: INestApplication;
  let db: DataSource;
  let dir: string;

  beforeAll(async () => {
    app = await createApiApp();
    db = app.get(DataSource);
    dir = mkdtempSync(join(tmpdir(), 'bandwright-backup-'));
  });
  afterAll(async () => {
    await app.close();
    rmSync(dir, { recursive: true, force: true });
  });

  const userCount = async () => Number((await db.query('SELECT COUNT(*) AS n FROM users'))[0].n);

  it('restores the database to the moment of the backup', async () => {
    const file = join(dir, 'round-trip.sql.gz');
    const before = await userCount();
    run('backup', file);
    await db.query("INSERT INTO users (email, name, role, status) VALUES ('after-backup@bandwright.test', 'After Backup', 'engineer', 'invited')");
    expect(await userCount()).toBe(before + 1);

    run('restore', file);
    expect(await userCount()).toBe(before);
    expect(await db.query("SELECT id FROM users WHERE email = 'after-backup@bandwright.test'")).toEqual([]);
    expect(await db.query("SELECT email FROM users WHERE email = 'admin@bandwright.test'")).toHaveLength(1);
  }, 120000);

  it('refuses a truncated dump and changes nothing', async () => {
    const file = join(dir, 'truncated.sql');
    writeFileSync(file, 'DROP TABLE IF EXISTS `users`;\n-- no completion line\n');
    const before = await userCount();
    expect(() => run('restore', file)).toThrow(/not a complete dump/);
    expect(await userCount()).toBe(before);
  });
});
