import type { Role } from '@limitbook/contracts';

/** What each role may open in the app. The server enforces the same rules; this only shapes the UI. */
const areas = {
  library: ['admin', 'author', 'reviewer', 'reader'],
  'standards.edit': ['admin', 'author'],
  'standards.review': ['admin', 'reviewer'],
  'admin.users': ['admin'],
  'admin.mail': ['admin'],
  'admin.audit': ['admin'],
} as const satisfies Record<string, readonly Role[]>;

export type Area = keyof typeof areas;

export function canAccess(role: Role, area: Area): boolean {
  return (areas[area] as readonly Role[]).includes(role);
}
