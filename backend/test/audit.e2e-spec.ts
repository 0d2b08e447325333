import type { AuditEntryDto, AuthResponse, Page, PossibleCauseRowDto } from '@causeway/shared';
import { AuditService } from '../src/audit/audit.service';
import { bearer, createTestApp, registerMember, registerOwner, setRole, type TestApp } from './utils/test-app';

/**
 * Moderators' direct edits of the knowledge base and the audit log (issue 6). The rules
 * checked: priors are probabilities (0–1) and per code and scope sum to at most 1, the rest
 * being "a cause not listed" (product.md §2); money is non-negative integer minor units
 * (product.md "Money"); every edit and its audit entry are written together or not at all.
 */
describe('direct edits and the audit log (e2e)', () => {
  let t: TestApp;
  let owner: AuthResponse;
  let contributor: AuthResponse;
  let moderator: AuthResponse;
  let admin: AuthResponse;

  const audit = async (query: Record<string, string | number>, who: AuthResponse = admin) =>
    (await t.http().get('/api/admin/audit').query(query).set(...bearer(who)).expect(200)).body as Page<AuditEntryDto>;
  const causesOf = async (code: string) => (await t.http().get('/api/causes').query({ code }).set(...bearer(owner)).expect(200)).body as PossibleCauseRowDto[];

  const cause = (over: Record<string, unknown> = {}) => ({ code: 'P0456', partKey: 'qa-cap', prior: 0.5, partCostMinor: 2200, currency: 'GBP', replaceHours: 0.1, ...over });

  beforeAll(async () => {
    t = await createTestApp();
    owner = await registerOwner(t);
    contributor = await registerMember(t, owner, 'contributor');
    moderator = await registerOwner(t);
    await setRole(t, moderator.user.id, 'moderator');
    admin = await registerOwner(t);
    await setRole(t, admin.user.id, 'admin');
    for (const [key, name, system] of [
      ['qa-cap', 'QA filler cap', 'fuel'],
      ['qa-vent', 'QA vent valve', 'evap'],
      ['qa-purge', 'QA purge valve', 'evap'],
    ]) {
      await t.http().post('/api/knowledge/parts').set(...bearer(moderator)).send({ key, name, system }).expect(201);
    }
  });
  afterAll(() => t.close());

  it('only moderators and admins edit the knowledge base; only admins read the log', async () => {
    await t.http().post('/api/knowledge/parts').set(...bearer(contributor)).send({ key: 'qa-x', name: 'X', system: 'fuel' }).expect(403);
    await t.http().patch('/api/knowledge/codes/P0456').set(...bearer(owner)).send({ title: 'x' }).expect(403);
    await t.http().get('/api/admin/audit').set(...bearer(moderator)).expect(403);
    await t.http().get('/api/admin/audit').expect(401);
  });

  it('creating a part is audited with who, what and the new values', async () => {
    const page = await audit({ entityType: 'part', entityId: 'qa-vent' });
    expect(page.total).toBe(1);
    expect(page.items[0]).toMatchObject({ action: 'part.create', actorId: moderator.user.id, actorEmail: moderator.user.email, before: null, after: { key: 'qa-vent', name: 'QA vent valve', system: 'evap' } });
    expect(Date.parse(page.items[0].at)).not.toBeNaN();
    const dup = await t.http().post('/api/knowledge/parts').set(...bearer(moderator)).send({ key: 'qa-vent', name: 'again', system: 'evap' }).expect(409);
    expect(dup.body.errors[0].field).toBe('key');
  });

  it('a prior outside 0–1 or a negative cost is a 400 naming the field, and nothing is written', async () => {
    // product.md §2: w_i are probabilities; product.md "Money": non-negative integer minor units.
    const before = (await audit({ entityType: 'possible-cause' })).total;
    const prior = await t.http().post('/api/knowledge/causes').set(...bearer(moderator)).send(cause({ prior: 1.2 })).expect(400);
    expect(prior.body.errors).toEqual([{ field: 'prior', message: 'must be a number between 0 and 1' }]);
    const negative = await t.http().post('/api/knowledge/causes').set(...bearer(moderator)).send(cause({ partCostMinor: -5, replaceHours: -1 })).expect(400);
    expect(negative.body.errors.map((e: { field: string }) => e.field).sort()).toEqual(['partCostMinor', 'replaceHours']);
    const money = await t.http().post('/api/knowledge/causes').set(...bearer(moderator)).send(cause({ partCostMinor: 22.5, currency: 'XYZ' })).expect(400);
    expect(money.body.errors.map((e: { field: string }) => e.field).sort()).toEqual(['currency', 'partCostMinor']);
    const code = await t.http().post('/api/knowledge/causes').set(...bearer(moderator)).send(cause({ code: 'P0X56' })).expect(400);
    expect(code.body.errors[0].field).toBe('code');
    expect(await causesOf('P0456')).toEqual([]);
    expect((await audit({ entityType: 'possible-cause' })).total).toBe(before);
  });

  it('the priors of one code and scope may sum to at most 1 (the rest is a cause not listed)', async () => {
    const a = await t.http().post('/api/knowledge/causes').set(...bearer(moderator)).send(cause({ prior: 0.6 })).expect(201);
    expect(a.body).toMatchObject({ code: 'P0456', partKey: 'qa-cap', partName: 'QA filler cap', prior: 0.6, check: null, make: null });
    await t.http().post('/api/knowledge/causes').set(...bearer(moderator)).send(cause({ partKey: 'qa-vent', prior: 0.3, check: { description: 'Vacuum-test the valve on the bench', hours: 0.3, mustPrecede: false } })).expect(201);
    // 0.6 + 0.3 + 0.2 = 1.1 > 1 (product.md §2: the weights sum to at most 1).
    const over = await t.http().post('/api/knowledge/causes').set(...bearer(moderator)).send(cause({ partKey: 'qa-purge', prior: 0.2 })).expect(400);
    expect(over.body.errors).toHaveLength(1);
    expect(over.body.errors[0].field).toBe('prior');
    expect(over.body.errors[0].message).toContain('sum to 1.1');
    // The same part for a vehicle scope is another list, with its own sum.
    const scoped = await t.http().post('/api/knowledge/causes').set(...bearer(moderator)).send(cause({ partKey: 'qa-purge', prior: 0.2, make: 'Quillon' })).expect(201);
    expect(scoped.body.make).toBe('Quillon');
    const dup = await t.http().post('/api/knowledge/causes').set(...bearer(moderator)).send(cause({ prior: 0.05 })).expect(409);
    expect(dup.body.errors[0].field).toBe('partKey');
    // Raising an existing prior is held to the same sum.
    const raise = await t.http().patch(`/api/knowledge/causes/${a.body.id}`).set(...bearer(moderator)).send({ prior: 0.8 }).expect(400);
    expect(raise.body.errors[0].field).toBe('prior');
    const nulled = await t.http().patch(`/api/knowledge/causes/${a.body.id}`).set(...bearer(moderator)).send({ prior: null }).expect(400);
    expect(nulled.body.errors[0].field).toBe('prior');
  });

  it('an update is audited with only the fields that changed, before and after', async () => {
    const [row] = (await causesOf('P0456')).filter((c) => c.partKey === 'qa-cap' && c.make === null);
    const res = await t.http().patch(`/api/knowledge/causes/${row.id}`).set(...bearer(moderator)).send({ prior: 0.55, partCostMinor: 2400 }).expect(200);
    expect(res.body).toMatchObject({ prior: 0.55, partCostMinor: 2400 });
    const page = await audit({ entityType: 'possible-cause', entityId: row.id, action: 'cause.update' });
    expect(page.total).toBe(1);
    expect(page.items[0].before).toEqual({ prior: 0.6, partCostMinor: 2200 });
    expect(page.items[0].after).toEqual({ prior: 0.55, partCostMinor: 2400 });
  });

  it('a teardown serves only causes within its vehicle scope', async () => {
    await t.http().post('/api/knowledge/teardowns').set(...bearer(moderator)).send({ key: 'qa-quillon-tank-drop', name: 'Lower the fuel tank', hours: 2.5, make: 'Quillon', cautions: ['fuel-vapour', 'lifted-vehicle'] }).expect(201);
    const bad = await t.http().post('/api/knowledge/teardowns').set(...bearer(moderator)).send({ key: 'qa-bad', name: 'x', hours: 1, cautions: ['not-a-caution'] }).expect(400);
    expect(bad.body.errors[0].field).toBe('cautions.0');
    const [generic] = (await causesOf('P0456')).filter((c) => c.partKey === 'qa-vent');
    const notCovered = await t.http().patch(`/api/knowledge/causes/${generic.id}`).set(...bearer(moderator)).send({ teardownKey: 'qa-quillon-tank-drop' }).expect(400);
    expect(notCovered.body.errors[0].field).toBe('teardownKey');
    const [scoped] = (await causesOf('P0456')).filter((c) => c.make === 'Quillon');
    await t.http().patch(`/api/knowledge/causes/${scoped.id}`).set(...bearer(moderator)).send({ teardownKey: 'qa-quillon-tank-drop' }).expect(200);
    // Widening is fine; narrowing below a cause that uses it is not.
    const narrow = await t.http().patch('/api/knowledge/teardowns/qa-quillon-tank-drop').set(...bearer(moderator)).send({ model: 'Ferro' }).expect(400);
    expect(narrow.body.errors[0].field).toBe('make');
    const renamed = await t.http().patch('/api/knowledge/teardowns/qa-quillon-tank-drop').set(...bearer(moderator)).send({ hours: 2.2 }).expect(200);
    expect(renamed.body.hours).toBe(2.2);
    const entry = (await audit({ entityType: 'teardown', action: 'teardown.update' })).items[0];
    expect(entry).toMatchObject({ before: { hours: 2.5 }, after: { hours: 2.2 } });
  });

  it('edits a code entry and audits it', async () => {
    const res = await t.http().patch('/api/knowledge/codes/p0456').set(...bearer(moderator)).send({ title: 'Evaporative emission system: very small leak detected', symptoms: ['Check-engine lamp on'], escalation: null }).expect(200);
    expect(res.body).toMatchObject({ code: 'P0456', title: 'Evaporative emission system: very small leak detected', symptoms: ['Check-engine lamp on'], escalation: null });
    const entry = (await audit({ entityType: 'dtc-code', entityId: 'P0456' })).items[0];
    expect(entry.action).toBe('code.update');
    expect((entry.after as { title: string }).title).toBe('Evaporative emission system: very small leak detected');
    expect(entry.before).toHaveProperty('title');
    const bad = await t.http().patch('/api/knowledge/codes/P0456').set(...bearer(moderator)).send({ title: '', cautions: ['nope'] }).expect(400);
    expect(bad.body.errors.map((e: { field: string }) => e.field)).toContain('title');
    await t.http().patch('/api/knowledge/codes/P0456').set(...bearer(moderator)).query({ make: 'Nomake' }).send({ title: 'x' }).expect(404);
  });

  it('deleting a cause is audited with what was removed', async () => {
    const [scoped] = (await causesOf('P0456')).filter((c) => c.make === 'Quillon');
    await t.http().delete(`/api/knowledge/causes/${scoped.id}`).set(...bearer(moderator)).expect(204);
    await t.http().delete(`/api/knowledge/causes/${scoped.id}`).set(...bearer(moderator)).expect(404);
    const entry = (await audit({ entityId: scoped.id, action: 'cause.delete' })).items[0];
    expect(entry.before).toMatchObject({ partKey: 'qa-purge', make: 'Quillon', prior: 0.2 });
    expect(entry.after).toBeNull();
  });

  it('the audit entry exists if and only if the change does', async () => {
    const [row] = (await causesOf('P0456')).filter((c) => c.partKey === 'qa-vent');
    const entriesBefore = (await audit({ entityId: row.id })).total;
    const service = t.app.get(AuditService);
    const spy = jest.spyOn(service, 'record').mockRejectedValueOnce(new Error('disk full (simulated)'));
    try {
      await t.http().patch(`/api/knowledge/causes/${row.id}`).set(...bearer(moderator)).send({ replaceHours: 3 }).expect(500);
    } finally {
      spy.mockRestore();
    }
    const [after] = (await causesOf('P0456')).filter((c) => c.partKey === 'qa-vent');
    expect(after.replaceHours).toBe(row.replaceHours);
    expect((await audit({ entityId: row.id })).total).toBe(entriesBefore);
  });

  it('admins browse the log with filters and pages', async () => {
    const all = await audit({ pageSize: 100 });
    expect(all.total).toBeGreaterThanOrEqual(10);
    // Newest first.
    const times = all.items.map((e) => Date.parse(e.at));
    expect([...times].sort((a, b) => b - a)).toEqual(times);
    const byPrefix = await audit({ action: 'cause.', pageSize: 100 });
    expect(byPrefix.items.length).toBeGreaterThan(0);
    expect(byPrefix.items.every((e) => e.action.startsWith('cause.'))).toBe(true);
    const byActor = await audit({ actor: moderator.user.email.split('@')[0], pageSize: 100 });
    expect(byActor.total).toBe(all.total);
    expect((await audit({ actor: contributor.user.id })).total).toBe(0);
    const paged = await audit({ page: 2, pageSize: 3 });
    expect(paged.items).toHaveLength(3);
    expect(paged.items[0].id).toBe(all.items[3].id);
    const tomorrow = new Date(Date.now() + 86_400_000).toISOString().slice(0, 10);
    expect((await audit({ from: tomorrow })).total).toBe(0);
    expect((await audit({ to: tomorrow })).total).toBe(all.total);
    const bad = await t.http().get('/api/admin/audit').query({ from: 'yesterday', pageSize: 500 }).set(...bearer(admin)).expect(400);
    expect(bad.body.errors.map((e: { field: string }) => e.field).sort()).toEqual(['from', 'pageSize']);
  });
});
