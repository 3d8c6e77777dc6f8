import { useCallback, useMemo, useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { Button, ButtonGroup, FormGroup, HTMLSelect, InputGroup, Intent, Menu, MenuItem, NumericInput, OverlayToaster, Position, Tag } from '@blueprintjs/core';
import { Cell, Column, ColumnHeaderCell, Table } from '@blueprintjs/table';
import { PageHeader } from '../../../components/PageHeader';
import { QueryState } from '../../../components/QueryState';
import { ScreeningCaution } from '../../../components/ScreeningCaution';
import { paths } from '../../../app/routes/paths';
import { useHasRole, useSession } from '../../../lib/session';
import { downloadPartsCsv } from '../api/download-parts-csv';
import { useParts } from '../api/get-parts';
import {
  CONNECTORS,
  FORM_FACTORS,
  LIFECYCLES,
  POLARIZATIONS,
  REVIEW_STATES,
  type LibraryBand,
  type PartFilters,
  type PartSummary,
  type SortKey,
} from '../types';
import { BandPicker } from './BandPicker';
import { PartEditorDialog } from './PartEditorDialog';
import { LIFECYCLE_INTENT, LIFECYCLE_LABEL, REVIEW_STATE_INTENT, rangesParam } from './part-labels';

const PAGE_SIZE = 50;
const toaster = OverlayToaster.createAsync({ position: Position.TOP });

interface ColumnSpec {
  key: string;
  name: string;
  sort?: SortKey;
  width: number;
  text: (p: PartSummary) => string;
}

const COLUMNS: ColumnSpec[] = [
  { key: 'mpn', name: 'MPN', sort: 'mpn', width: 170, text: (p) => p.mpn },
  { key: 'manufacturer', name: 'Manufacturer', sort: 'manufacturer', width: 160, text: (p) => p.manufacturer },
  { key: 'title', name: 'Title', sort: 'title', width: 330, text: (p) => p.title },
  { key: 'formFactor', name: 'Form factor', sort: 'formFactor', width: 115, text: (p) => p.formFactor },
  { key: 'connector', name: 'Feed', sort: 'connector', width: 100, text: (p) => p.connector },
  { key: 'polarization', name: 'Pol.', sort: 'polarization', width: 70, text: (p) => p.polarization },
  { key: 'reviewState', name: 'Review', sort: 'reviewState', width: 105, text: (p) => p.reviewState },
  { key: 'lifecycle', name: 'Lifecycle', sort: 'lifecycle', width: 130, text: (p) => LIFECYCLE_LABEL[p.lifecycle] },
  { key: 'data', name: 'Measured', width: 150, text: (p) => p.measuredKinds.join(', ') || 'spec only' },
  { key: 'price', name: 'From (USD)', sort: 'price', width: 100, text: (p) => p.lowestPrices.find((x) => x.currency === 'USD')?.unitPrice ?? '—' },
];

const enumSelect = (label: string, values: readonly string[], value: string | undefined, onChange: (v: string | undefined) => void) => (
  <FormGroup label={label} className="bw-filter">
    <HTMLSelect aria-label={label} value={value ?? ''} onChange={(e) => onChange(e.currentTarget.value || undefined)}>
      <option value="">any</option>
      {values.map((v) => (
        <option key={v} value={v}>
          {v}
        </option>
      ))}
    </HTMLSelect>
  </FormGroup>
);

/** The searchable catalogue: filters, band coverage, server-side sort and paging, CSV export. */
export function CataloguePage() {
  const navigate = useNavigate();
  const { user } = useSession();
  const canCreate = useHasRole('engineer', 'admin');
  const [text, setText] = useState('');
  const [filters, setFilters] = useState<PartFilters>({ sort: 'mpn', order: 'asc', offset: 0, limit: PAGE_SIZE });
  const [bands, setBands] = useState<LibraryBand[]>([]);
  const [vswrMax, setVswrMax] = useState(2);
  const [minEfficiency, setMinEfficiency] = useState<number | undefined>(undefined);
  const [creating, setCreating] = useState(false);

  const query = useMemo<PartFilters>(
    () => ({
      ...filters,
      q: text.trim() || undefined,
      covers: bands.length ? rangesParam(bands) : undefined,
      vswrMax: bands.length ? vswrMax : undefined,
      minEfficiencyPct: bands.length ? minEfficiency : undefined,
    }),
    [filters, text, bands, vswrMax, minEfficiency],
  );
  const parts = useParts(query);
  const rows = useMemo(() => parts.data?.items ?? [], [parts.data]);
  const total = parts.data?.total ?? 0;

  const set = (patch: Partial<PartFilters>) => setFilters((f) => ({ ...f, ...patch, offset: 0 }));
  const getCellData = useCallback((row: number, column: number) => (rows[row] ? COLUMNS[column].text(rows[row]) : ''), [rows]);

  const cellRenderers = useMemo(
    () =>
      COLUMNS.map((column, c) => (row: number) => {
        const part = rows[row];
        if (!part) return <Cell />;
        if (column.key === 'mpn')
          return (
            <Cell interactive>
              <Link to={paths.part(part.id)}>{part.mpn}</Link>
            </Cell>
          );
        if (column.key === 'reviewState')
          return (
            <Cell>
              <Tag minimal intent={REVIEW_STATE_INTENT[part.reviewState]}>
                {part.reviewState}
              </Tag>
            </Cell>
          );
        if (column.key === 'lifecycle')
          return (
            <Cell>
              <Tag minimal intent={LIFECYCLE_INTENT[part.lifecycle]}>
                {LIFECYCLE_LABEL[part.lifecycle]}
              </Tag>
            </Cell>
          );
        return <Cell>{getCellData(row, c)}</Cell>;
      }),
    [rows, getCellData],
  );

  const headerRenderers = useMemo(
    () =>
      COLUMNS.map((column) => () => (
        <ColumnHeaderCell
          name={column.name + (filters.sort === column.sort ? (filters.order === 'asc' ? ' ↑' : ' ↓') : '')}
          menuRenderer={
            column.sort
              ? () => (
                  <Menu>
                    <MenuItem icon="sort-asc" text="Sort ascending" onClick={() => set({ sort: column.sort, order: 'asc' })} />
                    <MenuItem icon="sort-desc" text="Sort descending" onClick={() => set({ sort: column.sort, order: 'desc' })} />
                  </Menu>
                )
              : undefined
          }
        />
      )),
    [filters.sort, filters.order],
  );

  const offset = filters.offset ?? 0;
  const defaultStatusHint = user?.role === 'procurement' && !filters.status ? 'Showing approved parts; choose a review state to see others.' : null;

  return (
    <>
      <PageHeader
        title="Catalogue"
        subtitle="Antenna parts with their measured data. Band coverage uses measured curves where they exist, else the datasheet bands."
        actions={
          <>
            <Button
              icon="export"
              text="Export CSV"
              data-testid="export-csv"
              onClick={() => downloadPartsCsv(query).catch((e: Error) => toaster.then((t) => t.show({ intent: Intent.DANGER, message: e.message })))}
            />
            {canCreate && <Button icon="add" intent={Intent.PRIMARY} text="New draft part" onClick={() => setCreating(true)} />}
          </>
        }
      />
      <section className="bw-panel bw-catalogue-filters" aria-label="Filters">
        <div className="bw-row">
          <FormGroup label="Search" className="bw-filter bw-filter--wide">
            <InputGroup
              leftIcon="search"
              placeholder="Manufacturer, MPN, title, notes"
              value={text}
              aria-label="Search"
              onChange={(e) => {
                setText(e.currentTarget.value);
                set({});
              }}
            />
          </FormGroup>
          {enumSelect('Form factor', FORM_FACTORS, filters.formFactor?.[0], (v) => set({ formFactor: v ? [v as never] : undefined }))}
          {enumSelect('Feed', CONNECTORS, filters.connector?.[0], (v) => set({ connector: v ? [v as never] : undefined }))}
          {enumSelect('Polarization', POLARIZATIONS, filters.polarization?.[0], (v) => set({ polarization: v ? [v as never] : undefined }))}
          {enumSelect('Review state', REVIEW_STATES, filters.status?.[0], (v) => set({ status: v ? [v as never] : undefined }))}
          {enumSelect('Lifecycle', LIFECYCLES, filters.lifecycle?.[0], (v) => set({ lifecycle: v ? [v as never] : undefined }))}
          <FormGroup label="Max price (USD)" className="bw-filter">
            <NumericInput
              aria-label="Max price (USD)"
              min={0}
              stepSize={0.1}
              minorStepSize={0.01}
              value={filters.priceMax ?? ''}
              onValueChange={(v) => set({ priceMax: Number.isFinite(v) ? v : undefined })}
            />
          </FormGroup>
        </div>
        <div className="bw-row bw-coverage-row">
          <FormGroup
            label="Covers these bands"
            className="bw-filter bw-filter--wide"
            helperText="Every band is checked over its full span (uplink and downlink)."
          >
            <BandPicker
              selected={bands}
              onChange={(b) => {
                setBands(b);
                set({});
              }}
            />
          </FormGroup>
          <FormGroup label="at VSWR ≤" className="bw-filter">
            <NumericInput
              aria-label="VSWR at most"
              min={1.1}
              max={10}
              stepSize={0.1}
              value={vswrMax}
              onValueChange={(v) => Number.isFinite(v) && v >= 1 && setVswrMax(v)}
            />
          </FormGroup>
          <FormGroup label="with total efficiency ≥ (%)" className="bw-filter">
            <NumericInput
              aria-label="Efficiency at least"
              min={0}
              max={100}
              stepSize={5}
              value={minEfficiency ?? ''}
              placeholder="any"
              onValueChange={(v) => setMinEfficiency(Number.isFinite(v) ? v : undefined)}
            />
          </FormGroup>
        </div>
        {defaultStatusHint && <p className="bw-muted">{defaultStatusHint}</p>}
      </section>
      {bands.length > 0 && <ScreeningCaution compact />}
      <QueryState isPending={parts.isPending} error={parts.error}>
        <div className="bw-table-wrap" data-testid="catalogue-table">
          <Table
            numRows={rows.length}
            defaultRowHeight={32}
            columnWidths={COLUMNS.map((c) => c.width)}
            getCellClipboardData={getCellData}
            enableRowHeader={false}
          >
            {COLUMNS.map((column, c) => (
              <Column key={column.key} id={column.key} name={column.name} cellRenderer={cellRenderers[c]} columnHeaderCellRenderer={headerRenderers[c]} />
            ))}
          </Table>
        </div>
        <div className="bw-pager">
          <span data-testid="result-count">{total === 0 ? 'No parts match' : `${offset + 1}–${Math.min(offset + PAGE_SIZE, total)} of ${total} parts`}</span>
          <ButtonGroup>
            <Button
              icon="chevron-left"
              aria-label="Previous page"
              disabled={offset === 0}
              onClick={() => setFilters((f) => ({ ...f, offset: Math.max(0, offset - PAGE_SIZE) }))}
            />
            <Button
              icon="chevron-right"
              aria-label="Next page"
              disabled={offset + PAGE_SIZE >= total}
              onClick={() => setFilters((f) => ({ ...f, offset: offset + PAGE_SIZE }))}
            />
          </ButtonGroup>
        </div>
      </QueryState>
      <PartEditorDialog isOpen={creating} onClose={() => setCreating(false)} onSaved={(id) => navigate(paths.part(id))} />
    </>
  );
}
