import { rootElementName, sniffDocumentType } from './document-type';

const sniff = (text: string) => sniffDocumentType(Buffer.from(text, 'utf8'))?.label ?? null;

describe(sniffDocumentType.name, () => {
  it('recognises SVG after a BOM, an XML declaration, comments, processing instructions and a doctype', () => {
    expect(sniff('<svg xmlns="http://www.w3.org/2000/svg"></svg>')).toBe('SVG');
    expect(sniff('\uFEFF  <?xml version="1.0"?>\n<!-- drawn by hand -->\n<svg>')).toBe('SVG');
    expect(sniff('<?xml version="1.0"?><?xml-stylesheet href="a.css"?><!DOCTYPE svg PUBLIC "-//W3C//DTD SVG 1.1//EN" "x.dtd"><SVG width="1">')).toBe('SVG');
    expect(sniff('<!DOCTYPE svg [ <!ENTITY a "<b>"> ]><svg>')).toBe('SVG');
    expect(sniff('<!----><!-- a > b --><svg/>')).toBe('SVG');
  });

  it('refuses markup whose root is not svg, unterminated comments and plain text', () => {
    expect(sniff('<html><svg></svg></html>')).toBeNull();
    expect(sniff('<svgfoo>')).toBeNull();
    expect(sniff('<!-- never closed <svg>')).toBeNull();
    expect(sniff('hello <svg>')).toBeNull();
    expect(sniff('')).toBeNull();
  });

  it('keeps PDF, PNG and DXF', () => {
    expect(sniff('%PDF-1.7\n')).toBe('PDF');
    expect(sniffDocumentType(Uint8Array.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0]))?.label).toBe('PNG');
    expect(sniff('  0\nSECTION\n  2\nHEADER\n')).toBe('DXF');
  });

  it('reads only the head: the root element must start within the first KiB', () => {
    expect(sniff(`${'<!-- x -->'.repeat(200)}<svg>`)).toBeNull();
  });
});

describe(rootElementName.name, () => {
  it('returns the first element name, or null when the text ends inside the prologue', () => {
    expect(rootElementName('<?xml version="1.0"?><a:svg x="1">')).toBe('a:svg');
    expect(rootElementName('<!-- -->')).toBeNull();
    expect(rootElementName('<svg')).toBeNull();
  });
});
