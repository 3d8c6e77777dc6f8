import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateInProduct } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { InProductMeasurement, PortAssignment } from '../types';

export interface PortMappingInput {
  productId: number;
  measurementId: number;
  /** The mapped ports only; a port left out is not used. */
  ports: PortAssignment[];
}

export const mapInProductPorts = ({ productId, measurementId, ports }: PortMappingInput) =>
  apiRequest<InProductMeasurement>(`/products/${productId}/in-product-measurements/${measurementId}/ports`, { method: 'PUT', body: ports });

export const useMapInProductPorts = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: mapInProductPorts, onSuccess: (_result, input) => invalidateInProduct(queryClient, input.productId) });
};
