import type { DataSource } from 'typeorm';
import type { AppConfig } from '../config/app-config';
import { seedDemoUsers } from '../users/demo-users.seed';
import { seedBands, seedBandSets } from '../bands/band-library.seed';
import { seedRegulatoryLimits } from '../regulatory/regulatory-limits.seed';
import { seedDemoProducts } from '../products/demo-products.seed';
import { seedDemoParts } from '../parts/demo-parts.seed';
import { seedDemoAssignments } from '../compatibility/demo-assignments.seed';
import { seedDemoInProduct } from '../products/in-product/demo-in-product.seed';

export type Seeder = (dataSource: DataSource, config: AppConfig) => Promise<string>;

/** Demo data loaders in dependency order; each is idempotent and returns a one-line summary. */
export const SEEDERS: [string, Seeder][] = [
  ['demo users', seedDemoUsers],
  ['band library', seedBands],
  ['band sets', seedBandSets],
  ['regulatory limits', seedRegulatoryLimits],
  ['demo products', seedDemoProducts],
  ['demo parts', seedDemoParts],
  ['demo assignments', seedDemoAssignments],
  ['demo in-product measurements', seedDemoInProduct],
];
