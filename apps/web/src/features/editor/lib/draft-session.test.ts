import { describe, expect, it } from 'vitest';
import { draftPage } from '../testing/fixtures';
import { draftReducer, initialDraftState } from './draft-session';

const review = {
  submittedAt: '2026-12-01T10:00:00.000Z',
  submittedBy: { id: 'u1', name: 'Idris Okafor', email: 'idris@example.test' },
  reviewers: [{ id: 'u2', name: 'Sunniva Lind', email: 'sunniva@example.test' }],
  note: 'Please check the rule.',
  comment: null,
};

function inReview(version: number) {
  const page = draftPage(version);
  return { ...page, revision: { ...page.revision, state: 'in_review' as const, review } };
}

describe('draft session review states', () => {
  const snapshot = { title: 'Port walls', document: '{}' };

  it('opens read-only when the revision is already in review', () => {
    expect(initialDraftState(inReview(4), snapshot).inReview).toEqual(review);
    expect(initialDraftState(draftPage(4), snapshot).inReview).toBeNull();
  });

  it('goes into review on submit and back to editing on withdraw, following the version', () => {
    let state = initialDraftState(draftPage(2), snapshot);
    state = draftReducer(state, { type: 'submit-started' });
    expect(state.phase).toBe('submitting');
    state = draftReducer(state, { type: 'submitted', page: inReview(2) });
    expect(state).toMatchObject({ phase: 'idle', inReview: review, baseVersion: 2 });
    state = draftReducer(state, { type: 'withdraw-started' });
    expect(state.phase).toBe('withdrawing');
    state = draftReducer(state, { type: 'withdrawn', page: draftPage(3) });
    expect(state).toMatchObject({ phase: 'idle', inReview: null, baseVersion: 3 });
  });
});
