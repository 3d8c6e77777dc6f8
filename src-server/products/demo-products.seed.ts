import type { DataSource } from 'typeorm';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { Band } from '../bands/band.entity';
import { Product } from './product.entity';
import { Radio, RadioBand } from './radio.entity';

interface RadioSeed extends Omit<Radio, 'product' | 'productId' | 'bands' | 'version' | 'createdAt' | 'updatedAt'> {
  bands: { band: string; certifiedMaxGainDbi: number | null }[];
}

interface ProductSeed extends Omit<Product, 'radios' | 'version' | 'createdAt' | 'updatedAt'> {
  radios: RadioSeed[];
}

/** The two invented demo products of the brief with their radios (stable ids the matrix relies on). */
export async function seedDemoProducts(dataSource: DataSource): Promise<string> {
  const seed: ProductSeed[] = JSON.parse(readFileSync(resolve('catalog-seed/products.json'), 'utf8'));
  let created = 0;
  await dataSource.transaction(async (manager) => {
    const byDesignation = new Map((await manager.find(Band, { select: { id: true, designation: true } })).map((b) => [b.designation, b.id]));
    for (const { radios, ...product } of seed) {
      if (await manager.existsBy(Product, { id: product.id })) continue;
      await manager.insert(Product, product);
      for (const { bands, ...radio } of radios) {
        await manager.insert(Radio, { ...radio, productId: product.id });
        await manager.insert(RadioBand, bands.map((b, position) => {
          const bandId = byDesignation.get(b.band);
          if (!bandId) throw new Error(`catalog-seed/products.json: radio "${radio.name}" names unknown band "${b.band}"`);
          return { radioId: radio.id, bandId, certifiedMaxGainDbi: b.certifiedMaxGainDbi, position };
        }));
      }
      created += 1;
    }
  });
  return `${created} created, ${seed.length - created} already present`;
}
