import { ConfigError, loadConfig } from './app-config';

describe(loadConfig.name, () => {
  it('gives working defaults for development', () => {
    const config = loadConfig({});
    expect(config.port).toBe(3000);
    expect(config.db).toMatchObject({ host: '127.0.0.1', port: 3307, name: 'bandwright' });
    expect(config.appUrl).toBe('http://127.0.0.1:3000');
    expect(config.uploadMaxBytes).toBe(25 * 1024 * 1024);
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

  it('demands a real JWT secret in production and never echoes it', () => {
    expect(() => loadConfig({ NODE_ENV: 'production' })).toThrow(/JWT_SECRET is required/);
    const attempt = () => loadConfig({ NODE_ENV: 'production', JWT_SECRET: 'short-secret-value' });
    expect(attempt).toThrow(/JWT_SECRET must be at least 32 characters/);
    expect(attempt).not.toThrow(/short-secret-value/);
  });
});
