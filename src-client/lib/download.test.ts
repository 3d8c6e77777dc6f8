import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { tokenStore } from './api-client';
import { downloadFromApi, saveBlob } from './download';

describe(downloadFromApi.name, () => {
  let saved: Blob[];
  let names: string[];
  let click: ReturnType<typeof vi.spyOn>;

  beforeEach(() => {
    saved = [];
    names = [];
    vi.stubGlobal('URL', { ...URL, createObjectURL: (blob: Blob) => (saved.push(blob), 'blob:x'), revokeObjectURL: vi.fn() });
    click = vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
      names.push(this.download);
    });
  });

  afterEach(() => {
    vi.unstubAllGlobals();
    click.mockRestore();
    tokenStore.clear();
  });

  it('fetches the route with the token and query, and saves the bytes unchanged under the name', async () => {
    tokenStore.set('t0ken');
    const bytes = new Uint8Array([0x25, 0x50, 0x44, 0x46, 0xff, 0xfe, 0x00, 0x80]); // not valid UTF-8: must not pass through text
    const fetchMock = vi.fn(async (_url: string, _init?: RequestInit) => new Response(bytes, { status: 200, headers: { 'Content-Type': 'application/pdf' } }));
    vi.stubGlobal('fetch', fetchMock);
    await downloadFromApi('/parts/3/documents/4/file', 'datasheet.pdf', { covers: '791-862', limit: undefined });
    expect(fetchMock.mock.calls[0][0]).toBe('/api/parts/3/documents/4/file?covers=791-862');
    expect((fetchMock.mock.calls[0][1]?.headers as Record<string, string>).Authorization).toBe('Bearer t0ken');
    expect(new Uint8Array(await saved[0].arrayBuffer())).toEqual(bytes);
    expect(names).toEqual(['datasheet.pdf']);
    expect(URL.revokeObjectURL).toHaveBeenCalledWith('blob:x');
    expect(document.querySelectorAll('a[download]')).toHaveLength(0);
  });

  it('passes a refusal on as a typed error and saves nothing', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => new Response(JSON.stringify({ code: 'DOCUMENT_NOT_FOUND', message: 'gone' }), { status: 404 })),
    );
    await expect(downloadFromApi('/parts/3/documents/4/file', 'x.pdf')).rejects.toMatchObject({ status: 404, code: 'DOCUMENT_NOT_FOUND' });
    expect(saved).toHaveLength(0);
    expect(click).not.toHaveBeenCalled();
  });

  it('reports an unreachable server as NETWORK_ERROR', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => {
        throw new TypeError('fetch failed');
      }),
    );
    await expect(downloadFromApi('/parts/export', 'x.csv')).rejects.toMatchObject({ code: 'NETWORK_ERROR' });
  });
});

describe(saveBlob.name, () => {
  afterEach(() => vi.unstubAllGlobals());

  it('clicks one temporary link to the blob and removes it again', () => {
    vi.stubGlobal('URL', { ...URL, createObjectURL: () => 'blob:y', revokeObjectURL: () => undefined });
    const hrefs: string[] = [];
    const click = vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
      hrefs.push(this.getAttribute('href') ?? '');
    });
    saveBlob(new Blob(['a,b\r\n']), 'table.csv');
    expect(hrefs).toEqual(['blob:y']);
    expect(document.body.querySelector('a')).toBeNull();
    click.mockRestore();
  });
});
