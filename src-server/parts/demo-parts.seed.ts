import type { DataSource } from 'typeorm';
import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { AppConfig } from '../config/app-config';
import { AuditService } from '../audit/audit.service';
import { StorageService } from '../storage/storage.service';
import { StoredFiles } from '../storage/stored-files.service';
import { UploadLedger } from '../storage/upload-ledger.service';
import { DocumentsService } from './documents/documents.service';
import { MeasurementsService } from './measurements/measurements.service';
import { Part } from './part.entity';
import { touchPart } from './catalogue-revision';
import { PartsService } from './catalogue/parts.service';
import { SourcingService } from './sourcing/sourcing.service';
import { demoAccountId } from '../users/demo-users.seed';
import { DEMO_CURVE_BASES, DEMO_SPEC_BASES, type DemoOffer } from './demo/demo-catalogue';
import type { DocumentKind, Lifecycle, MeasurementKind, ReviewState } from './part.types';
import type { CreatePartDto } from './dto/part-input.dto';

interface SeedPart extends Omit<CreatePartDto, 'specBands'> {
  id: number;
  size: [number, number, number];
  evalGround: [number, number] | null;
  lifecycle: Lifecycle;
  reviewState: ReviewState;
  specBands: [number, number, number, number, number][];
  offers: DemoOffer[];
  alternates?: number[];
  curves: { kind: MeasurementKind; file: string }[];
  documents: { kind: DocumentKind; title: string; file: string }[];
}

const SEED_DIR = 'catalog-seed/parts';

/**
 * Demo parts with stable ids 1001–1060 from catalog-seed/parts/ (written by parts/demo/write-demo-catalogue.ts).
 * Curves and datasheets go through the upload code path: parser, points in the database, original in storage.
 */
export async function seedDemoParts(dataSource: DataSource, config: AppConfig): Promise<string> {
  const root = resolve(SEED_DIR);
  const demo: SeedPart[] = JSON.parse(readFileSync(join(root, 'parts.json'), 'utf8'));
  const audit = new AuditService(dataSource);
  const parts = new PartsService(dataSource, audit);
  const storage = new StorageService(config);
  await storage.ensureBucket();
  const ledger = new UploadLedger(config, dataSource, storage);
  const files = new StoredFiles(dataSource, storage, ledger);
  const measurements = new MeasurementsService(dataSource, files, parts, audit);
  const documents = new DocumentsService(dataSource, files, parts, audit);
  const sourcing = new SourcingService(dataSource, parts, audit);
  // The demo engineer drafts and submits, the demo admin reviews; nobody when the demo accounts were not created.
  const [engineerId, adminId] = await Promise.all([demoAccountId(dataSource, 'engineer'), demoAccountId(dataSource, 'admin')]);
  const existing = new Set((await dataSource.getRepository(Part).find({ select: { id: true }, where: demo.map((p) => ({ id: p.id })) })).map((p) => p.id));
  const created: SeedPart[] = [];
  for (const p of demo) {
    if (existing.has(p.id)) continue;
    const input: CreatePartDto = {
      manufacturer: p.manufacturer,
      mpn: p.mpn,
      title: p.title,
      formFactor: p.formFactor,
      connector: p.connector,
      polarization: p.polarization,
      mounting: p.mounting,
      lengthMm: p.size[0],
      widthMm: p.size[1],
      heightMm: p.size[2],
      evalGroundLengthMm: p.evalGround?.[0] ?? null,
      evalGroundWidthMm: p.evalGround?.[1] ?? null,
      tempMinC: -40,
      tempMaxC: 85,
      lifecycle: p.lifecycle,
      notes: p.notes,
      specBands: p.specBands.map(([fromMhz, toMhz, maxVswr, efficiencyPct, peakGainDbi]) => ({
        fromMhz,
        toMhz,
        maxVswr,
        efficiencyPct,
        peakGainDbi,
        ...DEMO_SPEC_BASES,
      })),
    };
    await dataSource.transaction(async (manager) => {
      await parts.createIn(manager, input, engineerId, 'seeded', p.id);
      for (const offer of p.offers) {
        await sourcing.createOfferIn(
          manager,
          p.id,
          {
            supplier: offer.supplier,
            currency: offer.currency,
            sku: `${offer.supplier.slice(0, 3).toUpperCase()}-${p.mpn}`,
            moq: offer.moq,
            leadTimeDays: offer.leadTimeDays,
            lastCheckedOn: '2025-11-03',
            priceBreaks: offer.breaks.map(([quantity, unitPrice]) => ({ quantity, unitPrice })),
          },
          null,
        );
      }
    });
    for (const curve of p.curves) {
      const buffer = readFileSync(join(root, curve.file));
      const file = { originalname: curve.file.split('/').pop()!, mimetype: curve.kind === 's11' ? 'text/plain' : 'text/csv', size: buffer.length, buffer };
      // Radiated data is taken on the evaluation board; flex and external parts in free space.
      const input = {
        kind: curve.kind,
        basis: curve.kind === 's11' ? undefined : DEMO_CURVE_BASES[curve.kind],
        groundLengthMm: p.evalGround?.[0],
        groundWidthMm: p.evalGround?.[1],
        conditions: p.evalGround ? 'Evaluation board, anechoic chamber (invented demo data)' : 'Free space, anechoic chamber (invented demo data)',
      };
      await measurements.store(p.id, file, input, measurements.parse(file, input), null);
    }
    for (const doc of p.documents) {
      const buffer = readFileSync(join(root, doc.file));
      await documents.upload(
        p.id,
        { originalname: doc.file.split('/').pop()!, mimetype: 'application/pdf', size: buffer.length, buffer },
        { kind: doc.kind, title: doc.title },
        null,
      );
    }
    if (p.reviewState !== 'draft') {
      await dataSource.transaction(async (manager) => {
        const submittedAt = new Date('2025-10-20T09:00:00Z');
        const reviewed = p.reviewState !== 'in-review';
        await manager.update(
          Part,
          { id: p.id },
          {
            reviewState: p.reviewState,
            submittedById: engineerId,
            submittedAt,
            version: reviewed ? 3 : 2,
            reviewedById: reviewed ? adminId : null,
            reviewedAt: reviewed ? new Date('2025-10-27T14:00:00Z') : null,
            reviewComment: p.reviewState === 'restricted' || p.reviewState === 'retired' ? p.notes : null,
          },
        );
        await touchPart(manager, p.id);
        await audit.record(manager, {
          entityType: 'part',
          entityId: p.id,
          action: 'seeded-state',
          userId: null,
          changes: { reviewState: ['draft', p.reviewState] },
        });
      });
    }
    created.push(p);
  }
  for (const p of created) {
    for (const other of p.alternates ?? []) {
      await dataSource.transaction((manager) =>
        sourcing.linkIn(manager, p.id, other, { kind: 'second-source', note: 'Same footprint and cable exit (demo)' }, null),
      );
    }
  }
  await ledger.onModuleDestroy();
  return `${created.length} parts created, ${demo.length - created.length} already present`;
}
