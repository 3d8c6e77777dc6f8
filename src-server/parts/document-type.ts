/** What a document's bytes are, judged by content, never by its name. */
export interface SniffedType {
  contentType: string;
  label: string;
}

export const DOCUMENT_MAX_BYTES = 20 * 1024 * 1024;

const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];

/** PDF, PNG, SVG and DXF (the drawing formats datasheets come with); anything else is null. */
export function sniffDocumentType(bytes: Uint8Array): SniffedType | null {
  const head = Buffer.from(bytes.subarray(0, 1024));
  if (head.subarray(0, 5).toString('latin1') === '%PDF-') return { contentType: 'application/pdf', label: 'PDF' };
  if (PNG_SIGNATURE.every((b, i) => head[i] === b)) return { contentType: 'image/png', label: 'PNG' };
  const text = head.toString('utf8').replace(/^\uFEFF/, '').trimStart();
  // SVG may start with an XML declaration or comments; the root element must be svg.
  if (/^(<\?xml[^>]*>\s*)?(<!--[\s\S]*?-->\s*|<!DOCTYPE[^>]*>\s*)*<svg[\s>]/i.test(text)) return { contentType: 'image/svg+xml', label: 'SVG' };
  // DXF: group code 0 then SECTION on the next line (AutoCAD DXF reference, file structure).
  if (/^0\s*\r?\n\s*SECTION\s*\r?\n/.test(text)) return { contentType: 'image/vnd.dxf', label: 'DXF' };
  return null;
}
