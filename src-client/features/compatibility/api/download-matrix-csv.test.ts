import { afterEach, describe, expect, it, vi } from 'vitest';
import { downloadMatrixCsv } from './download-matrix-csv';

describe(downloadMatrixCsv.name, () => {
  afterEach(() => vi.unstubAllGlobals());

  it('saves the CSV the server wrote, unchanged, under the product name', async () => {
    const csv = "# caution\r\nProduct\r\n'=cmd\r\n";
    const fetchMock = vi.fn(async (_url: string) => new Response(csv, { status: 200, headers: { 'Content-Type': 'text/csv' } }));
    vi.stubGlobal('fetch', fetchMock);
    const saved: Blob[] = [];
    vi.stubGlobal('URL', { ...URL, createObjectURL: (blob: Blob) => (saved.push(blob), 'blob:x'), revokeObjectURL: () => undefined });
    const click = vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(() => undefined);
    await downloadMatrixCsv(7, 'Tracker, "demo"');
    expect(fetchMock.mock.calls[0][0]).toBe('/api/products/7/matrix.csv');
    expect(await saved[0].text()).toBe(csv);
    expect(click).toHaveBeenCalledTimes(1);
    click.mockRestore();
  });

  it('passes a refusal on as an error', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => new Response(JSON.stringify({ code: 'PRODUCT_NOT_FOUND', message: 'product 7 was not found' }), { status: 404 })),
    );
    await expect(downloadMatrixCsv(7, 'x')).rejects.toMatchObject({ code: 'PRODUCT_NOT_FOUND' });
  });
});
