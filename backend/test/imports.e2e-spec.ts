import fc from 'fast-check';
import { randomUUID } from 'node:crypto';
import type { AuthResponse, ImportDto, ImportReport, JobDto } from '@causeway/shared';
import { HEADER, VIN, csv, fixture, row } from './fixtures/csv/scan-csv';
import { KESTREL_SHOP, bearer, createTestApp, registerOwner, type TestApp } from './utils/test-app';

// vin-generator (npm) makes VINs with a check digit it computes itself: an outside reference for 49 CFR 565.15.
const { generateVin } = require('vin-generator') as { generateVin: () => string };

type ShopInput = Omit<typeof KESTREL_SHOP, 'distanceUnit'> & { distanceUnit: 'km' | 'mi' };
const US_SHOP: ShopInput = { name: 'Test Garage US', currency: 'USD', locale: 'en-US', labourRateMinor: 12000, taxRateBp: 0, distanceUnit: 'mi' };
const EU_SHOP: ShopInput = { name: 'Test Werkstatt', currency: 'EUR', locale: 'de-DE', labourRateMinor: 9000, taxRateBp: 1900, distanceUnit: 'km' };
const owner = (t: TestApp, shop: ShopInput) => registerOwner(t, shop as typeof KESTREL_SHOP);

describe('scan-tool CSV import (e2e)', () => {
  let t: TestApp;
  let gb: AuthResponse;
  beforeAll(async () => {
    t = await createTestApp();
    gb = await registerOwner(t);
  });
  afterAll(() => t.close());

  type Query = { dryRun?: string; validOnly?: string; id?: string };
  const post = (auth: AuthResponse, file: Buffer | null, query: Query = { dryRun: 'true' }, fields: Record<string, string> = {}, name = 'scan.csv') => {
    let req = t.http().post('/api/imports').query(query).set(...bearer(auth));
    for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
    return file ? req.attach('file', file, name) : req;
  };
  const preview = async (auth: AuthResponse, file: Buffer, fields: Record<string, string> = {}) => {
    const res = await post(auth, file, { dryRun: 'true' }, fields).expect(200);
    return res.body as ImportReport;
  };
  const commit = async (auth: AuthResponse, file: Buffer, query: Query = {}) => {
    const res = await post(auth, file, { dryRun: 'false', ...query }).expect(200);
    return res.body as ImportReport;
  };
  const count = async (sql: string, params: unknown[]) => Number((await t.query<{ n: number | string }>(sql, params))[0].n);
  const counts = async (auth: AuthResponse) => {
    const shopId = auth.user.shop!.id;
    return {
      vehicles: await count('SELECT COUNT(*) AS "n" FROM "vehicles" WHERE "shopId" = ?', [shopId]),
      jobs: await count('SELECT COUNT(*) AS "n" FROM "jobs" WHERE "shopId" = ?', [shopId]),
      codes: await count('SELECT COUNT(*) AS "n" FROM "job_codes" c JOIN "jobs" j ON j."id" = c."jobId" WHERE j."shopId" = ?', [shopId]),
    };
  };
  const jobsOf = async (auth: AuthResponse): Promise<JobDto[]> => {
    const list = await t.http().get('/api/jobs').query({ pageSize: 100, sort: 'openedAt', order: 'asc' }).set(...bearer(auth)).expect(200);
    return Promise.all(list.body.items.map(async (j: { id: string }) => (await t.http().get(`/api/jobs/${j.id}`).set(...bearer(auth)).expect(200)).body as JobDto));
  };
  const errorsOf = (r: ImportReport) => r.problems.filter((p) => p.severity === 'error');

  describe('detect: separator, encoding, line endings, quoting', () => {
    const rows = [row('2025-03-14 09:30', VIN.honda, 12000, 'P0171'), row('2025-03-14 09:31', VIN.honda, 12000, 'P0300')];

    it.each([
      [',', 'comma'],
      [';', 'semicolon'],
      ['\t', 'tab'],
    ] as const)('reads a %j-separated file (%s)', async (delimiter, _name) => {
      const r = await preview(gb, csv(HEADER, rows, { delimiter }));
      expect(r.detected.delimiter).toBe(delimiter);
      expect(r).toMatchObject({ rows: 2, accepted: 2, rejected: 0 });
      expect(r.preview.map((p) => p.code)).toEqual(['P0171', 'P0300']);
    });

    it('takes a UTF-8 byte-order mark off the first header and says it was there', async () => {
      const r = await preview(gb, csv(HEADER, rows, { bom: true }));
      expect(r.detected.encoding).toBe('utf-8-bom');
      expect(r.detected.headers[0]).toBe('Date');
      expect(r.detected.mapping.columns.date).toBe('Date');
      const plain = await preview(gb, csv(HEADER, rows));
      expect(plain.detected.encoding).toBe('utf-8');
    });

    it('reads CRLF, a quoted field with an embedded line break and doubled quotes (RFC 4180 §2.5–2.7), numbering lines as a text editor does', async () => {
      const text =
        'Date,VIN,DTC,Description\r\n' + // line 1
        `2025-03-14 09:30,${VIN.honda},P0171,"lean,\r\nbank ""1"""\r\n` + // lines 2–3
        `2025-03-14 09:31,${VIN.honda},P0300,plain\r\n` + // line 4
        `2025-03-14 09:32,${VIN.honda},XYZ,bad code\r\n`; // line 5
      const r = await preview(gb, Buffer.from(text));
      expect(r.detected.lineEnding).toBe('crlf');
      expect(r.preview[0]).toMatchObject({ line: 2, description: 'lean,\r\nbank "1"' });
      expect(r.preview.map((p) => p.line)).toEqual([2, 4, 5]);
      // The line of the bad row counted independently: the index of its first character's line in the text.
      const expectedLine = text.slice(0, text.indexOf(',XYZ,')).split('\r\n').length;
      expect(errorsOf(r)).toEqual([expect.objectContaining({ line: expectedLine, column: 'DTC' })]);
    });

    it('reads the committed semicolon, BOM and CRLF fixture with a decimal comma and day-first dates', async () => {
      const r = await preview(gb, fixture('semicolon-bom-crlf.csv'));
      expect(r.detected).toMatchObject({ delimiter: ';', encoding: 'utf-8-bom', lineEnding: 'crlf' });
      expect(r.detected.mapping.columns).toMatchObject({ date: 'Scan date', vin: 'VIN', odometer: 'Mileage (km)', module: 'ECU', code: 'Fault code', status: 'State', description: 'Text' });
      expect(r.detected.mapping.odometerUnit).toBe('km');
      expect(r).toMatchObject({ rows: 4, accepted: 4, rejected: 0 });
      expect(r.preview.map((p) => [p.line, p.code, p.status])).toEqual([
        [2, 'P0171', 'stored'],
        [3, 'P0420', 'pending'],
        [5, 'U0100', 'permanent'],
        [6, 'P0300', 'stored'],
      ]);
      expect(r.preview[0]).toMatchObject({ scanDay: '2025-03-14', odometerKm: 123456, freezeFrame: { 'Engine speed': 812, 'Coolant temp': 91.5 } });
      expect(r.preview[2].description).toBe('Lost communication; "ECM"');
      expect(r.preview[3].odometerKm).toBe(88000);
    });

    it('reads the committed tab-separated fixture: ISO 8601 with offsets, a unit column, a failure-type byte', async () => {
      const r = await preview(gb, fixture('tab-separated.csv'));
      expect(r.detected).toMatchObject({ delimiter: '\t', lineEnding: 'lf' });
      expect(r.preview.map((p) => [p.code, p.scannedAt, p.odometerKm])).toEqual([
        // 100 mi = 160.9344 km exactly (international mile of 1959: 1760 yd × 0.9144 m).
        ['P0456', '2025-03-14T09:30:00.000Z', 160.9344],
        ['P0442-13', '2025-03-14T09:15:00.000Z', 161],
        ['U0100', '2025-03-15T08:00:00.000Z', 42000],
      ]);
    });
  });

  describe('rows: codes, statuses, dates, odometer, VINs', () => {
    it('accepts lower-case, O-for-0 and hex codes and lists each correction (SAE J2012; J1979 two-byte form, domain-reference §2.1)', async () => {
      const codes = ['p0171', 'PO300', '01 04', '0A 80', 'C1 00', '04 56 13', ' P0420 '];
      const r = await preview(gb, csv(HEADER, codes.map((c, i) => row(`2025-03-14 09:${10 + i}`, VIN.honda, 1000, c))));
      expect(r.rejected).toBe(0);
      // python-OBD test vectors and the [calc] rows of domain-reference §2.1: 01 04 → P0104, 0A 80 → P0A80, C1 00 → U0100.
      expect(r.preview.map((p) => p.code)).toEqual(['P0171', 'P0300', 'P0104', 'P0A80', 'U0100', 'P0456-13', 'P0420']);
      expect(r.corrections).toEqual([
        { line: 2, column: 'DTC', from: 'p0171', to: 'P0171' },
        { line: 3, column: 'DTC', from: 'PO300', to: 'P0300' },
        { line: 4, column: 'DTC', from: '01 04', to: 'P0104' },
        { line: 5, column: 'DTC', from: '0A 80', to: 'P0A80' },
        { line: 6, column: 'DTC', from: 'C1 00', to: 'U0100' },
        { line: 7, column: 'DTC', from: '04 56 13', to: 'P0456-13' },
      ]);
    });

    it('names the line and column of a code the codec refuses (00 00 is padding, not a code)', async () => {
      const r = await preview(gb, csv(HEADER, [row('2025-03-14 09:30', VIN.honda, 1000, '00 00'), row('2025-03-14 09:30', VIN.honda, 1000, 'P12')]));
      expect(r.rejected).toBe(2);
      expect(errorsOf(r)).toEqual([
        expect.objectContaining({ line: 2, column: 'DTC', message: expect.stringMatching(/padding/) }),
        expect.objectContaining({ line: 3, column: 'DTC', message: expect.stringMatching(/too short/) }),
      ]);
    });

    it('maps status words and UDS status bytes (ISO 14229-1: bit 3 confirmed, bit 2 pending) and refuses unknown and history statuses', async () => {
      const statuses = ['Stored', 'confirmed', 'PENDING', 'permanent', '', '0x08', '0x04', 'history', 'maybe', 'constructor'];
      const r = await preview(gb, csv(HEADER, statuses.map((s, i) => row(`2025-03-14 09:${10 + i}`, VIN.honda, 1000, `P030${i}`, s))));
      expect(r.preview.map((p) => p.status)).toEqual(['stored', 'stored', 'pending', 'permanent', 'stored', 'stored', 'pending', null, null, null]);
      expect(errorsOf(r)).toEqual([
        expect.objectContaining({ line: 9, column: 'Status', message: expect.stringMatching(/history code/) }),
        expect.objectContaining({ line: 10, column: 'Status', message: expect.stringMatching(/not a status/) }),
        // A word that names a property of every JavaScript object is a word like any other.
        expect.objectContaining({ line: 11, column: 'Status', message: expect.stringMatching(/not a status/) }),
      ]);
      // A mapping may give a word a meaning.
      const mapped = await preview(gb, csv(HEADER, [row('2025-03-14 09:10', VIN.honda, 1000, 'P0300', 'history')]), { mapping: JSON.stringify({ statusValues: { history: 'stored' } }) });
      expect(mapped.preview[0].status).toBe('stored');
    });

    it('reads the documented date forms, and names line and column of one it cannot read', async () => {
      const dates = ['2025-03-14', '2025-03-14T09:30:15Z', '2025-03-14T09:30:15+02:00', '2025-03-14 09:30:15', '14/03/2025 09:30', '14.03.2025 09:30', '03/14/2025 2:30 PM', '2025-02-30', 'yesterday', '14/03/25'];
      const r = await preview(gb, csv(HEADER, dates.map((d, i) => row(d, VIN.honda, 1000, `P030${i}`))));
      expect(r.preview.map((p) => p.scannedAt)).toEqual([
        '2025-03-14T00:00:00.000Z',
        '2025-03-14T09:30:15.000Z',
        '2025-03-14T07:30:15.000Z',
        '2025-03-14T09:30:15.000Z',
        '2025-03-14T09:30:00.000Z',
        '2025-03-14T09:30:00.000Z',
        null, // an en-GB shop reads slash dates day first: there is no month 14
        null,
        null,
        null,
      ]);
      expect(errorsOf(r).map((p) => [p.line, p.column])).toEqual([
        [8, 'Date'],
        [9, 'Date'],
        [10, 'Date'],
        [11, 'Date'],
      ]);
      expect(errorsOf(r)[0].message).toMatch(/no month 14.*DD\/MM\/YYYY.*dateOrder/);
      expect(errorsOf(r)[3].message).toMatch(/four digits/);
    });

    it("reads an ambiguous slash date in the shop locale's order (CLDR short date patterns, as Intl.DateTimeFormat gives them)", async () => {
      const us = await owner(t, US_SHOP);
      const file = csv(HEADER, [row('03/04/2025 10:00', VIN.honda, 1000, 'P0171')]);
      const dayFirst = (locale: string) => {
        const parts = new Intl.DateTimeFormat(locale).formatToParts(new Date(Date.UTC(2025, 2, 4))).map((p) => p.type);
        return parts.indexOf('day') < parts.indexOf('month');
      };
      expect(dayFirst('en-GB')).toBe(true);
      expect(dayFirst('en-US')).toBe(false);
      expect((await preview(gb, file)).preview[0].scanDay).toBe('2025-04-03');
      expect((await preview(us, file)).preview[0].scanDay).toBe('2025-03-04');
      const overridden = await preview(us, file, { mapping: JSON.stringify({ dateOrder: 'DMY' }) });
      expect(overridden.preview[0].scanDay).toBe('2025-04-03');
    });

    it('stores the odometer in km from the header unit, a unit column, a value suffix or the shop unit (1 mi = 1.609344 km)', async () => {
      const eu = await owner(t, EU_SHOP);
      const header = ['Date', 'VIN', 'Odometer', 'Unit', 'DTC'];
      const r = await preview(eu, csv(header, [
        ['2025-03-14', VIN.honda, '100', 'mi', 'P0171'],
        ['2025-03-14', VIN.honda, '100', '', 'P0300'], // the shop's km
        ['2025-03-14', VIN.honda, '100 mi', '', 'P0301'],
        ['2025-03-14', VIN.honda, '12,345.5', 'km', 'P0302'],
        ['2025-03-14', VIN.honda, '100', 'furlongs', 'P0303'],
        ['2025-03-14', VIN.honda, 'lots', '', 'P0304'],
        ['2025-03-14', VIN.honda, '100 constructor', 'toString', 'P0305'],
      ]));
      expect(r.preview.map((p) => p.odometerKm)).toEqual([160.9344, 100, 160.9344, 12345.5, null, null, null]);
      expect(errorsOf(r).map((p) => [p.line, p.column])).toEqual([
        [6, 'Unit'],
        [7, 'Odometer'],
        [8, 'Odometer'],
      ]);
      // The header's unit: "Odometer (mi)".
      const mi = await preview(eu, csv(HEADER, [row('2025-03-14', VIN.honda, 100, 'P0171')]));
      expect(mi.detected.mapping.odometerUnit).toBe('mi');
      expect(mi.preview[0].odometerKm).toBe(160.9344);
    });

    it('checks VINs: a wrong North-American check digit is an error, a European VIN without one only a warning (49 CFR 565.15; ISO 3779)', async () => {
      const vins = [VIN.honda, VIN.ford, VIN.nhtsa, VIN.ones, VIN.euPasses, VIN.badCheckDigit, VIN.euNoCheckDigit, '1HGCM82633A00435', 'WVWZZZ1JZXW00O001'];
      const r = await preview(gb, csv(HEADER, vins.map((v, i) => row('2025-03-14 09:30', v, 1000, `P030${i}`))));
      expect(r.preview.map((p) => p.valid)).toEqual([true, true, true, true, true, false, true, false, false]);
      expect(errorsOf(r)).toEqual([
        expect.objectContaining({ line: 7, column: 'VIN', message: expect.stringMatching(/Position 9: check digit is '4' but the other characters give '3'/) }),
        expect.objectContaining({ line: 9, column: 'VIN', message: expect.stringMatching(/17 characters/) }),
        expect.objectContaining({ line: 10, column: 'VIN', message: expect.stringMatching(/letter O/) }),
      ]);
      expect(r.problems.filter((p) => p.severity === 'warning')).toEqual([expect.objectContaining({ line: 8, column: 'VIN', message: expect.stringMatching(/Position 9.*need not carry one/) })]);
    });

    it('accepts VINs whose check digit an outside library computed (vin-generator)', async () => {
      const vins = Array.from({ length: 25 }, () => generateVin());
      const r = await preview(gb, csv(HEADER, vins.map((v) => row('2025-03-14', v, 1000, 'P0171'))));
      expect(errorsOf(r)).toEqual([]);
      expect(r.accepted).toBe(25);
    });

    it('keeps freeze-frame columns as key/values on the stored code, numbers as numbers', async () => {
      const shop = await owner(t, EU_SHOP);
      const header = ['Date', 'VIN', 'DTC', 'FF: RPM', 'Freeze frame: Coolant temp', 'Fuel system', 'Extra'];
      const r = await commit(shop, csv(header, [['2025-03-14 09:30', VIN.ford, 'P0171', '812', '91.5', 'CL', 'ignored']]));
      expect(r.detected.unmapped).toEqual(['Fuel system', 'Extra']);
      const second = await commit(shop, csv(header, [['2025-03-15 09:30', VIN.ford, 'P0300', '700', '90', 'OL', 'ignored']]));
      expect(second.committed).toBe(true);
      // A mapping's list replaces the detected one, and marks any column as freeze frame.
      const withMapping = await post(shop, csv(header, [['2025-03-16 09:30', VIN.ford, 'P0300', '700', '90', 'OL', 'x']]), { dryRun: 'false' }, {
        mapping: JSON.stringify({ freezeFrame: [{ header: 'FF: RPM', key: 'rpm' }, { header: 'Fuel system', key: 'fuelSystem' }] }),
      }).expect(200);
      expect(withMapping.body.detected.unmapped).toEqual(['Freeze frame: Coolant temp', 'Extra']);
      const jobs = await jobsOf(shop);
      expect(jobs.map((j) => j.codes[0].freezeFrame)).toEqual([{ 'Coolant temp': 91.5, RPM: 812 }, { 'Coolant temp': 90, RPM: 700 }, { fuelSystem: 'OL', rpm: 700 }]);
    });
  });

  describe('whole-file problems answer 400 naming the file or the column, before any row is read', () => {
    it.each([
      ['vin', ['Date', 'DTC'], /no VIN column/],
      ['code', ['Date', 'VIN', 'Status'], /no code column/],
      ['date', ['VIN', 'DTC'], /no date column/],
    ])('a file without a %s column', async (missing, header, message) => {
      const res = await post(gb, csv(header, [header.map(() => 'x')]), { dryRun: 'false' }).expect(400);
      expect(res.body.message).toMatch(message);
      expect(res.body.errors[0]).toMatchObject({ field: 'file', message: expect.stringContaining(`mapping.columns.${missing}`) });
      expect(res.body.details).toMatchObject({ missing: [missing], headers: header });
      const history = await t.http().get('/api/imports').set(...bearer(gb)).expect(200);
      expect(history.body.items.every((i: { fileName: string; status: string }) => i.status !== 'running')).toBe(true);
    });

    it('an empty file, a blank file and a header-only file', async () => {
      for (const file of [Buffer.alloc(0), Buffer.from('\r\n\r\n  \n'), Buffer.from([0xef, 0xbb, 0xbf])]) {
        const res = await post(gb, file).expect(400);
        expect(res.body.errors).toEqual([{ field: 'file', message: 'is empty' }]);
      }
      const headerOnly = await post(gb, csv(HEADER, [])).expect(400);
      expect(headerOnly.body.errors).toEqual([{ field: 'file', message: 'has a header line but no data rows' }]);
    });

    it('binary junk, a workbook, UTF-16 and Latin-1 text', async () => {
      const cases: Array<[Buffer, RegExp]> = [
        [Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]), /PNG image/],
        [Buffer.from([0x50, 0x4b, 0x03, 0x04, 20, 0, 6, 0]), /ZIP archive.*save the sheet as CSV/],
        [Buffer.from('\ufeffDate,VIN\r\n', 'utf16le'), /not a text file|UTF-16/],
        [Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from('Date,VIN\r\n', 'utf16le')]), /UTF-16/],
        [Buffer.from('Date,VIN,DTC\n2025-03-14,Citro\xebn,P0171\n', 'latin1'), /not UTF-8/],
        [Buffer.from([1, 2, 3, 4, 5, 6, 7, 8, 0x41, 0x42]), /not a text file/],
      ];
      for (const [file, message] of cases) {
        const res = await post(gb, file, { dryRun: 'false' }).expect(400);
        expect(res.body.errors[0]).toMatchObject({ field: 'file', message: expect.stringMatching(message) });
      }
    });

    it('no file, a second file, an unknown field', async () => {
      const none = await post(gb, null).expect(400);
      expect(none.body.errors[0]).toMatchObject({ field: 'file', message: expect.stringMatching(/is required/) });
      const two = await t.http().post('/api/imports').set(...bearer(gb)).attach('file', csv(HEADER, []), 'a.csv').attach('file', csv(HEADER, []), 'b.csv').expect(400);
      expect(two.body.errors[0]).toMatchObject({ field: 'file', message: 'only one file per import' });
      const unknown = await post(gb, csv(HEADER, [row('2025-03-14', VIN.honda, 1, 'P0171')]), { dryRun: 'true' }, { colour: 'red' }).expect(400);
      expect(unknown.body.errors[0]).toMatchObject({ field: 'colour' });
      const badFlag = await post(gb, csv(HEADER, [row('2025-03-14', VIN.honda, 1, 'P0171')]), { dryRun: 'yes' }).expect(400);
      expect(badFlag.body.errors[0]).toMatchObject({ field: 'dryRun', message: 'must be true or false' });
    });

    it('a file over the size limit (413) and over the row limit (400), each with a clear message', async () => {
      const saved = { bytes: process.env.IMPORT_MAX_BYTES, rows: process.env.IMPORT_MAX_ROWS };
      try {
        process.env.IMPORT_MAX_BYTES = String(64 * 1024);
        const big = csv(HEADER, Array.from({ length: 1500 }, (_, i) => row('2025-03-14', VIN.honda, i, 'P0171')));
        expect(big.length).toBeGreaterThan(64 * 1024);
        const res = await post(gb, big, { dryRun: 'false' }).expect(413);
        expect(res.body.errors[0]).toMatchObject({ field: 'file', message: expect.stringMatching(/larger than 0.06 MB, the limit for one import/) });
        delete process.env.IMPORT_MAX_BYTES;
        process.env.IMPORT_MAX_ROWS = '100';
        const before = await counts(gb);
        const many = await post(gb, big, { dryRun: 'false' }).expect(400);
        expect(many.body.errors[0]).toMatchObject({ field: 'file', message: expect.stringMatching(/more than 100 data rows/) });
        expect(await counts(gb)).toEqual(before);
        const history = await t.http().get('/api/imports').query({ status: 'failed' }).set(...bearer(gb)).expect(200);
        expect(history.body.items[0]).toMatchObject({ status: 'failed' });
        const failed = await t.http().get(`/api/imports/${history.body.items[0].id}`).set(...bearer(gb)).expect(200);
        expect(failed.body.message).toMatch(/more than 100 data rows/);
      } finally {
        process.env.IMPORT_MAX_BYTES = saved.bytes;
        process.env.IMPORT_MAX_ROWS = saved.rows;
        if (saved.bytes === undefined) delete process.env.IMPORT_MAX_BYTES;
        if (saved.rows === undefined) delete process.env.IMPORT_MAX_ROWS;
      }
    });

    it('a quote that is never closed names its line', async () => {
      const text = `Date,VIN,DTC,Description\n2025-03-14,${VIN.honda},P0171,ok\n2025-03-14,${VIN.honda},P0300,"never closed\n2025-03-14,${VIN.honda},P0301,x\n`;
      const res = await post(gb, Buffer.from(text)).expect(400);
      expect(res.body.errors[0]).toMatchObject({ field: 'file', message: expect.stringMatching(/^line 3: a quoted field opened here is never closed/) });
    });
  });

  describe('commit', () => {
    const day1 = [
      row('2025-03-14 09:30', VIN.honda, 12000, 'P0171', 'stored', { rpm: 812 }),
      row('2025-03-14 09:31', VIN.honda, 12010, 'P0300', 'pending'),
      row('2025-03-14 10:00', VIN.ford, 80000, 'P0420'),
      row('2025-03-15 08:00', VIN.honda, 12100, 'P0171', 'stored'),
    ];

    it('writes vehicles by VIN, one job per vehicle and scan day, its codes; a dry run rehearses exactly that and writes nothing', async () => {
      const shop = await registerOwner(t);
      const file = csv(HEADER, day1);
      const dry = await preview(shop, file);
      expect(await counts(shop)).toEqual({ vehicles: 0, jobs: 0, codes: 0 });
      expect(dry).toMatchObject({ importId: null, committed: false, createdVehicles: 2, createdJobs: 3, createdCodes: 4 });
      const done = await commit(shop, file);
      expect(done).toMatchObject({ committed: true, refused: false, rows: 4, accepted: 4, rejected: 0, skippedDuplicates: 0, createdVehicles: 2, createdJobs: 3, createdCodes: 4 });
      expect(await counts(shop)).toEqual({ vehicles: 2, jobs: 3, codes: 4 });
      const jobs = await jobsOf(shop);
      expect(jobs.map((j) => [j.vehicle.vin, j.openedAt, j.codes.map((c) => `${c.code}:${c.status}`)])).toEqual([
        [VIN.honda, '2025-03-14T09:30:00.000Z', ['P0171:stored', 'P0300:pending']],
        [VIN.ford, '2025-03-14T10:00:00.000Z', ['P0420:stored']],
        [VIN.honda, '2025-03-15T08:00:00.000Z', ['P0171:stored']],
      ]);
      // The vehicle keeps the highest reading (12 100 mi), stored in km; the model year comes from VIN position 10 ('3' → 2003).
      const vehicles = await t.query<{ vin: string; odometerKm: number; year: number }>('SELECT "vin", "odometerKm", "year" FROM "vehicles" WHERE "shopId" = ? ORDER BY "vin"', [shop.user.shop!.id]);
      expect(vehicles.map((v) => [v.vin, Number(v.odometerKm), Number(v.year)])).toEqual([
        [VIN.honda, 19473.0624, 2003],
        [VIN.ford, 128747.52, 1989], // 80 000 mi; position 10 'K' with a digit in position 7 → 1989 (domain-reference §5)
      ]);
    });

    it('re-importing the same file, or rows of it, changes nothing; new rows of the same day join the open job', async () => {
      const shop = await registerOwner(t);
      await commit(shop, csv(HEADER, day1));
      const before = await counts(shop);
      const again = await commit(shop, csv(HEADER, day1));
      expect(again).toMatchObject({ committed: true, skippedDuplicates: 4, createdVehicles: 0, updatedVehicles: 0, createdJobs: 0, createdCodes: 0 });
      expect(again.preview.every((p) => p.duplicate)).toBe(true);
      expect(await counts(shop)).toEqual(before);
      // Re-ordered, with a different separator and a BOM: the same rows by their normalised values.
      const reshaped = await commit(shop, csv(HEADER, [...day1].reverse(), { delimiter: ';', bom: true, crlf: true }));
      expect(reshaped.skippedDuplicates).toBe(4);
      expect(await counts(shop)).toEqual(before);
      // One new code on 14 March: added to that day's open job, not a new job.
      const more = await commit(shop, csv(HEADER, [...day1, row('2025-03-14 09:40', VIN.honda, 12020, 'P0301')]));
      expect(more).toMatchObject({ skippedDuplicates: 4, createdJobs: 0, createdCodes: 1, updatedVehicles: 0 });
      const jobs = await jobsOf(shop);
      expect(jobs[0].codes.map((c) => c.code)).toEqual(['P0171', 'P0300', 'P0301']);
    });

    it('counts a row repeated in the file once, and keeps one code per job (the more serious status)', async () => {
      const shop = await registerOwner(t);
      const r = await commit(shop, csv(HEADER, [
        row('2025-03-14 09:30', VIN.honda, 12000, 'P0171', 'pending'),
        row('2025-03-14 09:30', VIN.honda, 12000, 'P0171', 'pending'),
        row('2025-03-14 09:35', VIN.honda, 12000, 'p0171', 'confirmed', { coolant: 90 }),
      ]));
      expect(r).toMatchObject({ rows: 3, accepted: 3, skippedDuplicates: 1, createdJobs: 1, createdCodes: 1 });
      const [job] = await jobsOf(shop);
      expect(job.codes).toEqual([expect.objectContaining({ code: 'P0171', status: 'stored', freezeFrame: { 'Coolant temp': 90 } })]);
    });

    it('raises the odometer only: a lower reading in a later file leaves the vehicle as it was', async () => {
      const shop = await registerOwner(t);
      await commit(shop, csv(HEADER, [row('2025-03-14', VIN.nhtsa, 50000, 'P0171')]));
      const lower = await commit(shop, csv(HEADER, [row('2025-04-14', VIN.nhtsa, 40000, 'P0300')]));
      expect(lower).toMatchObject({ createdVehicles: 0, updatedVehicles: 0, createdJobs: 1 });
      const higher = await commit(shop, csv(HEADER, [row('2025-05-14', VIN.nhtsa, 60000, 'P0420')]));
      expect(higher.updatedVehicles).toBe(1);
      const [v] = await t.query<{ odometerKm: number }>('SELECT "odometerKm" FROM "vehicles" WHERE "shopId" = ?', [shop.user.shop!.id]);
      expect(Number(v.odometerKm)).toBe(96560.64); // 60 000 mi × 1.609344
    });

    it('refuses a file with any bad row whole; validOnly imports exactly the valid rows', async () => {
      const shop = await registerOwner(t);
      const rows = [
        row('2025-03-14 09:30', VIN.honda, 1000, 'P0171'),
        row('2025-03-14 09:31', VIN.badCheckDigit, 1000, 'P0300'),
        row('2025-03-14 09:32', VIN.ford, 1000, 'P0420'),
        row('not a date', VIN.ford, 1000, 'P0455'),
        row('2025-03-14 09:34', VIN.euNoCheckDigit, 1000, 'P0456'), // a warning only
        row('2025-03-14 09:35', VIN.ford, 1000, 'Q1234'),
      ];
      const file = csv(HEADER, rows);
      const refused = await commit(shop, file);
      expect(refused).toMatchObject({ committed: false, refused: true, rows: 6, accepted: 3, rejected: 3, createdVehicles: 0, createdJobs: 0, createdCodes: 0 });
      expect(errorsOf(refused).map((p) => [p.line, p.column])).toEqual([
        [3, 'VIN'],
        [5, 'Date'],
        [7, 'DTC'],
      ]);
      expect(await counts(shop)).toEqual({ vehicles: 0, jobs: 0, codes: 0 });
      const history = await t.http().get(`/api/imports/${refused.importId}`).set(...bearer(shop)).expect(200);
      expect(history.body).toMatchObject({ status: 'refused', rejected: 3 });

      const valid = await commit(shop, file, { validOnly: 'true' });
      expect(valid).toMatchObject({ committed: true, validOnly: true, accepted: 3, rejected: 3, createdCodes: 3 });
      const stored = await t.query<{ vin: string; code: string }>(
        'SELECT v."vin" AS "vin", c."code" AS "code" FROM "job_codes" c JOIN "jobs" j ON j."id" = c."jobId" JOIN "vehicles" v ON v."id" = j."vehicleId" WHERE j."shopId" = ? ORDER BY c."code"',
        [shop.user.shop!.id],
      );
      const expected = rows.filter((_, i) => [0, 2, 4].includes(i)).map((r) => ({ vin: r[1], code: r[4] }));
      expect(stored).toEqual(expected.sort((a, b) => String(a.code).localeCompare(String(b.code))));
    });

    it('takes a client-chosen id so that the client can poll the import, and refuses it twice', async () => {
      const shop = await registerOwner(t);
      const id = randomUUID();
      const file = csv(HEADER, [row('2025-03-14', VIN.honda, 1000, 'P0171')]);
      const done = await commit(shop, file, { id });
      expect(done.importId).toBe(id);
      const polled = await t.http().get(`/api/imports/${id}`).set(...bearer(shop)).expect(200);
      expect((polled.body as ImportDto).progress).toEqual({ phase: 'done', bytesProcessed: file.length, bytesTotal: file.length, rowsProcessed: 1 });
      const twice = await post(shop, file, { dryRun: 'false', id }).expect(409);
      expect(twice.body.errors[0]).toMatchObject({ field: 'id' });
    });
  });

  describe('history and mappings', () => {
    it('lists the shop’s imports with their reports; another shop sees none of them (404)', async () => {
      const a = await registerOwner(t);
      const b = await registerOwner(t);
      const r = await commit(a, csv(HEADER, [row('2025-03-14', VIN.honda, 1000, 'P0171'), row('2025-03-14', VIN.euNoCheckDigit, 1000, 'P0300')]));
      const list = await t.http().get('/api/imports').set(...bearer(a)).expect(200);
      expect(list.body).toMatchObject({ total: 1, page: 1, items: [{ id: r.importId, fileName: 'scan.csv', status: 'committed', rows: 2, createdCodes: 2, createdBy: { id: a.user.id } }] });
      const one = await t.http().get(`/api/imports/${r.importId}`).set(...bearer(a)).expect(200);
      expect(one.body.report.problems).toEqual([expect.objectContaining({ line: 3, column: 'VIN', severity: 'warning' })]);
      expect(one.body.report.preview).toHaveLength(2);
      await t.http().get(`/api/imports/${r.importId}`).set(...bearer(b)).expect(404);
      // A file name as the browser sends it, in UTF-8, path and control characters left out.
      const named = await post(a, csv(HEADER, [row('2025-03-15', VIN.honda, 1000, 'P0171')]), { dryRun: 'false' }, {}, 'Prüfstand März.csv').expect(200);
      expect(named.body.fileName).toBe('Prüfstand März.csv');
      await t.http().get('/api/imports/not-an-id').set(...bearer(a)).expect(404);
      expect((await t.http().get('/api/imports').set(...bearer(b)).expect(200)).body.total).toBe(0);
      expect((await t.http().get('/api/imports').query({ pageSize: 1, page: 2 }).set(...bearer(a)).expect(200)).body).toMatchObject({ total: 2, page: 2, items: [{ id: r.importId }] });
      await t.http().get('/api/imports').expect(401);
    });

    it('saves, lists, applies and deletes named mappings per shop', async () => {
      const a = await registerOwner(t);
      const b = await registerOwner(t);
      const header = ['When', 'Chassis no', 'Trouble', 'Reading', 'Engine speed'];
      const file = csv(header, [['2025-03-14 09:30', VIN.honda, 'P0171', '1000', '812']]);
      const detected = await post(a, file).expect(400);
      expect(detected.body.details.missing).toEqual(['code', 'date']);

      const mapping = { columns: { date: 'When', code: 'Trouble', odometer: 'Reading' }, freezeFrame: [{ header: 'Engine speed', key: 'rpm' }], odometerUnit: 'km' };
      const saved = await t.http().post('/api/imports/mappings').set(...bearer(a)).send({ name: 'Bay 2 reader', mapping }).expect(201);
      expect(saved.body).toMatchObject({ name: 'Bay 2 reader', mapping });
      const replaced = await t.http().post('/api/imports/mappings').set(...bearer(a)).send({ name: 'Bay 2 reader', mapping }).expect(201);
      expect(replaced.body.id).toBe(saved.body.id);
      expect((await t.http().get('/api/imports/mappings').set(...bearer(a)).expect(200)).body).toHaveLength(1);
      expect((await t.http().get('/api/imports/mappings').set(...bearer(b)).expect(200)).body).toEqual([]);

      const r = await preview(a, file, { mappingName: 'Bay 2 reader' });
      expect(r.preview[0]).toMatchObject({ code: 'P0171', odometerKm: 1000, freezeFrame: { rpm: 812 } });
      await post(b, file, { dryRun: 'true' }, { mappingName: 'Bay 2 reader' }).expect(400);
      await t.http().delete(`/api/imports/mappings/${saved.body.id}`).set(...bearer(b)).expect(404);
      await t.http().delete(`/api/imports/mappings/${saved.body.id}`).set(...bearer(a)).expect(204);
      expect((await t.http().get('/api/imports/mappings').set(...bearer(a)).expect(200)).body).toEqual([]);
    });

    it('names the field of a bad mapping', async () => {
      const file = csv(HEADER, [row('2025-03-14', VIN.honda, 1, 'P0171')]);
      const notJson = await post(gb, file, { dryRun: 'true' }, { mapping: '{columns:' }).expect(400);
      expect(notJson.body.errors).toEqual([{ field: 'mapping', message: 'is not valid JSON' }]);
      const bad = await post(gb, file, { dryRun: 'true' }, { mapping: JSON.stringify({ columns: { colour: 'X', code: 7 }, dateOrder: 'YMD', statusValues: { h: 'historic' } }) }).expect(400);
      expect(bad.body.errors.map((e: { field: string }) => e.field)).toEqual(['mapping.columns.colour', 'mapping.columns.code', 'mapping.dateOrder', 'mapping.statusValues.h']);
      const missingHeader = await post(gb, file, { dryRun: 'true' }, { mapping: JSON.stringify({ columns: { code: 'Fault' } }) }).expect(400);
      expect(missingHeader.body.errors).toEqual([{ field: 'mapping.columns.code', message: 'names the header "Fault", which the file does not have' }]);
      const unmap = await post(gb, file, { dryRun: 'true' }, { mapping: JSON.stringify({ columns: { vin: null } }) }).expect(400);
      expect(unmap.body.details.missing).toEqual(['vin']);
      const badSave = await t.http().post('/api/imports/mappings').set(...bearer(gb)).send({ name: '', mapping: { odometerUnit: 'leagues' } }).expect(400);
      expect(badSave.body.errors.map((e: { field: string }) => e.field)).toContain('name');
    });
  });

  describe('never a 500 (fast-check)', () => {
    const seen = new Set<number>();

    it('random bytes', async () => {
      await fc.assert(
        fc.asyncProperty(fc.uint8Array({ maxLength: 600 }), fc.boolean(), async (bytes, dryRun) => {
          const res = await post(gb, Buffer.from(bytes), { dryRun: String(dryRun) });
          seen.add(res.status);
          expect(res.status).toBeLessThan(500);
        }),
        { numRuns: 60 },
      );
    });

    it('random CSV-shaped text', async () => {
      const cell = fc.oneof(
        fc.string({ maxLength: 12 }),
        fc.constantFrom('P0171', 'po171', '04 56', 'C1 00', '00 00', VIN.honda, VIN.badCheckDigit, VIN.euNoCheckDigit, '2025-03-14', '14/03/2025 09:30', '2099-01-01', '"', '""', 'stored', 'history', '0x08', '12,345', '100 mi', '100 constructor', 'constructor', '__proto__', 'toString', 'km', '', ' '),
      );
      const extras = ['Status', 'Odometer (mi)', 'Unit', 'Module', 'FF: RPM', 'Freeze frame: x', 'FF: __proto__', 'FF: constructor', 'Time', 'Description', 'Year', 'Make', '', 'Date'];
      // Half the headers carry the three required columns, so that rows get checked and written too.
      const header = fc.tuple(fc.boolean(), fc.shuffledSubarray(extras)).chain(([required, rest]) => (required ? fc.shuffledSubarray(['Date', 'VIN', 'DTC', ...rest], { minLength: 3 + rest.length }) : fc.constant(rest.length ? rest : ['x'])));
      await fc.assert(
        fc.asyncProperty(
          header,
          fc.array(fc.array(cell, { maxLength: 9 }), { maxLength: 12 }),
          fc.constantFrom(',', ';', '\t'),
          fc.constantFrom('\n', '\r\n', '\r'),
          fc.boolean(),
          fc.record({ dryRun: fc.constantFrom('true', 'false'), validOnly: fc.constantFrom('true', 'false') }),
          async (head, rows, d, eol, bom, query) => {
            const text = [head, ...rows].map((r) => r.join(d)).join(eol);
            const res = await post(gb, Buffer.concat([Buffer.from(bom ? '\ufeff' : ''), Buffer.from(text)]), query);
            seen.add(res.status);
            expect(res.status).toBeLessThan(500);
          },
        ),
        { numRuns: 60 },
      );
    });

    it('the two properties reached the row checks and the commit as well as the whole-file answers', () => {
      expect([...seen]).toEqual(expect.arrayContaining([200, 400]));
    });
  });
});
