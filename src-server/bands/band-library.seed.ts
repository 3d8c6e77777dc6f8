import type { DataSource } from 'typeorm';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import type { DuplexMode, RangeRole, Technology } from './band-domain';
import { Band, BandRange } from './band.entity';
import { BandSet, BandSetMember } from './band-set.entity';

export interface BandSeed {
  id: number;
  technology: Technology;
  designation: string;
  name: string;
  duplex: DuplexMode;
  ranges: { role: RangeRole; fromMhz: number; toMhz: number }[];
  centreMhz?: number;
  bandwidthMhz?: number;
  /** GNSS: main lobe of the open-service signal (the ranges hold the full signal band). */
  mainLobe?: { fromMhz: number; toMhz: number };
  regions: string[];
  source: { document: string; table: string; note?: string | null };
}

interface BandSetSeed {
  id: number;
  name: string;
  description: string;
  bands: string[];
}

export const readBandSeed = (): BandSeed[] => JSON.parse(readFileSync(resolve('catalog-seed/bands.json'), 'utf8'));

/** The standard band library from catalog-seed/bands.json, with stable ids; existing bands are left as they are. */
export async function seedBands(dataSource: DataSource): Promise<string> {
  const seed = readBandSeed();
  let created = 0;
  await dataSource.transaction(async (manager) => {
    for (const band of seed) {
      if (await manager.existsBy(Band, { id: band.id })) continue;
      await manager.insert(Band, {
        id: band.id,
        technology: band.technology,
        designation: band.designation,
        name: band.name,
        duplex: band.duplex,
        centreMhz: band.centreMhz ?? null,
        bandwidthMhz: band.bandwidthMhz ?? null,
        mainLobeFromMhz: band.mainLobe?.fromMhz ?? null,
        mainLobeToMhz: band.mainLobe?.toMhz ?? null,
        regions: band.regions,
        sourceDocument: band.source.document,
        sourceTable: band.source.table,
        sourceNote: band.source.note ?? null,
      });
      await manager.insert(
        BandRange,
        band.ranges.map((r, position) => ({ ...r, bandId: band.id, position })),
      );
      created += 1;
    }
  });
  return `${created} created, ${seed.length - created} already present`;
}

/** Example band sets from catalog-seed/band-sets.json; bands are named by designation there. */
export async function seedBandSets(dataSource: DataSource): Promise<string> {
  const seed: BandSetSeed[] = JSON.parse(readFileSync(resolve('catalog-seed/band-sets.json'), 'utf8'));
  let created = 0;
  await dataSource.transaction(async (manager) => {
    const byDesignation = new Map((await manager.find(Band, { select: { id: true, designation: true } })).map((b) => [b.designation, b.id]));
    for (const set of seed) {
      if (await manager.existsBy(BandSet, { id: set.id })) continue;
      const bandIds = set.bands.map((designation) => {
        const id = byDesignation.get(designation);
        if (!id) throw new Error(`catalog-seed/band-sets.json: set "${set.name}" names unknown band "${designation}"`);
        return id;
      });
      await manager.insert(BandSet, { id: set.id, name: set.name, description: set.description });
      await manager.insert(
        BandSetMember,
        bandIds.map((bandId, position) => ({ bandSetId: set.id, bandId, position })),
      );
      created += 1;
    }
  });
  return `${created} created, ${seed.length - created} already present`;
}
