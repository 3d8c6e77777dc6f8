import { loadRoute, printLoad, signInForBench, startServer } from './http-load';

/**
 * The main read routes under load (issue: reliability): catalogue search with a coverage filter,
 * part detail and a product's compatibility matrix, each driven for BENCH_SECONDS (default 60)
 * at 32 connections against the demo data. Target: zero errors and p95 ≤ 150 ms.
 */
const SECONDS = Number(process.env.BENCH_SECONDS ?? 60);
const CONNECTIONS = 32;
const TARGET_P95_MS = 150;

async function main(): Promise<void> {
  const server = await startServer(Number(process.env.BENCH_PORT ?? 3200) + 1);
  try {
    const token = await signInForBench(server.url, 'engineer@bandwright.test');
    const get = async (path: string) => {
      const res = await fetch(`${server.url}${path}`, { headers: { authorization: `Bearer ${token}` } });
      if (!res.ok) throw new Error(`${path} answered ${res.status}`);
      return res.json();
    };
    const parts = await get('/api/parts?limit=1&status=approved');
    const partId = parts.items[0]?.id;
    const products = await get('/api/products');
    const productId = products[0]?.id ?? products.items?.[0]?.id;
    if (!partId || !productId) throw new Error('the demo data has no approved part or no product: run the seed first');

    const routes = [
      { label: 'GET /api/parts (covers B20 + B8, VSWR ≤ 3)', path: '/api/parts?covers=791-862,880-960&vswrMax=3&limit=25' },
      { label: `GET /api/parts/${partId}`, path: `/api/parts/${partId}` },
      { label: `GET /api/products/${productId}/matrix`, path: `/api/products/${productId}/matrix` },
    ];
    console.log(`read routes, ${CONNECTIONS} connections, ${SECONDS} s each (demo data)`);
    for (const route of routes) {
      printLoad(await loadRoute({ label: route.label, url: `${server.url}${route.path}`, token, connections: CONNECTIONS, seconds: SECONDS }), TARGET_P95_MS);
    }
  } finally {
    server.stop();
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
