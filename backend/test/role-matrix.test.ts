import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '@understudy/shared-types';
import { createTestContext, type TestContext } from './context';
import { listRoutes } from './list-routes';

/**
 * Who may call every API route. The first test fails when a route is registered without an entry
 * here, so nobody adds a route and forgets to decide (and test) who may use it.
 *   'public'   — anyone, signed in or not
 *   'signedIn' — any signed-in role
 *   Role[]     — only these roles; others get 403, signed-out callers 401
 */
type Access = 'public' | 'signedIn' | Role[];

const ADMIN: Role[] = ['admin'];
const EDITORS: Role[] = ['editor', 'admin'];

export const ROUTE_ACCESS: Record<string, Access> = {
  'GET /api/health': 'public',
  'POST /api/auth/sign-in': 'public',
  'POST /api/auth/sign-out': 'public',
  'GET /api/auth/me': 'signedIn',
  'GET /api/users': ADMIN,
  'PATCH /api/users/:id': ADMIN,
  'GET /api/invitations': ADMIN,
  'POST /api/invitations': ADMIN,
  'DELETE /api/invitations/:id': ADMIN,
  'GET /api/invitations/preview': 'public',
  'POST /api/invitations/accept': 'public',
  'POST /api/password-resets': 'public',
  'POST /api/password-resets/complete': 'public',
  'GET /api/audit-events': ADMIN,
  'GET /api/outbox': ADMIN,
  'GET /api/families': 'signedIn',
  'GET /api/manufacturers': 'signedIn',
  'GET /api/parts': 'signedIn',
  'GET /api/parts/export': 'signedIn',
  'POST /api/parts/import': EDITORS,
  'POST /api/parts': EDITORS,
  'GET /api/parts/:id': 'signedIn',
  'PATCH /api/parts/:id': EDITORS,
  'DELETE /api/parts/:id': EDITORS,
  'POST /api/parts/:id/restore': EDITORS,
  'GET /api/parts/:id/revisions': 'signedIn',
  'GET /api/datasheets': 'signedIn',
  'POST /api/datasheets': EDITORS,
  'GET /api/datasheets/:id': 'signedIn',
  'GET /api/datasheets/:id/file': 'signedIn',
  'PATCH /api/datasheets/:id/proposals/:proposalId': EDITORS,
  'POST /api/datasheets/:id/apply': EDITORS,
  'POST /api/datasheets/:id/retry': EDITORS,
  'GET /api/parts/:id/alternates': 'signedIn',
  'POST /api/alternates/rank': 'signedIn',
  'GET /api/parts/:id/equivalents': 'signedIn',
  'POST /api/equivalents': EDITORS,
  'PATCH /api/equivalents/:id': EDITORS,
  'DELETE /api/equivalents/:id': EDITORS,
  'GET /api/requirement-sets': 'signedIn',
  'POST /api/requirement-sets': 'signedIn',
  'GET /api/requirement-sets/:id': 'signedIn',
  'PATCH /api/requirement-sets/:id': 'signedIn',
  'DELETE /api/requirement-sets/:id': 'signedIn',
  'GET /api/requirement-sets/:id/results': 'signedIn',
  'POST /api/boms/preview': 'signedIn',
  'POST /api/boms': 'signedIn',
  'GET /api/boms': 'signedIn',
  'GET /api/boms/colleagues': 'signedIn',
  'GET /api/boms/:id': 'signedIn',
  'PATCH /api/boms/:id': 'signedIn',
  'DELETE /api/boms/:id': 'signedIn',
  'PUT /api/boms/:id/shares': 'signedIn',
  'POST /api/boms/:id/check': 'signedIn',
  'PATCH /api/boms/:id/lines/:lineId': 'signedIn',
  'GET /api/boms/:id/lines/:lineId/options': 'signedIn',
  'GET /api/boms/:id/export.csv': 'signedIn',
  // Everyone has their own notices and alert preference; another person's notice answers 404, not 403.
  'GET /api/notifications': 'signedIn',
  'POST /api/notifications/read-all': 'signedIn',
  'POST /api/notifications/:id/read': 'signedIn',
  'GET /api/me/alert-preferences': 'signedIn',
  'PUT /api/me/alert-preferences': 'signedIn',
};

const SAMPLE_ID = '00000000-0000-4000-8000-000000000000';
const ROLES: Role[] = ['viewer', 'editor', 'admin'];

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(() => ctx.close());

function call(agent: ReturnType<typeof request.agent> | ReturnType<typeof request>, route: string) {
  const [method, path] = route.split(' ') as [string, string];
  const url = path.replace(/:id\b/g, SAMPLE_ID);
  const m = method.toLowerCase() as 'get' | 'post' | 'patch' | 'put' | 'delete';
  return (agent as ReturnType<typeof request>)[m](url).send({});
}

describe('role matrix', () => {
  it('has an access rule for every registered API route, and no stale ones', () => {
    const registered = listRoutes(ctx.app);
    expect(registered.length).toBeGreaterThan(10);
    expect(registered.filter((r) => !(r in ROUTE_ACCESS))).toEqual([]);
    expect(Object.keys(ROUTE_ACCESS).filter((r) => !registered.includes(r))).toEqual([]);
  });

  for (const [route, access] of Object.entries(ROUTE_ACCESS)) {
    it(`${route} — ${Array.isArray(access) ? access.join('/') + ' only' : access}`, async () => {
      const anonymous = await call(request(ctx.app), route);
      if (access === 'public') expect([401, 403]).not.toContain(anonymous.status);
      else expect(anonymous.status).toBe(401);

      for (const role of ROLES) {
        const { agent } = await ctx.agentFor(role);
        const res = await call(agent, route);
        const allowed = access === 'public' || access === 'signedIn' || access.includes(role);
        if (allowed) expect([401, 403], `${role} should pass ${route}, got ${res.status}`).not.toContain(res.status);
        else expect(res.status, `${role} should be refused ${route}`).toBe(403);
      }
    });
  }
});
