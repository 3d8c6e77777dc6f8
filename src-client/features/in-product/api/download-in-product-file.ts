import { useMutation } from '@tanstack/react-query';
import { downloadFromApi } from '../../../lib/download';

/** The original uploaded file, under the name it was uploaded with. */
export function downloadInProductFile(productId: number, measurementId: number, fileName: string): Promise<void> {
  return downloadFromApi(`/products/${productId}/in-product-measurements/${measurementId}/file`, fileName);
}

export const useDownloadInProductFile = () =>
  useMutation({
    mutationFn: ({ productId, measurementId, fileName }: { productId: number; measurementId: number; fileName: string }) =>
      downloadInProductFile(productId, measurementId, fileName),
  });
