import { GetObjectCommand, ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import sharp from 'sharp';
import type { AttachmentDto, AuthResponse, FieldReportDto } from '@causeway/shared';
import { StorageService } from '../src/uploads/storage.service';
import { S3Storage } from '../src/uploads/storage-s3';
import { bearer, createTestApp, registerMember, registerOwner, setRole, type TestApp } from './utils/test-app';

// s3rver (registry: s3rver) is a fake S3 server for tests; its types are not published.
// eslint-disable-next-line @typescript-eslint/no-require-imports
const S3rver = require('s3rver') as new (options: Record<string, unknown>) => { run(): Promise<AddressInfo>; close(): Promise<void> };

/**
 * Uploads through the S3 driver (STORAGE_DRIVER=s3) against a fake S3-compatible store on
 * loopback (s3rver, from the registry), with the same API calls every instance would make.
 * Outside source: the Amazon S3 API Reference — GetObject answers NoSuchKey (404) for a missing
 * key, DeleteObject succeeds (204) for a missing key; path-style requests put the bucket in the
 * path (forcePathStyle).
 */
describe('uploads in S3-compatible object storage (e2e, fake S3 on loopback)', () => {
  const BUCKET = 'causeway-uploads';
  const PREFIX = 'attachments/';
  let s3dir: string;
  let s3: { run(): Promise<AddressInfo>; close(): Promise<void> };
  let endpoint: string;
  let inspect: S3Client;
  let t: TestApp;
  let contributor: AuthResponse;
  let moderator: AuthResponse;

  const bytesOf = (req: ReturnType<ReturnType<TestApp['http']>['get']>) =>
    req.buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
  const objects = async () => ((await inspect.send(new ListObjectsV2Command({ Bucket: BUCKET }))).Contents ?? []).map((o) => o.Key!).sort();
  const objectBytes = async (key: string) => Buffer.from(await (await inspect.send(new GetObjectCommand({ Bucket: BUCKET, Key: key }))).Body!.transformToByteArray());
  const draft = async (): Promise<FieldReportDto> =>
    (await t.http().post('/api/field-reports').set(...bearer(contributor)).send({ kind: 'confirmed-fix', payload: { code: 'P0456', make: 'Quillon', model: 'Ferro', part: 'qa-vent' } }).expect(201)).body;
  const upload = (report: string, files: Array<{ data: Buffer; name: string; type: string }>) => {
    let req = t.http().post(`/api/field-reports/${report}/attachments`).set(...bearer(contributor));
    for (const f of files) req = req.attach('files', f.data, { filename: f.name, contentType: f.type });
    return req;
  };
  const plainPdf = Buffer.from(
    '%PDF-1.4\n1 0 obj << /Type /Catalog /Pages 2 0 R >> endobj\n2 0 obj << /Type /Pages /Kids [] /Count 0 >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n',
    'latin1',
  );

  beforeAll(async () => {
    s3dir = mkdtempSync(join(tmpdir(), 'causeway-s3-'));
    s3 = new S3rver({ address: '127.0.0.1', port: 0, silent: true, directory: s3dir, configureBuckets: [{ name: BUCKET }] });
    const { port } = await s3.run();
    endpoint = `http://127.0.0.1:${port}`;
    // s3rver checks request signatures against its fixed test keys.
    const credentials = { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' };
    inspect = new S3Client({ region: 'us-east-1', endpoint, forcePathStyle: true, credentials });
    t = await createTestApp({
      STORAGE_DRIVER: 's3',
      S3_BUCKET: BUCKET,
      S3_ENDPOINT: endpoint,
      S3_REGION: 'us-east-1',
      S3_ACCESS_KEY_ID: credentials.accessKeyId,
      S3_SECRET_ACCESS_KEY: credentials.secretAccessKey,
      S3_FORCE_PATH_STYLE: 'true',
      S3_PREFIX: PREFIX,
    });
    const owner = await registerOwner(t);
    contributor = await registerMember(t, owner, 'contributor');
    moderator = await registerOwner(t);
    await setRole(t, moderator.user.id, 'moderator');
    await t.http().post('/api/knowledge/parts').set(...bearer(moderator)).send({ key: 'qa-vent', name: 'QA vent valve', system: 'evap' }).expect(201);
  });
  afterAll(async () => {
    await t?.close();
    inspect?.destroy();
    await s3?.close().catch(() => undefined);
    rmSync(s3dir, { recursive: true, force: true });
  });

  it('the app runs on the S3 driver and keeps nothing on its own disk', () => {
    expect(t.app.get(StorageService)).toBeInstanceOf(S3Storage);
    expect(existsSync(join(t.dataDir, 'uploads'))).toBe(false);
  });

  it('a photo and a PDF invoice round-trip through the bucket byte for byte', async () => {
    const photo = await sharp({ create: { width: 40, height: 30, channels: 3, background: '#aa3300' } }).png().toBuffer();
    const report = await draft();
    const before = await objects();
    const res = await upload(report.id, [
      { data: photo, name: 'cap.png', type: 'image/png' },
      { data: plainPdf, name: 'invoice.pdf', type: 'application/pdf' },
    ]).expect(201);
    const [png, pdf] = res.body as AttachmentDto[];

    // Two new objects, under the prefix, named by random keys only.
    const added = (await objects()).filter((k) => !before.includes(k));
    expect(added).toHaveLength(2);
    expect(added.every((k) => new RegExp(`^${PREFIX}[0-9a-f]{32}$`).test(k))).toBe(true);

    // What the API serves is exactly what sits in the bucket.
    const servedPdf = (await bytesOf(t.http().get(pdf.url).set(...bearer(contributor))).expect(200)).body as Buffer;
    expect(servedPdf.equals(plainPdf)).toBe(true); // a plain PDF is kept as sent
    const servedPng = (await bytesOf(t.http().get(png.url).set(...bearer(contributor))).expect(200)).body as Buffer;
    const inBucket = await Promise.all(added.map(objectBytes));
    expect(inBucket.some((b) => b.equals(servedPng))).toBe(true);
    expect(inBucket.some((b) => b.equals(plainPdf))).toBe(true);
    // The photo was re-encoded, still 40 × 30 PNG.
    expect(await sharp(servedPng).metadata()).toMatchObject({ format: 'png', width: 40, height: 30 });
  });

  it('removing an attachment deletes its object; a missing object reads as nothing', async () => {
    const report = await draft();
    const before = await objects();
    const [a] = (await upload(report.id, [{ data: plainPdf, name: 'second.pdf', type: 'application/pdf' }]).expect(201)).body as AttachmentDto[];
    const [key] = (await objects()).filter((k) => !before.includes(k));
    await t.http().delete(a.url).set(...bearer(contributor)).expect(204);
    expect(await objects()).toEqual(before);
    await t.http().get(a.url).set(...bearer(contributor)).expect(404);

    const storage = t.app.get(StorageService);
    const missing = key.slice(PREFIX.length);
    expect(await storage.get(missing)).toBeNull(); // GetObject: NoSuchKey
    await expect(storage.delete(missing)).resolves.toBeUndefined(); // DeleteObject of a missing key succeeds
    // Keys the driver did not make never reach the store.
    await expect(storage.get('../etc/passwd')).rejects.toThrow('Invalid storage key');
  });

  it('when the store is unreachable the upload fails whole: no attachment row is written', async () => {
    const report = await draft();
    await s3.close();
    const res = await upload(report.id, [{ data: plainPdf, name: 'late.pdf', type: 'application/pdf' }]);
    expect(res.status).toBe(500);
    const detail = (await t.http().get(`/api/field-reports/${report.id}`).set(...bearer(contributor)).expect(200)).body as FieldReportDto;
    expect(detail.attachments).toEqual([]);
  });
});
