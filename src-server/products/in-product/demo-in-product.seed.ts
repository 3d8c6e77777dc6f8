import type { DataSource } from 'typeorm';
import type { AppConfig } from '../../config/app-config';
import { AuditService } from '../../audit/audit.service';
import { StorageService } from '../../storage/storage.service';
import { StoredFiles } from '../../storage/stored-files.service';
import { UploadLedger } from '../../storage/upload-ledger.service';
import { Product } from '../product.entity';
import { ProductsService } from '../products.service';
import { DEMO_ANTENNAS, DEMO_ASSEMBLY_FILE_NAME, DEMO_ASSEMBLY_PRODUCT_ID, demoAssemblyFile } from './demo-assembly';
import { InProductMeasurement } from './in-product-measurement.entity';
import { InProductMeasurementsService } from './in-product-measurements.service';

/** The gateway's invented 4-port housing measurement with its port mapping, through the upload path. */
export async function seedDemoInProduct(dataSource: DataSource, config: AppConfig): Promise<string> {
  if (!(await dataSource.getRepository(Product).existsBy({ id: DEMO_ASSEMBLY_PRODUCT_ID }))) return 'skipped (no demo gateway)';
  if (await dataSource.getRepository(InProductMeasurement).existsBy({ productId: DEMO_ASSEMBLY_PRODUCT_ID })) return 'already present';
  const audit = new AuditService(dataSource);
  const storage = new StorageService(config);
  await storage.ensureBucket();
  const files = new StoredFiles(dataSource, storage, new UploadLedger(config, dataSource, storage));
  const service = new InProductMeasurementsService(dataSource, files, new ProductsService(dataSource, audit), audit);
  const buffer = Buffer.from(demoAssemblyFile());
  const stored = await service.upload(
    DEMO_ASSEMBLY_PRODUCT_ID,
    { originalname: DEMO_ASSEMBLY_FILE_NAME, mimetype: 'text/plain', size: buffer.length, buffer },
    { note: 'Antennas in the plastic housing on the production board (invented demo data)' },
    null,
  );
  await service.mapPorts(
    DEMO_ASSEMBLY_PRODUCT_ID,
    stored.id,
    DEMO_ANTENNAS.map((a, i) => ({ port: i + 1, radioId: a.radioId, role: a.role })),
    null,
  );
  return '1 created';
}
