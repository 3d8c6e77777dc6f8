import { downloadOf, storedFileName } from './file-response';

describe(storedFileName.name, () => {
  it('stores the composed form, so a macOS "ä" (a + combining diaeresis) matches a typed one', () => {
    expect(storedFileName('Ba\u0308nder.s1p')).toBe('Bänder.s1p');
  });

  it('cuts at 200 characters without splitting a character in two', () => {
    // Each 📡 is two UTF-16 code units; a plain slice(0, 200) would keep 100 of them.
    expect(storedFileName('📡'.repeat(300))).toBe('📡'.repeat(200));
  });
});

describe(downloadOf.name, () => {
  const dispositionOf = (fileName: string) => downloadOf({ body: Buffer.from('x'), fileName, contentType: 'text/plain' }).getHeaders().disposition as string;

  it('percent-encodes the RFC 5987 characters encodeURIComponent leaves alone', () => {
    expect(dispositionOf("l'été (2)*.s1p")).toBe(`attachment; filename="l'_t_ (2)*.s1p"; filename*=UTF-8''l%27%C3%A9t%C3%A9%20%282%29%2A.s1p`);
  });

  it('keeps quotes, backslashes and percent signs out of the ASCII fallback', () => {
    expect(dispositionOf('a"b\\c%41.csv')).toMatch(/^attachment; filename="a_b_c_41.csv"; /);
  });
});
