import { type Role } from '@limitbook/contracts';

/** Roles that write pages and may see drafts. Reviewers join them when review lands. */
export const editorRoles = ['admin', 'author'] as const satisfies readonly Role[];

export function seesDrafts(role: Role): boolean {
  return (editorRoles as readonly Role[]).includes(role);
}
