/** What a document's bytes are, judged by content, never by its name. */
export interface SniffedType {
  contentType: string;
  label: string;
}

export const DOCUMENT_MAX_BYTES = 20 * 1024 * 1024;

const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
/** How far into the file the root element is looked for. */
const SNIFF_BYTES = 1024;

function isXmlSpace(c: string): boolean {
  return c === ' ' || c === '\t' || c === '\n' || c === '\r';
}

/**
 * The name of the first element, after an XML declaration, comments, processing instructions and a
 * doctype; null when the text is not markup or the head ends first. One pass, each character read once,
 * so no input can make it slow (a regex with nested repetition backtracked exponentially on `<!---->`).
 */
export function rootElementName(text: string): string | null {
  let i = 0;
  const skipTo = (terminator: string): boolean => {
    const end = text.indexOf(terminator, i);
    if (end < 0) return false;
    i = end + terminator.length;
    return true;
  };
  for (;;) {
    while (i < text.length && isXmlSpace(text[i])) i++;
    if (i >= text.length || text[i] !== '<') return null;
    if (text.startsWith('<!--', i)) {
      i += 4;
      if (!skipTo('-->')) return null;
    } else if (text.startsWith('<?', i)) {
      if (!skipTo('?>')) return null;
    } else if (text.slice(i, i + 9).toUpperCase() === '<!DOCTYPE') {
      // An internal subset ([…]) may hold '>' inside; it ends at ']' followed by '>'.
      const bracket = text.indexOf('[', i);
      const close = text.indexOf('>', i);
      if (close < 0) return null;
      if (bracket >= 0 && bracket < close) {
        i = bracket;
        if (!skipTo(']')) return null;
      }
      if (!skipTo('>')) return null;
    } else {
      let end = i + 1;
      while (end < text.length && !isXmlSpace(text[end]) && text[end] !== '>' && text[end] !== '/') end++;
      return end < text.length && end > i + 1 ? text.slice(i + 1, end) : null;
    }
  }
}

/** PDF, PNG, SVG and DXF (the drawing formats datasheets come with); anything else is null. */
export function sniffDocumentType(bytes: Uint8Array): SniffedType | null {
  const head = Buffer.from(bytes.subarray(0, SNIFF_BYTES));
  if (head.subarray(0, 5).toString('latin1') === '%PDF-') return { contentType: 'application/pdf', label: 'PDF' };
  if (PNG_SIGNATURE.every((b, i) => head[i] === b)) return { contentType: 'image/png', label: 'PNG' };
  const text = head.toString('utf8').replace(/^\uFEFF/, '');
  // SVG may start with an XML declaration, comments or a doctype; the root element must be svg.
  if (rootElementName(text)?.toLowerCase() === 'svg') return { contentType: 'image/svg+xml', label: 'SVG' };
  // DXF: group code 0 then SECTION on the next line (AutoCAD DXF reference, file structure).
  if (/^0[\t\v\f\r \xa0\u1680\u2000-\u200a\u2028\u2029\u202f\u205f\u3000\ufeff]*\n\s*SECTION\s*\n/.test(text.trimStart()))
    return { contentType: 'image/vnd.dxf', label: 'DXF' };
  return null;
}
