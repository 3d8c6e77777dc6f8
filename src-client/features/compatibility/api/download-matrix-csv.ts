import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** The server writes the matrix CSV (one writer that defuses spreadsheet formulas); the route needs the token, so fetch then save. */
export async function downloadMatrixCsv(productId: number, productName: string): Promise<void> {
  const text = await apiRequest<string>(`/products/${productId}/matrix.csv`, { raw: true });
  const url = URL.createObjectURL(new Blob([text], { type: 'text/csv;charset=utf-8' }));
  const link = document.createElement('a');
  link.href = url;
  link.download = `matrix-${productName.replace(/[^A-Za-z0-9]+/g, '-').toLowerCase()}.csv`;
  document.body.append(link);
  link.click();
  link.remove();
  URL.revokeObjectURL(url);
}

export const useDownloadMatrixCsv = () => useMutation({ mutationFn: ({ productId, productName }: { productId: number; productName: string }) => downloadMatrixCsv(productId, productName) });
