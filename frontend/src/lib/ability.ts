import { AbilityProvider, Can as CaslCan, useAbility, type CanProps } from '@casl/react';
import type { AppAbility } from '@understudy/shared-types';
import type { ReactNode } from 'react';

/** The ability of the signed-in person; rules come from shared-types, so the UI hides exactly what the API refuses. */
export function useAppAbility(): AppAbility {
  return useAbility<AppAbility>();
}

/** `<Can I="read" a="User">` typed against our actions and subjects. */
export const Can = CaslCan as (props: CanProps<AppAbility>) => ReactNode;

export { AbilityProvider };
