import { apiBlob, type Query } from './api-client';

/** Hands a Blob to the browser as a file download under the given name. */
export function saveBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  document.body.append(link);
  link.click();
  link.remove();
  URL.revokeObjectURL(url);
}

/**
 * Downloads what an API route answers (CSV exports, stored measurement and document files).
 * The routes need the bearer token, so a plain link would not do: fetch, then save.
 */
export async function downloadFromApi(path: string, fileName: string, query?: Query): Promise<void> {
  saveBlob(await apiBlob(path, query), fileName);
}
