import type { AuthResponse, FieldReportDto, FieldReportSummaryDto, Page } from '@causeway/shared';
import { bearer, createTestApp, registerMember, registerOwner, setRole, type TestApp } from './utils/test-app';

/**
 * Filing field reports (issue 6): who may file and read them, the draft → submitted →
 * withdrawn lifecycle, and the per-kind rules of the payload. Codes are checked with the
 * shared codec (SAE J2012 structure, domain-reference §1); priors are probabilities in 0–1
 * and money is non-negative integer minor units (product.md §2 and "Money").
 */
describe('field reports (e2e)', () => {
  let t: TestApp;
  let owner: AuthResponse;
  let technician: AuthResponse;
  let contributor: AuthResponse;
  let otherContributor: AuthResponse;
  let moderator: AuthResponse;

  const fix = (over: Record<string, unknown> = {}) => ({ code: 'p0303', make: 'Quillon', model: 'Ferro', engine: '1.4', year: 2019, part: 'qa-coil', odometerKm: 88400, triedFirst: ['qa-plug'], notes: 'Swapped coils 3 and 5; the misfire followed the coil.', ...over });
  const newCause = (over: Record<string, unknown> = {}) => ({ code: 'P0303', part: 'qa-injector', prior: 0.1, partCostMinor: 9000, currency: 'GBP', replaceHours: 1.2, ...over });
  const file = (who: AuthResponse, kind: string, payload: Record<string, unknown>, submit = false) => t.http().post('/api/field-reports').set(...bearer(who)).send({ kind, payload, submit });
  const fields = (body: { errors?: Array<{ field: string }> }) => (body.errors ?? []).map((e) => e.field).sort();

  beforeAll(async () => {
    t = await createTestApp();
    owner = await registerOwner(t);
    technician = await registerMember(t, owner, 'technician');
    contributor = await registerMember(t, owner, 'contributor');
    otherContributor = await registerMember(t, await registerOwner(t), 'contributor');
    moderator = await registerOwner(t);
    await setRole(t, moderator.user.id, 'moderator');
    for (const [key, name, system] of [
      ['qa-coil', 'QA ignition coil', 'ignition'],
      ['qa-plug', 'QA spark plug', 'ignition'],
      ['qa-injector', 'QA injector', 'fuel-injection'],
    ]) {
      await t.http().post('/api/knowledge/parts').set(...bearer(moderator)).send({ key, name, system }).expect(201);
    }
    await t.http().post('/api/knowledge/causes').set(...bearer(moderator)).send({ code: 'P0303', partKey: 'qa-coil', prior: 0.5, partCostMinor: 4500, currency: 'GBP', replaceHours: 0.3 }).expect(201);
    await t.http().post('/api/knowledge/causes').set(...bearer(moderator)).send({ code: 'P0303', partKey: 'qa-plug', prior: 0.3, partCostMinor: 900, currency: 'GBP', replaceHours: 0.2 }).expect(201);
  });
  afterAll(() => t.close());

  it('a technician cannot file or list field reports (contributor role and up)', async () => {
    const res = await file(technician, 'confirmed-fix', fix()).expect(403);
    expect(res.body.message).toContain('contributor');
    await t.http().get('/api/field-reports').set(...bearer(technician)).expect(403);
  });

  it('a contributor files a draft; nobody else can read it', async () => {
    const res = await file(contributor, 'confirmed-fix', fix()).expect(201);
    const draft = res.body as FieldReportDto;
    // The codec normalises the code (product.md §1): p0303 → P0303.
    expect(draft).toMatchObject({ kind: 'confirmed-fix', status: 'draft', code: 'P0303', proposesNewCode: false, submittedAt: null, author: { id: contributor.user.id } });
    expect(draft.payload).toMatchObject({ code: 'P0303', part: 'qa-coil', triedFirst: ['qa-plug'] });
    expect(draft.title).toBe('P0303 fixed by QA ignition coil on Quillon Ferro 1.4 2019');
    await t.http().get(`/api/field-reports/${draft.id}`).set(...bearer(contributor)).expect(200);
    // Another contributor, and moderators before it is submitted: a 404, never a hint that it exists.
    await t.http().get(`/api/field-reports/${draft.id}`).set(...bearer(otherContributor)).expect(404);
    await t.http().get(`/api/field-reports/${draft.id}`).set(...bearer(moderator)).expect(404);
    await t.http().get(`/api/review/reports/${draft.id}`).set(...bearer(moderator)).expect(404);
    await t.http().patch(`/api/field-reports/${draft.id}`).set(...bearer(otherContributor)).send({ kind: 'confirmed-fix', payload: fix() }).expect(404);
    await t.http().get('/api/field-reports/not-a-uuid').set(...bearer(contributor)).expect(404);
  });

  it('draft → edit → submit; then moderators can read it and it can no longer be edited', async () => {
    const draft = (await file(contributor, 'confirmed-fix', fix()).expect(201)).body as FieldReportDto;
    const edited = await t.http().patch(`/api/field-reports/${draft.id}`).set(...bearer(contributor)).send({ kind: 'confirmed-fix', payload: fix({ odometerKm: 90000 }) }).expect(200);
    expect(edited.body.payload.odometerKm).toBe(90000);
    const submitted = await t.http().post(`/api/field-reports/${draft.id}/submit`).set(...bearer(contributor)).expect(200);
    expect(submitted.body.status).toBe('submitted');
    expect(Date.parse(submitted.body.submittedAt)).not.toBeNaN();
    await t.http().patch(`/api/field-reports/${draft.id}`).set(...bearer(contributor)).send({ kind: 'confirmed-fix', payload: fix() }).expect(409);
    await t.http().post(`/api/field-reports/${draft.id}/submit`).set(...bearer(contributor)).expect(409);
    await t.http().get(`/api/field-reports/${draft.id}`).set(...bearer(moderator)).expect(200);
    await t.http().get(`/api/field-reports/${draft.id}`).set(...bearer(otherContributor)).expect(404);
  });

  it('the author withdraws a submitted report; it leaves the queue', async () => {
    const report = (await file(contributor, 'confirmed-fix', fix({ year: 2020 }), true).expect(201)).body as FieldReportDto;
    expect(report.status).toBe('submitted');
    await t.http().post(`/api/field-reports/${report.id}/withdraw`).set(...bearer(otherContributor)).expect(404);
    const res = await t.http().post(`/api/field-reports/${report.id}/withdraw`).set(...bearer(contributor)).expect(200);
    expect(res.body.status).toBe('withdrawn');
    await t.http().post(`/api/field-reports/${report.id}/withdraw`).set(...bearer(contributor)).expect(409);
    const queue = (await t.http().get('/api/review/reports').set(...bearer(moderator)).expect(200)).body as Page<FieldReportSummaryDto>;
    expect(queue.items.map((i) => i.id)).not.toContain(report.id);
  });

  it('the contributor lists their own reports with their status', async () => {
    const mine = (await t.http().get('/api/field-reports').set(...bearer(contributor)).expect(200)).body as Page<FieldReportSummaryDto>;
    expect(mine.total).toBeGreaterThanOrEqual(3);
    expect(mine.items.every((r) => r.author.id === contributor.user.id)).toBe(true);
    expect(new Set(mine.items.map((r) => r.status))).toEqual(new Set(['draft', 'submitted', 'withdrawn']));
    const drafts = (await t.http().get('/api/field-reports').query({ status: 'draft' }).set(...bearer(contributor)).expect(200)).body as Page<FieldReportSummaryDto>;
    expect(drafts.items.every((r) => r.status === 'draft')).toBe(true);
    const theirs = (await t.http().get('/api/field-reports').set(...bearer(otherContributor)).expect(200)).body as Page<FieldReportSummaryDto>;
    expect(theirs.total).toBe(0);
    const bad = await t.http().get('/api/field-reports').query({ status: 'lost' }).set(...bearer(contributor)).expect(400);
    expect(fields(bad.body)).toEqual(['status']);
  });

  it('probabilities and costs out of range are a 400 naming the field', async () => {
    const prior = await file(contributor, 'new-cause', newCause({ prior: 1.5 })).expect(400);
    expect(prior.body.errors).toEqual([{ field: 'payload.prior', message: 'must be a number between 0 and 1' }]);
    const costs = await file(contributor, 'new-cause', newCause({ partCostMinor: -100, replaceHours: 500, check: { description: 'Swap with a known good one', hours: -1, mustPrecede: 'yes' } })).expect(400);
    expect(fields(costs.body)).toEqual(['payload.check.hours', 'payload.check.mustPrecede', 'payload.partCostMinor', 'payload.replaceHours']);
    const text = await file(contributor, 'new-cause', newCause({ prior: '0.1', currency: 'pounds', surprise: 1 })).expect(400);
    expect(fields(text.body)).toEqual(['payload.currency', 'payload.prior', 'payload.surprise']);
    const kind = await t.http().post('/api/field-reports').set(...bearer(contributor)).send({ kind: 'rumour', payload: {} }).expect(400);
    expect(fields(kind.body)).toEqual(['kind']);
    const scope = await file(contributor, 'new-cause', newCause({ model: 'Ferro', yearFrom: 2020, yearTo: 2018 })).expect(400);
    expect(fields(scope.body)).toEqual(['payload.model', 'payload.yearTo']);
  });

  it('an invalid code is a 400 naming the position; a valid code not in the catalogue is flagged', async () => {
    // SAE J2012: the fourth character must be a hexadecimal digit.
    const bad = await file(contributor, 'confirmed-fix', fix({ code: 'P03G3' })).expect(400);
    expect(bad.body.errors[0].field).toBe('payload.code');
    expect(bad.body.errors[0].message).toMatch(/position 4/);
    // P2FFF is well formed (domain-reference §1) but in no catalogue entry.
    await t.http().get('/api/codes/P2FFF').set(...bearer(contributor)).expect(404);
    const proposed = await file(contributor, 'confirmed-fix', fix({ code: 'P2FFF', codeTitle: 'Invented test title' }), true).expect(201);
    expect(proposed.body).toMatchObject({ code: 'P2FFF', proposesNewCode: true });
    const queue = (await t.http().get('/api/review/reports').query({ code: 'p2fff' }).set(...bearer(moderator)).expect(200)).body as Page<FieldReportSummaryDto>;
    expect(queue.items).toEqual([expect.objectContaining({ id: proposed.body.id, proposesNewCode: true })]);
    // A correction needs an entry to correct.
    const correction = await file(contributor, 'correction', { target: 'code', code: 'P2FFF', field: 'title', value: 'x', reason: 'It has no title yet' }).expect(400);
    expect(fields(correction.body)).toEqual(['payload.code']);
  });

  it('references must exist: parts, the cause to correct, and no duplicate cause', async () => {
    const part = await file(contributor, 'confirmed-fix', fix({ part: 'qa-unknown', triedFirst: ['qa-coil'] })).expect(400);
    expect(fields(part.body)).toEqual(['payload.part']);
    const tried = await file(contributor, 'confirmed-fix', fix({ triedFirst: ['qa-coil'] })).expect(400);
    expect(fields(tried.body)).toEqual(['payload.triedFirst.0']);
    const unnamed = await file(contributor, 'new-cause', newCause({ part: 'qa-brand-new' })).expect(400);
    expect(fields(unnamed.body)).toEqual(['payload.partName']);
    const named = await file(contributor, 'new-cause', newCause({ part: 'qa-brand-new', partName: 'QA brand-new part', system: 'fuel' })).expect(201);
    expect(named.body.payload).toMatchObject({ part: 'qa-brand-new', partName: 'QA brand-new part', system: 'fuel' });
    const duplicate = await file(contributor, 'new-cause', newCause({ part: 'qa-coil' })).expect(400);
    expect(fields(duplicate.body)).toEqual(['payload.part']);
    const teardown = await file(contributor, 'new-cause', newCause({ teardown: 'qa-no-such-teardown' })).expect(400);
    expect(fields(teardown.body)).toEqual(['payload.teardown']);

    const correction = (over: Record<string, unknown>) => ({ target: 'cause', code: 'P0303', part: 'qa-coil', field: 'partCostMinor', value: 4800, reason: 'Supplier price rose this month', ...over });
    await file(contributor, 'correction', correction({})).expect(201);
    const scope = await file(contributor, 'correction', correction({ make: 'Quillon' })).expect(400);
    expect(scope.body.errors[0]).toEqual({ field: 'payload.part', message: 'is not a possible cause of P0303 for Quillon' });
    const value = await file(contributor, 'correction', correction({ value: -1, reason: 'no' })).expect(400);
    expect(fields(value.body)).toEqual(['payload.reason', 'payload.value']);
    const wrongField = await file(contributor, 'correction', correction({ field: 'title', value: 'New title' })).expect(400);
    expect(fields(wrongField.body)).toEqual(['payload.field']);
    const codeTitle = await file(contributor, 'correction', { target: 'code', code: 'P0303', field: 'title', value: ' Cylinder 3 misfire detected ', reason: 'Match the standard wording' }).expect(201);
    expect(codeTitle.body.payload.value).toBe('Cylinder 3 misfire detected');
  });
});
