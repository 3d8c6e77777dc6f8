import { checkJwtSecret, isLocalMode, publishedDefaultsInProduction } from './fail-closed';

/** Every setting Bandwright reads from the environment, validated once at boot. */
export interface AppConfig {
  nodeEnv: 'development' | 'test' | 'production';
  port: number;
  host: string;
  appUrl: string;
  db: { host: string; port: number; user: string; password: string; name: string };
  jwt: { secret: string; expiresInSeconds: number };
  smtp: { host: string; port: number; from: string };
  s3: { endpoint: string; region: string; bucket: string; accessKeyId: string; secretAccessKey: string };
  uploadMaxBytes: number;
  /** Test-only: pause after an upload's object is stored, so a test can kill the process there. 0 (off) by default, always 0 in production. */
  uploadTestPauseMs: number;
  demoPassword: string;
  /** SEED_DEMO_ACCOUNTS=1: the seed creates the demo accounts (npm start and the test scripts ask; production does not). */
  seedDemoAccounts: boolean;
  clientDir: string;
}

export class ConfigError extends Error {
  constructor(readonly badKeys: string[]) {
    super(`Invalid configuration: ${badKeys.join('; ')}`);
  }
}

export function loadConfig(env: NodeJS.ProcessEnv = process.env): AppConfig {
  const problems: string[] = [];
  const str = (key: string, fallback?: string): string => {
    const value = env[key] ?? fallback;
    if (value === undefined || value === '') {
      problems.push(`${key} is required`);
      return '';
    }
    return value;
  };
  const int = (key: string, fallback: number, min: number, max: number): number => {
    const raw = env[key];
    if (raw === undefined || raw === '') return fallback;
    const value = Number(raw);
    if (!Number.isInteger(value) || value < min || value > max) {
      problems.push(`${key} must be an integer from ${min} to ${max}, got "${raw}"`);
      return fallback;
    }
    return value;
  };

  const nodeEnv = (env.NODE_ENV ?? 'development') as AppConfig['nodeEnv'];
  if (!['development', 'test', 'production'].includes(nodeEnv)) {
    problems.push(`NODE_ENV must be development, test or production, got "${env.NODE_ENV}"`);
  }
  const host = str('HOST', '127.0.0.1');
  const { secret: jwtSecret, problem: jwtProblem } = checkJwtSecret(env.JWT_SECRET, isLocalMode(env, host));
  if (jwtProblem) problems.push(jwtProblem);
  const seedDemoAccounts = env.SEED_DEMO_ACCOUNTS === '1';
  if (![undefined, '', '0', '1'].includes(env.SEED_DEMO_ACCOUNTS)) problems.push(`SEED_DEMO_ACCOUNTS must be 1 or 0, got "${env.SEED_DEMO_ACCOUNTS}"`);
  const port = int('PORT', 3000, 1, 65535);
  const s3Port = int('S3_PORT', 4569, 1, 65535);
  const smtpPort = int('SMTP_PORT', 1025, 1, 65535);

  const config: AppConfig = {
    nodeEnv,
    port,
    host,
    appUrl: str('APP_URL', `http://127.0.0.1:${port}`),
    db: {
      host: str('DB_HOST', '127.0.0.1'),
      port: int('DB_PORT', 3307, 1, 65535),
      user: str('DB_USER', 'bandwright'),
      password: str('DB_PASSWORD', 'bandwright-local'),
      name: str('DB_NAME', 'bandwright'),
    },
    jwt: { secret: jwtSecret, expiresInSeconds: int('JWT_EXPIRES_IN_SECONDS', 8 * 3600, 60, 30 * 24 * 3600) },
    smtp: { host: str('SMTP_HOST', '127.0.0.1'), port: smtpPort, from: str('MAIL_FROM', 'Bandwright <no-reply@bandwright.test>') },
    s3: {
      endpoint: str('S3_ENDPOINT', `http://127.0.0.1:${s3Port}`),
      region: str('S3_REGION', 'us-east-1'),
      bucket: str('S3_BUCKET', 'bandwright'),
      accessKeyId: str('S3_ACCESS_KEY_ID', 'S3RVER'),
      secretAccessKey: str('S3_SECRET_ACCESS_KEY', 'S3RVER'),
    },
    uploadMaxBytes: int('UPLOAD_MAX_MB', 25, 1, 1024) * 1024 * 1024,
    uploadTestPauseMs: nodeEnv === 'production' ? 0 : int('UPLOAD_TEST_PAUSE_MS', 0, 0, 600_000),
    demoPassword: str('DEMO_PASSWORD', 'bandwright-demo'),
    seedDemoAccounts,
    clientDir: str('CLIENT_DIR', 'dist/client'),
  };
  if (nodeEnv === 'production') {
    const { db, s3, demoPassword } = config;
    const published = { DB_PASSWORD: db.password, S3_ACCESS_KEY_ID: s3.accessKeyId, S3_SECRET_ACCESS_KEY: s3.secretAccessKey, DEMO_PASSWORD: demoPassword };
    problems.push(...publishedDefaultsInProduction(published, seedDemoAccounts || Boolean(env.DEMO_PASSWORD)));
  }
  if (problems.length > 0) throw new ConfigError(problems);
  return config;
}

export const APP_CONFIG = Symbol('APP_CONFIG');
