import { type Role } from '@limitbook/contracts';

/** Roles that write pages and may see drafts. */
export const editorRoles = ['admin', 'author'] as const satisfies readonly Role[];

/** Roles that approve or send back revisions in review. */
export const reviewRoles = ['admin', 'reviewer'] as const satisfies readonly Role[];

export function seesDrafts(role: Role): boolean {
  return (editorRoles as readonly Role[]).includes(role);
}

/** Revisions in review are open to those who wrote them and those who review them. */
export function seesReviews(role: Role): boolean {
  return seesDrafts(role) || (reviewRoles as readonly Role[]).includes(role);
}

/** Which revision states a role may read. */
export function visibleStates(role: Role): ('draft' | 'in_review' | 'released' | 'superseded')[] {
  if (seesDrafts(role)) return ['draft', 'in_review', 'released', 'superseded'];
  if (seesReviews(role)) return ['in_review', 'released', 'superseded'];
  return ['released', 'superseded'];
}
