import type { ReactNode } from 'react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { renderHook, waitFor } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { candidateKeys, matrixKeys } from '../api/query-keys';
import { useBands } from '../features/bands/api/get-bands';
import { usePartCoverage } from '../features/bands/api/get-part-coverage';
import { useLibraryBands } from '../features/parts/api/get-library-bands';
import { usePart } from '../features/parts/api/get-part';
import { useParts } from '../features/parts/api/get-parts';
import { useReviewPart } from '../features/parts/api/review-part';
import { useCandidates } from '../features/compatibility/api/get-candidates';
import { useMatrix } from '../features/compatibility/api/get-matrix';
import { useEvaluation } from '../features/compatibility/api/get-evaluation';
import { useBillOfMaterials } from '../features/compatibility/api/get-bill-of-materials';
import { usePartMeasurements } from '../features/compatibility/api/get-part-measurements';
import { useBandChoices } from '../features/products/api/get-band-choices';
import { useProduct } from '../features/products/api/get-product';
import { useUpdateRadio } from '../features/products/api/update-radio';
import { useOverlayBands } from '../features/rf-tools/api/get-overlay-bands';
import { useUpdateRegulatoryLimit } from '../features/regulatory/api/update-regulatory-limit';
import { useRegulatoryLimits } from '../features/regulatory/api/get-regulatory-limits';

// Several features on one page read the same server resources; these tests hold them to one cache entry each.

const band = { id: 1, technology: 'lte', designation: 'B20', name: 'E-UTRA 20', duplex: 'FDD', ranges: [{ role: 'uplink', fromMhz: 832, toMhz: 862 }] };
const part = { id: 5, manufacturer: 'Kestrel', mpn: 'KA-1', title: 'Chip', version: 1, coveredRanges: [], measurements: [] };
const answers: Record<string, unknown> = {
  'GET /api/bands': [band],
  'GET /api/band-sets': [],
  'GET /api/parts': { items: [part], total: 1 },
  'GET /api/parts/5': part,
  'POST /api/parts/5/approval': part,
  'GET /api/products/7': { id: 7, name: 'Tracker', radios: [] },
  'PATCH /api/products/7/radios/70': { id: 70 },
  'GET /api/products/7/matrix': { productId: 7, productName: 'Tracker', rows: [], columns: [], cells: [], rules: '' },
  'GET /api/products/7/evaluation': { productId: 7, productName: 'Tracker', verdict: 'pass', reason: '', radios: [], findings: [], rules: '', evaluatedAt: '' },
  'GET /api/products/7/bill-of-materials': {
    productId: 7,
    productName: 'Tracker',
    quantity: 100,
    currency: 'USD',
    lines: [],
    radiosWithoutPart: [],
    totalPerUnit: [],
  },
  'GET /api/regulatory-limits': [],
  'PATCH /api/regulatory-limits/3': { id: 3 },
  'GET /api/products/7/radios/70/candidates': { productId: 7, radioId: 70, radioName: 'LTE', evaluated: 0, candidates: [] },
};

let requests: string[];
const count = (request: string) => requests.filter((r) => r === request).length;

function setup() {
  // The app's own stale time: without invalidation, nothing here would refetch for 30 s.
  const queryClient = new QueryClient({ defaultOptions: { queries: { staleTime: 30_000, retry: false } } });
  const wrapper = ({ children }: { children: ReactNode }) => <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>;
  return { queryClient, wrapper };
}

beforeEach(() => {
  requests = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (url: string, init?: RequestInit) => {
      const request = `${init?.method ?? 'GET'} ${new URL(url, 'http://localhost').pathname}`;
      requests.push(request);
      if (!(request in answers)) return new Response(JSON.stringify({ code: 'NOT_FOUND', message: request }), { status: 404 });
      return new Response(JSON.stringify(answers[request]), { status: 200 });
    }),
  );
});

afterEach(() => vi.unstubAllGlobals());

describe('shared resources', () => {
  it('reads the band library once for the four features that show it', async () => {
    const { wrapper } = setup();
    const { result } = renderHook(() => [useBands().data, useLibraryBands().data, useBandChoices().data, useOverlayBands().data] as const, { wrapper });
    await waitFor(() => expect(result.current.every((data) => data !== undefined)).toBe(true));
    expect(result.current[3]?.fromLibrary).toBe(true);
    expect(count('GET /api/bands')).toBe(1);
  });

  it('reads a part once for the catalogue, the band strip and the matrix cell panel', async () => {
    const { wrapper } = setup();
    const { result } = renderHook(() => [usePart(5).data, usePartCoverage(5).data, usePartMeasurements(5).data] as const, { wrapper });
    await waitFor(() => expect(result.current.every((data) => data !== undefined)).toBe(true));
    expect(count('GET /api/parts/5')).toBe(1);
  });

  it("refreshes the product's matrix, verdict, bill of materials and candidates on the same page when a radio is edited", async () => {
    const { queryClient, wrapper } = setup();
    const { result } = renderHook(
      () => ({
        product: useProduct(7),
        matrix: useMatrix(7),
        evaluation: useEvaluation(7),
        bom: useBillOfMaterials(7, 100),
        candidates: useCandidates(7, 70),
        updateRadio: useUpdateRadio(),
      }),
      { wrapper },
    );
    await waitFor(() =>
      expect(
        result.current.matrix.data &&
          result.current.candidates.data &&
          result.current.product.data &&
          result.current.evaluation.data &&
          result.current.bom.data,
      ).toBeTruthy(),
    );
    const invalidate = vi.spyOn(queryClient, 'invalidateQueries');
    await result.current.updateRadio.mutateAsync({ productId: 7, radioId: 70, version: 1, name: 'LTE main' });
    expect(invalidate).toHaveBeenCalledWith({ queryKey: matrixKeys.product(7) });
    expect(invalidate).toHaveBeenCalledWith({ queryKey: candidateKeys.product(7) });
    await waitFor(() => expect(count('GET /api/products/7/matrix')).toBe(2));
    await waitFor(() => expect(count('GET /api/products/7/evaluation')).toBe(2));
    await waitFor(() => expect(count('GET /api/products/7/bill-of-materials')).toBe(2));
    expect(count('GET /api/products/7/radios/70/candidates')).toBe(2);
    expect(count('GET /api/products/7')).toBe(2);
  });

  it('refreshes the part, the search, the band strip and the matrix when a part is reviewed', async () => {
    const { wrapper } = setup();
    const { result } = renderHook(
      () => ({ page: usePart(5), search: useParts({ q: 'KA' }), strip: usePartCoverage(5), matrix: useMatrix(7), review: useReviewPart() }),
      { wrapper },
    );
    await waitFor(() => expect(result.current.page.data && result.current.search.data && result.current.strip.data && result.current.matrix.data).toBeTruthy());
    await result.current.review.mutateAsync({ id: 5, action: 'approval', version: 1 });
    await waitFor(() => expect(count('GET /api/products/7/matrix')).toBe(2));
    expect(count('GET /api/parts/5')).toBe(2);
    expect(count('GET /api/parts')).toBe(2);
  });

  it('refreshes the matrix and candidates on the same page when a regulatory limit is corrected', async () => {
    const { wrapper } = setup();
    const { result } = renderHook(
      () => ({ limits: useRegulatoryLimits(), matrix: useMatrix(7), candidates: useCandidates(7, 70), update: useUpdateRegulatoryLimit() }),
      { wrapper },
    );
    await waitFor(() => expect(result.current.limits.data && result.current.matrix.data && result.current.candidates.data).toBeTruthy());
    await result.current.update.mutateAsync({ id: 3, valueDbm: 14 });
    await waitFor(() => expect(count('GET /api/products/7/matrix')).toBe(2));
    expect(count('GET /api/products/7/radios/70/candidates')).toBe(2);
    expect(count('GET /api/regulatory-limits')).toBe(2);
  });
});
