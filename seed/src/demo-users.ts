import type { Role } from '@understudy/shared-types';

/** Demo-only accounts; the seed refuses to run in production. */
export const DEMO_PASSWORD = 'understudy-demo';

export const DEMO_USERS: { email: string; name: string; role: Role }[] = [
  { email: 'viewer@understudy.test', name: 'Wren Okafor', role: 'viewer' },
  // Buys the parts: checks each build's BOM before ordering (a viewer, like every purchaser).
  { email: 'purchaser@understudy.test', name: 'Dagny Achterberg', role: 'viewer' },
  { email: 'editor@understudy.test', name: 'Tomasz Lindqvist', role: 'editor' },
  { email: 'admin@understudy.test', name: 'Imogen Bastable', role: 'admin' },
];
