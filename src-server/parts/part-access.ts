import type { AuthUser } from '../common/auth.decorators';
import { DomainError } from '../common/domain-error';
import type { ReviewState } from './part.types';

interface OwnedPart {
  id: number;
  createdById: number | null;
  reviewState: ReviewState;
}

/** Who may do what with a part (issue 5, "Permissions"); pure so the matrix is testable without a database. */
export const partAccess = {
  /** Admins edit every part; engineers only their own drafts; procurement never (sourcing only). */
  canEdit(user: AuthUser, part: OwnedPart): boolean {
    if (user.role === 'admin') return true;
    return user.role === 'engineer' && part.reviewState === 'draft' && part.createdById === user.id;
  },
  canUploadData(user: AuthUser, part: OwnedPart): boolean {
    return partAccess.canEdit(user, part);
  },
  canSubmit(user: AuthUser, part: OwnedPart): boolean {
    return part.reviewState === 'draft' && partAccess.canEdit(user, part);
  },
  canReview(user: AuthUser): boolean {
    return user.role === 'admin';
  },
  canEditSourcing(user: AuthUser): boolean {
    return user.role === 'admin' || user.role === 'procurement';
  },
};

export function assertCanEdit(user: AuthUser, part: OwnedPart, action = 'edit'): void {
  if (partAccess.canEdit(user, part)) return;
  const why =
    user.role === 'procurement'
      ? 'procurement may edit sourcing only'
      : part.reviewState !== 'draft'
        ? `the part is ${part.reviewState}; engineers may change drafts only`
        : 'engineers may change only the drafts they created';
  throw new DomainError('PART_EDIT_FORBIDDEN', `You may not ${action} part ${part.id}: ${why}`, 403);
}
