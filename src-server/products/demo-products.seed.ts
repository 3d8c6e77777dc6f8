import type { DataSource } from 'typeorm';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { Band } from '../bands/band.entity';
import { Product } from './product.entity';
import { User } from '../users/user.entity';
import { Radio, RadioBand } from './radio.entity';

interface RadioSeed extends Omit<Radio, 'product' | 'productId' | 'bands' | 'version' | 'createdAt' | 'updatedAt'> {
  bands: { band: string; certifiedMaxGainDbi: number | null }[];
}

type ProductFields = Omit<Product, 'radios' | 'version' | 'createdAt' | 'updatedAt' | 'createdById' | 'createdBy' | 'deletedAt' | 'deletedById' | 'deletedBy'>;

interface ProductSeed extends ProductFields {
  /** E-mail of the demo account that created it; unknown (null) when demo accounts were not seeded. */
  createdBy: string;
  radios: RadioSeed[];
}

/** The two invented demo products of the brief with their radios (stable ids the matrix relies on). */
export async function seedDemoProducts(dataSource: DataSource): Promise<string> {
  const seed: ProductSeed[] = JSON.parse(readFileSync(resolve('catalog-seed/products.json'), 'utf8'));
  let created = 0;
  await dataSource.transaction(async (manager) => {
    const byDesignation = new Map((await manager.find(Band, { select: { id: true, designation: true } })).map((b) => [b.designation, b.id]));
    for (const { radios, createdBy, ...product } of seed) {
      // A deleted demo product stays deleted: re-inserting its id would fail.
      if (await manager.exists(Product, { where: { id: product.id }, withDeleted: true })) continue;
      const creator = await manager.findOne(User, { select: { id: true }, where: { email: createdBy } });
      await manager.insert(Product, { ...product, createdById: creator?.id ?? null });
      for (const { bands, ...radio } of radios) {
        await manager.insert(Radio, { ...radio, productId: product.id });
        await manager.insert(
          RadioBand,
          bands.map((b, position) => {
            const bandId = byDesignation.get(b.band);
            if (!bandId) throw new Error(`catalog-seed/products.json: radio "${radio.name}" names unknown band "${b.band}"`);
            return { radioId: radio.id, bandId, certifiedMaxGainDbi: b.certifiedMaxGainDbi, position };
          }),
        );
      }
      created += 1;
    }
  });
  return `${created} created, ${seed.length - created} already present`;
}
