import { useState } from 'react';
import { Button, Dialog, DialogBody, DialogFooter, FormGroup, Intent, OverlayToaster, Position, TextArea } from '@blueprintjs/core';
import { type ReviewAction, useReviewPart } from '../api/review-part';
import type { PartDetail } from '../types';

export interface ReviewActionsProps {
  part: Pick<PartDetail, 'id' | 'version' | 'reviewState' | 'mpn'> & { permissions: Pick<PartDetail['permissions'], 'submit' | 'review'> };
}

const toaster = OverlayToaster.createAsync({ position: Position.TOP });

/** Decisions that ask for a comment first (sent in the e-mail and kept in the history); `required` ones refuse an empty one. */
const ASKS_COMMENT: Partial<Record<ReviewAction, { title: string; confirm: string; intent: Intent; required: boolean }>> = {
  approval: { title: 'Approve', confirm: 'Approve', intent: Intent.SUCCESS, required: false },
  rejection: { title: 'Reject', confirm: 'Reject', intent: Intent.DANGER, required: true },
  restriction: { title: 'Restrict', confirm: 'Restrict', intent: Intent.WARNING, required: true },
};

/** The lifecycle buttons the caller may press for this part's state. */
export function ReviewActions({ part }: ReviewActionsProps) {
  const review = useReviewPart();
  const [asking, setAsking] = useState<ReviewAction | null>(null);
  const [comment, setComment] = useState('');
  const run = (action: ReviewAction, text?: string) =>
    review.mutate(
      { id: part.id, action, version: part.version, comment: text || undefined },
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
      aria-label={`${text.replace('…', '')} ${part.mpn}`}
      onClick={() => (ASKS_COMMENT[action] ? setAsking(action) : run(action))}
    />
  );
  const buttons = [];
  if (part.permissions.submit && part.reviewState === 'draft') buttons.push(button('submission', 'Submit for review', Intent.PRIMARY));
  if (part.permissions.review) {
    if (part.reviewState === 'in-review') buttons.push(button('approval', 'Approve…', Intent.SUCCESS), button('rejection', 'Reject…', Intent.DANGER));
    if (part.reviewState === 'approved') buttons.push(button('restriction', 'Restrict…', Intent.WARNING), button('retirement', 'Retire', Intent.DANGER));
    if (part.reviewState === 'restricted')
      buttons.push(button('reinstatement', 'Lift restriction', Intent.SUCCESS), button('retirement', 'Retire', Intent.DANGER));
  }
  const asked = asking ? ASKS_COMMENT[asking] : undefined;
  return (
    <>
      {buttons}
      <Dialog isOpen={asked !== undefined} onClose={() => setAsking(null)} title={asked ? `${asked.title} ${part.mpn}` : ''}>
        <DialogBody>
          <FormGroup
            label={asked?.required ? 'Comment (required)' : 'Comment (optional)'}
            labelFor="review-comment"
            helperText="Sent to the submitter by e-mail and kept in the part's history."
          >
            <TextArea id="review-comment" fill rows={4} autoFocus value={comment} onChange={(e) => setComment(e.currentTarget.value)} />
          </FormGroup>
        </DialogBody>
        <DialogFooter
          actions={
            <>
              <Button text="Cancel" onClick={() => setAsking(null)} />
              <Button
                intent={asked?.intent}
                text={asked?.confirm}
                disabled={asked?.required && !comment.trim()}
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
