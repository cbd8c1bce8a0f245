import { AppException } from '../../common/errors/app.exception.js';

export type MethodDesignErrorReason =
  | 'design-not-found'
  | 'slug-taken'
  | 'draft-not-found'
  | 'draft-exists'
  | 'drafts-hidden'
  | 'in-review'
  | 'not-in-review'
  | 'released-immutable'
  | 'own-approval'
  | 'version-not-found'
  | 'restore-open-revision'
  | 'review-stale'
  | 'no-release';

const byReason: Record<MethodDesignErrorReason, () => AppException> = {
  'design-not-found': () => new AppException(404, 'NOT_FOUND', 'No in-house method with this id.'),
  'slug-taken': () => new AppException(409, 'CONFLICT', 'Another in-house method already uses this id.', { slug: 'Already in use' }),
  'draft-not-found': () => new AppException(404, 'NOT_FOUND', 'This method has no draft. Start one from the released version first.'),
  'draft-exists': () => new AppException(409, 'CONFLICT', 'This method already has a draft or a version in review. Open it instead of starting another.'),
  'drafts-hidden': () => new AppException(403, 'FORBIDDEN', 'Drafts are open to authors and admins only; versions in review to reviewers too.'),
  'in-review': () => new AppException(409, 'CONFLICT', 'This version is in review and cannot be edited. Withdraw it to draft first, or wait for the reviewer.'),
  'not-in-review': () => new AppException(409, 'CONFLICT', 'This method has no version in review.'),
  'released-immutable': () =>
    new AppException(409, 'CONFLICT', 'Released and superseded versions cannot be changed. Start a new draft of the next version instead.'),
  'own-approval': () => new AppException(403, 'FORBIDDEN', 'You worked on this version, so another reviewer or admin has to approve it.'),
  'version-not-found': () => new AppException(404, 'NOT_FOUND', 'This method has no such version.'),
  'restore-open-revision': () =>
    new AppException(409, 'CONFLICT', 'This method already has a draft or a version in review. Finish or discard it before restoring an older version.'),
  'review-stale': () =>
    new AppException(409, 'CONFLICT', 'The version in review changed since you opened it (it was withdrawn, edited and submitted again). Reload it and review the current one.', {
      baseVersion: 'Not the version in review',
    }),
  'no-release': () => new AppException(409, 'CONFLICT', 'This method has no released version to start a draft from.'),
};

export class MethodDesignsException {
  static of(reason: MethodDesignErrorReason): AppException {
    return byReason[reason]();
  }

  static invalidReviewers(message: string): AppException {
    return new AppException(400, 'VALIDATION_FAILED', message, { reviewerIds: message });
  }

  /** A definition the sandbox refuses or that cannot be evaluated; `tex` holds the LaTeX of what parsed, for the designer. */
  static invalidDefinition(message: string, fields: Record<string, string>, tex?: Record<string, string>): AppException {
    const exception = new AppException(400, 'VALIDATION_FAILED', message, fields);
    if (tex) Object.assign(exception.getResponse() as object, { tex });
    return exception;
  }

  static staleDraft(version: number): AppException {
    return new AppException(409, 'CONFLICT', `Someone saved this draft since you opened it; it is now at version ${version}. Reload it, or keep your copy and save again over it.`, {
      baseVersion: `The draft is at version ${version}`,
    });
  }
}
