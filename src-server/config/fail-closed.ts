import { isIPv4 } from 'node:net';

/** The JWT secret used when none is set, only in an explicit development or test mode on loopback. */
export const DEV_JWT_SECRET = 'dev-only-secret-change-me-0123456789abcdef';

/**
 * Every JWT secret printed in this repository (the development default, .env.example, the test and bench
 * scripts). Anyone can sign tokens with them, so they are refused outside loopback development and tests.
 */
export const PUBLISHED_JWT_SECRETS: readonly string[] = [
  DEV_JWT_SECRET,
  'change-me-to-at-least-32-random-characters',
  'test-secret-not-for-production-0123456789',
  'bench-secret-not-for-production-0123456789',
];

/** Passwords and keys printed in the repository as local defaults; refused when NODE_ENV=production. */
export const PUBLISHED_DEFAULTS = {
  DB_PASSWORD: ['bandwright-local'],
  S3_ACCESS_KEY_ID: ['S3RVER'],
  S3_SECRET_ACCESS_KEY: ['S3RVER'],
  DEMO_PASSWORD: ['bandwright-demo'],
} as const satisfies Record<string, readonly string[]>;

export const MIN_JWT_SECRET_LENGTH = 32;
// A random 32+ character secret (hex or base64) has far more distinct characters than this.
const MIN_JWT_SECRET_DISTINCT_CHARACTERS = 10;

export function isLoopbackHost(host: string): boolean {
  return host === 'localhost' || host === '::1' || (isIPv4(host) && host.startsWith('127.'));
}

/** Published secrets are tolerated only when the mode is asked for by name and nothing outside this machine can connect. */
export function isLocalMode(env: NodeJS.ProcessEnv, host: string): boolean {
  return (env.NODE_ENV === 'development' || env.NODE_ENV === 'test') && isLoopbackHost(host);
}

/** The JWT secret to use, or the problem that stops the server; the secret itself is never echoed. */
export function checkJwtSecret(raw: string | undefined, localMode: boolean): { secret: string; problem?: string } {
  if (raw === undefined || raw === '') {
    if (localMode) return { secret: DEV_JWT_SECRET };
    return {
      secret: '',
      problem:
        'JWT_SECRET is required: set a random value of 32+ characters (npm start keeps a generated one in .data/jwt-secret); ' +
        'the development default is used only with NODE_ENV=development or test on a loopback HOST',
    };
  }
  if (raw.length < MIN_JWT_SECRET_LENGTH) return { secret: raw, problem: `JWT_SECRET must be at least ${MIN_JWT_SECRET_LENGTH} characters` };
  if (new Set(raw).size < MIN_JWT_SECRET_DISTINCT_CHARACTERS) {
    return { secret: raw, problem: 'JWT_SECRET is too predictable (too few distinct characters); use a random value' };
  }
  if (!localMode && PUBLISHED_JWT_SECRETS.includes(raw)) {
    return {
      secret: raw,
      problem:
        'JWT_SECRET is a value published with Bandwright (development default, .env.example or a test script); ' +
        'set a random value of 32+ characters, or use NODE_ENV=development on a loopback HOST',
    };
  }
  return { secret: raw };
}

/** In production, every setting still holding a published default is named (never its value). */
export function publishedDefaultsInProduction(values: Record<keyof typeof PUBLISHED_DEFAULTS, string>, demoPasswordUsed: boolean): string[] {
  const problems: string[] = [];
  for (const key of Object.keys(PUBLISHED_DEFAULTS) as (keyof typeof PUBLISHED_DEFAULTS)[]) {
    if (key === 'DEMO_PASSWORD' && !demoPasswordUsed) continue;
    if ((PUBLISHED_DEFAULTS[key] as readonly string[]).includes(values[key])) {
      problems.push(`${key} is a default published with Bandwright and is refused when NODE_ENV=production; set your own value`);
    }
  }
  return problems;
}
