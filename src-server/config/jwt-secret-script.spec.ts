import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { checkJwtSecret } from './fail-closed';

const SCRIPT = resolve(__dirname, '../../scripts/jwt-secret.sh');
const secretIn = (dataDir: string) => execFileSync('bash', [SCRIPT, dataDir], { encoding: 'utf8' });

describe('scripts/jwt-secret.sh', () => {
  let root: string;
  beforeEach(() => {
    root = mkdtempSync(join(tmpdir(), 'bw-secret-'));
  });
  afterEach(() => rmSync(root, { recursive: true, force: true }));

  it('generates a secret that production accepts, readable by the owner only', () => {
    const secret = secretIn(join(root, 'data'));
    expect(checkJwtSecret(secret, false).problem).toBeUndefined();
    expect(statSync(join(root, 'data', 'jwt-secret')).mode & 0o777).toBe(0o600);
  });

  it('reuses the secret on later starts, and no two installs share one', () => {
    const first = secretIn(join(root, 'a'));
    expect(secretIn(join(root, 'a'))).toBe(first);
    expect(secretIn(join(root, 'b'))).not.toBe(first);
  });
});
