import { useMutation } from '@tanstack/react-query';
import { downloadFromApi } from '../../../lib/download';

/** The server writes the matrix CSV (one writer that defuses spreadsheet formulas); saved under the product's name. */
export function downloadMatrixCsv(productId: number, productName: string): Promise<void> {
  return downloadFromApi(`/products/${productId}/matrix.csv`, `matrix-${productName.replace(/[^A-Z0-9]+/gi, '-').toLowerCase()}.csv`);
}

export const useDownloadMatrixCsv = () =>
  useMutation({ mutationFn: ({ productId, productName }: { productId: number; productName: string }) => downloadMatrixCsv(productId, productName) });
