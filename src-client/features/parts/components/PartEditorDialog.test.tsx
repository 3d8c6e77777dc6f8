import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { BlueprintProvider } from '@blueprintjs/core';
import { fireEvent, render, screen, waitFor } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { PartDetail } from '../types';
import { PartEditorDialog } from './PartEditorDialog';

const part = {
  id: 5,
  manufacturer: 'Kestrel',
  mpn: 'KA-1',
  title: 'Chip antenna',
  formFactor: 'chip',
  connector: 'solder-pad',
  polarization: 'linear',
  lifecycle: 'active',
  mounting: null,
  notes: null,
  nominalImpedanceOhms: 50,
  lengthMm: 5,
  widthMm: 2,
  heightMm: null,
  evalGroundLengthMm: null,
  evalGroundWidthMm: null,
  tempMinC: null,
  tempMaxC: null,
  version: 3,
  specBands: [],
} as unknown as PartDetail;

let bodies: { method: string; path: string; body: Record<string, unknown> }[];

beforeEach(() => {
  bodies = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (url: string, init?: RequestInit) => {
      bodies.push({ method: init?.method ?? 'GET', path: new URL(url, 'http://localhost').pathname, body: JSON.parse(String(init?.body ?? '{}')) });
      return new Response(JSON.stringify(part), { status: 200 });
    }),
  );
});

afterEach(() => vi.unstubAllGlobals());

function renderDialog(editing?: PartDetail) {
  const queryClient = new QueryClient({ defaultOptions: { mutations: { retry: false } } });
  render(
    <QueryClientProvider client={queryClient}>
      <BlueprintProvider>
        <PartEditorDialog isOpen onClose={() => undefined} onSaved={() => undefined} part={editing} />
      </BlueprintProvider>
    </QueryClientProvider>,
  );
  const fill = (label: string, value: string) => fireEvent.change(screen.getByLabelText(label), { target: { value } });
  return { fill, save: (name: string) => fireEvent.click(screen.getByRole('button', { name })) };
}

describe(PartEditorDialog.name, () => {
  it('sends a new part with every name, a blank one as empty text, so the server names the missing field', async () => {
    const { fill, save } = renderDialog();
    fill('Manufacturer', ' Kestrel ');
    fill('Manufacturer part number', 'KA-2');
    save('Create draft');
    await waitFor(() => expect(bodies).toHaveLength(1));
    expect(bodies[0]).toMatchObject({ method: 'POST', path: '/api/parts' });
    expect(bodies[0].body).toMatchObject({ manufacturer: 'Kestrel', mpn: 'KA-2', title: '', nominalImpedanceOhms: 50, lengthMm: null, mounting: null });
  });

  it('leaves out of an edit a name the user blanked, and sends the version edited', async () => {
    const { fill, save } = renderDialog(part);
    fill('Title', '   ');
    fill('Length (mm)', '6.5');
    save('Save');
    await waitFor(() => expect(bodies).toHaveLength(1));
    expect(bodies[0]).toMatchObject({ method: 'PATCH', path: '/api/parts/5' });
    expect(bodies[0].body).not.toHaveProperty('title');
    expect(bodies[0].body).not.toHaveProperty('id');
    expect(bodies[0].body).toMatchObject({ manufacturer: 'Kestrel', mpn: 'KA-1', version: 3, lengthMm: 6.5, widthMm: 2 });
  });
});
