import type { RevisionState } from '@limitbook/contracts';

export const stateLabels: Record<RevisionState, string> = { draft: 'Draft', in_review: 'In review', released: 'Released', superseded: 'Superseded' };
export const stateColors: Record<RevisionState, string> = { draft: 'amber', in_review: 'blue', released: 'verdigris', superseded: 'gray' };

/** "Rev. B", or "the draft" / "the revision in review" before a letter is given. */
export function revisionName(revision: { revisionLetter: string | null; state: RevisionState; sequence: number }): string {
  if (revision.revisionLetter) return `Rev. ${revision.revisionLetter}`;
  if (revision.state === 'draft') return `the draft (#${revision.sequence})`;
  if (revision.state === 'in_review') return `the revision in review (#${revision.sequence})`;
  return `revision #${revision.sequence}`;
}
