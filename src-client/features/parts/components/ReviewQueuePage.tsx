import { Link } from 'react-router-dom';
import { NonIdealState, Tag } from '@blueprintjs/core';
import { PageHeader } from '../../../components/PageHeader';
import { QueryState } from '../../../components/QueryState';
import { paths } from '../../../app/routes/paths';
import { useReviewQueue } from '../api/get-review-queue';
import type { ReviewQueueItem } from '../types';
import { ReviewActions } from './ReviewActions';
import { ReviewAid } from './ReviewAid';
import { summaryOf } from './review-aid';
import './review-offers.css';

const MEASURED_LABEL: Record<ReviewQueueItem['measuredKinds'][number], string> = {
  s11: 'S11',
  efficiency: 'efficiency',
  'peak-gain': 'peak gain',
  'average-gain': 'average gain',
};

function QueueCard({ item }: { item: ReviewQueueItem }) {
  const summary = summaryOf(item.check);
  return (
    <section className="bw-panel bw-review-card" aria-label={`${item.manufacturer} ${item.mpn}`} data-testid="review-item">
      <div>
        <h2 className="bw-review-card__title">
          <Link to={paths.part(item.id)}>{item.mpn}</Link> <span className="bw-muted">{item.manufacturer}</span>{' '}
          <Tag minimal intent={summary.intent} data-testid="review-summary">
            {summary.text}
          </Tag>
        </h2>
        <p className="bw-review-card__meta bw-muted">
          {item.title} · submitted by {item.submittedBy?.name ?? '—'}
          {item.submittedAt ? `, ${new Date(item.submittedAt).toLocaleString()}` : ''} · measured:{' '}
          {item.measuredKinds.length ? item.measuredKinds.map((k) => MEASURED_LABEL[k]).join(', ') : 'nothing (datasheet only)'} · {item.documentCount} document
          {item.documentCount === 1 ? '' : 's'}
        </p>
      </div>
      <div className="bw-review-card__actions">
        <ReviewActions part={{ ...item, reviewState: 'in-review', permissions: { submit: false, review: true } }} />
      </div>
      <div className="bw-review-card__aid">
        <ReviewAid check={item.check} />
      </div>
    </section>
  );
}

/** Parts waiting for an admin, oldest first: each with its claims against its measurements, and approve and reject at hand. */
export function ReviewQueuePage() {
  const queue = useReviewQueue();
  const rows = queue.data ?? [];
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
          <div data-testid="review-queue">
            {rows.map((item) => (
              <QueueCard key={item.id} item={item} />
            ))}
          </div>
        )}
      </QueryState>
    </>
  );
}
