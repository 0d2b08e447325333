import { JwtService } from '@nestjs/jwt';
import { PASSWORD_RULE } from '@causeway/shared';
import { bearer, createTestApp, GOOD_PASSWORD, KESTREL_SHOP, registerMember, registerOwner, setRole, uniqueEmail, type TestApp } from './utils/test-app';

describe('accounts, sign-in and shops (e2e)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('health is public', async () => {
    const res = await t.http().get('/api/health').expect(200);
    expect(res.body).toMatchObject({ status: 'ok', database: 'ok' });
  });

  it('every other route needs a token', async () => {
    await t.http().get('/api/me').expect(401);
    await t.http().get('/api/shops/mine').expect(401);
    await t.http().get('/api/admin/users').expect(401);
  });

  it('registers a shop owner with a new shop and signs in', async () => {
    const email = uniqueEmail('Mixed.Case');
    const reg = await t.http().post('/api/auth/register').send({ email, password: GOOD_PASSWORD, displayName: 'Ann', shop: KESTREL_SHOP }).expect(201);
    expect(reg.body.user).toMatchObject({ email, role: 'technician', shopOwner: true, shop: { name: 'Test Garage', currency: 'GBP', labourRateMinor: 9500, taxRateBp: 2000, distanceUnit: 'mi' } });
    expect(reg.body.accessToken).toEqual(expect.any(String));
    expect(reg.body).not.toHaveProperty('user.passwordHash');
    // E-mail is unique regardless of case.
    const login = await t.http().post('/api/auth/login').send({ email: email.toUpperCase(), password: GOOD_PASSWORD }).expect(200);
    const me = await t.http().get('/api/me').set(...bearer(login.body.accessToken)).expect(200);
    expect(me.body.email).toBe(email);
  });

  it('a duplicate e-mail is a 409 naming the field', async () => {
    const email = uniqueEmail();
    await t.http().post('/api/auth/register').send({ email, password: GOOD_PASSWORD, displayName: 'A', shop: KESTREL_SHOP }).expect(201);
    const res = await t.http().post('/api/auth/register').send({ email: email.toUpperCase(), password: GOOD_PASSWORD, displayName: 'B', shop: KESTREL_SHOP }).expect(409);
    expect(res.body.errors).toEqual([{ field: 'email', message: 'is already registered' }]);
  });

  it('joins a shop with an invite code, once', async () => {
    const owner = await registerOwner(t);
    const invite = await t.http().post('/api/shops/mine/invites').set(...bearer(owner)).send({ role: 'contributor' }).expect(201);
    expect(invite.body.code).toMatch(/^[0-9A-Z]{4}-[0-9A-Z]{4}-[0-9A-Z]{4}$/);
    const joined = await t.http().post('/api/auth/register').send({ email: uniqueEmail(), password: GOOD_PASSWORD, displayName: 'C', inviteCode: invite.body.code.toLowerCase() }).expect(201);
    expect(joined.body.user).toMatchObject({ role: 'contributor', shopOwner: false, shop: { id: owner.user.shop!.id } });
    const again = await t.http().post('/api/auth/register').send({ email: uniqueEmail(), password: GOOD_PASSWORD, displayName: 'D', inviteCode: invite.body.code }).expect(400);
    expect(again.body.errors[0].field).toBe('inviteCode');
    const members = await t.http().get('/api/shops/mine/members').set(...bearer(owner)).expect(200);
    expect(members.body).toHaveLength(2);
  });

  it('needs exactly one of an invite code and a new shop', async () => {
    const neither = await t.http().post('/api/auth/register').send({ email: uniqueEmail(), password: GOOD_PASSWORD, displayName: 'E' }).expect(400);
    expect(neither.body.errors[0].field).toBe('shop');
  });

  it('wrong password and unknown e-mail get the same answer', async () => {
    const owner = await registerOwner(t);
    const wrong = await t.http().post('/api/auth/login').send({ email: owner.user.email, password: 'not-the-password-1' }).expect(401);
    const unknown = await t.http().post('/api/auth/login').send({ email: uniqueEmail('nobody'), password: 'not-the-password-1' }).expect(401);
    expect(wrong.body).toEqual(unknown.body);
  });

  it('rejects invalid and expired tokens', async () => {
    await t.http().get('/api/me').set('Authorization', 'Bearer not.a.token').expect(401);
    const owner = await registerOwner(t);
    const jwt = t.app.get(JwtService);
    const expired = await jwt.signAsync({ sub: owner.user.id, tv: 0 }, { expiresIn: -10 });
    await t.http().get('/api/me').set('Authorization', `Bearer ${expired}`).expect(401);
    const forged = await new JwtService({ secret: 'another-secret-another-secret-123' }).signAsync({ sub: owner.user.id, tv: 0 });
    await t.http().get('/api/me').set('Authorization', `Bearer ${forged}`).expect(401);
  });

  it('changing the password revokes tokens already issued', async () => {
    const owner = await registerOwner(t);
    const changed = await t.http().post('/api/auth/change-password').set(...bearer(owner)).send({ currentPassword: GOOD_PASSWORD, newPassword: 'a-new-password-7' }).expect(200);
    await t.http().get('/api/me').set(...bearer(owner)).expect(401);
    await t.http().get('/api/me').set(...bearer(changed.body.accessToken)).expect(200);
    await t.http().post('/api/auth/login').send({ email: owner.user.email, password: GOOD_PASSWORD }).expect(401);
    await t.http().post('/api/auth/login').send({ email: owner.user.email, password: 'a-new-password-7' }).expect(200);
  });

  it('a password that breaks the rule is a 400 stating the rule', async () => {
    const res = await t.http().post('/api/auth/register').send({ email: uniqueEmail(), password: 'short', displayName: 'F', shop: KESTREL_SHOP }).expect(400);
    expect(res.body.errors).toContainEqual({ field: 'password', message: `must be ${PASSWORD_RULE}` });
  });

  describe('bad input', () => {
    it('malformed JSON is a 400 naming the body', async () => {
      const res = await t.http().post('/api/auth/login').set('Content-Type', 'application/json').send('{"email": ').expect(400);
      expect(res.body.errors).toEqual([{ field: 'body', message: 'is not valid JSON' }]);
    });

    it('unknown fields, wrong types and over-long strings name each field', async () => {
      const res = await t.http().post('/api/auth/register').send({ email: 42, password: GOOD_PASSWORD, displayName: 'x'.repeat(81), isAdmin: true, shop: { ...KESTREL_SHOP, currency: 'POUNDS', taxRateBp: -1, labourRateMinor: 12.5 } }).expect(400);
      const fields = res.body.errors.map((e: { field: string }) => e.field);
      expect(fields).toEqual(expect.arrayContaining(['email', 'displayName', 'isAdmin', 'shop.currency', 'shop.taxRateBp', 'shop.labourRateMinor']));
    });

    it('nothing is half-written when registration fails', async () => {
      const email = uniqueEmail();
      await t.http().post('/api/auth/register').send({ email, password: GOOD_PASSWORD, displayName: 'G', inviteCode: 'ZZZZ-ZZZZ-ZZZZ' }).expect(400);
      await t.http().post('/api/auth/login').send({ email, password: GOOD_PASSWORD }).expect(401);
    });
  });

  describe('roles', () => {
    it('shop settings: owners edit, members read, validation names fields', async () => {
      const owner = await registerOwner(t);
      const tech = await registerMember(t, owner, 'technician');
      await t.http().get('/api/shops/mine').set(...bearer(tech)).expect(200);
      await t.http().patch('/api/shops/mine').set(...bearer(tech)).send({ ...KESTREL_SHOP, name: 'Hijack' }).expect(403);
      await t.http().post('/api/shops/mine/invites').set(...bearer(tech)).send({ role: 'technician' }).expect(403);
      const ok = await t.http().patch('/api/shops/mine').set(...bearer(owner)).send({ ...KESTREL_SHOP, labourRateMinor: 11000 }).expect(200);
      expect(ok.body.labourRateMinor).toBe(11000);
      const bad = await t.http().patch('/api/shops/mine').set(...bearer(owner)).send({ ...KESTREL_SHOP, taxRateBp: 10001, distanceUnit: 'furlong', locale: 'xx-!!' }).expect(400);
      expect(bad.body.errors.map((e: { field: string }) => e.field)).toEqual(expect.arrayContaining(['taxRateBp', 'distanceUnit', 'locale']));
      // A shop owner cannot invite a moderator or an admin.
      await t.http().post('/api/shops/mine/invites').set(...bearer(owner)).send({ role: 'admin' }).expect(400);
    });

    it('only admins list users, change roles and disable accounts; disabling revokes tokens', async () => {
      const owner = await registerOwner(t);
      const admin = await registerOwner(t);
      await t.http().get('/api/admin/users').set(...bearer(owner)).expect(403);
      await setRole(t, admin.user.id, 'moderator');
      await t.http().get('/api/admin/users').set(...bearer(admin)).expect(403);
      await setRole(t, admin.user.id, 'admin');
      const list = await t.http().get('/api/admin/users?pageSize=2&sort=email&order=asc').set(...bearer(admin)).expect(200);
      expect(list.body.items).toHaveLength(2);
      expect(list.body.total).toBeGreaterThan(2);
      const search = await t.http().get(`/api/admin/users?q=${encodeURIComponent(owner.user.email)}`).set(...bearer(admin)).expect(200);
      expect(search.body.items.map((u: { id: string }) => u.id)).toEqual([owner.user.id]);
      await t.http().get('/api/admin/users?pageSize=1000').set(...bearer(admin)).expect(400);
      const promoted = await t.http().patch(`/api/admin/users/${owner.user.id}`).set(...bearer(admin)).send({ role: 'moderator' }).expect(200);
      expect(promoted.body.role).toBe('moderator');
      await t.http().patch(`/api/admin/users/${owner.user.id}`).set(...bearer(admin)).send({ role: 'superuser' }).expect(400);
      await t.http().patch(`/api/admin/users/${owner.user.id}`).set(...bearer(admin)).send({ disabled: true }).expect(200);
      await t.http().get('/api/me').set(...bearer(owner)).expect(401);
      const login = await t.http().post('/api/auth/login').send({ email: owner.user.email, password: GOOD_PASSWORD }).expect(403);
      expect(login.body.message).toMatch(/disabled/);
      await t.http().patch(`/api/admin/users/${admin.user.id}`).set(...bearer(admin)).send({ disabled: true }).expect(400);
    });
  });

  it('lists every route in the OpenAPI document', async () => {
    const res = await t.http().get('/api/docs/json').expect(200);
    expect(Object.keys(res.body.paths)).toEqual(expect.arrayContaining(['/api/auth/login', '/api/auth/register', '/api/me', '/api/shops/mine', '/api/admin/users', '/api/health']));
  });
});
