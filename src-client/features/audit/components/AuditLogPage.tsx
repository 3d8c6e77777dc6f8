import { useCallback, useMemo, useState } from 'react';
import { Button, ButtonGroup, InputGroup } from '@blueprintjs/core';
import { Cell, Column, Table, TruncatedFormat } from '@blueprintjs/table';
import { PageHeader } from '../../../components/PageHeader';
import { QueryState } from '../../../components/QueryState';
import type { AuditEntry } from '../../../api/audit-entries';
import { useAuditLog } from '../api/get-audit-log';

const PAGE = 50;

const describeChanges = (changes: Record<string, unknown>) =>
  Object.entries(changes)
    .map(([field, value]) =>
      Array.isArray(value) && value.length === 2 ? `${field}: ${JSON.stringify(value[0])} → ${JSON.stringify(value[1])}` : `${field}: ${JSON.stringify(value)}`,
    )
    .join('; ');

const COLUMNS: { id: string; name: string; value: (e: AuditEntry) => string }[] = [
  { id: 'at', name: 'When (UTC)', value: (e) => e.at.replace('T', ' ').slice(0, 19) },
  { id: 'who', name: 'Who', value: (e) => e.user?.name ?? 'system' },
  { id: 'what', name: 'Record', value: (e) => `${e.entityType} ${e.entityId}` },
  { id: 'action', name: 'Action', value: (e) => e.action },
  { id: 'changes', name: 'Changes', value: (e) => describeChanges(e.changes) },
];

export function AuditLogPage() {
  const [offset, setOffset] = useState(0);
  const [entityType, setEntityType] = useState('');
  const log = useAuditLog({ limit: PAGE, offset, entityType: entityType || undefined });
  const items = useMemo(() => log.data?.items ?? [], [log.data]);
  const total = log.data?.total ?? 0;
  const getCellData = useCallback((row: number, col: number) => COLUMNS[col].value(items[row]), [items]);
  const renderers = useMemo(
    () =>
      COLUMNS.map((_, col) => (row: number) => (
        <Cell>
          <TruncatedFormat detectTruncation>{getCellData(row, col)}</TruncatedFormat>
        </Cell>
      )),
    [getCellData],
  );

  return (
    <>
      <PageHeader title="Audit log" subtitle="Every change, who made it and when." />
      <div className="bw-row bw-gap">
        <InputGroup
          leftIcon="filter"
          placeholder="Record type (part, product, user…)"
          value={entityType}
          onValueChange={(v) => {
            setEntityType(v);
            setOffset(0);
          }}
        />
        <ButtonGroup>
          <Button icon="chevron-left" disabled={offset === 0} onClick={() => setOffset(Math.max(0, offset - PAGE))} />
          <Button disabled text={`${total ? offset + 1 : 0}–${Math.min(offset + PAGE, total)} of ${total}`} />
          <Button icon="chevron-right" disabled={offset + PAGE >= total} onClick={() => setOffset(offset + PAGE)} />
        </ButtonGroup>
      </div>
      <QueryState isPending={log.isPending} error={log.error}>
        <div className="bw-table-wrap">
          <Table numRows={items.length} columnWidths={[170, 150, 150, 150, 520]} getCellClipboardData={getCellData}>
            {COLUMNS.map((c, i) => (
              <Column key={c.id} id={c.id} name={c.name} cellRenderer={renderers[i]} />
            ))}
          </Table>
        </div>
      </QueryState>
    </>
  );
}
