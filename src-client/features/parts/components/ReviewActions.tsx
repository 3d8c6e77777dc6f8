import { useState } from 'react';
import { Button, Dialog, DialogBody, DialogFooter, FormGroup, Intent, OverlayToaster, Position, TextArea } from '@blueprintjs/core';
import { type ReviewAction, useReviewPart } from '../api/review-part';
import type { PartDetail } from '../types';

export interface ReviewActionsProps {
  part: Pick<PartDetail, 'id' | 'version' | 'reviewState' | 'mpn'> & { permissions: Pick<PartDetail['permissions'], 'submit' | 'review'> };
}

const toaster = OverlayToaster.createAsync({ position: Position.TOP });
const NEEDS_COMMENT: ReviewAction[] = ['rejection', 'restriction'];

/** The lifecycle buttons the caller may press for this part's state. */
export function ReviewActions({ part }: ReviewActionsProps) {
  const review = useReviewPart();
  const [asking, setAsking] = useState<ReviewAction | null>(null);
  const [comment, setComment] = useState('');
  const run = (action: ReviewAction, text?: string) =>
    review.mutate(
      { id: part.id, action, version: part.version, comment: text },
      {
        onSuccess: (p) => {
          setAsking(null);
          setComment('');
          toaster.then((t) => t.show({ intent: Intent.SUCCESS, message: `${p.mpn} is now ${p.reviewState}` }));
        },
        onError: (e) => toaster.then((t) => t.show({ intent: Intent.DANGER, message: e.message })),
      },
    );
  const button = (action: ReviewAction, text: string, intent: Intent) => (
    <Button
      key={action}
      text={text}
      intent={intent}
      loading={review.isPending && review.variables?.action === action}
      onClick={() => (NEEDS_COMMENT.includes(action) ? setAsking(action) : run(action))}
    />
  );
  const buttons = [];
  if (part.permissions.submit && part.reviewState === 'draft') buttons.push(button('submission', 'Submit for review', Intent.PRIMARY));
  if (part.permissions.review) {
    if (part.reviewState === 'in-review') buttons.push(button('approval', 'Approve', Intent.SUCCESS), button('rejection', 'Reject…', Intent.DANGER));
    if (part.reviewState === 'approved') buttons.push(button('restriction', 'Restrict…', Intent.WARNING), button('retirement', 'Retire', Intent.DANGER));
    if (part.reviewState === 'restricted')
      buttons.push(button('reinstatement', 'Lift restriction', Intent.SUCCESS), button('retirement', 'Retire', Intent.DANGER));
  }
  return (
    <>
      {buttons}
      <Dialog isOpen={asking !== null} onClose={() => setAsking(null)} title={asking === 'rejection' ? `Reject ${part.mpn}` : `Restrict ${part.mpn}`}>
        <DialogBody>
          <FormGroup label="Comment (sent to the submitter)" labelFor="review-comment">
            <TextArea id="review-comment" fill rows={4} value={comment} onChange={(e) => setComment(e.currentTarget.value)} />
          </FormGroup>
        </DialogBody>
        <DialogFooter
          actions={
            <>
              <Button text="Cancel" onClick={() => setAsking(null)} />
              <Button
                intent={Intent.DANGER}
                text={asking === 'rejection' ? 'Reject' : 'Restrict'}
                disabled={!comment.trim()}
                loading={review.isPending}
                onClick={() => asking && run(asking, comment.trim())}
              />
            </>
          }
        />
      </Dialog>
    </>
  );
}
