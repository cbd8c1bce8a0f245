import type { Page, RevisionReview } from '@limitbook/contracts';

/** What a save sends, kept as text so two versions compare cheaply. */
export type DraftSnapshot = { title: string; document: string };

export type DraftState = {
  pageId: string;
  documentNumber: string;
  /** The draft version the editor's copy is based on; sent as `baseVersion`. */
  baseVersion: number;
  /** The copy the server holds at `baseVersion`, as this editor last saved or loaded it. */
  saved: DraftSnapshot;
  phase: 'idle' | 'saving' | 'submitting' | 'withdrawing';
  /** Set while the revision is in review: nothing can be edited until it is withdrawn. */
  inReview: RevisionReview | null;
  /** A save was refused because someone saved a newer version (`latest`, when it could be fetched). */
  conflict: { message: string; latest: Page | null } | null;
  /** The author chose to keep their copy: the next save replaces this newer version. */
  overwriting: { version: number; updatedAt: string } | null;
  /** The server refused the page body or title, with one message per field. */
  refused: { message: string; fields: Record<string, string> } | null;
  savedAt: string | null;
};

export type DraftAction =
  | { type: 'save-started' }
  | { type: 'submit-started' }
  | { type: 'withdraw-started' }
  | { type: 'submitted'; page: Page }
  | { type: 'withdrawn'; page: Page }
  | { type: 'saved'; page: Page; snapshot: DraftSnapshot }
  | { type: 'conflict'; message: string; latest: Page | null }
  | { type: 'refused'; message: string; fields: Record<string, string> }
  | { type: 'settled' }
  | { type: 'kept-mine'; latest: Page }
  | { type: 'reloaded'; latest: Page; snapshot: DraftSnapshot };

export function initialDraftState(page: Page, snapshot: DraftSnapshot): DraftState {
  return {
    pageId: page.id,
    documentNumber: page.documentNumber,
    baseVersion: page.revision.version,
    saved: snapshot,
    phase: 'idle',
    inReview: page.revision.state === 'in_review' ? page.revision.review : null,
    conflict: null,
    overwriting: null,
    refused: null,
    savedAt: page.revision.updatedAt,
  };
}

export function draftReducer(state: DraftState, action: DraftAction): DraftState {
  switch (action.type) {
    case 'save-started':
      return { ...state, phase: 'saving' };
    case 'submit-started':
      return { ...state, phase: 'submitting' };
    case 'withdraw-started':
      return { ...state, phase: 'withdrawing' };
    case 'submitted':
      return { ...state, phase: 'idle', baseVersion: action.page.revision.version, inReview: action.page.revision.review, refused: null };
    case 'withdrawn':
      return { ...state, phase: 'idle', baseVersion: action.page.revision.version, inReview: null, savedAt: action.page.revision.updatedAt };
    case 'saved':
      return {
        ...state,
        phase: 'idle',
        baseVersion: action.page.revision.version,
        saved: action.snapshot,
        conflict: null,
        overwriting: null,
        refused: null,
        savedAt: action.page.revision.updatedAt,
      };
    case 'conflict':
      // The base version stays: nothing is overwritten until the author decides.
      return { ...state, phase: 'idle', conflict: { message: action.message, latest: action.latest } };
    case 'refused':
      return { ...state, phase: 'idle', refused: { message: action.message, fields: action.fields } };
    case 'settled':
      return { ...state, phase: 'idle' };
    case 'kept-mine':
      // Saving against the latest version now replaces it; the local copy stays unsaved until then.
      return {
        ...state,
        baseVersion: action.latest.revision.version,
        conflict: null,
        overwriting: { version: action.latest.revision.version, updatedAt: action.latest.revision.updatedAt },
      };
    case 'reloaded':
      return {
        ...state,
        phase: 'idle',
        baseVersion: action.latest.revision.version,
        saved: action.snapshot,
        conflict: null,
        overwriting: null,
        refused: null,
        savedAt: action.latest.revision.updatedAt,
      };
  }
}

export function isDirty(state: DraftState, current: DraftSnapshot): boolean {
  return state.saved.title !== current.title || state.saved.document !== current.document;
}
