import { HTMLTable, Section, SectionCard } from '@blueprintjs/core';
import { QueryState } from '../../../components/QueryState';
import { useProductHistory } from '../api/get-product-history';

export interface ProductHistoryProps {
  productId: number;
}

const ACTION_TEXT: Record<string, string> = {
  created: 'Created the product',
  updated: 'Edited the product',
  deleted: 'Deleted the product',
  'radio-created': 'Added a radio',
  'radio-updated': 'Edited a radio',
  'radio-deleted': 'Removed a radio',
  'in-product-measurement-uploaded': 'Uploaded a measurement in the product',
  'in-product-measurement-deleted': 'Deleted a measurement in the product',
  'in-product-ports-mapped': 'Mapped the ports of a measurement in the product',
};

/** A mapped port of an in-product measurement, as its audit entry stores it: { port, radioId, role }. */
const isPortEntry = (v: unknown): v is { port: number; radioId: number; role: string } => typeof v === 'object' && v !== null && 'port' in v && 'role' in v;

const show = (v: unknown): string =>
  Array.isArray(v)
    ? v.map((x) => (isPortEntry(x) ? `port ${x.port} → radio ${x.radioId} ${x.role}` : show(x))).join(', ')
    : v === null || v === undefined || v === ''
      ? '—'
      : String(v);

/** Edits store { field: [before, after] }; creations and deletions store plain values. */
function describeChanges(action: string, changes: Record<string, unknown>): string {
  const isEdit = action.endsWith('updated');
  return Object.entries(changes)
    .filter(([k]) => k !== 'radioId')
    .map(([k, v]) => (isEdit && Array.isArray(v) && v.length === 2 ? `${k}: ${show(v[0])} → ${show(v[1])}` : `${k}: ${show(v)}`))
    .join('; ');
}

/** Who changed what and when, for the product and its radios. */
export function ProductHistory({ productId }: ProductHistoryProps) {
  const history = useProductHistory(productId);
  return (
    <Section title="History" icon="history" collapsible collapseProps={{ defaultIsOpen: false }} className="bw-gap">
      <SectionCard padded={false}>
        <QueryState isPending={history.isPending} error={history.error}>
          <HTMLTable compact striped className="bw-history-table" data-testid="product-history">
            <thead>
              <tr>
                <th>When (UTC)</th>
                <th>Who</th>
                <th>What</th>
                <th>Changes</th>
              </tr>
            </thead>
            <tbody>
              {(history.data?.items ?? []).map((e) => (
                <tr key={e.id}>
                  <td className="bw-nowrap">{e.at.replace('T', ' ').slice(0, 19)}</td>
                  <td>{e.user?.name ?? 'system'}</td>
                  <td>{ACTION_TEXT[e.action] ?? e.action}</td>
                  <td>{describeChanges(e.action, e.changes)}</td>
                </tr>
              ))}
            </tbody>
          </HTMLTable>
        </QueryState>
      </SectionCard>
    </Section>
  );
}
