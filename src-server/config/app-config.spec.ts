import { randomBytes } from 'node:crypto';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { ConfigError, loadConfig } from './app-config';
import { DEV_JWT_SECRET, PUBLISHED_JWT_SECRETS } from './fail-closed';

const randomSecret = () => randomBytes(48).toString('base64url');
/** A production environment with every secret and password set to its own value. */
const production = (extra: NodeJS.ProcessEnv = {}): NodeJS.ProcessEnv => ({
  NODE_ENV: 'production',
  JWT_SECRET: randomSecret(),
  DB_PASSWORD: randomSecret(),
  S3_ACCESS_KEY_ID: 'AKIA-own-key',
  S3_SECRET_ACCESS_KEY: randomSecret(),
  ...extra,
});

/** The setting each refusal names (the first word of its message), or [] when the configuration loads. */
function refusedKeys(env: NodeJS.ProcessEnv): string[] {
  try {
    loadConfig(env);
    return [];
  } catch (error) {
    if (!(error instanceof ConfigError)) throw error;
    return error.badKeys.map((problem) => problem.split(' ')[0]);
  }
}

describe(loadConfig.name, () => {
  it('gives working defaults for development', () => {
    const config = loadConfig({ NODE_ENV: 'development' });
    expect(config.port).toBe(3000);
    expect(config.db).toMatchObject({ host: '127.0.0.1', port: 3307, name: 'bandwright' });
    expect(config.appUrl).toBe('http://127.0.0.1:3000');
    expect(config.uploadMaxBytes).toBe(25 * 1024 * 1024);
    expect(config.jwt.secret).toBe(DEV_JWT_SECRET);
    expect(config.seedDemoAccounts).toBe(false);
  });

  it('names every bad key at once', () => {
    let error: unknown;
    try {
      loadConfig({ PORT: 'eighty', DB_PORT: '70000', NODE_ENV: 'staging' });
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(ConfigError);
    const keys = (error as ConfigError).badKeys.join('\n');
    expect(keys).toMatch(/^PORT must be an integer/m);
    expect(keys).toMatch(/^DB_PORT must be an integer/m);
    expect(keys).toMatch(/^NODE_ENV must be/m);
  });

  describe('JWT_SECRET', () => {
    it('is required in production and when no mode is named', () => {
      expect(refusedKeys({ NODE_ENV: 'production' })).toContain('JWT_SECRET');
      expect(refusedKeys({})).toEqual(['JWT_SECRET']);
    });

    it('is required when a development or test mode listens beyond loopback', () => {
      for (const mode of ['development', 'test']) {
        for (const host of ['0.0.0.0', '::', '192.168.1.20', 'bandwright.example']) {
          expect(refusedKeys({ NODE_ENV: mode, HOST: host })).toEqual(['JWT_SECRET']);
        }
      }
    });

    it.each(PUBLISHED_JWT_SECRETS)('refuses the published value %s outside loopback development and tests', (published) => {
      expect(refusedKeys(production({ JWT_SECRET: published }))).toEqual(['JWT_SECRET']);
      expect(refusedKeys({ JWT_SECRET: published })).toEqual(['JWT_SECRET']);
      expect(refusedKeys({ NODE_ENV: 'development', HOST: '0.0.0.0', JWT_SECRET: published })).toEqual(['JWT_SECRET']);
      expect(refusedKeys({ NODE_ENV: 'test', HOST: '10.0.0.5', JWT_SECRET: published })).toEqual(['JWT_SECRET']);
      expect(
        refusedKeys({
          NODE_ENV: 'production',
          HOST: '127.0.0.1',
          JWT_SECRET: published,
          DB_PASSWORD: randomSecret(),
          S3_ACCESS_KEY_ID: 'own',
          S3_SECRET_ACCESS_KEY: randomSecret(),
        }),
      ).toEqual(['JWT_SECRET']);
    });

    it.each(['127.0.0.1', '127.0.0.2', 'localhost', '::1'])('accepts a published value in development and tests on loopback %s', (host) => {
      for (const mode of ['development', 'test']) {
        for (const published of PUBLISHED_JWT_SECRETS) {
          expect(loadConfig({ NODE_ENV: mode, HOST: host, JWT_SECRET: published }).jwt.secret).toBe(published);
        }
      }
    });

    it('refuses a short secret in every mode and never echoes it', () => {
      for (const env of [production({ JWT_SECRET: 'short-secret-value' }), { NODE_ENV: 'development', JWT_SECRET: 'short-secret-value' }]) {
        expect(refusedKeys(env)).toEqual(['JWT_SECRET']);
        expect(() => loadConfig(env)).not.toThrow(/short-secret-value/);
      }
    });

    it('refuses a long secret made of a few repeated characters', () => {
      expect(refusedKeys(production({ JWT_SECRET: 'ab'.repeat(40) }))).toEqual(['JWT_SECRET']);
    });

    it('accepts a random secret in production', () => {
      const secret = randomSecret();
      expect(loadConfig(production({ JWT_SECRET: secret })).jwt.secret).toBe(secret);
    });

    it('lists every secret printed in the repository as published', () => {
      // Any 32+ character word on a line that mentions JWT_SECRET (or the development default) in code, scripts and docs.
      const root = resolve(__dirname, '../..');
      const files = [
        ...walk(join(root, 'src-server')),
        ...walk(join(root, 'scripts')),
        ...walk(join(root, 'test')),
        join(root, '.env.example'),
        join(root, 'README.md'),
        join(root, 'DEVELOPERS.md'),
      ].filter((file) => file !== __filename);
      const printed = new Set<string>();
      for (const file of files) {
        for (const line of readFileSync(file, 'utf8').split('\n')) {
          if (!line.includes('JWT_SECRET') && !line.includes('DEV_JWT_SECRET')) continue;
          for (const word of line.match(/[A-Z0-9][\w-]{31,}/gi) ?? []) if (!/^[A-Z0-9_]+$/.test(word)) printed.add(word);
        }
      }
      expect(printed.size).toBeGreaterThanOrEqual(3);
      expect([...printed].filter((word) => !PUBLISHED_JWT_SECRETS.includes(word))).toEqual([]);
    });
  });

  describe('published defaults in production', () => {
    it('loads when every secret is set to an own value', () => {
      expect(refusedKeys(production())).toEqual([]);
    });

    it('refuses the local database password, set or defaulted', () => {
      expect(refusedKeys(production({ DB_PASSWORD: 'bandwright-local' }))).toEqual(['DB_PASSWORD']);
      expect(refusedKeys(production({ DB_PASSWORD: undefined }))).toEqual(['DB_PASSWORD']);
    });

    it('refuses the local object store keys, set or defaulted', () => {
      expect(refusedKeys(production({ S3_ACCESS_KEY_ID: 'S3RVER', S3_SECRET_ACCESS_KEY: 'S3RVER' }))).toEqual(['S3_ACCESS_KEY_ID', 'S3_SECRET_ACCESS_KEY']);
      expect(refusedKeys(production({ S3_ACCESS_KEY_ID: undefined, S3_SECRET_ACCESS_KEY: undefined }))).toEqual(['S3_ACCESS_KEY_ID', 'S3_SECRET_ACCESS_KEY']);
    });

    it('refuses the demo password when demo accounts are asked for or the password is set', () => {
      expect(refusedKeys(production({ SEED_DEMO_ACCOUNTS: '1' }))).toEqual(['DEMO_PASSWORD']);
      expect(refusedKeys(production({ DEMO_PASSWORD: 'bandwright-demo' }))).toEqual(['DEMO_PASSWORD']);
      expect(refusedKeys(production({ SEED_DEMO_ACCOUNTS: '1', DEMO_PASSWORD: randomSecret() }))).toEqual([]);
    });

    it('keeps the local defaults working in development and tests', () => {
      expect(loadConfig({ NODE_ENV: 'development', SEED_DEMO_ACCOUNTS: '1' })).toMatchObject({
        db: { password: 'bandwright-local' },
        demoPassword: 'bandwright-demo',
      });
      expect(refusedKeys({ NODE_ENV: 'test', JWT_SECRET: randomSecret(), SEED_DEMO_ACCOUNTS: '1' })).toEqual([]);
    });

    it('names every refused setting at once and never echoes a value', () => {
      const env = { NODE_ENV: 'production', SEED_DEMO_ACCOUNTS: '1' };
      expect(refusedKeys(env)).toEqual(['JWT_SECRET', 'DB_PASSWORD', 'S3_ACCESS_KEY_ID', 'S3_SECRET_ACCESS_KEY', 'DEMO_PASSWORD']);
      expect(() => loadConfig(env)).not.toThrow(/bandwright-local|S3RVER|bandwright-demo/);
    });
  });

  describe('SEED_DEMO_ACCOUNTS', () => {
    it('is off unless set to 1', () => {
      expect(loadConfig({ NODE_ENV: 'test' }).seedDemoAccounts).toBe(false);
      expect(loadConfig({ NODE_ENV: 'test', SEED_DEMO_ACCOUNTS: '0' }).seedDemoAccounts).toBe(false);
      expect(loadConfig({ NODE_ENV: 'test', SEED_DEMO_ACCOUNTS: '1' }).seedDemoAccounts).toBe(true);
      expect(refusedKeys({ NODE_ENV: 'test', SEED_DEMO_ACCOUNTS: 'yes' })).toEqual(['SEED_DEMO_ACCOUNTS']);
    });
  });
});

function* walk(dir: string): Generator<string> {
  for (const name of readdirSync(dir)) {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) yield* walk(path);
    else if (/\.(?:ts|js|sh|md)$/.test(name)) yield path;
  }
}
