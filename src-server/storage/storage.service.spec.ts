import { objectKey } from './storage.service';
import { safeFileName } from './uploaded-file';
import { looksBinary } from './limited-file-upload';

describe(objectKey.name, () => {
  it('joins safe segments with slashes', () => {
    expect(objectKey('parts', 7, 'documents', 'a1b2-datasheet.pdf')).toBe('parts/7/documents/a1b2-datasheet.pdf');
  });

  it.each([
    ['..'],
    ['../etc'],
    ['a/b'],
    ['a\\b'],
    ['.hidden'],
    [''],
    ['-leading-dash'],
    ['x'.repeat(122)],
    ['nul\u0000byte'],
    ['ünïcode'],
    ['a..b'],
    ['%2e%2e'],
    ['sp ace'],
  ])('refuses %j as a segment with 400 STORAGE_BAD_KEY', (segment) => {
    expect(() => objectKey('parts', 1, segment)).toThrow(expect.objectContaining({ code: 'STORAGE_BAD_KEY', status: 400 }));
  });
});

describe(safeFileName.name, () => {
  it.each([
    ['../../../etc/passwd', 'passwd'],
    ['..\\..\\windows\\system.ini', 'system.ini'],
    ['C:\\fakepath\\sweep 868.s1p', 'sweep_868.s1p'],
    ['..', 'file'],
    ['', 'file'],
    ['.env', 'env'],
    ['résumé datasheet.pdf', 'r_sum_datasheet.pdf'],
    ['rev..2...pdf', 'rev.2.pdf'],
  ])('turns %j into %j', (name, expected) => {
    expect(safeFileName(name)).toBe(expected);
  });

  it('always yields a name that objectKey accepts after the upload id, for any input', () => {
    const alphabet = ['.', '/', '\\', '..', ' ', '\u0000', 'é', '%', 'a', 'Z', '9', '-', '_', '~', '\n'];
    let seed = 12345;
    const next = () => (seed = (seed * 1103515245 + 12345) % 2 ** 31);
    for (let i = 0; i < 2000; i++) {
      const name = Array.from({ length: next() % 300 }, () => alphabet[next() % alphabet.length]).join('');
      const key = objectKey('parts', 1, 'measurements', `0b8e6b4e-2f6a-4d5e-9c1a-3f2b1a0c9d8e-${safeFileName(name)}`);
      expect(key.split('/')).toHaveLength(4);
      expect(key).not.toContain('..');
    }
  });
});

describe(looksBinary.name, () => {
  it('flags a NUL byte in the first 8 KiB and passes text with a UTF-8 BOM', () => {
    expect(looksBinary(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x00]))).toBe(true);
    expect(looksBinary(Buffer.from('\uFEFF# MHz S RI R 50\n868 0.2 0\n'))).toBe(false);
  });
});
