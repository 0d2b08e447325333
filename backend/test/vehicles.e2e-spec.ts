import { validateVin, VIN_ALPHABET, vinCharValue, type AuthResponse, type VehicleDto } from '@causeway/shared';
import { bearer, createTestApp, KESTREL_SHOP, registerMember, registerOwner, type TestApp } from './utils/test-app';

// vin-generator (npm, MIT) builds VINs from real WMI/VDS prefixes with a 49 CFR 565.15 check digit.
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { generateVin } = require('vin-generator') as { generateVin: () => string };

const NEW_VEHICLE = { make: 'Halden', model: 'Tarn', engine: '1.6 T' };

describe('vehicles (e2e)', () => {
  let t: TestApp;
  let owner: AuthResponse;
  let tech: AuthResponse;
  let other: AuthResponse;

  beforeAll(async () => {
    t = await createTestApp();
    owner = await registerOwner(t); // miles, GBP
    tech = await registerMember(t, owner);
    other = await registerOwner(t, { ...KESTREL_SHOP, name: 'Other Garage' });
  });
  afterAll(() => t.close());

  const create = (auth: AuthResponse, body: Record<string, unknown>) => t.http().post('/api/vehicles').set(...bearer(auth)).send({ ...NEW_VEHICLE, ...body });

  describe('VIN check digit and model year (domain-reference §5)', () => {
    // Worked examples of domain-reference §5 (49 CFR 565.15(c); the third is NHTSA's own example VIN).
    it.each([
      ['1HGCM82633A004352', 2003],
      ['1M8GDM9AXKP042788', 1989],
      ['1J9RP1A36A1644345', 2010],
      ['11111111111111111', 2001],
    ])('accepts %s and reads model year %i from position 10 with the position-7 rule', async (vin, year) => {
      const res = await create(tech, { vin }).expect(201);
      expect(res.body).toMatchObject({ vin, year, warnings: [] });
    });

    it('rejects the mistyped worked example 1HGCM82643A004352 with a 400 naming position 9 and why', async () => {
      // domain-reference §5: Σ = 311, 311 mod 11 = 3, but position 9 holds 4.
      const res = await create(tech, { vin: '1HGCM82643A004352' }).expect(400);
      expect(res.body.errors).toEqual([{ field: 'vin', message: expect.stringMatching(/^Position 9: check digit is '4' but the other characters give '3'/) }]);
    });

    it('names the position of a letter a VIN never uses', async () => {
      const res = await create(tech, { vin: '1HGCI82633A004352' }).expect(400);
      expect(res.body.errors[0]).toEqual({ field: 'vin', message: expect.stringContaining('Position 5: letter I is never used') });
    });

    it('accepts random valid VINs from the vin-generator package', async () => {
      // vin-generator: every VIN it makes carries a correct check digit, so none may be refused.
      const vins = Array.from({ length: 300 }, () => generateVin());
      for (const vin of vins) {
        const r = validateVin(vin);
        expect({ vin, valid: r.valid, checkDigit: r.issues.filter((i) => i.position === 9) }).toEqual({ vin, valid: true, checkDigit: [] });
      }
      // A few of them through the API too.
      for (const vin of vins.slice(0, 5)) {
        const res = await create(tech, { vin, year: 2015 });
        expect(res.status).toBe(201);
        expect(res.body.warnings.filter((w: { message: string }) => w.message.startsWith('Position 9'))).toEqual([]);
      }
    });

    it('catches every change of one character of a North-American VIN', () => {
      // 49 CFR 565.15(c): weights are 1–10 except position 9 and 11 is prime, so changing one
      // character to one with a different transliteration value always changes Σ mod 11.
      const base = '1J9RP1A36A1644345';
      let tried = 0;
      for (let pos = 0; pos < 17; pos++) {
        for (const ch of VIN_ALPHABET) {
          if (vinCharValue(ch) === vinCharValue(base[pos])) continue;
          if (pos === 0 && !/[1-5]/.test(ch)) continue; // stays North-American, where the check digit is required
          const changed = base.slice(0, pos) + ch + base.slice(pos + 1);
          const r = validateVin(changed);
          expect({ changed, valid: r.valid }).toEqual({ changed, valid: false });
          expect(r.issues.some((i) => i.position === 9 && i.severity === 'error')).toBe(true);
          tried += 1;
        }
      }
      expect(tried).toBeGreaterThan(300);
    });

    it('only warns about a check digit that does not match outside North America', async () => {
      // domain-reference §5: ISO 3779 does not require a check digit; WDBEA30D3HA391172 passes, so …4… does not.
      const res = await create(tech, { vin: 'WDBEA30D4HA391172' }).expect(201);
      expect(res.body.warnings).toEqual([{ field: 'vin', message: expect.stringContaining('Position 9') }]);
    });

    it('warns when the given year disagrees with VIN position 10', async () => {
      const res2 = await create(other, { vin: '1HGCM82633A004352', year: 2005 }).expect(201);
      expect(res2.body.year).toBe(2005);
      expect(res2.body.warnings).toEqual([{ field: 'year', message: expect.stringContaining('model year 2003') }]);
    });

    it('reads the invented demo VIN YHATR6G24KH104382 as model year 2019 (position 7 a letter → 2010–2039 cycle)', async () => {
      const res = await create(tech, { vin: 'yhatr6g24kh-104382' }).expect(201);
      expect(res.body).toMatchObject({ vin: 'YHATR6G24KH104382', year: 2019 });
    });
  });

  describe('odometer', () => {
    let vehicle: VehicleDto;
    it('stores the reading in km, entered in the shop’s miles', async () => {
      const res = await create(tech, { vin: 'YHATR6G22GH061734', odometer: 50000, ownerName: 'Gareth Lowe', ownerEmail: 'g.lowe@example.com', plate: 'KV16 RDN' }).expect(201);
      vehicle = res.body;
      // 1 international mile = 1.609344 km exactly (international yard and pound agreement, 1959).
      expect(vehicle).toMatchObject({ odometerKm: 80467.2, odometer: 50000, distanceUnit: 'mi' });
    });

    it('a lower reading is a 409 warning the user confirms by sending it again', async () => {
      const res = await t.http().patch(`/api/vehicles/${vehicle.id}`).set(...bearer(tech)).send({ odometer: 49000 }).expect(409);
      expect(res.body.errors).toEqual([{ field: 'odometer', message: expect.stringContaining('lower than the last reading (50000 mi)') }]);
      expect(res.body.details).toEqual({ reason: 'odometer-lower', field: 'odometer', lastReading: 50000, lastReadingKm: 80467.2, given: 49000, unit: 'mi', confirmWith: { confirmOdometerLower: true } });
      const unchanged = await t.http().get(`/api/vehicles/${vehicle.id}`).set(...bearer(tech)).expect(200);
      expect(unchanged.body.odometer).toBe(50000);
      const confirmed = await t.http().patch(`/api/vehicles/${vehicle.id}`).set(...bearer(tech)).send({ odometer: 49000, confirmOdometerLower: true }).expect(200);
      expect(confirmed.body).toMatchObject({ odometer: 49000, odometerKm: 78857.856 });
    });

    it('re-entering the reading shown raises no warning', async () => {
      await t.http().patch(`/api/vehicles/${vehicle.id}`).set(...bearer(tech)).send({ odometer: 49000 }).expect(200);
    });
  });

  describe('list, search, pagination and sorting', () => {
    let shop: AuthResponse;
    beforeAll(async () => {
      shop = await registerOwner(t, { ...KESTREL_SHOP, name: 'Search Garage' });
      const rows = [
        { vin: '1HGCM82633A004352', plate: 'AB12 CDE', ownerName: 'Priya Anand', year: 2003 },
        { vin: '1J9RP1A36A1644345', plate: 'XY99 ZZZ', ownerName: 'Declan Moran', year: 2010 },
        { vin: '1M8GDM9AXKP042788', plate: 'KN21 WPE', ownerName: 'Joanna Fairley', ownerEmail: 'joanna@example.com', year: 1989 },
      ];
      for (const r of rows) await create(shop, r).expect(201);
    });

    it('finds by plate without spaces, owner name, owner e-mail and part of a VIN', async () => {
      const q = async (text: string) => (await t.http().get('/api/vehicles').query({ q: text }).set(...bearer(shop)).expect(200)).body;
      expect((await q('kn21wpe')).items.map((v: VehicleDto) => v.vin)).toEqual(['1M8GDM9AXKP042788']);
      expect((await q('anand')).items.map((v: VehicleDto) => v.vin)).toEqual(['1HGCM82633A004352']);
      expect((await q('joanna@')).total).toBe(1);
      expect((await q('644345')).items.map((v: VehicleDto) => v.vin)).toEqual(['1J9RP1A36A1644345']);
    });

    it('pages and sorts on the server', async () => {
      const page1 = await t.http().get('/api/vehicles').query({ sort: 'year', order: 'asc', pageSize: 2, page: 1 }).set(...bearer(shop)).expect(200);
      expect(page1.body).toMatchObject({ total: 3, page: 1, pageSize: 2 });
      expect(page1.body.items.map((v: VehicleDto) => v.year)).toEqual([1989, 2003]);
      const page2 = await t.http().get('/api/vehicles').query({ sort: 'year', order: 'asc', pageSize: 2, page: 2 }).set(...bearer(shop)).expect(200);
      expect(page2.body.items.map((v: VehicleDto) => v.year)).toEqual([2010]);
      const bad = await t.http().get('/api/vehicles').query({ sort: 'colour' }).set(...bearer(shop)).expect(400);
      expect(bad.body.errors[0].field).toBe('sort');
    });
  });

  describe('bad input and other shops', () => {
    it('names each bad field', async () => {
      const res = await t.http().post('/api/vehicles').set(...bearer(tech)).send({ vin: '1HGCM82633A004352', make: ' ', ownerEmail: 'nope' }).expect(400);
      expect([...new Set(res.body.errors.map((e: { field: string }) => e.field))].sort()).toEqual(['make', 'model', 'ownerEmail']);
    });

    it('the same VIN twice in one shop is a 409; another shop may have it', async () => {
      // tech (the owner's shop) registered 1J9RP1A36A1644345 above.
      const res = await create(owner, { vin: '1J9RP1A36A1644345' }).expect(409);
      expect(res.body.errors).toEqual([{ field: 'vin', message: 'is already registered to a vehicle of this shop' }]);
      await create(other, { vin: '1J9RP1A36A1644345' }).expect(201);
    });

    it("another shop's vehicle is a 404 for reading, changing and deleting", async () => {
      const mine = await create(owner, { vin: 'WDBEA30D3HA391172', make: 'Morrow', model: 'Strand' }).expect(201);
      const id = mine.body.id as string;
      await t.http().get(`/api/vehicles/${id}`).set(...bearer(other)).expect(404);
      await t.http().patch(`/api/vehicles/${id}`).set(...bearer(other)).send({ plate: 'X' }).expect(404);
      await t.http().delete(`/api/vehicles/${id}`).set(...bearer(other)).expect(404);
      await t.http().get('/api/vehicles/not-an-id').set(...bearer(owner)).expect(404);
      await t.http().delete(`/api/vehicles/${id}`).set(...bearer(owner)).expect(204);
      await t.http().get(`/api/vehicles/${id}`).set(...bearer(owner)).expect(404);
    });

    it('needs a token', async () => {
      await t.http().get('/api/vehicles').expect(401);
    });
  });
});
