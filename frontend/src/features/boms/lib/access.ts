import { subject } from '@casl/ability';
import type { BomDto } from '@understudy/shared-types';
import type { useAppAbility } from '../../../lib/ability';

type Ability = ReturnType<typeof useAppAbility>;

function bomSubject(bom: Pick<BomDto, 'owner' | 'sharedWith'>) {
  return subject('Bom', { ownerId: bom.owner.id, sharedWith: bom.sharedWith.map((p) => p.id) });
}

/** Whether the signed-in person may change the BOM: rename, watch, confirm lines, choose replacements, check again. */
export function canChangeBom(ability: Ability, bom: Pick<BomDto, 'owner' | 'sharedWith'>): boolean {
  return ability.can('update', bomSubject(bom));
}

/** Only the owner may delete (and so share) a BOM; the same rule tells "yours" from "shared with you". */
export function ownsBom(ability: Ability, bom: Pick<BomDto, 'owner' | 'sharedWith'>): boolean {
  return ability.can('delete', bomSubject(bom));
}
