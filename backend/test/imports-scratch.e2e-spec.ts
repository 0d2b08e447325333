import { bearer, createTestApp, registerOwner, type TestApp } from './utils/test-app';
import type { AuthResponse } from '@causeway/shared';

describe('scratch', () => {
  let t: TestApp;
  let owner: AuthResponse;
  beforeAll(async () => {
    t = await createTestApp();
    owner = await registerOwner(t);
  });
  afterAll(() => t.close());
  it('works', async () => {
    const csv = 'Date;VIN;Odometer (mi);ECU;DTC;Status;Description;FF: RPM;FF: Coolant\r\n2025-03-14 09:30;1HGCM82633A004352;"12,345";ECM;po171;confirmed;System too lean;850;"91,5"\r\n2025-03-14 09:31;1HGCM82633A004352;12345;ECM;04 20;pending;"multi\r\nline";900;90\r\n14/03/2025 10:00;WVWZZZ1JZXW000001;100000;ECM;P0300;;x;;\r\n';
    const res = await t.http().post('/api/imports').query({ dryRun: 'true' }).set(...bearer(owner)).attach('file', Buffer.from(csv), 'scan.csv');
    console.log(res.status, JSON.stringify(res.body, null, 1).slice(0, 6000));
    const c = await t.http().post('/api/imports').query({ dryRun: 'false' }).set(...bearer(owner)).attach('file', Buffer.from(csv), 'scan.csv');
    console.log(c.status, JSON.stringify({ ...c.body, preview: undefined, detected: undefined }));
    const c2 = await t.http().post('/api/imports').query({ dryRun: 'false' }).set(...bearer(owner)).attach('file', Buffer.from(csv), 'scan.csv');
    console.log(c2.status, JSON.stringify({ ...c2.body, preview: undefined, detected: undefined, problems: undefined }));
    const l = await t.http().get('/api/imports').set(...bearer(owner));
    console.log(l.status, JSON.stringify(l.body));
    const j = await t.http().get('/api/jobs').set(...bearer(owner));
    console.log(j.status, JSON.stringify(j.body).slice(0, 2000));
  });
});
