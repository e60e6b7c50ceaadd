import { subject } from '@casl/ability';
import { describe, expect, it } from 'vitest';
import { defineAbilityFor } from './abilities';

const viewer = { id: 'u-viewer', role: 'viewer' as const };
const editor = { id: 'u-editor', role: 'editor' as const };
const admin = { id: 'u-admin', role: 'admin' as const };

describe('defineAbilityFor', () => {
  it('grants nothing to a signed-out visitor', () => {
    const ability = defineAbilityFor(null);
    expect(ability.can('read', 'Part')).toBe(false);
    expect(ability.rules).toHaveLength(0);
  });

  it('lets a viewer read the catalog but not change it', () => {
    const ability = defineAbilityFor(viewer);
    expect(ability.can('read', 'Part')).toBe(true);
    expect(ability.can('read', 'Datasheet')).toBe(true);
    expect(ability.can('create', 'Part')).toBe(false);
    expect(ability.can('update', 'Part')).toBe(false);
    expect(ability.can('review', 'Datasheet')).toBe(false);
    expect(ability.can('read', 'User')).toBe(false);
  });

  it('limits a viewer to their own BOMs and those shared with them', () => {
    const ability = defineAbilityFor(viewer);
    expect(ability.can('update', subject('Bom', { ownerId: 'u-viewer', sharedWith: [] }))).toBe(true);
    expect(ability.can('read', subject('Bom', { ownerId: 'someone', sharedWith: [] }))).toBe(false);
    expect(ability.can('read', subject('Bom', { ownerId: 'someone', sharedWith: ['u-viewer'] }))).toBe(true);
    expect(ability.can('update', subject('Bom', { ownerId: 'someone', sharedWith: ['u-viewer'] }))).toBe(false);
  });

  it('lets each person read and mark only their own BOM alerts', () => {
    for (const user of [viewer, editor, admin]) {
      const ability = defineAbilityFor(user);
      expect(ability.can('update', subject('Notification', { userId: user.id }))).toBe(true);
      expect(ability.can('read', subject('Notification', { userId: 'someone-else' }))).toBe(false);
    }
  });

  it('lets an editor curate parts, datasheets and equivalents, but not people', () => {
    const ability = defineAbilityFor(editor);
    expect(ability.can('create', 'Part')).toBe(true);
    expect(ability.can('archive', 'Part')).toBe(true);
    expect(ability.can('review', 'Datasheet')).toBe(true);
    expect(ability.can('create', 'Equivalent')).toBe(true);
    expect(ability.can('read', subject('Bom', { ownerId: 'someone', sharedWith: [] }))).toBe(true);
    expect(ability.can('read', 'User')).toBe(false);
    expect(ability.can('create', 'Invitation')).toBe(false);
  });

  it('lets an admin manage people and read the outbox', () => {
    const ability = defineAbilityFor(admin);
    expect(ability.can('update', 'User')).toBe(true);
    expect(ability.can('create', 'Invitation')).toBe(true);
    expect(ability.can('read', 'Outbox')).toBe(true);
    expect(ability.can('create', 'Part')).toBe(true);
  });
});
