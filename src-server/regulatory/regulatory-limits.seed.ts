import type { DataSource } from 'typeorm';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { RegulatoryLimit } from './regulatory-limit.entity';

/** Regulatory limits from catalog-seed/regulatory-limits.json (47 CFR 15.247, ETSI EN 300 328 / 300 220-2 / 301 893, ERC/REC 70-03) with stable ids. */
export async function seedRegulatoryLimits(dataSource: DataSource): Promise<string> {
  const seed: Omit<RegulatoryLimit, 'createdAt' | 'updatedAt'>[] = JSON.parse(readFileSync(resolve('catalog-seed/regulatory-limits.json'), 'utf8'));
  let created = 0;
  await dataSource.transaction(async (manager) => {
    for (const limit of seed) {
      if (await manager.existsBy(RegulatoryLimit, { id: limit.id })) continue;
      await manager.insert(RegulatoryLimit, limit);
      created += 1;
    }
  });
  return `${created} created, ${seed.length - created} already present`;
}
