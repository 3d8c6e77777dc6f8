import { QueryState } from '../../../components/QueryState';
import { usePartConsistency } from '../api/get-part-consistency';
import { ReviewAid } from './ReviewAid';
import { fmt } from './part-labels';

/** On the part page: per datasheet band, the claims against the measurements and the directivity the gain and efficiency imply. */
export function PartReviewAid({ partId }: { partId: number }) {
  const check = usePartConsistency(partId);
  return (
    <section className="bw-panel" data-testid="part-review-aid" aria-labelledby="part-review-aid-title">
      <h3 id="part-review-aid-title">Claims, measurements and implied directivity</h3>
      <QueryState isPending={check.isPending} error={check.error}>
        {check.data && (
          <>
            <p className="bw-muted bw-small">
              Implied directivity is gain divided by efficiency on the same basis (D = G / η). A real antenna is at least as directive as a short dipole (1.76
              dBi); for this form factor more than {fmt(check.data.plausibleMaxDirectivityDbi, 0)} dBi is not credible (common practice).
            </p>
            <ReviewAid check={check.data} />
          </>
        )}
      </QueryState>
    </section>
  );
}
