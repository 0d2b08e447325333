import type { AuthResponse, VehicleDto } from '@causeway/shared';
import { bearer, createTestApp, registerOwner, type TestApp } from './utils/test-app';

/**
 * Where SQLite and PostgreSQL differ by default and the app must not (this suite runs on both:
 * SQLite in `npm test`, PostgreSQL under scripts/pg-test.sh). Outside sources: the SQLite manual
 * ("The ORDER BY clause": NULLs are smaller than any other value; "The LIKE operator": case-
 * insensitive for ASCII) and the PostgreSQL 15 manual (§7.5 "Sorting Rows": nulls sort as if
 * larger than any non-null value; §9.7.1 LIKE is case-sensitive; §8.3 a text value cannot hold
 * the NUL character).
 */
describe('the same answers on SQLite and PostgreSQL (e2e)', () => {
  let t: TestApp;
  let shop: AuthResponse;
  const list = async (query: Record<string, string | number>) => (await t.http().get('/api/vehicles').query(query).set(...bearer(shop)).expect(200)).body as { items: VehicleDto[] };

  beforeAll(async () => {
    t = await createTestApp();
    shop = await registerOwner(t);
    const add = (body: Record<string, unknown>) => t.http().post('/api/vehicles').set(...bearer(shop)).send({ make: 'Halden', model: 'Tarn', ...body }).expect(201);
    await add({ vin: '1HGCM82633A004352', plate: 'BB22 BBB', ownerName: 'Priya Anand' });
    await add({ vin: '1M8GDM9AXKP042788', plate: 'AA11 AAA', ownerName: 'Joanna Brook' });
    await add({ vin: '1J9RP1A36A1644345' }); // no plate, no owner
  });
  afterAll(() => t.close());

  it('puts empty values last whichever way a list is sorted', async () => {
    expect((await list({ sort: 'plate', order: 'asc' })).items.map((v) => v.plate)).toEqual(['AA11 AAA', 'BB22 BBB', null]);
    expect((await list({ sort: 'plate', order: 'desc' })).items.map((v) => v.plate)).toEqual(['BB22 BBB', 'AA11 AAA', null]);
    expect((await list({ sort: 'ownerName', order: 'desc' })).items.map((v) => v.ownerName)).toEqual(['Priya Anand', 'Joanna Brook', null]);
  });

  it('searches without regard to letter case', async () => {
    for (const q of ['anand', 'ANAND', 'AnAnD']) expect((await list({ q })).items.map((v) => v.vin)).toEqual(['1HGCM82633A004352']);
    for (const q of ['aa11aaa', 'AA11-AAA']) expect((await list({ q })).items.map((v) => v.vin)).toEqual(['1M8GDM9AXKP042788']);
    // Wildcards typed by the user are taken literally.
    expect((await list({ q: '%' })).items).toEqual([]);
    expect((await list({ q: '_' })).items).toEqual([]);
  });

  it('refuses the NUL character anywhere in a request with a 400 naming where', async () => {
    const q = await t.http().get('/api/vehicles').query({ q: 'a\u0000b' }).set(...bearer(shop)).expect(400);
    expect(q.body.errors).toEqual([{ field: 'q', message: 'must not contain the NUL character (U+0000)' }]);
    const body = await t.http().post('/api/vehicles').set(...bearer(shop)).send({ vin: '1HGCM82633A004352', make: 'Halden', model: 'Tarn', ownerName: 'Nul\u0000Name' }).expect(400);
    expect(body.body.errors).toEqual([{ field: 'ownerName', message: 'must not contain the NUL character (U+0000)' }]);
    const path = await t.http().get('/api/vehicles/abc%00def').set(...bearer(shop)).expect(400);
    expect(path.body.errors[0].field).toBe('path');
  });

  it('a malformed id is simply not found', async () => {
    for (const id of ['not-an-id', '12345', 'ffffffff-ffff-ffff-ffff-ffffffffffff', 'x'.repeat(200)]) {
      await t.http().get(`/api/vehicles/${id}`).set(...bearer(shop)).expect(404);
      await t.http().get(`/api/jobs/${id}`).set(...bearer(shop)).expect(404);
    }
  });
});
