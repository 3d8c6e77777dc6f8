import { useMutation } from '@tanstack/react-query';
import { downloadFromApi } from '../../../lib/download';

/** The server's dated PDF report of the product, saved under the product's name. */
export function downloadReport(productId: number, productName: string): Promise<void> {
  return downloadFromApi(`/products/${productId}/report.pdf`, `report-${productName.replace(/[^A-Z0-9]+/gi, '-').toLowerCase()}.pdf`);
}

export const useDownloadReport = () =>
  useMutation({ mutationFn: ({ productId, productName }: { productId: number; productName: string }) => downloadReport(productId, productName) });
