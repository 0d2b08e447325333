import { createHash } from 'node:crypto';
import type { AuthResponse, CreateEstimateResponse, JobDto, PublicEstimateDto, VehicleDto } from '@causeway/shared';
import { closedPort, startMailCatcher, type MailCatcher } from './utils/mail-catcher';
import { bearer, createTestApp, KESTREL_SHOP, registerMember, registerOwner, type TestApp } from './utils/test-app';

const PUBLIC_URL = 'http://causeway.example';
const TOKEN_IN_LINK = new RegExp(`${PUBLIC_URL.replace(/\./g, '\\.')}/estimate/([A-Za-z0-9_-]{43})`);

async function shopWithJob(t: TestApp, ownerEmail: string | null): Promise<{ owner: AuthResponse; tech: AuthResponse; vehicle: VehicleDto; job: JobDto }> {
  const owner = await registerOwner(t);
  const tech = await registerMember(t, owner);
  const vehicle = (await t.http().post('/api/vehicles').set(...bearer(tech)).send({ vin: 'YHATR6G24KH104382', make: 'Halden', model: 'Tarn', engine: '1.6 T', plate: 'KX19 HTN', ownerName: 'Priya Anand', ownerEmail }).expect(201)).body;
  const job = (await t.http().post('/api/jobs').set(...bearer(tech)).send({ vehicleId: vehicle.id, complaint: 'Warning lamp; whistle from the engine', codes: [{ code: 'P0171', status: 'stored' }] }).expect(201)).body;
  return { owner, tech, vehicle, job };
}

describe('staged estimates by e-mail (e2e, real SMTP to a local mail catcher)', () => {
  let mail: MailCatcher;
  let t: TestApp;
  let owner: AuthResponse;
  let tech: AuthResponse;
  let job: JobDto;
  let created: CreateEstimateResponse;
  let token: string;
  const customer = 'priya.anand@example.com';

  beforeAll(async () => {
    mail = await startMailCatcher();
    t = await createTestApp({ SEED_DEMO: 'true', SMTP_HOST: '127.0.0.1', SMTP_PORT: String(mail.smtpPort), PUBLIC_URL, MAIL_FROM: 'Causeway <estimates@causeway.test>' });
    ({ owner, tech, job } = await shopWithJob(t, customer));
  });
  afterAll(async () => {
    await t.close();
    await mail.stop();
  });

  it('builds the estimate from the job’s fix path, priced with the shop’s tax, and e-mails it', async () => {
    const res = await t.http().post(`/api/jobs/${job.id}/estimates`).set(...bearer(tech)).send({ message: 'Ring us with any question.' }).expect(201);
    created = res.body;
    expect(created).toMatchObject({ emailed: true, emailError: null });
    const fp = job.codes[0].fixPath!;
    const e = created.estimate;
    expect(e).toMatchObject({ currency: 'GBP', taxRateBp: 2000, recipientEmail: customer, expired: false });
    expect(e.stages).toHaveLength(fp.plan.stages.length);
    e.stages.forEach((s, i) => {
      const planned = fp.plan.stages[i];
      // Net = the stage cost in whole minor units (half up); tax = net × 2000 bp / 10 000 rounded half up; gross = net + tax (rounding as the estimate states).
      const net = Math.floor(planned.cost + 0.5);
      const tax = Math.floor((net * 2000 + 5000) / 10_000);
      expect(s.price).toEqual({ net, tax, gross: net + tax });
      expect(s.fixProbability).toBeCloseTo(planned.fixProbability, 12);
      expect(s.cumulativeFixProbability).toBeCloseTo(planned.cumulativeFixProbability, 12);
      expect(s.ifNotFixed.length).toBeGreaterThan(0);
    });
    expect(e.rounding).toMatch(/rounded half/);
    // Expires in 14 days by default.
    const days = (Date.parse(e.expiresAt) - Date.parse(e.createdAt)) / 86_400_000;
    expect(days).toBeCloseTo(14, 2);
    // The link goes out once; the database keeps only its SHA-256 hash.
    token = TOKEN_IN_LINK.exec(created.link)![1];
    const rows = await t.query('SELECT * FROM estimates WHERE id = ?', [e.id]);
    expect(rows[0].tokenHash).toBe(createHash('sha256').update(token).digest('hex'));
    expect(JSON.stringify(rows)).not.toContain(token);
  });

  it('the e-mail arrives at the mail catcher over SMTP, with the prices and the link', async () => {
    const m = await mail.waitFor(customer);
    expect(m.subject).toBe('Staged estimate from Test Garage for your 2019 Halden Tarn (KX19 HTN)');
    expect(m.from[0].address).toBe('estimates@causeway.test');
    expect(m.text).toContain(created.link);
    expect(m.text).toContain('Ring us with any question.');
    expect(m.html).toContain('Read the estimate and answer each stage');
    const first = created.estimate.stages[0];
    // Shown with and without sales tax (common practice), formatted for the shop's locale.
    expect(m.text).toContain(`£${(first.price.gross / 100).toFixed(2)} including £${(first.price.tax / 100).toFixed(2)} tax (£${(first.price.net / 100).toFixed(2)} before tax)`);
  });

  it('the link opens the estimate without signing in', async () => {
    const res = await t.http().get(`/api/public/estimates/${token}`).expect(200);
    const pub = res.body as PublicEstimateDto;
    expect(pub).toMatchObject({ shop: { name: 'Test Garage' }, vehicle: { make: 'Halden', model: 'Tarn', year: 2019, plate: 'KX19 HTN' }, acceptingAnswers: true, currency: 'GBP' });
    expect(pub.codes).toEqual([{ code: 'P0171', title: 'System Too Lean (Bank 1)' }]);
    expect(pub.stages).toEqual(created.estimate.stages);
    expect(pub.decisions.every((d) => d === null)).toBe(true);
    expect(JSON.stringify(pub)).not.toMatch(/YHATR6G24KH104382|shopId|jobId/);
  });

  it('approving a stage shows on the job with the time it came', async () => {
    const before = Date.now();
    const res = await t.http().post(`/api/public/estimates/${token}/answers`).send({ stageIndex: 0, decision: 'approved', name: 'Priya Anand' }).expect(201);
    expect((res.body as PublicEstimateDto).decisions[0]).toMatchObject({ stageIndex: 0, decision: 'approved', name: 'Priya Anand' });
    const lastStage = created.estimate.stages.length - 1;
    const declined = await t.http().post(`/api/public/estimates/${token}/answers`).send({ stageIndex: lastStage, decision: 'declined' }).expect(201);
    expect((declined.body as PublicEstimateDto).answers).toHaveLength(2);

    const detail = (await t.http().get(`/api/jobs/${job.id}`).set(...bearer(tech)).expect(200)).body as JobDto;
    const answers = detail.estimates[0].answers;
    expect(answers[0]).toMatchObject({ stageIndex: 0, decision: 'approved', name: 'Priya Anand' });
    expect(Date.parse(answers[0].answeredAt)).toBeGreaterThanOrEqual(before - 1000);
    const list = (await t.http().get(`/api/jobs/${job.id}/estimates`).set(...bearer(owner)).expect(200)).body;
    expect(list).toHaveLength(1);
    expect(list[0].answers[0].decision).toBe('approved');
  });

  it('names a stage that is not on the estimate', async () => {
    const res = await t.http().post(`/api/public/estimates/${token}/answers`).send({ stageIndex: 99, decision: 'approved' }).expect(400);
    expect(res.body.errors).toEqual([{ field: 'stageIndex', message: expect.stringContaining('must be a stage of this estimate') }]);
    const bad = await t.http().post(`/api/public/estimates/${token}/answers`).send({ stageIndex: 0, decision: 'maybe' }).expect(400);
    expect(bad.body.errors[0].field).toBe('decision');
  });

  it('an unknown link is a 404 and an expired one a 410 with a clear message', async () => {
    await t.http().get(`/api/public/estimates/${'A'.repeat(43)}`).expect(404);
    await t.http().get('/api/public/estimates/short').expect(404);
    await t.query('UPDATE estimates SET "expiresAt" = ? WHERE id = ?', ['2026-01-02 10:00:00.000', created.estimate.id]);
    const res = await t.http().get(`/api/public/estimates/${token}`).expect(410);
    expect(res.body.message).toBe('This estimate link expired on 2 January 2026. Please ask Test Garage to send a new one.');
    await t.http().post(`/api/public/estimates/${token}/answers`).send({ stageIndex: 0, decision: 'declined' }).expect(410);
  });

  it('sending again gives a new link and the old one stops working', async () => {
    const res = await t.http().post(`/api/jobs/${job.id}/estimates/${created.estimate.id}/send`).set(...bearer(tech)).send({}).expect(200);
    const fresh = TOKEN_IN_LINK.exec(res.body.link)![1];
    expect(fresh).not.toBe(token);
    await t.http().get(`/api/public/estimates/${token}`).expect(404);
    await t.http().get(`/api/public/estimates/${fresh}`).expect(200);
  });

  it("another shop's job or estimate is a 404", async () => {
    const stranger = await registerOwner(t, { ...KESTREL_SHOP, name: 'Other Garage' });
    await t.http().post(`/api/jobs/${job.id}/estimates`).set(...bearer(stranger)).send({}).expect(404);
    await t.http().get(`/api/jobs/${job.id}/estimates`).set(...bearer(stranger)).expect(404);
    await t.http().get(`/api/jobs/${job.id}/estimates/${created.estimate.id}`).set(...bearer(stranger)).expect(404);
    await t.http().post(`/api/jobs/${job.id}/estimates/${created.estimate.id}/send`).set(...bearer(stranger)).send({}).expect(404);
    const printable = await t.http().get(`/api/jobs/${job.id}/estimates/${created.estimate.id}`).set(...bearer(owner)).expect(200);
    expect(printable.body.stages).toEqual(created.estimate.stages);
  });

  it('a vehicle without an owner e-mail: the estimate is saved and the answer says why it was not sent', async () => {
    const s = await shopWithJob(t, null);
    const res = await t.http().post(`/api/jobs/${s.job.id}/estimates`).set(...bearer(s.tech)).send({}).expect(201);
    expect(res.body).toMatchObject({ emailed: false, emailError: expect.stringContaining('no owner e-mail') });
  });

  it('an estimate on a closed job is a 409, and answers are no longer taken', async () => {
    const s = await shopWithJob(t, 'someone@example.com');
    const est = (await t.http().post(`/api/jobs/${s.job.id}/estimates`).set(...bearer(s.tech)).send({ expiresInDays: 3 }).expect(201)).body as CreateEstimateResponse;
    await t.http().post(`/api/jobs/${s.job.id}/close`).set(...bearer(s.tech)).send({ resolution: 'unresolved' }).expect(200);
    await t.http().post(`/api/jobs/${s.job.id}/estimates`).set(...bearer(s.tech)).send({}).expect(409);
    const tok = TOKEN_IN_LINK.exec(est.link)![1];
    const pub = await t.http().get(`/api/public/estimates/${tok}`).expect(200);
    expect(pub.body.acceptingAnswers).toBe(false);
    await t.http().post(`/api/public/estimates/${tok}/answers`).send({ stageIndex: 0, decision: 'approved' }).expect(409);
  });
});

describe('staged estimates when the mail server is down (e2e)', () => {
  let t: TestApp;
  let port: number;
  beforeAll(async () => {
    port = await closedPort();
    t = await createTestApp({ SEED_DEMO: 'true', SMTP_HOST: '127.0.0.1', SMTP_PORT: String(port), PUBLIC_URL, PUBLIC_THROTTLE_LIMIT: '3' });
  });
  afterAll(() => t.close());

  it('an e-mail that fails to send leaves the estimate saved and says so (never a 500)', async () => {
    const { tech, job } = await shopWithJob(t, 'priya.anand@example.com');
    const res = await t.http().post(`/api/jobs/${job.id}/estimates`).set(...bearer(tech)).send({}).expect(201);
    expect(res.body).toMatchObject({ emailed: false, emailError: expect.stringContaining(`the mail server at 127.0.0.1:${port} refused the connection`) });
    expect(res.body.estimate.emailedAt).toBeNull();
    const list = (await t.http().get(`/api/jobs/${job.id}/estimates`).set(...bearer(tech)).expect(200)).body;
    expect(list).toHaveLength(1);
    expect(list[0]).toMatchObject({ id: res.body.estimate.id, emailedAt: null, emailError: expect.stringContaining('not sent') });
    // The saved estimate's link still works.
    const tok = TOKEN_IN_LINK.exec(res.body.link)![1];
    await t.http().get(`/api/public/estimates/${tok}`).expect(200);
  });

  it('the public routes are throttled per client (PUBLIC_THROTTLE_LIMIT a minute)', async () => {
    // Three a minute in this app; the test above used one.
    await t.http().get(`/api/public/estimates/${'B'.repeat(43)}`).expect(404);
    await t.http().get(`/api/public/estimates/${'C'.repeat(43)}`).expect(404);
    await t.http().get(`/api/public/estimates/${'D'.repeat(43)}`).expect(429);
  });
});
