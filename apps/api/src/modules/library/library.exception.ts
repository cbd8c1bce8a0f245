import { type PersonRef } from '@limitbook/contracts';
import { AppException } from '../../common/errors/app.exception.js';

export type LibraryErrorReason =
  | 'collection-not-found'
  | 'collection-unknown'
  | 'collection-key-taken'
  | 'collection-not-empty'
  | 'page-not-found'
  | 'document-number-taken'
  | 'owner-not-found'
  | 'draft-not-found'
  | 'draft-exists'
  | 'drafts-hidden'
  | 'not-published'
  | 'in-review'
  | 'not-in-review'
  | 'released-immutable'
  | 'own-approval'
  | 'revision-not-found'
  | 'restore-open-revision'
  | 'restore-not-released'
  | 'already-obsolete'
  | 'not-obsolete'
  | 'review-stale';

const byReason: Record<LibraryErrorReason, () => AppException> = {
  'collection-not-found': () => new AppException(404, 'NOT_FOUND', 'No collection with this id.'),
  'collection-unknown': () => new AppException(400, 'VALIDATION_FAILED', 'Pick one of the library\'s collections.', { collectionId: 'No collection with this id' }),
  'collection-key-taken': () => new AppException(409, 'CONFLICT', 'Another collection already uses this key.', { key: 'Already in use' }),
  'collection-not-empty': () => new AppException(409, 'CONFLICT', 'The collection still holds pages. Move or delete them first.'),
  'page-not-found': () => new AppException(404, 'NOT_FOUND', 'No page with this id or document number.'),
  'document-number-taken': () =>
    new AppException(409, 'CONFLICT', 'Another page already has this document number.', { documentNumber: 'Already used by another page' }),
  'owner-not-found': () => new AppException(400, 'VALIDATION_FAILED', 'The owner must be a user of Limitbook.', { ownerId: 'No user with this id' }),
  'draft-not-found': () => new AppException(404, 'NOT_FOUND', 'This page has no draft. Start one from the released revision first.'),
  'draft-exists': () => new AppException(409, 'CONFLICT', 'This page already has a draft. Open it instead of starting another.'),
  'not-published': () => new AppException(404, 'NOT_FOUND', 'This page has no released revision yet.'),
  'drafts-hidden': () => new AppException(403, 'FORBIDDEN', 'Drafts are open to authors and admins only; revisions in review to reviewers too.'),
  'in-review': () => new AppException(409, 'CONFLICT', 'This revision is in review and cannot be edited. Withdraw it to draft first, or wait for the reviewer.'),
  'not-in-review': () => new AppException(409, 'CONFLICT', 'This page has no revision in review.'),
  'released-immutable': () =>
    new AppException(409, 'CONFLICT', 'Released and superseded revisions cannot be changed. Start a new draft of the next revision instead.'),
  'own-approval': () => new AppException(403, 'FORBIDDEN', 'You worked on this revision, so another reviewer or admin has to approve it.'),
  'revision-not-found': () => new AppException(404, 'NOT_FOUND', 'This page has no revision with this id.'),
  'restore-open-revision': () =>
    new AppException(409, 'CONFLICT', 'This page already has a draft or a revision in review. Finish or discard it before restoring an older revision.'),
  'restore-not-released': () => new AppException(409, 'CONFLICT', 'Only released or superseded revisions can be restored.'),
  'already-obsolete': () => new AppException(409, 'CONFLICT', 'This page is already obsolete.'),
  'review-stale': () =>
    new AppException(409, 'CONFLICT', 'The revision changed since you opened it (it was withdrawn, edited and submitted again). Reload it and review the current text.', {
      baseVersion: 'Not the version in review',
    }),
  'not-obsolete': () => new AppException(409, 'CONFLICT', 'This page is not obsolete.'),
};

/** The 409 of a stale draft save, telling the editor which version is current and who saved it. */
export class DraftConflictException extends AppException {
  constructor(current: { version: number; updatedAt: string; updatedBy: PersonRef | null }) {
    super(409, 'CONFLICT', `Someone saved this draft since you opened it; it is now at version ${current.version}. Reload it, or keep your copy and save again over it.`, {
      baseVersion: `The draft is at version ${current.version}`,
    });
    Object.assign(this.getResponse() as object, { current });
  }
}

export class LibraryException {
  static of(reason: LibraryErrorReason): AppException {
    return byReason[reason]();
  }

  /** For expressions: `found ?? LibraryException.throw('page-not-found')`. */
  static throw(reason: LibraryErrorReason): never {
    throw byReason[reason]();
  }

  static invalidReviewers(message: string): AppException {
    return new AppException(400, 'VALIDATION_FAILED', message, { reviewerIds: message });
  }

  static invalidDocument(fields: Record<string, string>): AppException {
    return new AppException(400, 'VALIDATION_FAILED', 'The page body holds content the editor does not allow.', fields);
  }

  static staleDraft(current: { version: number; updatedAt: string; updatedBy: PersonRef | null }): AppException {
    return new DraftConflictException(current);
  }
}
