import { useCallback, useMemo } from 'react';
import { Link } from 'react-router-dom';
import { NonIdealState, Tag } from '@blueprintjs/core';
import { Cell, Column, Table } from '@blueprintjs/table';
import { PageHeader } from '../../../components/PageHeader';
import { QueryState } from '../../../components/QueryState';
import { paths } from '../../../app/routes/paths';
import { useReviewQueue } from '../api/get-review-queue';
import type { ReviewQueueItem } from '../types';
import { ReviewActions } from './ReviewActions';

const TEXT: ((q: ReviewQueueItem) => string)[] = [
  (q) => q.mpn,
  (q) => q.manufacturer,
  (q) => q.title,
  (q) => q.submittedBy?.name ?? '—',
  (q) => (q.submittedAt ? new Date(q.submittedAt).toLocaleString() : '—'),
  (q) => q.measuredKinds.join(', ') || 'spec only',
  (q) => String(q.documentCount),
  () => '',
];

/** Parts waiting for an admin, oldest first, with approve and reject in the row. */
export function ReviewQueuePage() {
  const queue = useReviewQueue();
  const rows = useMemo(() => queue.data ?? [], [queue.data]);
  const getCellData = useCallback((row: number, column: number) => (rows[row] ? TEXT[column](rows[row]) : ''), [rows]);
  const text = useCallback((column: number) => (row: number) => <Cell>{getCellData(row, column)}</Cell>, [getCellData]);
  const mpnCell = useCallback(
    (row: number) => (
      <Cell interactive>
        <Link to={paths.part(rows[row].id)}>{rows[row].mpn}</Link>
      </Cell>
    ),
    [rows],
  );
  const dataCell = useCallback(
    (row: number) => (
      <Cell>
        {rows[row].measuredKinds.length
          ? rows[row].measuredKinds.map((k) => (
              <Tag key={k} minimal className="bw-tag-gap">
                {k}
              </Tag>
            ))
          : 'spec only'}
      </Cell>
    ),
    [rows],
  );
  const actionCell = useCallback(
    (row: number) => {
      const q = rows[row];
      return (
        <Cell interactive className="bw-action-cell">
          <ReviewActions part={{ ...q, reviewState: 'in-review', permissions: { submit: false, review: true } }} />
        </Cell>
      );
    },
    [rows],
  );
  return (
    <>
      <PageHeader
        title="Review queue"
        subtitle="Parts engineers submitted. Approving makes a part visible to procurement; rejecting returns it to its author with your comment."
      />
      <QueryState isPending={queue.isPending} error={queue.error}>
        {rows.length === 0 ? (
          <NonIdealState icon="tick-circle" title="Nothing waiting for review" />
        ) : (
          <div className="bw-table-wrap" data-testid="review-queue">
            <Table
              numRows={rows.length}
              defaultRowHeight={40}
              columnWidths={[160, 150, 300, 130, 170, 190, 60, 230]}
              getCellClipboardData={getCellData}
              enableRowHeader={false}
            >
              <Column id="mpn" name="MPN" cellRenderer={mpnCell} />
              <Column id="manufacturer" name="Manufacturer" cellRenderer={text(1)} />
              <Column id="title" name="Title" cellRenderer={text(2)} />
              <Column id="submitter" name="Submitted by" cellRenderer={text(3)} />
              <Column id="submitted" name="Submitted" cellRenderer={text(4)} />
              <Column id="data" name="Measured" cellRenderer={dataCell} />
              <Column id="docs" name="Docs" cellRenderer={text(6)} />
              <Column id="actions" name="" cellRenderer={actionCell} />
            </Table>
          </div>
        )}
      </QueryState>
    </>
  );
}
