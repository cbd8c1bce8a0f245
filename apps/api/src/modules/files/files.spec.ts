import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { type ErrorBody, maxUploadBytes, type StoredFile } from '@limitbook/contracts';
import { eq } from 'drizzle-orm';
import type supertest from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { users } from '../../database/schema/index.js';
import { createTestApp, type TestApp } from '../../testing/test-app.js';
import { storageKeyFor } from './file-storage.js';
import { FileUrlSigner } from './signed-file-url.js';
import { samples } from './testing/sample-files.js';

/** Collects the whole body as bytes whatever the content type. */
function binary(response: supertest.Response, done: (error: Error | null, body: Buffer) => void) {
  const chunks: Buffer[] = [];
  response.on('data', (chunk: Buffer) => chunks.push(chunk));
  response.on('end', () => done(null, Buffer.concat(chunks)));
}

describe('files over HTTP', () => {
  let t: TestApp;
  let author: string;
  let reader: string;
  const as = (token: string) => ({ Authorization: `Bearer ${token}` });

  const upload = (name: string, bytes: Buffer, token = author) => t.http.post('/api/files').set(as(token)).attach('file', bytes, { filename: name, contentType: 'application/octet-stream' });

  async function uploaded(name: string, bytes: Buffer, token = author): Promise<StoredFile> {
    const response = await upload(name, bytes, token);
    expect(response.status, JSON.stringify(response.body)).toBe(201);
    return response.body as StoredFile;
  }

  beforeAll(async () => {
    t = await createTestApp();
    [author, reader] = await Promise.all([t.signIn('author'), t.signIn('reader')]);
  });
  afterAll(async () => {
    await t?.close();
  });

  describe('upload', () => {
    it.each([
      ['port-section.png', 'image/png', samples.png],
      ['flange.JPG', 'image/jpeg', samples.jpeg],
      ['spinner.gif', 'image/gif', samples.gif],
      ['photo.webp', 'image/webp', samples.webp],
      ['gauge-study.pdf', 'application/pdf', samples.pdf],
      ['contributors.csv', 'text/csv', samples.csv],
    ])('stores %s as %s, decided from its bytes', async (name, contentType, bytes) => {
      const before = await t.rowCounts();
      const file = await uploaded(name, bytes, reader);
      expect(file).toMatchObject({ name, contentType, size: bytes.length, url: `/api/files/${file.id}`, uploadedBy: { email: t.demoPerson('reader').email } });
      expect(file.sha256).toMatch(/^[0-9a-f]{64}$/);
      expect(existsSync(join(t.config.dataDir, 'files', storageKeyFor(file.id)))).toBe(true);
      expect((await t.rowCounts()).stored_files).toBe(before.stored_files! + 1);
    });

    it.each([
      ['HTML renamed .png', 'innocent.png', samples.html, /innocent\.png is named \.png but its bytes are not a PNG image/],
      ['a Windows executable', 'setup.exe', samples.exe, /setup\.exe holds application\/x-msdownload data/],
      ['an executable renamed .pdf', 'manual.pdf', samples.exe, /manual\.pdf holds application\/x-msdownload data/],
      ['a PDF renamed .png', 'drawing.png', samples.pdf, /drawing\.png is named \.png but holds a PDF document/],
      ['an SVG image (it can carry scripts)', 'logo.svg', samples.svg, /logo\.svg is not a file type Limitbook accepts/],
      ['HTML renamed .csv', 'table.csv', samples.html, /table\.csv is not a CSV table: it looks like HTML or XML/],
      ['binary data renamed .csv', 'data.csv', Buffer.from('a,b\n1,\u0000\n'), /data\.csv is not a CSV table: it holds binary data/],
      ['a ZIP archive renamed .csv', 'export.csv', samples.zip, /export\.csv holds application\/zip data/],
    ])('refuses %s with 415 and writes nothing', async (_label, name, bytes, message) => {
      const before = await t.rowCounts();
      const response = await upload(name, bytes).expect(415);
      const body = response.body as ErrorBody;
      expect(body.code).toBe('UNSUPPORTED_MEDIA_TYPE');
      expect(body.message).toMatch(message);
      expect(body.fields?.file).toBe(body.message);
      expect(await t.rowCounts()).toEqual(before);
    });

    it('refuses a file over the size limit with 413', async () => {
      const before = await t.rowCounts();
      const response = await upload('huge.csv', Buffer.alloc(maxUploadBytes + 1, 'a')).expect(413);
      expect(response.body).toMatchObject({ code: 'PAYLOAD_TOO_LARGE', message: 'Files may be at most 10 MB.' });
      expect(await t.rowCounts()).toEqual(before);
    });

    it('refuses a request without a file, with two files, and without a token', async () => {
      const none = await t.http.post('/api/files').set(as(author)).send({ file: 'not a file' }).expect(400);
      expect((none.body as ErrorBody).fields).toEqual({ file: 'A file is required' });
      await t.http.post('/api/files').set(as(author)).attach('file', samples.png, 'a.png').attach('file', samples.png, 'b.png').expect(400);
      await t.http.post('/api/files').attach('file', samples.png, 'a.png').expect(401);
    });
  });

  describe('download', () => {
    let image: StoredFile;
    let csv: StoredFile;

    beforeAll(async () => {
      image = await uploaded('Schnitt Ø20 "A–A".png', samples.png);
      csv = await uploaded('../../etc/contributors.csv', samples.csv);
    });

    it('serves a file only to signed-in users', async () => {
      const refused = await t.http.get(image.url).expect(401);
      expect((refused.body as ErrorBody).code).toBe('UNAUTHENTICATED');
      await t.http.get(image.url).set('Authorization', 'Bearer not-a-token').expect(401);
      await t.http.get('/api/files/0f8e2c53-6a1d-4f4b-9a3e-5b7c2d1e8f90').set(as(reader)).expect(404);
    });

    it('serves an image inline with its sniffed type, the exact name and locked-down headers', async () => {
      const response = await t.http.get(image.url).set(as(reader)).buffer(true).parse(binary).expect(200);
      expect(response.body).toEqual(samples.png);
      expect(response.headers['content-type']).toBe('image/png');
      expect(response.headers['content-disposition']).toBe(
        `inline; filename="Schnitt _20 _A_A_.png"; filename*=UTF-8''Schnitt%20%C3%9820%20%22A%E2%80%93A%22.png`,
      );
      expect(response.headers['x-content-type-options']).toBe('nosniff');
      expect(response.headers['content-security-policy']).toBe("default-src 'none'; style-src 'unsafe-inline'; sandbox");
      const forced = await t.http.get(`${image.url}?download=1`).set(as(reader)).expect(200);
      expect(forced.headers['content-disposition']).toMatch(/^attachment; /);
    });

    it('serves a CSV as an attachment, with folders stripped from its name', async () => {
      expect(csv.name).toBe('contributors.csv');
      const response = await t.http.get(csv.url).set(as(reader)).expect(200);
      expect(response.headers['content-type']).toBe('text/csv; charset=utf-8');
      expect(response.headers['content-disposition']).toBe(`attachment; filename="contributors.csv"; filename*=UTF-8''contributors.csv`);
      expect(response.text).toBe(samples.csv.toString('utf8'));
    });

    it('serves a signed address without a token, and refuses a tampered, expired or orphaned one', async () => {
      const signed = await t.http.get(image.signedUrl).buffer(true).parse(binary).expect(200);
      expect(signed.body).toEqual(samples.png);
      expect(signed.headers['x-content-type-options']).toBe('nosniff');

      const tampered = image.signedUrl.replace(/sig=(.)/, (_all, first: string) => `sig=${first === 'A' ? 'B' : 'A'}`);
      expect((await t.http.get(tampered).expect(403)).body).toMatchObject({ code: 'FORBIDDEN' });
      const otherFile = image.signedUrl.replace(image.id, csv.id);
      await t.http.get(otherFile).expect(403);

      const signer = new FileUrlSigner(t.config.jwtSecret);
      const userId = new URL(image.signedUrl, 'http://x').searchParams.get('u')!;
      const past = Math.floor(Date.now() / 1000) - 60;
      const expired = `/api/files/${image.id}/signed?u=${userId}&exp=${past}&sig=${signer.sign({ fileId: image.id, userId, expires: past })}`;
      await t.http.get(expired).expect(403);

      await t.db.update(users).set({ status: 'deactivated' }).where(eq(users.id, userId));
      await t.http.get(image.signedUrl).expect(403);
      await t.db.update(users).set({ status: 'active' }).where(eq(users.id, userId));
      await t.http.get(image.signedUrl).expect(200);

      const missing = await t.http.get(`/api/files/${image.id}/signed`).expect(400);
      expect(Object.keys((missing.body as ErrorBody).fields ?? {}).sort()).toEqual(['exp', 'sig', 'u']);
    });
  });
});
