import { downloadFromApi } from '../../../lib/download';

/** A part's stored measurement or document file, under the name it was uploaded with. */
export function downloadPartFile(partId: number, kind: 'measurements' | 'documents', fileId: number, fileName: string): Promise<void> {
  return downloadFromApi(`/parts/${partId}/${kind}/${fileId}/file`, fileName);
}
