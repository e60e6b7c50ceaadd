import { z } from 'zod';

/** The three roles, from least to most privileged. */
export const ROLES = ['viewer', 'editor', 'admin'] as const;
export const RoleSchema = z.enum(ROLES);
export type Role = z.infer<typeof RoleSchema>;

export const ROLE_LABELS: Record<Role, string> = {
  viewer: 'Viewer',
  editor: 'Editor',
  admin: 'Admin',
};

export const ROLE_DESCRIPTIONS: Record<Role, string> = {
  viewer: 'Searches, compares, runs substitutions and checks bills of materials.',
  editor: 'Also curates parts, datasheets and approved equivalents.',
  admin: 'Also invites people, changes roles and disables accounts.',
};
