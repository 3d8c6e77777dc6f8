import type { DataSource } from 'typeorm';
import type { AuditService } from '../../audit/audit.service';
import type { StorageService } from '../../storage/storage.service';
import { StoredFiles } from '../../storage/stored-files.service';
import type { UploadLedger } from '../../storage/upload-ledger.service';
import { MeasurementsService } from './measurements.service';
import type { PartsService } from '../catalogue/parts.service';

/** A ledger that records what was put and abandoned. */
function fakeStorage() {
  const puts: string[] = [];
  const deletes: string[] = [];
  const ledger = { putPending: async (key: string) => void puts.push(key), abandon: async (key: string) => void deletes.push(key) } as unknown as UploadLedger;
  return { puts, deletes, storage: {} as StorageService, ledger };
}

function serviceOver(dataSource: DataSource): { service: MeasurementsService; puts: string[]; deletes: string[] } {
  const { puts, deletes, storage, ledger } = fakeStorage();
  return { service: new MeasurementsService(dataSource, new StoredFiles(dataSource, storage, ledger), {} as PartsService, {} as AuditService), puts, deletes };
}

const engineer = { id: 2, email: 'e@x', name: 'E', role: 'engineer' as const };
const draft = { id: 7, createdById: 2, reviewState: 'draft' };

describe(MeasurementsService.name, () => {
  it('deletes the stored object again when the database transaction fails, so nothing is half-stored', async () => {
    const dataSource = {
      transaction: async () => {
        throw new Error('deadlock');
      },
    } as unknown as DataSource;
    const { service, puts, deletes } = serviceOver(dataSource);
    const file = { originalname: 'a.s1p', mimetype: 'text/plain', size: 10, buffer: Buffer.from('# MHz S RI R 50\n800 0.1 0\n900 0.2 0\n') };
    const curve = service.parse(file, { kind: 's11' });
    await expect(service.store(7, file, { kind: 's11' }, curve, engineer)).rejects.toThrow('deadlock');
    expect(puts).toHaveLength(1);
    expect(deletes).toEqual(puts);
  });

  it('never touches storage for a file the parser refuses', async () => {
    const dataSource = { getRepository: () => ({ findOneBy: async () => draft }) } as unknown as DataSource;
    const { service, puts } = serviceOver(dataSource);
    const bad = { originalname: 'bad.s1p', mimetype: 'text/plain', size: 20, buffer: Buffer.from('# MHz S RI R 50\n800 0.1 x\n') };
    await expect(service.upload(7, bad, { kind: 's11' }, engineer)).rejects.toMatchObject({ code: 'TOUCHSTONE_BAD_NUMBER', details: { line: 2 } });
    expect(puts).toEqual([]);
  });
});
