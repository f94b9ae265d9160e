import fs from 'node:fs';
import path from 'node:path';

import { errorBodySchema } from '@/shared/errors';

import { startTestServer, type TestServer } from '@/__tests__/support/test-server';

describe('createApp: errors, headers, limits and the web app', () => {
  let t: TestServer;
  beforeAll(async () => {
    t = await startTestServer();
    fs.writeFileSync(path.join(t.webDir, 'index.html'), '<!doctype html><title>Ligandry test build</title>');
    fs.mkdirSync(path.join(t.webDir, '_expo/static/js/web'), { recursive: true });
    fs.writeFileSync(path.join(t.webDir, '_expo/static/js/web/entry-abc.js'), 'console.log(1)');
  });
  afterAll(async () => {
    await t.close();
  });

  const cases: Array<{ name: string; method: 'get' | 'post'; url: string; body?: string; status: number; code: string }> = [
    { name: 'unknown API route', method: 'get', url: '/api/no-such-thing', status: 404, code: 'not_found' },
    { name: 'unknown API route by POST', method: 'post', url: '/api/no-such-thing', body: '{}', status: 404, code: 'not_found' },
    { name: 'malformed JSON body', method: 'post', url: '/api/anything', body: '{"a":', status: 400, code: 'invalid_json' },
    {
      name: 'JSON body over the 100 kB limit',
      method: 'post',
      url: '/api/anything',
      body: JSON.stringify({ pad: 'x'.repeat(120_000) }),
      status: 413,
      code: 'payload_too_large',
    },
  ];

  it.each(cases)('$name answers $status with one error shape', async ({ method, url, body, status, code }) => {
    let req = t.agent()[method](url);
    if (body !== undefined) req = req.set('Content-Type', 'application/json').send(body);
    const res = await req;
    expect(res.status).toBe(status);
    const parsed = errorBodySchema.parse(res.body);
    expect(parsed.error.code).toBe(code);
    expect(parsed.error.message.length).toBeGreaterThan(10);
    expect(JSON.stringify(res.body)).not.toMatch(/at .+\.(ts|js):\d+/);
  });

  it('refuses a state-changing request from another origin', async () => {
    const res = await t
      .agent()
      .post('/api/anything')
      .set('Origin', 'http://evil.example')
      .set('Content-Type', 'application/json')
      .send('{}');
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('bad_origin');
  });

  it('sends security headers and no x-powered-by', async () => {
    const res = await t.agent().get('/api/health');
    expect(res.headers['x-powered-by']).toBeUndefined();
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
    expect(res.headers['content-security-policy']).toContain("frame-ancestors 'none'");
  });

  it.each(['/', '/baths', '/calculate', '/library/some/deep/link'])('serves index.html for client route %s', async (url) => {
    const res = await t.agent().get(url).set('Accept', 'text/html');
    expect(res.status).toBe(200);
    expect(res.text).toContain('Ligandry test build');
  });

  it('serves hashed bundles with a long cache lifetime', async () => {
    const res = await t.agent().get('/_expo/static/js/web/entry-abc.js');
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toContain('immutable');
  });

  it('answers a missing asset with a JSON 404, not the app page', async () => {
    const res = await t.agent().get('/_expo/static/js/web/missing.js').set('Accept', 'application/javascript');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });
});
