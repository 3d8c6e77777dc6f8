import { dirname, relative, resolve } from 'node:path';
import ts from 'typescript';

const ROOT = resolve(__dirname, '..');

/** Every source file a tsconfig compiles: its own list plus everything those files import. */
function compiledFiles(configFile: string): string[] {
  const path = resolve(ROOT, configFile);
  const { config } = ts.readConfigFile(path, ts.sys.readFile);
  const parsed = ts.parseJsonConfigFileContent(config, ts.sys, dirname(path));
  const program = ts.createProgram({ rootNames: parsed.fileNames, options: { ...parsed.options, noEmit: true } });
  return program
    .getSourceFiles()
    .map((file) => relative(ROOT, file.fileName))
    .filter((file) => file.startsWith('src-server/'));
}

describe('production build (tsconfig.server.build.json)', () => {
  const files = compiledFiles('tsconfig.server.build.json');

  it('compiles the app and its entry points', () => {
    expect(files).toEqual(
      expect.arrayContaining(['src-server/main.ts', 'src-server/database/migrate.ts', 'src-server/database/seed.ts', 'src-server/dev-fakes/run-fakes.ts']),
    );
  });

  it('leaves out benchmarks, specs and test fixtures', () => {
    const notProduction = files.filter((file) => file.startsWith('src-server/bench/') || file.endsWith('.spec.ts') || file.endsWith('/fixtures.ts'));
    expect(notProduction).toEqual([]);
  });
});

describe('benchmark build (tsconfig.bench.json)', () => {
  it('compiles every benchmark with the entry points they start', () => {
    const files = compiledFiles('tsconfig.bench.json');
    expect(files).toEqual(
      expect.arrayContaining(['src-server/bench/matrix-bench.ts', 'src-server/bench/http-load.ts', 'src-server/main.ts', 'src-server/database/migrate.ts']),
    );
  });
});
