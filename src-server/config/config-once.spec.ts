import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import { loadConfig } from './app-config';

const SERVER = resolve(__dirname, '..');
/** Entry points that load the configuration once for their process, and code that is not part of the app. */
const MAY_READ_ENVIRONMENT = ['main.ts', 'write-api-document.ts', 'database/migrate.ts', 'database/seed.ts', 'config/', 'bench/', 'dev-fakes/'];

function* sourceFiles(dir: string): Generator<string> {
  for (const name of readdirSync(dir)) {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) yield* sourceFiles(path);
    else if (name.endsWith('.ts') && !name.endsWith('.spec.ts')) yield path;
  }
}

const appSources = [...sourceFiles(SERVER)]
  .map((file) => ({ name: relative(SERVER, file), text: readFileSync(file, 'utf8') }))
  .filter(({ name }) => !MAY_READ_ENVIRONMENT.some((allowed) => name === allowed || name.startsWith(allowed)));

const entryPoint = { name: 'main.ts', text: readFileSync(join(SERVER, 'main.ts'), 'utf8') };

/** Every leaf of the configuration as a dotted path, e.g. `db.host`. */
function leafPaths(value: object, prefix = ''): string[] {
  return Object.entries(value).flatMap(([key, inner]) =>
    inner !== null && typeof inner === 'object' ? leafPaths(inner, `${prefix}${key}.`) : [`${prefix}${key}`],
  );
}

describe('configuration is loaded once and injected', () => {
  it('no app code reads the environment or loads the configuration itself', () => {
    const readers = appSources.filter(({ text }) => /process\.env|loadConfig\(/.test(text)).map(({ name }) => name);
    expect(readers).toEqual([]);
  });

  it('every configuration key is read by the app', () => {
    // main.ts reads where to listen; the rest is read by the modules it configures.
    const readPaths = new Set(
      appSources.concat(entryPoint).flatMap(({ text }) => [...text.matchAll(/config\.[\w.]+/g)].map(([read]) => read.slice('config.'.length))),
    );
    expect(leafPaths(loadConfig({ NODE_ENV: 'development' })).filter((path) => !readPaths.has(path))).toEqual([]);
  });
});
