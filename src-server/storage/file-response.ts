import { StreamableFile } from '@nestjs/common';

/** The uploader's file name as stored: NFC (macOS sends "ä" as a + ¨), at most 200 characters, never a split character. */
export function storedFileName(originalName: string, maxChars = 200): string {
  return Array.from(originalName.normalize('NFC')).slice(0, maxChars).join('');
}

/** RFC 5987 ext-value: percent-encoded UTF-8, including the characters encodeURIComponent leaves alone but attr-char forbids. */
function rfc5987(value: string): string {
  return encodeURIComponent(value).replace(/['()*]/g, (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`);
}

/**
 * A stored file as a download: always an attachment, so an SVG or PDF never renders inside the app's origin, with the
 * content type the caller fixed for its kind (routes add X-Content-Type-Options: nosniff). Old clients read the ASCII
 * `filename`, current ones the UTF-8 `filename*`.
 */
export function downloadOf(file: { body: Buffer; fileName: string; contentType: string }): StreamableFile {
  const ascii = file.fileName.replace(/[^\x20-\x7e]/g, '_').replace(/["\\%]/g, '_');
  return new StreamableFile(file.body, {
    type: file.contentType,
    length: file.body.length,
    disposition: `attachment; filename="${ascii}"; filename*=UTF-8''${rfc5987(file.fileName)}`,
  });
}
