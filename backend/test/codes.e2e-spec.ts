import { parse } from 'csv-parse/sync';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { bearer, createTestApp, registerOwner, setRole, type TestApp } from './utils/test-app';
import type { AuthResponse } from '@causeway/shared';

/**
 * The MIT-licensed reference list of generic powertrain titles (todrobbins/dtcdb @129a8cbf,
 * generic.csv), vendored byte for byte under seeds/reference/dtcdb.
 */
function referenceTitles(): Array<{ line: number; code: string; title: string }> {
  const csv = readFileSync(join(__dirname, '..', '..', 'seeds', 'reference', 'dtcdb', 'generic.csv'), 'utf8');
  const rows = parse(csv, { relax_column_count: true, relax_quotes: true, skip_empty_lines: false, trim: true }) as string[][];
  return rows.flatMap((row, i) => (/^P[0-9A-F]{4}$/.test(row[0] ?? '') ? [{ line: i + 1, code: row[0], title: row.slice(1).join(',').trim() }] : []));
}

const normalise = (s: string) => s.toLowerCase().replace(/\s+/g, ' ').trim();

describe('fault codes: decode, catalogue, search (e2e)', () => {
  let t: TestApp;
  let user: AuthResponse;
  beforeAll(async () => {
    t = await createTestApp();
    user = await registerOwner(t);
  });
  afterAll(() => t.close());

  describe('GET /api/dtc/decode (public)', () => {
    it('decodes a typed code without a token', async () => {
      const res = await t.http().get('/api/dtc/decode').query({ input: 'P0456' }).expect(200);
      expect(res.body.structure).toMatchObject({ code: 'P0456', system: 'P', control: 'sae', bytes: '04 56', corrections: [] });
      expect(res.body.known.title).toMatch(/very small leak/i);
    });

    it('repairs letter O for zero and says so (product.md §1)', async () => {
      const res = await t.http().get('/api/dtc/decode').query({ input: ' po456 ' }).expect(200);
      expect(res.body.structure.code).toBe('P0456');
      expect(res.body.structure.corrections).toEqual([expect.objectContaining({ position: 2, from: 'O', to: '0' })]);
    });

    it('reads the two-byte form of a service $03 response (SAE J1979; python-OBD test vectors)', async () => {
      const res = await t.http().get('/api/dtc/decode').query({ input: '01 04' }).expect(200);
      expect(res.body.structure.code).toBe('P0104');
      const u = await t.http().get('/api/dtc/decode').query({ input: 'C1 00' }).expect(200);
      expect(u.body.structure.code).toBe('U0100');
    });

    it('reads the three-byte form with a failure-type byte and a status byte (ISO 14229-1, domain-reference §2.2)', async () => {
      const res = await t.http().get('/api/dtc/decode').query({ input: '04 20 00', status: '0x08' }).expect(200);
      expect(res.body.structure.display).toBe('P0420-00');
      const confirmed = res.body.status.bits.find((b: { bit: number }) => b.bit === 3);
      expect(confirmed).toMatchObject({ set: true });
      expect(res.body.status.bits.filter((b: { set: boolean }) => b.set)).toHaveLength(1);
      const ftb = await t.http().get('/api/dtc/decode').query({ input: 'P0456-13' }).expect(200);
      expect(ftb.body.structure.failureType.description).toMatch(/open/i);
    });

    it('decodes a valid code that is not in the catalogue', async () => {
      const res = await t.http().get('/api/dtc/decode').query({ input: 'P2B4A' }).expect(200);
      expect(res.body.known).toBeNull();
      expect(res.body.structure.code).toBe('P2B4A');
    });

    it.each([
      ['', null],
      ['P9', null],
      ['PGGGG', 2],
      ['P0GGG', 3],
      ['X0123', 1],
      ['P4123', 2],
      ['P0123456789012345678901234567890', null],
      ['P04é6', null],
    ])('rejects %p with a 400 naming the position and the rule', async (input, position) => {
      const res = await t.http().get('/api/dtc/decode').query({ input }).expect(400);
      expect(res.body.errors[0].field).toBe('input');
      expect(res.body.message.length).toBeGreaterThan(8);
      if (position !== null) expect(res.body.errors[0].message).toMatch(new RegExp(`position ${position}`));
    });

    it('rejects a malformed status byte naming the field', async () => {
      const res = await t.http().get('/api/dtc/decode').query({ input: 'P0420', status: 'zz' }).expect(400);
      expect(res.body.errors).toEqual([expect.objectContaining({ field: 'status' })]);
    });

    it('needs an input', async () => {
      const res = await t.http().get('/api/dtc/decode').expect(400);
      expect(res.body.errors[0].field).toBe('input');
    });
  });

  describe('GET /api/codes/:code', () => {
    it('needs a token', async () => {
      await t.http().get('/api/codes/P0456').expect(401);
      await t.http().get('/api/codes').expect(401);
    });

    it('answers the entry with structure, verification and cautions that defer to the maker', async () => {
      const res = await t.http().get('/api/codes/po456').set(...bearer(user)).expect(200);
      expect(res.body).toMatchObject({ code: 'P0456', make: null, system: 'P' });
      expect(res.body.description.length).toBeGreaterThan(20);
      expect(res.body.verification.monitor).toMatch(/EVAP/i);
      const fuel = res.body.cautions.find((c: { key: string }) => c.key === 'fuel-vapour');
      expect(fuel).toBeDefined();
      expect(fuel.points.join(' ')).toMatch(/maker's procedure, local regulations and licensed practice/i);
    });

    it('gives each system its cautions: hybrid high voltage, airbags, brakes', async () => {
      const keys = async (code: string) => (await t.http().get(`/api/codes/${code}`).set(...bearer(user)).expect(200)).body.cautions.map((c: { key: string }) => c.key);
      expect(await keys('P0A80')).toContain('hybrid-high-voltage');
      expect(await keys('B0001')).toContain('airbag-srs');
      expect(await keys('C0035')).toContain('brakes');
    });

    it('a manufacturer-controlled code means what its make says', async () => {
      const res = await t.http().get('/api/codes/P1A10').query({ make: 'Halden' }).set(...bearer(user)).expect(200);
      expect(res.body).toMatchObject({ make: 'Halden', control: 'manufacturer' });
      const other = await t.http().get('/api/codes/P1A10').query({ make: 'Morrow' }).set(...bearer(user)).expect(404);
      expect(other.body.details.structure.code).toBe('P1A10');
    });

    it('400 with the reason for an invalid code; 404 with the decoded structure for a valid unknown one', async () => {
      const bad = await t.http().get('/api/codes/X0123').set(...bearer(user)).expect(400);
      expect(bad.body.errors[0]).toMatchObject({ field: 'code', message: expect.stringMatching(/position 1/) });
      const unknown = await t.http().get('/api/codes/P2B4A').set(...bearer(user)).expect(404);
      expect(unknown.body.details.structure).toMatchObject({ code: 'P2B4A', system: 'P', control: 'sae' });
    });
  });

  describe('GET /api/codes (search)', () => {
    it('finds by code prefix, in code order', async () => {
      const res = await t.http().get('/api/codes').query({ q: 'p045', pageSize: 100 }).set(...bearer(user)).expect(200);
      const codes = res.body.items.map((i: { code: string }) => i.code);
      expect(codes).toEqual(expect.arrayContaining(['P0450', 'P0455', 'P0456']));
      expect(codes.every((c: string) => c.startsWith('P045'))).toBe(true);
      expect([...codes].sort()).toEqual(codes);
    });

    it('finds by words in title, description and symptoms', async () => {
      const res = await t.http().get('/api/codes').query({ q: 'misfire cylinder' }).set(...bearer(user)).expect(200);
      expect(res.body.items.map((i: { code: string }) => i.code)).toEqual(expect.arrayContaining(['P0300', 'P0301']));
    });

    it('filters by system and by who controls the code, and paginates', async () => {
      const body = (await t.http().get('/api/codes').query({ system: 'b' }).set(...bearer(user)).expect(200)).body;
      expect(body.items.length).toBeGreaterThan(0);
      expect(body.items.every((i: { system: string }) => i.system === 'B')).toBe(true);
      const manu = (await t.http().get('/api/codes').query({ control: 'manufacturer' }).set(...bearer(user)).expect(200)).body;
      expect(manu.items.every((i: { control: string }) => i.control === 'manufacturer')).toBe(true);
      const p1 = (await t.http().get('/api/codes').query({ pageSize: 10, page: 1 }).set(...bearer(user)).expect(200)).body;
      const p2 = (await t.http().get('/api/codes').query({ pageSize: 10, page: 2 }).set(...bearer(user)).expect(200)).body;
      expect(p1.total).toBe(p2.total);
      expect(p1.items[9].code < p2.items[0].code).toBe(true);
      const desc = (await t.http().get('/api/codes').query({ sort: 'code', order: 'desc', pageSize: 5 }).set(...bearer(user)).expect(200)).body;
      expect(desc.items[0].code >= desc.items[4].code).toBe(true);
    });

    it('caps the page size and names bad filters', async () => {
      const res = await t.http().get('/api/codes').query({ pageSize: 5000, system: 'X', sort: 'password' }).set(...bearer(user)).expect(400);
      expect(res.body.errors.map((e: { field: string }) => e.field)).toEqual(expect.arrayContaining(['pageSize', 'system', 'sort']));
    });

    it('gives the whole catalogue index for client-side fuzzy search', async () => {
      const res = await t.http().get('/api/codes/index').set(...bearer(user)).expect(200);
      expect(res.body.length).toBeGreaterThan(450);
      expect(res.body[0]).toEqual(expect.objectContaining({ code: expect.any(String), title: expect.any(String), symptoms: expect.any(String) }));
    });
  });

  it('the catalogue agrees with the dtcdb reference titles on at least 95 % of the codes both hold', async () => {
    // Source: todrobbins/dtcdb @129a8cbf generic.csv (MIT). Its known faults (seeds/catalogue/dtcdb-corrections.json:
    // mis-numbered and merged rows) are the listed exceptions: their lines are left out of the comparison.
    const corrections = JSON.parse(readFileSync(join(__dirname, '..', '..', 'seeds', 'catalogue', 'dtcdb-corrections.json'), 'utf8')) as Array<{ line: number }>;
    const faulty = new Set(corrections.map((c) => c.line));
    const index = (await t.http().get('/api/codes/index').set(...bearer(user)).expect(200)).body as Array<{ code: string; make: string | null; title: string }>;
    const ours = new Map(index.filter((e) => e.make === null).map((e) => [e.code, e.title]));
    let both = 0;
    let same = 0;
    for (const ref of referenceTitles()) {
      if (faulty.has(ref.line) || !ours.has(ref.code)) continue;
      both += 1;
      if (normalise(ours.get(ref.code)!) === normalise(ref.title)) same += 1;
    }
    expect(both).toBeGreaterThan(400);
    expect(same / both).toBeGreaterThanOrEqual(0.95);
  });

  describe('POST /api/codes/import (admin)', () => {
    let admin: AuthResponse;
    beforeAll(async () => {
      admin = await registerOwner(t);
      await setRole(t, admin.user.id, 'admin');
    });

    const csv = (s: string) => Buffer.from(s, 'utf8');

    it('only admins may import', async () => {
      await t.http().post('/api/codes/import').set(...bearer(user)).attach('file', csv('code,title\nP1234,x\n'), 'c.csv').expect(403);
    });

    it('reports every rejected row by line and column, and refuses the file whole', async () => {
      const file = '\uFEFFCode;Make;Title;Verification hours;Cautions\nP1A99;Halden;Invented sensor circuit;0.5;fuel-vapour\nX1234;;Bad letter;;\nP1A98;;;;\nP1A97;;Hours wrong;lots;\nP1A96;;Caution wrong;;asbestos\n';
      const res = await t.http().post('/api/codes/import?dryRun=false').set(...bearer(admin)).attach('file', csv(file), 'cat.csv').expect(200);
      expect(res.body).toMatchObject({ rows: 5, accepted: 1, rejected: 4, created: 0 });
      expect(res.body.problems).toEqual(
        expect.arrayContaining([
          expect.objectContaining({ line: 3, column: 'code' }),
          expect.objectContaining({ line: 4, column: 'title' }),
          expect.objectContaining({ line: 5, column: 'verification_hours' }),
          expect.objectContaining({ line: 6, column: 'cautions' }),
        ]),
      );
      await t.http().get('/api/codes/P1A99').query({ make: 'Halden' }).set(...bearer(admin)).expect(404);
    });

    it('a dry run writes nothing; a commit writes the valid file; importing again changes nothing new', async () => {
      const file = 'code,make,title,description,symptoms\nP1A99,Halden,Invented sensor circuit,Invented for a test,"stalls; rough idle"\n';
      const dry = await t.http().post('/api/codes/import').set(...bearer(admin)).attach('file', csv(file), 'c.csv').expect(200);
      expect(dry.body).toMatchObject({ dryRun: true, accepted: 1, created: 0 });
      await t.http().get('/api/codes/P1A99').query({ make: 'Halden' }).set(...bearer(admin)).expect(404);
      const done = await t.http().post('/api/codes/import?dryRun=false').set(...bearer(admin)).attach('file', csv(file), 'c.csv').expect(200);
      expect(done.body).toMatchObject({ accepted: 1, created: 1 });
      const entry = await t.http().get('/api/codes/P1A99').query({ make: 'Halden' }).set(...bearer(admin)).expect(200);
      expect(entry.body).toMatchObject({ title: 'Invented sensor circuit', symptoms: ['stalls', 'rough idle'], source: 'import' });
      const again = await t.http().post('/api/codes/import?dryRun=false').set(...bearer(admin)).attach('file', csv(file), 'c.csv').expect(200);
      expect(again.body).toMatchObject({ created: 0, updated: 1 });
    });

    it('refuses files that are not a catalogue', async () => {
      const noCode = await t.http().post('/api/codes/import').set(...bearer(admin)).attach('file', csv('name,value\na,b\n'), 'c.csv').expect(200);
      expect(noCode.body.problems[0]).toMatchObject({ line: 1, column: 'code' });
      const empty = await t.http().post('/api/codes/import').set(...bearer(admin)).attach('file', csv(''), 'c.csv').expect(400);
      expect(empty.body.errors[0].field).toBe('file');
      const binary = await t.http().post('/api/codes/import').set(...bearer(admin)).attach('file', Buffer.from([0x89, 0x50, 0x4e, 0x47, 0, 1, 2, 255]), 'c.csv').expect(400);
      expect(binary.body.errors[0].field).toBe('file');
      const missing = await t.http().post('/api/codes/import').set(...bearer(admin)).expect(400);
      expect(missing.body.errors[0].field).toBe('file');
    });
  });
});
