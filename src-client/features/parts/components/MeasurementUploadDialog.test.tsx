import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { BlueprintProvider } from '@blueprintjs/core';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { MeasurementUploadDialog } from './MeasurementUploadDialog';

const apiRequest = vi.fn();
vi.mock('../../../lib/api-client', async (importOriginal) => ({
  ...(await importOriginal<typeof import('../../../lib/api-client')>()),
  apiRequest: (...args: unknown[]) => apiRequest(...args),
}));

const PREVIEW = {
  kind: 'efficiency',
  sourceFormat: 'CSV, MHz, %',
  pointCount: 2,
  fromMhz: 700,
  toMhz: 800,
  referenceOhms: null,
  valueLabel: 'Efficiency (%)',
  frequenciesMhz: [700, 800],
  values: [40, 45],
};

function openDialog() {
  render(
    <BlueprintProvider>
      <QueryClientProvider client={new QueryClient()}>
        <MeasurementUploadDialog partId={7} isOpen onClose={() => {}} />
      </QueryClientProvider>
    </BlueprintProvider>,
  );
  const file = new File(['frequency (MHz),efficiency (%)\n700,40\n800,45\n'], 'eff.csv', { type: 'text/csv' });
  fireEvent.change(screen.getByLabelText('Measurement file'), { target: { files: [file] } });
}

const sentForm = () => (apiRequest.mock.calls.at(-1)![1] as { form: FormData }).form;

describe(MeasurementUploadDialog.name, () => {
  afterEach(() => {
    cleanup();
    apiRequest.mockReset();
  });

  it('asks what an efficiency curve includes, preselects total efficiency, and sends the choice as basis', async () => {
    apiRequest.mockResolvedValue({ measurement: null, preview: PREVIEW });
    openDialog();
    fireEvent.change(screen.getByLabelText('Kind'), { target: { value: 'efficiency' } });
    const basis = screen.getByLabelText('The figures are') as HTMLSelectElement;
    expect(basis.value).toBe('total');
    expect(screen.getByText(/most datasheets give total efficiency/)).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Check file' }));
    await waitFor(() => expect(apiRequest).toHaveBeenCalled());
    expect(sentForm().get('basis')).toBe('total');
    fireEvent.change(basis, { target: { value: 'radiation' } });
    fireEvent.click(screen.getByRole('button', { name: 'Check file' }));
    await waitFor(() => expect(apiRequest).toHaveBeenCalledTimes(2));
    expect(sentForm().get('basis')).toBe('radiation');
  }, 30_000);

  it('offers antenna or realized gain for a gain curve, and sends no basis for S11', async () => {
    apiRequest.mockResolvedValue({ measurement: null, preview: PREVIEW });
    openDialog();
    fireEvent.change(screen.getByLabelText('Kind'), { target: { value: 'peak-gain' } });
    expect((screen.getByLabelText('The figures are') as HTMLSelectElement).value).toBe('peak');
    fireEvent.change(screen.getByLabelText('Kind'), { target: { value: 's11' } });
    expect(screen.queryByLabelText('The figures are')).toBeNull();
    fireEvent.click(screen.getByRole('button', { name: 'Check file' }));
    await waitFor(() => expect(apiRequest).toHaveBeenCalled());
    expect(sentForm().get('basis')).toBeNull();
  }, 30_000);
});
