import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { deflateSync } from 'node:zlib';
import sharp from 'sharp';
import type { AttachmentDto, AuthResponse, FieldReportDto } from '@causeway/shared';
import { bearer, createTestApp, registerMember, registerOwner, setRole, type TestApp } from './utils/test-app';

/**
 * Evidence uploads on field reports (issue 6): type from the content (magic numbers, via
 * file-type), photos re-encoded without EXIF (so no GPS position: EXIF 2.3 §4.6.6, GPS IFD
 * tag 0x8825), PDFs with active content refused (ISO 32000-1 §12.6 actions: /JavaScript, /JS,
 * /Launch; §7.11.4 embedded files), random names on disk, and every abuse a clear 4xx with
 * nothing written.
 */
describe('field report uploads (e2e)', () => {
  let t: TestApp;
  let owner: AuthResponse;
  let contributor: AuthResponse;
  let otherContributor: AuthResponse;
  let moderator: AuthResponse;
  let jpegWithGps: Buffer;
  let png: Buffer;
  let webp: Buffer;

  const uploadsDir = () => join(t.dataDir, 'uploads');
  const stored = () => readdirSync(uploadsDir()).sort();
  const attachmentRows = async () => Number((await t.query<{ n: number | string }>('SELECT COUNT(*) AS n FROM field_report_attachments'))[0].n);

  const draft = async (who: AuthResponse = contributor): Promise<FieldReportDto> =>
    (
      await t
        .http()
        .post('/api/field-reports')
        .set(...bearer(who))
        .send({ kind: 'confirmed-fix', payload: { code: 'P0456', make: 'Quillon', model: 'Ferro', part: 'qa-vent' } })
        .expect(201)
    ).body;
  const upload = (report: string, files: Array<{ data: Buffer; name: string; type?: string }>, who: AuthResponse = contributor) => {
    let req = t.http().post(`/api/field-reports/${report}/attachments`).set(...bearer(who));
    // form-data's `filepath` option sends the name as given (with `filename` it would strip any
    // directory part); superagent passes the options through but its types omit it.
    for (const f of files) req = req.attach('files', f.data, { filepath: f.name, contentType: f.type ?? 'image/jpeg' } as { filename?: string; contentType?: string });
    return req;
  };
  /** Runs an upload that must fail, and checks nothing reached the disk or the database. */
  const refused = async (status: number, report: string, files: Array<{ data: Buffer; name: string; type?: string }>) => {
    const disk = stored();
    const rows = await attachmentRows();
    const res = await upload(report, files).expect(status);
    expect(stored()).toEqual(disk);
    expect(await attachmentRows()).toBe(rows);
    return res.body as { message: string; errors: Array<{ field: string; message: string }> };
  };

  const minimalPdf = (extra = '') =>
    Buffer.from(
      `%PDF-1.4\n1 0 obj << /Type /Catalog /Pages 2 0 R ${extra} >> endobj\n2 0 obj << /Type /Pages /Kids [] /Count 0 >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n`,
      'latin1',
    );

  beforeAll(async () => {
    t = await createTestApp();
    owner = await registerOwner(t);
    contributor = await registerMember(t, owner, 'contributor');
    otherContributor = await registerMember(t, owner, 'contributor');
    moderator = await registerOwner(t);
    await setRole(t, moderator.user.id, 'moderator');
    await t.http().post('/api/knowledge/parts').set(...bearer(moderator)).send({ key: 'qa-vent', name: 'QA vent valve', system: 'evap' }).expect(201);
    const base = () => sharp({ create: { width: 64, height: 48, channels: 3, background: '#336699' } });
    // A photo as a phone would take it: GPS position in the EXIF GPS IFD (EXIF 2.3 §4.6.6).
    jpegWithGps = await base()
      .jpeg()
      .withExif({ IFD0: { Copyright: 'QA camera' }, IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '51/1 28/1 4000/100', GPSLongitudeRef: 'W', GPSLongitude: '0/1 7/1 3900/100' } })
      .toBuffer();
    png = await base().png().toBuffer();
    webp = await base().webp().toBuffer();
  });
  afterAll(() => t.close());

  it('strips EXIF (and the GPS position in it) from photos, and serves them only to those allowed', async () => {
    const before = await sharp(jpegWithGps).metadata();
    expect(before.exif).toBeDefined();
    // Tag 0x8825 (GPS IFD pointer), little-endian as sharp writes it: the position is really there.
    expect(before.exif!.includes(Buffer.from([0x25, 0x88]))).toBe(true);

    const report = await draft();
    const res = await upload(report.id, [{ data: jpegWithGps, name: 'bench photo 1.JPG' }]).expect(201);
    const [a] = res.body as AttachmentDto[];
    expect(a).toMatchObject({ name: 'bench photo 1.jpg', contentType: 'image/jpeg', width: 64, height: 48 });

    const file = await t.http().get(a.url).set(...bearer(contributor)).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    }).expect(200);
    expect(file.headers['content-type']).toBe('image/jpeg');
    expect(file.headers['content-disposition']).toBe('inline; filename="bench photo 1.jpg"');
    expect(file.headers['x-content-type-options']).toBe('nosniff');
    const after = await sharp(file.body as Buffer).metadata();
    expect(after.format).toBe('jpeg');
    expect(after.exif).toBeUndefined();
    expect((file.body as Buffer).includes(Buffer.from('QA camera'))).toBe(false);

    // On disk: a random 32-hex name, never the user's.
    expect(stored().every((n) => /^[0-9a-f]{32}$/.test(n))).toBe(true);

    await t.http().get(a.url).set(...bearer(otherContributor)).expect(404);
    await t.http().get(a.url).set(...bearer(moderator)).expect(404); // still a draft
    await t.http().post(`/api/field-reports/${report.id}/submit`).set(...bearer(contributor)).expect(200);
    await t.http().get(a.url).set(...bearer(moderator)).expect(200);
    await t.http().get(a.url).set(...bearer(otherContributor)).expect(404);
    // Evidence is fixed once submitted.
    await upload(report.id, [{ data: png, name: 'late.png', type: 'image/png' }]).expect(409);
  });

  it('decides the type by the content, not the name; PNG, WebP and a plain PDF invoice are accepted', async () => {
    const report = await draft();
    const res = await upload(report.id, [
      { data: png, name: 'actually-a-png.jpg' },
      { data: webp, name: 'photo.webp', type: 'image/webp' },
      { data: minimalPdf(), name: 'invoice 2026-11.pdf', type: 'application/pdf' },
    ]).expect(201);
    const list = res.body as AttachmentDto[];
    expect(list.map((x) => [x.name, x.contentType])).toEqual([
      ['actually-a-png.png', 'image/png'],
      ['photo.webp', 'image/webp'],
      ['invoice 2026-11.pdf', 'application/pdf'],
    ]);
    const pdf = await t.http().get(list[2].url).set(...bearer(contributor)).expect(200);
    expect(pdf.headers['content-type']).toBe('application/pdf');
    expect(pdf.headers['content-disposition']).toBe('attachment; filename="invoice 2026-11.pdf"');
    const detail = (await t.http().get(`/api/field-reports/${report.id}`).set(...bearer(contributor)).expect(200)).body as FieldReportDto;
    expect(detail.attachments).toHaveLength(3);
    await t.http().delete(list[1].url).set(...bearer(contributor)).expect(204);
    await t.http().get(list[1].url).set(...bearer(contributor)).expect(404);
  });

  it('refuses a file over the size limit (413), with nothing written', async () => {
    const report = await draft();
    const big = Buffer.concat([png, Buffer.alloc(8 * 1024 * 1024)]);
    const body = await refused(413, report.id, [{ data: big, name: 'huge.png', type: 'image/png' }]);
    expect(body.errors).toEqual([{ field: 'files', message: 'each file must be at most 8 MB; nothing was uploaded' }]);
  });

  it('refuses more than 6 files in one request or in total', async () => {
    const report = await draft();
    const seven = Array.from({ length: 7 }, (_, i) => ({ data: png, name: `p${i}.png`, type: 'image/png' }));
    const body = await refused(400, report.id, seven);
    expect(body.errors[0]).toEqual({ field: 'files', message: 'at most 6 files per report; nothing was uploaded' });
    await upload(report.id, seven.slice(0, 4)).expect(201);
    const more = await refused(400, report.id, seven.slice(0, 3));
    expect(more.errors[0].message).toContain('2 more can be added');
  });

  it('refuses an executable renamed .jpg', async () => {
    const report = await draft();
    const elf = Buffer.concat([Buffer.from([0x7f, 0x45, 0x4c, 0x46, 0x02, 0x01, 0x01, 0x00]), Buffer.alloc(256)]);
    const pe = Buffer.concat([Buffer.from('MZ'), Buffer.alloc(256)]);
    const body = await refused(400, report.id, [{ data: elf, name: 'holiday.jpg' }, { data: pe, name: 'invoice.jpg' }]);
    expect(body.errors.map((e) => e.field)).toEqual(['files.0', 'files.1']);
    expect(body.errors[1].message).toContain('application/x-msdownload');
    // One bad file spoils the batch: the good photo beside it is not stored either.
    await refused(400, report.id, [{ data: png, name: 'good.png', type: 'image/png' }, { data: elf, name: 'bad.jpg' }]);
  });

  it('refuses path-traversal and control-character file names', async () => {
    const report = await draft();
    const body = await refused(400, report.id, [{ data: png, name: '../../etc/passwd.jpg' }]);
    expect(body.errors[0].field).toBe('files.0');
    expect(body.errors[0].message).toContain('must not contain a path');
    await refused(400, report.id, [{ data: png, name: '..\\..\\windows\\win.ini.png' }]);
    await refused(400, report.id, [{ data: png, name: 'a\u0001b.png' }]);
  });

  it('refuses a PDF with a script, a launch action or an embedded file, even when hidden', async () => {
    const report = await draft();
    const script = await refused(400, report.id, [{ data: minimalPdf('/OpenAction << /S /JavaScript /JS (app.alert(1)) >>'), name: 'invoice.pdf', type: 'application/pdf' }]);
    expect(script.errors[0].message).toContain('/JavaScript');
    await refused(400, report.id, [{ data: minimalPdf('/OpenAction << /S /Launch /F (calc.exe) >>'), name: 'invoice.pdf', type: 'application/pdf' }]);
    await refused(400, report.id, [{ data: minimalPdf('/Names << /EmbeddedFiles 3 0 R >>'), name: 'invoice.pdf', type: 'application/pdf' }]);
    // A name spelled with #xx escapes (ISO 32000-1 §7.3.5) is the same name.
    await refused(400, report.id, [{ data: minimalPdf('/AA << /O << /S /J#61vaScript /J#53 (x) >> >>'), name: 'invoice.pdf', type: 'application/pdf' }]);
    // Inside a compressed object stream (PDF 1.5).
    const hidden = deflateSync(Buffer.from('<< /S /JavaScript /JS (app.alert(1)) >>'));
    const objStm = Buffer.concat([Buffer.from(`%PDF-1.5\n3 0 obj << /Type /ObjStm /Filter /FlateDecode /Length ${hidden.length} >>\nstream\n`), hidden, Buffer.from('\nendstream\nendobj\n%%EOF\n')]);
    const body = await refused(400, report.id, [{ data: objStm, name: 'invoice.pdf', type: 'application/pdf' }]);
    expect(body.errors[0].message).toContain('/JS');
  });

  it('only the author uploads, only to a draft, only contributors and up', async () => {
    const report = await draft();
    await upload(report.id, [{ data: png, name: 'x.png', type: 'image/png' }], otherContributor).expect(404);
    const tech = await registerMember(t, owner, 'technician');
    await upload(report.id, [{ data: png, name: 'x.png', type: 'image/png' }], tech).expect(403);
    const none = await t.http().post(`/api/field-reports/${report.id}/attachments`).set(...bearer(contributor)).field('note', 'no files').expect(400);
    expect(none.body.errors[0].field).toBe('files');
    const wrongField = await t.http().post(`/api/field-reports/${report.id}/attachments`).set(...bearer(contributor)).attach('photo', png, 'x.png').expect(400);
    expect(wrongField.body.errors[0]).toEqual({ field: 'files', message: 'files must be sent in the multipart field "files"' });
  });
});
