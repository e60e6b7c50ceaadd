import type { Role } from '@understudy/shared-types';

/** Demo-only accounts; the seed refuses to run in production. */
export const DEMO_PASSWORD = 'understudy-demo';

export const DEMO_USERS: { email: string; name: string; role: Role }[] = [
  { email: 'viewer@understudy.test', name: 'Wren Okafor', role: 'viewer' },
  { email: 'editor@understudy.test', name: 'Tomasz Lindqvist', role: 'editor' },
  { email: 'admin@understudy.test', name: 'Imogen Bastable', role: 'admin' },
];
