import { DomainError, VersionConflictError } from '../common/domain-error';
import type { ReviewState } from './part.types';

/** The catalogue's error codes in one place. */
export const partErrors = {
  versionConflict: (id: number, expected: number, actual: number) => new VersionConflictError('part', id, expected, actual),
  duplicateMpn: (manufacturer: string, mpn: string) => new DomainError('PART_MPN_TAKEN', `${manufacturer} already has a part ${mpn}`, 409, { field: 'mpn' }),
  wrongState: (id: number, state: ReviewState, action: string, allowed: ReviewState[]) =>
    new DomainError('PART_STATE_CONFLICT', `Part ${id} is ${state}; it can be ${action} only when ${allowed.join(' or ')}`, 409, { reviewState: state }),
  commentRequired: (action: string) =>
    new DomainError('VALIDATION_FAILED', `comment: a comment is required to ${action} a part`, 400, {
      fields: [{ field: 'comment', message: `is required to ${action} a part` }],
    }),
};
