/** The JSON error shape of PRODUCT.md §8 for what falls outside the routes: unknown routes, bad JSON, crashes. */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildTestApp, DEMO, signIn, type TestApp } from './helpers.js';

let t: TestApp;
beforeAll(async () => {
  t = await buildTestApp();
});
afterAll(async () => t.close());

describe('error shapes', () => {
  it('GET /api/health answers {ok: true} to anyone', async () => {
    const res = await request(t.app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ ok: true });
  });

  it('an unknown /api route is a JSON 404, whatever the method', async () => {
    for (const res of [await request(t.app).get('/api/nothing-here'), await request(t.app).post('/api/nothing-here').send({}), await request(t.app).delete('/api/workshops')]) {
      expect(res.status).toBe(404);
      expect(res.headers['content-type']).toMatch(/application\/json/);
      expect(res.body.error.code).toBe('not_found');
    }
  });

  it('signed-out requests to workshop routes get 401 before anything else', async () => {
    const res = await request(t.app).get('/api/workshops/abc/designs');
    expect(res.status).toBe(401);
    expect(res.body).toEqual({ error: { code: 'not_signed_in', message: 'Sign in to continue.' } });
  });

  it('a workshop id that is not a number is 404 for a signed-in user; one that is not theirs is 403', async () => {
    const agent = await signIn(t.app, DEMO.viewer);
    expect((await agent.get('/api/workshops/abc/designs')).status).toBe(404);
    const res = await agent.get('/api/workshops/424242/designs');
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('forbidden');
  });

  it('an unexpected failure is a generic 500: the stack is logged, never sent', async () => {
    const broken = await buildTestApp();
    const agent = await signIn(broken.app, DEMO.viewer);
    await broken.orm.close(true); // the database goes away under a signed-in user
    const res = await agent.get('/api/auth/me');
    expect(res.status).toBe(500);
    expect(res.body).toEqual({ error: { code: 'internal_error', message: 'Something went wrong on the server. Please try again.' } });
    expect(JSON.stringify(res.body)).not.toMatch(/\bat\s|\.ts:|knex|sqlite/i);
    expect(broken.logged.some((line) => line.includes('GET /api/auth/me') && /\n\s+at /.test(line))).toBe(true);
    await broken.close();
  });
});
