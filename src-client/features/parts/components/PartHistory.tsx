import { HTMLTable } from '@blueprintjs/core';
import { QueryState } from '../../../components/QueryState';
import { usePartHistory } from '../api/get-part-history';
import { describeChanges } from './history-changes';

/** The part's audit history, newest first, each change with its old and new value. */
export function PartHistory({ partId }: { partId: number }) {
  const history = usePartHistory(partId);
  return (
    <QueryState isPending={history.isPending} error={history.error}>
      <section className="bw-panel">
        <HTMLTable compact striped data-testid="history">
          <thead>
            <tr>
              <th>When</th>
              <th>Who</th>
              <th>What</th>
              <th>Changes</th>
            </tr>
          </thead>
          <tbody>
            {(history.data?.items ?? []).map((e) => (
              <tr key={e.id}>
                <td className="bw-nowrap">{new Date(e.at).toLocaleString()}</td>
                <td>{e.user?.name ?? 'system'}</td>
                <td>{e.action.replace(/-/g, ' ')}</td>
                <td className="bw-history-changes">
                  {describeChanges(e.action, e.changes).map((line) => (
                    <div key={line.field}>{line.text}</div>
                  ))}
                </td>
              </tr>
            ))}
          </tbody>
        </HTMLTable>
      </section>
    </QueryState>
  );
}
