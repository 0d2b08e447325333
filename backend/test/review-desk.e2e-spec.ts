import type { AuditEntryDto, AuthResponse, CauseRankingDto, FieldReportDto, FieldReportSummaryDto, LikelihoodDto, Page, PossibleCauseRowDto, ReviewReportDto, VehicleScopeQuery } from '@causeway/shared';
import { AuditService } from '../src/audit/audit.service';
import { MailService } from '../src/mail/mail.service';
import { DEMO_PASSWORD } from '../src/seed/demo-accounts.seeder';
import type { AddressInfo } from 'node:net';
import { simpleParser, type AddressObject, type ParsedMail } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import { bearer, createTestApp, registerOwner, setRole, type TestApp } from './utils/test-app';

// jstat ships no type declarations; only the Beta quantile is used, as the reference library.
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { jStat } = require('jstat') as { jStat: { beta: { inv(p: number, a: number, b: number): number } } };

const STRAND: VehicleScopeQuery = { make: 'Morrow', model: 'Strand', engine: '3.0 V6', year: 2018 };
const TARN: VehicleScopeQuery = { make: 'Halden', model: 'Tarn', engine: '1.6 T', year: 2019 };

interface Inbox {
  port: number;
  /** The first message to `address` (the decision mail is sent before the request answers). */
  to(address: string): ParsedMail;
  clear(): void;
  close(): Promise<void>;
}

/** A real SMTP server on a loopback port (smtp-server + mailparser), so decisions are sent as in production. */
async function startInbox(): Promise<Inbox> {
  let messages: ParsedMail[] = [];
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onData(stream, _session, callback) {
      simpleParser(stream).then((m) => {
        messages.push(m);
        callback();
      }, callback);
    },
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const addresses = (m: ParsedMail) => ([] as AddressObject[]).concat(m.to ?? []).flatMap((a) => a.value.map((v) => v.address?.toLowerCase()));
  return {
    port: (server.server.address() as AddressInfo).port,
    to(address: string): ParsedMail {
      const found = messages.find((m) => addresses(m).includes(address.toLowerCase()));
      if (!found) throw new Error(`no mail to ${address}`);
      return found;
    },
    clear: () => {
      messages = [];
    },
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}

/**
 * The review desk (issue 6) on the invented demo scenario: the queue, the before/after diff,
 * decisions and what they do. The likelihood arithmetic is checked against the posterior mean
 * of product.md §2, p_i = (α·w_i + n_i) / (α + N) (domain-reference §6, "Learning from
 * outcomes"), computed here from the ranking's own before values, and the interval against
 * jstat's Beta quantiles (reference library).
 */
describe('review desk (e2e)', () => {
  let t: TestApp;
  let mail: Inbox;
  let contributor: string;
  let moderator: string;
  let technician: string;
  let admin: string;
  let secondModerator: AuthResponse;

  const login = async (email: string) => (await t.http().post('/api/auth/login').send({ email, password: DEMO_PASSWORD }).expect(200)).body.accessToken as string;
  const queue = async (query: Record<string, string | number> = {}) => (await t.http().get('/api/review/reports').query(query).set(...bearer(moderator)).expect(200)).body as Page<FieldReportSummaryDto>;
  const detail = async (id: string, who: string | AuthResponse = moderator) => (await t.http().get(`/api/review/reports/${id}`).set(...bearer(who)).expect(200)).body as ReviewReportDto;
  const ranking = async (code: string, vehicle: VehicleScopeQuery) => (await t.http().get(`/api/codes/${code}/causes`).query({ ...vehicle }).set(...bearer(contributor)).expect(200)).body as CauseRankingDto;
  const causeRows = async (code: string) => (await t.http().get('/api/causes').query({ code }).set(...bearer(contributor)).expect(200)).body as PossibleCauseRowDto[];
  const auditOf = async (entityId: string) => (await t.http().get('/api/admin/audit').query({ entityId, pageSize: 100 }).set(...bearer(admin)).expect(200)).body as Page<AuditEntryDto>;
  const outcomesOf = async (reportId: string) => (await t.query('SELECT "causeKey", weight FROM outcomes WHERE "sourceId" = ?', [reportId])) as Array<{ causeKey: string | null; weight: number }>;
  const seeded = async (kind: string, code: string) => (await queue({ kind, code })).items[0];
  const fileFix = async (payload: Record<string, unknown>, who = contributor) =>
    (await t.http().post('/api/field-reports').set(...bearer(who)).send({ kind: 'confirmed-fix', payload, submit: true }).expect(201)).body as FieldReportDto;

  beforeAll(async () => {
    mail = await startInbox();
    t = await createTestApp({ SEED_DEMO: 'true', SMTP_HOST: '127.0.0.1', SMTP_PORT: String(mail.port) });
    [contributor, moderator, technician, admin] = await Promise.all(['contributor@causeway.test', 'moderator@causeway.test', 'technician@causeway.test', 'admin@causeway.test'].map(login));
    secondModerator = await registerOwner(t);
    await setRole(t, secondModerator.user.id, 'moderator');
  });
  afterAll(async () => {
    await t.close();
    await mail.close();
  });

  it('queues the submitted demo reports oldest first, with filters and pages; drafts stay out', async () => {
    const all = await queue();
    expect(all.total).toBe(5);
    expect(all.items.map((i) => `${i.kind} ${i.code}`)).toEqual(['confirmed-fix P0303', 'new-cause P0171', 'new-cause P0420', 'correction P0456', 'correction C0035']);
    expect((await queue({ kind: 'correction' })).items.map((i) => i.code)).toEqual(['P0456', 'C0035']);
    expect((await queue({ code: 'p0303' })).total).toBe(1);
    const page = await queue({ page: 3, pageSize: 2 });
    expect(page).toMatchObject({ total: 5, page: 3, pageSize: 2 });
    expect(page.items.map((i) => i.code)).toEqual(['C0035']);
    const bad = await t.http().get('/api/review/reports').query({ status: 'draft', kind: 'gossip' }).set(...bearer(moderator)).expect(400);
    expect(bad.body.errors.map((e: { field: string }) => e.field).sort()).toEqual(['kind', 'status']);
    await t.http().get('/api/review/reports').set(...bearer(contributor)).expect(403);
  });

  it('a contributor or technician cannot decide; a moderator cannot decide their own report', async () => {
    const report = await seeded('confirmed-fix', 'P0303');
    await t.http().post(`/api/review/reports/${report.id}/approve`).set(...bearer(contributor)).send({}).expect(403);
    await t.http().post(`/api/review/reports/${report.id}/reject`).set(...bearer(technician)).send({ reason: 'Not enough evidence' }).expect(403);

    const own = (await t.http().post('/api/field-reports').set(...bearer(secondModerator)).send({ kind: 'correction', submit: true, payload: { target: 'code', code: 'P0128', field: 'title', value: 'Coolant below thermostat regulating temperature', reason: 'Standard wording' } }).expect(201)).body as FieldReportDto;
    const res = await t.http().post(`/api/review/reports/${own.id}/approve`).set(...bearer(secondModerator)).send({}).expect(403);
    expect(res.body.message).toBe('You cannot decide your own field report: another moderator must review it');
    await t.http().post(`/api/review/reports/${own.id}/reject`).set(...bearer(secondModerator)).send({ reason: 'Changed my mind' }).expect(403);
    const view = await detail(own.id, secondModerator);
    expect(view.diff.applicable).toBe(false);
    expect(view.diff.blockers[0]).toContain('your own report');
    expect(view.status).toBe('submitted');
  });

  it('shows a confirmed fix side by side: before is the ranking today, after counts the outcome', async () => {
    const report = await seeded('confirmed-fix', 'P0303');
    const view = await detail(report.id);
    expect(view.payload).toMatchObject({ part: 'ignition-coil', make: 'Morrow', model: 'Strand' });
    const before = await ranking('P0303', STRAND);
    const coil = view.diff.likelihoods!.causes.find((c) => c.key === 'ignition-coil')!;
    expect(coil.subject).toBe(true);
    expect(coil.before!.probability).toBeCloseTo(before.causes.find((c) => c.key === 'ignition-coil')!.probability, 12);
    expect(view.diff.likelihoods!.evidenceAfter).toBeCloseTo(view.diff.likelihoods!.evidenceBefore + 1, 12);
    expect(view.diff.applicable).toBe(true);
  });

  it('approving a confirmed fix moves the likelihood by exactly the posterior amount, and tells the author', async () => {
    const report = await seeded('confirmed-fix', 'P0303');
    const diff = (await detail(report.id)).diff;
    const before = await ranking('P0303', STRAND);
    // The formula below holds when the outcome lands at the vehicle's own (last) back-off level
    // and no cap scales it; both are stated by the ranking.
    expect(before.capped).toBe(false);
    const alpha = before.priorStrength;
    const N = before.totalEvidence;

    const res = await t.http().post(`/api/review/reports/${report.id}/approve`).set(...bearer(moderator)).send({ note: 'Coil swap test is convincing' }).expect(200);
    expect(res.body).toMatchObject({ status: 'approved', decisionNote: 'Coil swap test is convincing', decidedBy: { displayName: 'Tomasz Wielgus' } });
    const after = await ranking('P0303', STRAND);
    expect(after.capped).toBe(false);
    expect(after.levels.map((l) => l.evidence)).toEqual(before.levels.map((l, i, all) => (i === all.length - 1 ? l.evidence + 1 : l.evidence)));
    expect(after.totalEvidence).toBeCloseTo(N + 1, 12);

    for (const c of before.causes) {
      // product.md §2: p_i = (α·w_i + n_i)/(α + N); the fix adds 1 to n_coil and to N.
      const n = c.evidence + (c.key === 'ignition-coil' ? 1 : 0);
      const expected = (alpha * c.priorWeight + n) / (alpha + N + 1);
      const got = after.causes.find((x) => x.key === c.key)!;
      expect(got.probability).toBeCloseTo(expected, 12);
      expect(got.priorWeight).toBeCloseTo(c.priorWeight, 12);
      // The interval is the Beta(α·w + n, α + N − α·w − n) marginal's 5 % and 95 % quantiles (jstat).
      const a = alpha * c.priorWeight + n;
      const b = alpha + N + 1 - a;
      expect(got.lower).toBeCloseTo(jStat.beta.inv(0.05, a, b), 6);
      expect(got.upper).toBeCloseTo(jStat.beta.inv(0.95, a, b), 6);
      // The review desk showed exactly this as "after".
      const shown = diff.likelihoods!.causes.find((x) => x.key === c.key)!.after as LikelihoodDto;
      expect(shown.probability).toBeCloseTo(got.probability, 12);
    }
    expect(after.unlisted.probability).toBeCloseTo((alpha * before.unlisted.priorWeight + before.unlisted.evidence) / (alpha + N + 1), 12);

    expect(await outcomesOf(report.id)).toEqual([{ causeKey: 'ignition-coil', weight: 1 }]);
    const entries = await auditOf(report.id);
    expect(entries.items.map((e) => e.action)).toEqual(['report.approve']);
    expect(entries.items[0]).toMatchObject({ actorEmail: 'moderator@causeway.test', note: 'Coil swap test is convincing', before: { status: 'submitted' } });
    expect((await auditOf(`field-report:${report.id}`)).items.map((e) => e.action)).toEqual(['outcome.record']);

    const message = mail.to('contributor@causeway.test');
    expect(message.subject).toContain('approved');
    expect(message.text).toContain('Coil swap test is convincing');
    const notified = (await t.http().get(`/api/field-reports/${report.id}`).set(...bearer(contributor)).expect(200)).body as FieldReportDto;
    expect(notified.notifiedAt).not.toBeNull();

    // Deciding it again is a conflict, and changes nothing.
    await t.http().post(`/api/review/reports/${report.id}/approve`).set(...bearer(moderator)).send({}).expect(409);
    await t.http().post(`/api/review/reports/${report.id}/reject`).set(...bearer(moderator)).send({ reason: 'Second thoughts' }).expect(409);
    expect(await outcomesOf(report.id)).toHaveLength(1);
  });

  it('a burst of confirmed fixes from one contributor is held to the influence cap', async () => {
    // product.md §2: one user can move a likelihood only so far. With the default cap of 3 outcomes
    // per user (INFLUENCE_CAP_USER unset) a fourth fix by the same contributor adds nothing more.
    const CAP_USER = 3;
    const base = await ranking('P0303', STRAND);
    const coil = base.causes.find((c) => c.key === 'ignition-coil')!;
    expect(coil.evidence).toBeCloseTo(1, 12); // the demo report approved above
    const alpha = base.priorStrength;
    for (let i = 0; i < 3; i++) {
      const report = await fileFix({ code: 'P0303', ...STRAND, part: 'ignition-coil', notes: `Another Strand, coil ${i + 1}` });
      const view = await detail(report.id);
      expect(view.diff.likelihoods!.capped).toBe(i === 2);
      await t.http().post(`/api/review/reports/${report.id}/approve`).set(...bearer(moderator)).send({}).expect(200);
    }
    const after = await ranking('P0303', STRAND);
    expect(after.capped).toBe(true);
    const got = after.causes.find((c) => c.key === 'ignition-coil')!;
    // Four outcomes of weight 1 scaled to a total of 3: p = (α·w + 3)/(α + 3).
    expect(got.evidence).toBeCloseTo(CAP_USER, 12);
    expect(got.probability).toBeCloseTo((alpha * coil.priorWeight + CAP_USER) / (alpha + CAP_USER), 12);
  });

  it('rejecting moves nothing, needs a reason, and tells the author why', async () => {
    const report = await fileFix({ code: 'P0456', ...TARN, part: 'vent-valve', triedFirst: ['fuel-cap'], notes: 'Bench test failed' });
    const before = await ranking('P0456', TARN);
    const noReason = await t.http().post(`/api/review/reports/${report.id}/reject`).set(...bearer(moderator)).send({ reason: 'no' }).expect(400);
    expect(noReason.body.errors).toEqual([{ field: 'reason', message: 'must be text of 3 to 1000 characters' }]);
    mail.clear();
    const res = await t.http().post(`/api/review/reports/${report.id}/reject`).set(...bearer(moderator)).send({ reason: 'Please attach the bench-test photo' }).expect(200);
    expect(res.body).toMatchObject({ status: 'rejected', decisionNote: 'Please attach the bench-test photo' });
    expect(await ranking('P0456', TARN)).toEqual(before);
    expect(await outcomesOf(report.id)).toEqual([]);
    const entries = await auditOf(report.id);
    expect(entries.items.map((e) => [e.action, e.note])).toEqual([['report.reject', 'Please attach the bench-test photo']]);
    const message = mail.to('contributor@causeway.test');
    expect(message.subject).toContain('not accepted');
    expect(message.text).toContain('Please attach the bench-test photo');

    const correction = await seeded('correction', 'P0456');
    const rows = await causeRows('P0456');
    await t.http().post(`/api/review/reports/${correction.id}/reject`).set(...bearer(moderator)).send({ reason: 'The supplier price is not typical' }).expect(200);
    expect(await causeRows('P0456')).toEqual(rows);
  });

  it('a failure mid-approve leaves neither the change nor the decision nor an audit entry', async () => {
    const report = await fileFix({ code: 'P0456', ...TARN, part: 'fuel-cap', notes: 'Cap seal split' });
    const before = await ranking('P0456', TARN);
    const audit = t.app.get(AuditService);
    const original = audit.record.bind(audit);
    // The outcome and its own audit entry are written first; the decision's entry then fails.
    const spy = jest.spyOn(audit, 'record').mockImplementation((em, actor, entry) => (entry.action === 'report.approve' ? Promise.reject(new Error('simulated failure')) : original(em, actor, entry)));
    try {
      await t.http().post(`/api/review/reports/${report.id}/approve`).set(...bearer(moderator)).send({}).expect(500);
    } finally {
      spy.mockRestore();
    }
    expect(await outcomesOf(report.id)).toEqual([]);
    expect((await auditOf(report.id)).total).toBe(0);
    expect((await auditOf(`field-report:${report.id}`)).total).toBe(0);
    expect((await detail(report.id)).status).toBe('submitted');
    expect(await ranking('P0456', TARN)).toEqual(before);
    // Once the failure is gone the same approval goes through, with both entries.
    await t.http().post(`/api/review/reports/${report.id}/approve`).set(...bearer(moderator)).send({}).expect(200);
    expect(await outcomesOf(report.id)).toEqual([{ causeKey: 'fuel-cap', weight: 1 }]);
    expect((await auditOf(report.id)).total).toBe(1);
  });

  it('a mail that cannot be sent never undoes a decision', async () => {
    const report = await fileFix({ code: 'P0456', ...TARN, year: 2020, part: 'vent-valve', notes: 'Second car, same fault' });
    const spy = jest.spyOn(t.app.get(MailService), 'send').mockResolvedValueOnce({ sent: false, reason: 'the mail server at 127.0.0.1:1 refused the connection (is it running?)' });
    try {
      const res = await t.http().post(`/api/review/reports/${report.id}/approve`).set(...bearer(moderator)).send({}).expect(200);
      expect(res.body).toMatchObject({ status: 'approved', notifiedAt: null });
    } finally {
      spy.mockRestore();
    }
    expect(await outcomesOf(report.id)).toHaveLength(1);
  });

  it('approving a new possible cause adds it (and its new part, once a system is chosen)', async () => {
    const sparks = await seeded('new-cause', 'P0420');
    const view = await detail(sparks.id);
    expect(view.diff.changes.find((c) => c.field === 'priorSum')).toMatchObject({ before: 0.85, after: 0.89 });
    expect(view.diff.likelihoods!.causes.find((c) => c.key === 'spark-plugs-set')).toMatchObject({ before: null, subject: true });
    await t.http().post(`/api/review/reports/${sparks.id}/approve`).set(...bearer(moderator)).send({}).expect(200);
    const added = (await causeRows('P0420')).find((c) => c.partKey === 'spark-plugs-set' && c.make === null)!;
    expect(added).toMatchObject({ prior: 0.04, partCostMinor: 4000, currency: 'GBP', replaceHours: 0.8 });
    expect((await auditOf(added.id)).items[0]).toMatchObject({ action: 'cause.create', note: `Field report ${sparks.id}` });

    const diverter = await seeded('new-cause', 'P0171');
    const warnings = (await detail(diverter.id)).diff.warnings.join(' ');
    expect(warnings).toContain('new part');
    expect(warnings).toContain('choose one when approving');
    const missing = await t.http().post(`/api/review/reports/${diverter.id}/approve`).set(...bearer(moderator)).send({}).expect(400);
    expect(missing.body.errors).toEqual([{ field: 'partSystem', message: 'is required: the report proposes a new part turbo-diverter-valve without a system' }]);
    expect((await detail(diverter.id)).status).toBe('submitted');
    await t.http().post(`/api/review/reports/${diverter.id}/approve`).set(...bearer(moderator)).send({ partSystem: 'air-intake' }).expect(200);
    const parts = (await t.http().get('/api/parts').set(...bearer(contributor)).expect(200)).body as Array<{ key: string; system: string }>;
    expect(parts.find((p) => p.key === 'turbo-diverter-valve')).toMatchObject({ system: 'air-intake' });
    expect((await causeRows('P0171')).some((c) => c.partKey === 'turbo-diverter-valve' && c.make === 'Halden' && c.model === 'Tarn')).toBe(true);
  });

  it('approving a correction updates the value, audited before and after', async () => {
    const report = await seeded('correction', 'C0035');
    const row = (await causeRows('C0035')).find((c) => c.partKey === 'wheel-speed-sensor' && c.make === null)!;
    const view = await detail(report.id);
    expect(view.diff.changes).toEqual([expect.objectContaining({ field: 'replaceHours', before: row.replaceHours, after: 0.6 })]);
    await t.http().post(`/api/review/reports/${report.id}/approve`).set(...bearer(moderator)).send({ note: 'Agreed for older vehicles' }).expect(200);
    expect((await causeRows('C0035')).find((c) => c.id === row.id)!.replaceHours).toBe(0.6);
    const entry = (await auditOf(row.id)).items[0];
    expect(entry).toMatchObject({ action: 'cause.update', before: { replaceHours: row.replaceHours }, after: { replaceHours: 0.6 } });
  });

  it('approving a report on a valid code outside the catalogue adds the entry it proposes', async () => {
    const report = await fileFix({ code: 'P2FFF', codeTitle: 'Invented demo title for a test code', make: 'Morrow', model: 'Strand', part: 'ignition-coil' });
    expect(report.proposesNewCode).toBe(true);
    expect((await detail(report.id)).diff.warnings[0]).toContain('approving adds a catalogue entry');
    await t.http().post(`/api/review/reports/${report.id}/approve`).set(...bearer(moderator)).send({}).expect(200);
    const entry = (await t.http().get('/api/codes/P2FFF').set(...bearer(contributor)).expect(200)).body;
    expect(entry).toMatchObject({ code: 'P2FFF', title: 'Invented demo title for a test code', source: 'field-report' });
    expect((await auditOf('P2FFF')).items.map((e) => e.action)).toEqual(['code.create']);
  });
});
