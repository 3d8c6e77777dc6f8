import { StreamableFile } from '@nestjs/common';

/** A stored file as a download: always an attachment, so an SVG or PDF never renders inside the app's origin. */
export function downloadOf(file: { body: Buffer; fileName: string; contentType: string }): StreamableFile {
  const ascii = file.fileName.replace(/[^\x20-\x7e]/g, '_').replace(/["\\]/g, '_');
  return new StreamableFile(file.body, {
    type: file.contentType,
    length: file.body.length,
    disposition: `attachment; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(file.fileName)}`,
  });
}
