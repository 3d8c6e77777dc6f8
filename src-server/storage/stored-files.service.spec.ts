import type { DataSource, EntityManager } from 'typeorm';
import type { StorageService } from './storage.service';
import { StoredFileRecord } from './stored-file-record';
import { StoredFiles } from './stored-files.service';
import type { UploadLedger } from './upload-ledger.service';

class Row extends StoredFileRecord {
  id: number;
}

/** Records, in order, what the ledger, the transaction and the manager were asked to do. */
function harness(options: { failPut?: boolean; rows?: Row[] } = {}) {
  const log: string[] = [];
  const manager = {
    delete: async (_entity: unknown, id: number) => void log.push(`delete row ${id}`),
  } as unknown as EntityManager;
  const dataSource = {
    transaction: async (work: (m: EntityManager) => Promise<unknown>) => {
      log.push('begin');
      try {
        const result = await work(manager);
        log.push('commit');
        return result;
      } catch (error) {
        log.push('rollback');
        throw error;
      }
    },
    getRepository: () => ({ findOneBy: async (where: { id: number }) => options.rows?.find((r) => r.id === where.id) ?? null }),
  } as unknown as DataSource;
  const ledger = {
    putPending: async (key: string) => {
      if (options.failPut) throw new Error('store down');
      log.push(`put ${key}`);
    },
    settle: async (m: EntityManager, key: string) => void log.push(`settle ${key}${m === manager ? ' in tx' : ''}`),
    abandon: async (key: string) => void log.push(`abandon ${key}`),
    release: async (m: EntityManager, key: string) => void log.push(`release ${key}${m === manager ? ' in tx' : ''}`),
  } as unknown as UploadLedger;
  const storage = { get: async (key: string) => Buffer.from(`bytes of ${key}`) } as unknown as StorageService;
  return { log, files: new StoredFiles(dataSource, storage, ledger) };
}

const upload = (name: string, text: string) => ({ originalname: name, mimetype: 'text/plain', size: Buffer.byteLength(text), buffer: Buffer.from(text) });
const stored = (id: number, objectKey: string): Row =>
  Object.assign(new Row(), { id, objectKey, fileName: 'a.pdf', contentType: 'application/pdf', sizeBytes: 3, sha256: '' });

describe(StoredFiles.name, () => {
  describe('store', () => {
    it('hands the write the columns of the stored original and settles its note in the same transaction', async () => {
      const { log, files } = harness();
      const columns = await files.store(
        { keyPrefix: ['parts', 7, 'documents'], file: upload('Ba\u0308nder plan.pdf', 'abc'), contentType: 'application/pdf' },
        async (_m, c) => {
          log.push('insert row');
          return c;
        },
      );
      expect(columns.objectKey).toMatch(/^parts\/7\/documents\/[0-9a-f-]{36}-Ba_nder_plan\.pdf$/);
      expect(columns).toMatchObject({ fileName: 'Bänder plan.pdf', contentType: 'application/pdf', sizeBytes: 3 });
      // FIPS 180-2, appendix B.1: SHA-256("abc").
      expect(columns.sha256).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
      const key = columns.objectKey;
      expect(log).toEqual([`put ${key}`, 'begin', 'insert row', `settle ${key} in tx`, 'commit']);
    });

    it('abandons the object when the row cannot be written, and rethrows', async () => {
      const { log, files } = harness();
      let key = '';
      await expect(
        files.store({ keyPrefix: ['parts', 7, 'measurements'], file: upload('a.s1p', 'x'), contentType: 'text/plain' }, async (_m, c) => {
          key = c.objectKey;
          throw new Error('deadlock');
        }),
      ).rejects.toThrow('deadlock');
      expect(log).toEqual([`put ${key}`, 'begin', 'rollback', `abandon ${key}`]);
    });

    it('writes no row when the object could not be stored', async () => {
      const { log, files } = harness({ failPut: true });
      const write = jest.fn();
      await expect(files.store({ keyPrefix: ['parts', 7, 'documents'], file: upload('a.pdf', 'x'), contentType: 'application/pdf' }, write)).rejects.toThrow(
        'store down',
      );
      expect(write).not.toHaveBeenCalled();
      expect(log).toEqual([]);
    });
  });

  describe('removeWithin', () => {
    it('deletes the row and releases its object in the transaction, then removes the object after commit', async () => {
      const { log, files } = harness();
      await files.removeWithin(async (_m, drop) => {
        await drop(Row, stored(5, 'parts/7/documents/k1-a.pdf'));
        log.push('audit');
      });
      expect(log).toEqual(['begin', 'delete row 5', 'release parts/7/documents/k1-a.pdf in tx', 'audit', 'commit', 'abandon parts/7/documents/k1-a.pdf']);
    });

    it('keeps the object when the removal is rolled back, since its row stays', async () => {
      const { log, files } = harness();
      await expect(
        files.removeWithin(async (_m, drop) => {
          await drop(Row, stored(5, 'parts/7/documents/k1-a.pdf'));
          throw new Error('audit failed');
        }),
      ).rejects.toThrow('audit failed');
      expect(log.filter((entry) => entry.startsWith('abandon'))).toEqual([]);
      expect(log.at(-1)).toBe('rollback');
    });
  });

  describe('original', () => {
    it('reads the object of the row, served under its stored name and content type', async () => {
      const { files } = harness({ rows: [stored(5, 'parts/7/documents/k1-a.pdf')] });
      const original = await files.original(Row, { id: 5 }, 'document', 5);
      expect(original).toEqual({ body: Buffer.from('bytes of parts/7/documents/k1-a.pdf'), fileName: 'a.pdf', contentType: 'application/pdf' });
    });

    it('answers 404 <WHAT>_NOT_FOUND for a row that does not exist', async () => {
      const { files } = harness();
      await expect(files.original(Row, { id: 6 }, 'document', 6)).rejects.toMatchObject({ code: 'DOCUMENT_NOT_FOUND', status: 404 });
    });
  });
});
