import { roleLabels, roles, type Role } from '@limitbook/contracts';

export const roleDescriptions: Record<Role, string> = {
  admin: 'Users, roles, mail and the audit log',
  author: 'Writes and revises standards',
  reviewer: 'Approves or returns revisions',
  reader: 'Reads standards and runs calculators',
};

export const roleOptions = roles.map((role) => ({ value: role, label: roleLabels[role] }));
