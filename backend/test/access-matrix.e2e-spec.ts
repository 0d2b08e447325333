import { randomUUID } from 'node:crypto';
import type { AuthResponse, Role } from '@causeway/shared';
import { discoverRoutes, type DiscoveredRoute } from './utils/routes';
import { bearer, createTestApp, registerMember, registerOwner, setRole, type TestApp } from './utils/test-app';

/**
 * The access decision of every route, as the README's role table states it. A route the
 * application serves that is missing here fails the suite: adding a route means deciding
 * who may use it. `technician` = any signed-in account; `shop-owner` = the owner of the
 * caller's shop (admins too).
 */
type Access = 'public' | Role | 'shop-owner';
const POLICY: Record<string, Access> = {
  'GET /api/health': 'public',
  'GET /api/dtc/decode': 'public',
  'POST /api/auth/login': 'public',
  'POST /api/auth/register': 'public',
  'GET /api/public/estimates/:token': 'public',
  'POST /api/public/estimates/:token/answers': 'public',

  'POST /api/auth/change-password': 'technician',
  'GET /api/me': 'technician',
  'GET /api/shops/mine': 'technician',
  'GET /api/codes': 'technician',
  'GET /api/codes/index': 'technician',
  'GET /api/codes/:code': 'technician',
  'GET /api/codes/:code/causes': 'technician',
  'GET /api/codes/:code/fix-path': 'technician',
  'POST /api/fix-paths': 'technician',
  'GET /api/parts': 'technician',
  'GET /api/teardowns': 'technician',
  'GET /api/causes': 'technician',
  'GET /api/exchange-rates': 'technician',
  'GET /api/vehicles': 'technician',
  'POST /api/vehicles': 'technician',
  'GET /api/vehicles/:id': 'technician',
  'PATCH /api/vehicles/:id': 'technician',
  'DELETE /api/vehicles/:id': 'technician',
  'GET /api/jobs': 'technician',
  'POST /api/jobs': 'technician',
  'GET /api/jobs/:id': 'technician',
  'POST /api/jobs/:id/steps': 'technician',
  'POST /api/jobs/:id/close': 'technician',
  'GET /api/jobs/:jobId/estimates': 'technician',
  'POST /api/jobs/:jobId/estimates': 'technician',
  'GET /api/jobs/:jobId/estimates/:estimateId': 'technician',
  'POST /api/jobs/:jobId/estimates/:estimateId/send': 'technician',
  'GET /api/imports': 'technician',
  'POST /api/imports': 'technician',
  'GET /api/imports/:id': 'technician',
  'GET /api/imports/mappings': 'technician',
  'POST /api/imports/mappings': 'technician',
  'DELETE /api/imports/mappings/:id': 'technician',

  'GET /api/field-reports': 'contributor',
  'POST /api/field-reports': 'contributor',
  'GET /api/field-reports/:id': 'contributor',
  'PATCH /api/field-reports/:id': 'contributor',
  'POST /api/field-reports/:id/attachments': 'contributor',
  'GET /api/field-reports/:id/attachments/:attachmentId': 'contributor',
  'DELETE /api/field-reports/:id/attachments/:attachmentId': 'contributor',
  'POST /api/field-reports/:id/submit': 'contributor',
  'POST /api/field-reports/:id/withdraw': 'contributor',

  'GET /api/review/reports': 'moderator',
  'GET /api/review/reports/:id': 'moderator',
  'POST /api/review/reports/:id/approve': 'moderator',
  'POST /api/review/reports/:id/reject': 'moderator',
  'PATCH /api/knowledge/codes/:code': 'moderator',
  'POST /api/knowledge/parts': 'moderator',
  'PATCH /api/knowledge/parts/:key': 'moderator',
  'POST /api/knowledge/teardowns': 'moderator',
  'PATCH /api/knowledge/teardowns/:key': 'moderator',
  'POST /api/knowledge/causes': 'moderator',
  'PATCH /api/knowledge/causes/:id': 'moderator',
  'DELETE /api/knowledge/causes/:id': 'moderator',

  'GET /api/admin/users': 'admin',
  'PATCH /api/admin/users/:id': 'admin',
  'GET /api/admin/audit': 'admin',
  'POST /api/codes/import': 'admin',

  'PATCH /api/shops/mine': 'shop-owner',
  'GET /api/shops/mine/invites': 'shop-owner',
  'POST /api/shops/mine/invites': 'shop-owner',
  'GET /api/shops/mine/members': 'shop-owner',
  'GET /api/insights': 'shop-owner',
};

type Caller = 'anonymous' | 'technician' | 'contributor' | 'moderator' | 'admin' | 'owner';
const RANK: Record<Exclude<Caller, 'anonymous' | 'owner'>, number> = { technician: 0, contributor: 1, moderator: 2, admin: 3 };

function allowed(access: Access, caller: Caller): boolean {
  if (access === 'public') return true;
  if (caller === 'anonymous') return false;
  if (access === 'shop-owner') return caller === 'owner' || caller === 'admin';
  const rank = caller === 'owner' ? 0 : RANK[caller];
  return rank >= RANK[access];
}

function declared(route: DiscoveredRoute): Access {
  if (route.isPublic) return 'public';
  if (route.shopOwner) return 'shop-owner';
  return route.minimumRole ?? 'technician';
}

/** A concrete URL for a route pattern: ids that exist nowhere, a valid code, an unknown key. */
function concrete(path: string): string {
  return path
    .replace(':code', 'P0456')
    .replace(':token', 'A'.repeat(43))
    .replace(':key', 'no-such-key')
    .replace(/:[A-Za-z]+/g, () => randomUUID());
}

describe('access matrix: every route, every role (e2e)', () => {
  let t: TestApp;
  let routes: DiscoveredRoute[];
  const tokens: Partial<Record<Caller, string>> = {};

  beforeAll(async () => {
    t = await createTestApp({ PUBLIC_THROTTLE_LIMIT: '10000' });
    routes = discoverRoutes(t.app);
    const owner = await registerOwner(t);
    tokens.owner = owner.accessToken;
    const member = async (role: Role): Promise<AuthResponse> => {
      const m = await registerMember(t, owner, role === 'technician' ? 'technician' : 'contributor');
      if (role !== 'technician' && role !== 'contributor') await setRole(t, m.user.id, role);
      return m;
    };
    for (const role of ['technician', 'contributor', 'moderator', 'admin'] as const) tokens[role] = (await member(role)).accessToken;
  });
  afterAll(() => t.close());

  it('every route the application serves has an access decision, and its guards state that decision', () => {
    const served = routes.map((r) => `${r.method} ${r.path}`);
    expect(served.filter((k) => !(k in POLICY))).toEqual([]);
    expect(Object.keys(POLICY).filter((k) => !served.includes(k))).toEqual([]);
    const mismatched = routes.filter((r) => declared(r) !== POLICY[`${r.method} ${r.path}`]).map((r) => `${r.method} ${r.path}: guards say ${declared(r)}, policy says ${POLICY[`${r.method} ${r.path}`]}`);
    expect(mismatched).toEqual([]);
  });

  it('every caller gets exactly the access the policy gives, on every route', async () => {
    const wrong: string[] = [];
    for (const route of routes) {
      const access = POLICY[`${route.method} ${route.path}`];
      for (const caller of ['anonymous', 'technician', 'contributor', 'moderator', 'admin', 'owner'] as const) {
        const url = concrete(route.path);
        let req = t.http()[route.method.toLowerCase() as 'get' | 'post' | 'patch' | 'delete'](url);
        if (caller !== 'anonymous') req = req.set(...bearer(tokens[caller]!));
        if (route.method !== 'GET' && route.method !== 'DELETE') req = req.send({});
        const res = await req;
        const denied = res.status === 401 || res.status === 403;
        const expectAllowed = allowed(access, caller);
        if (res.status >= 500) wrong.push(`${caller} ${route.method} ${url}: ${res.status} ${JSON.stringify(res.body)}`);
        else if (expectAllowed && denied) wrong.push(`${caller} ${route.method} ${route.path}: denied with ${res.status} (${res.body.message})`);
        else if (!expectAllowed && res.status !== (caller === 'anonymous' ? 401 : 403)) wrong.push(`${caller} ${route.method} ${route.path}: expected ${caller === 'anonymous' ? 401 : 403}, got ${res.status}`);
      }
    }
    expect(wrong).toEqual([]);
  });
});
