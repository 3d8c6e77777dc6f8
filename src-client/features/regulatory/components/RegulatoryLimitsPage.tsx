import { useCallback, useMemo, useState } from 'react';
import { Alert, Button, Intent, OverlayToaster, Position } from '@blueprintjs/core';
import { Cell, Column, Table, TruncatedFormat } from '@blueprintjs/table';
import { PageHeader } from '../../../components/PageHeader';
import { QueryState } from '../../../components/QueryState';
import { ScreeningCaution } from '../../../components/ScreeningCaution';
import { useHasRole } from '../../../lib/session';
import { useRegulatoryLimits } from '../api/get-regulatory-limits';
import { useDeleteRegulatoryLimit } from '../api/delete-regulatory-limit';
import { LIMIT_KIND_LABELS, type RegulatoryLimit } from '../types';
import { BandsNav } from '../../../components/BandsNav';
import { RegulatoryLimitDialog } from './RegulatoryLimitDialog';

const toaster = OverlayToaster.createAsync({ position: Position.TOP });

const COLUMNS: { id: string; name: string; width: number; value: (l: RegulatoryLimit) => string }[] = [
  { id: 'region', name: 'Region', width: 70, value: (l) => l.region },
  { id: 'title', name: 'Limit', width: 200, value: (l) => l.title },
  { id: 'range', name: 'Range (MHz)', width: 120, value: (l) => `${l.fromMhz}–${l.toMhz}` },
  { id: 'kind', name: 'Kind', width: 150, value: (l) => LIMIT_KIND_LABELS[l.kind] },
  { id: 'value', name: 'Value', width: 220, value: (l) => `${l.valueText} (${Number(l.valueDbm.toFixed(2))} dBm)` },
  {
    id: 'rule',
    name: 'Gain rule',
    width: 170,
    value: (l) => (typeof l.gainThresholdDbi !== 'number' ? '' : `−${l.reductionDbPerDb} dB per dB above ${l.gainThresholdDbi} dBi`),
  },
  { id: 'conditions', name: 'Conditions', width: 360, value: (l) => l.conditions ?? '' },
  { id: 'source', name: 'Source', width: 300, value: (l) => l.source },
  { id: 'note', name: 'Note', width: 300, value: (l) => l.note ?? '' },
];

/** Published power limits per region and frequency range, with their sources. */
export function RegulatoryLimitsPage() {
  const isAdmin = useHasRole('admin');
  const limits = useRegulatoryLimits();
  const remove = useDeleteRegulatoryLimit();
  const rows = useMemo(() => limits.data ?? [], [limits.data]);
  const [editing, setEditing] = useState<RegulatoryLimit | null | undefined>(undefined);
  const [deleting, setDeleting] = useState<RegulatoryLimit | null>(null);

  const getCellData = useCallback((row: number, col: number) => COLUMNS[col].value(rows[row]), [rows]);
  const renderers = useMemo(
    () =>
      COLUMNS.map((_, col) => (row: number) => (
        <Cell>
          <TruncatedFormat detectTruncation>{getCellData(row, col)}</TruncatedFormat>
        </Cell>
      )),
    [getCellData],
  );
  const actionCell = useCallback(
    (row: number) => (
      <Cell interactive>
        <Button size="small" variant="minimal" icon="edit" aria-label={`Edit ${rows[row].title}`} onClick={() => setEditing(rows[row])} />
        <Button
          size="small"
          variant="minimal"
          icon="trash"
          intent={Intent.DANGER}
          aria-label={`Delete ${rows[row].title}`}
          onClick={() => setDeleting(rows[row])}
        />
      </Cell>
    ),
    [rows],
  );

  return (
    <>
      <PageHeader
        title="Regulatory limits"
        subtitle="Power limits by region and frequency, as published. Entries marked from memory must be verified against the document."
        actions={isAdmin && <Button icon="add" intent={Intent.PRIMARY} text="New limit" onClick={() => setEditing(null)} />}
      />
      <BandsNav />
      <ScreeningCaution />
      <QueryState isPending={limits.isPending} error={limits.error}>
        <div className="bw-table-wrap" data-testid="limits-table">
          <Table
            numRows={rows.length}
            defaultRowHeight={30}
            columnWidths={[...COLUMNS.map((c) => c.width), ...(isAdmin ? [80] : [])]}
            getCellClipboardData={getCellData}
          >
            {[
              ...COLUMNS.map((c, i) => <Column key={c.id} id={c.id} name={c.name} cellRenderer={renderers[i]} />),
              ...(isAdmin ? [<Column key="actions" id="actions" name="" cellRenderer={actionCell} />] : []),
            ]}
          </Table>
        </div>
      </QueryState>
      {editing !== undefined && <RegulatoryLimitDialog key={editing?.id ?? 'new'} limit={editing} onClose={() => setEditing(undefined)} />}
      <Alert
        isOpen={deleting !== null}
        intent={Intent.DANGER}
        icon="trash"
        confirmButtonText="Delete limit"
        cancelButtonText="Keep it"
        loading={remove.isPending}
        onCancel={() => setDeleting(null)}
        onConfirm={() =>
          deleting &&
          remove.mutate(deleting.id, {
            onSuccess: () => setDeleting(null),
            onError: (e) => toaster.then((t) => t.show({ intent: Intent.DANGER, message: e.message })),
          })
        }
      >
        Delete the limit <b>{deleting?.title}</b> ({deleting?.region})?
      </Alert>
    </>
  );
}
