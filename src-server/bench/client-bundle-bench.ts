import { readFileSync, existsSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';

/**
 * The JavaScript a browser must fetch before the first screen renders: the entry module and the
 * modules index.html preloads, gzip-compressed. Route chunks loaded later are listed separately.
 */
const CLIENT_DIR = process.env.CLIENT_DIR ?? 'dist/client';
const TARGET_KB = 350;

function main(): void {
  const indexPath = join(CLIENT_DIR, 'index.html');
  if (!existsSync(indexPath)) throw new Error(`${indexPath} is missing: build the client first (npx vite build)`);
  const html = readFileSync(indexPath, 'utf8');
  const initial = [...html.matchAll(/<script[^>]+src="([^"]+\.js)"|<link[^>]+rel="modulepreload"[^>]+href="([^"]+\.js)"/g)].map((m) => m[1] ?? m[2]);
  const gz = (file: string) => gzipSync(readFileSync(join(CLIENT_DIR, file.replace(/^\//, '')))).length;
  let total = 0;
  for (const file of initial) {
    const size = gz(file);
    total += size;
    console.log(`  initial  ${(size / 1024).toFixed(1).padStart(8)} KB gzip  ${file}`);
  }
  console.log(`initial JavaScript: ${(total / 1024).toFixed(1)} KB gzip (target ≤ ${TARGET_KB} KB) ${total / 1024 <= TARGET_KB ? 'OK' : 'OVER TARGET'}`);
}

main();
