import {
  AbilityBuilder,
  createMongoAbility,
  type ForcedSubject,
  type MongoAbility,
} from '@casl/ability';
import type { Role } from '../roles';

/**
 * Who may do what, defined once. The API enforces these rules on every route;
 * the UI only uses them to hide what a role cannot do.
 */
export const ACTIONS = ['read', 'create', 'update', 'archive', 'delete', 'review', 'manage'] as const;
export type Action = (typeof ACTIONS)[number];

export const SUBJECTS = [
  'Part',
  'Datasheet',
  'Equivalent',
  'Requirement',
  'Bom',
  'User',
  'Invitation',
  'Outbox',
  'AuditEvent',
  'Notification',
] as const;
export type SubjectName = (typeof SUBJECTS)[number];

/** Records whose rules depend on who owns them or whom they are shared with. */
export type OwnedBom = ForcedSubject<'Bom'> & { ownerId: string; sharedWith: string[] };
export type OwnedRequirement = ForcedSubject<'Requirement'> & { ownerId: string };
export type OwnedNotification = ForcedSubject<'Notification'> & { userId: string };

/** A subject is a type name, or a tagged record where a rule has conditions. */
export type AppSubject = SubjectName | 'all' | OwnedBom | OwnedRequirement | OwnedNotification;
export type AppAbility = MongoAbility<[Action, AppSubject]>;

/** The fields of the signed-in person that rules depend on. */
export interface AbilityUser {
  id: string;
  role: Role;
}

export function defineAbilityFor(user: AbilityUser | null | undefined): AppAbility {
  const { can, build } = new AbilityBuilder<AppAbility>(createMongoAbility);
  if (!user) return build();

  // Viewers: read the catalog, run substitutions, keep their own lists and BOMs.
  can('read', ['Part', 'Datasheet', 'Equivalent']);
  can('manage', 'Requirement', { ownerId: user.id });
  can('create', 'Bom');
  can(['read', 'update', 'delete'], 'Bom', { ownerId: user.id });
  can('read', 'Bom', { sharedWith: { $in: [user.id] } });
  // Alerts about watched BOMs: each person reads and marks only their own.
  can(['read', 'update'], 'Notification', { userId: user.id });

  if (user.role === 'editor' || user.role === 'admin') {
    can(['create', 'update', 'archive'], 'Part');
    can(['create', 'update', 'review', 'archive'], 'Datasheet');
    can(['create', 'update', 'delete'], 'Equivalent');
    can('read', ['Bom', 'Requirement']);
  }

  if (user.role === 'admin') {
    can(['read', 'update'], 'User');
    can(['read', 'create', 'delete'], 'Invitation');
    can('read', ['Outbox', 'AuditEvent']);
  }

  return build();
}
