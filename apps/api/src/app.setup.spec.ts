import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './testing/test-app.js';

describe('one process serves the web app and the API', () => {
  let t: TestApp;
  const dist = mkdtempSync(join(tmpdir(), 'limitbook-web-'));

  beforeAll(async () => {
    mkdirSync(join(dist, 'assets'));
    writeFileSync(join(dist, 'index.html'), '<!doctype html><title>Limitbook</title><div id="root"></div>');
    writeFileSync(join(dist, 'assets', 'index-abc123.js'), 'console.log("limitbook");');
    t = await createTestApp({ env: { LIMITBOOK_WEB_DIST: dist } });
  });
  afterAll(async () => {
    await t?.close();
    rmSync(dist, { recursive: true, force: true });
  });

  it('serves index.html for the app and for client-side routes', async () => {
    for (const path of ['/', '/library', '/pages/BW-STD-101/revisions/B']) {
      const response = await t.http.get(path).expect(200);
      expect(response.text).toContain('<div id="root">');
    }
  });

  it('serves hashed assets with long caching, and a missing asset is a 404, not index.html', async () => {
    const asset = await t.http.get('/assets/index-abc123.js').expect(200);
    expect(asset.headers['cache-control']).toContain('immutable');
    const missing = await t.http.get('/assets/index-old999.js').expect(404);
    expect(missing.text).not.toContain('<div id="root">');
  });

  it('keeps /api paths for the API, in its error shape', async () => {
    const response = await t.http.get('/api/does-not-exist').expect(404);
    expect(response.body).toMatchObject({ statusCode: 404, code: 'NOT_FOUND' });
    await t.http.get('/api/health').expect(200);
  });
});
