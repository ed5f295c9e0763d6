import type { LoggerService } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { ROSA, SETTINGS, ORDER as PCA_ORDER } from './support/pca.js';
import { verifiedOrderWithSyringe } from './support/pca-steps.js';
import { createTestApp, DEMO_PASSWORD, type TestApp } from './support/test-app.js';

// Settings are read when the app is first imported. The per-username limit keeps its default (5);
// the per-address limits are lowered so the file stays quick. TRUST_PROXY lets each test come
// from its own address through X-Forwarded-For, so their counts never meet.
vi.hoisted(() => {
  process.env.TRUST_PROXY = 'loopback';
  process.env.SIGN_IN_MAX_FAILURES_PER_ADDRESS = '8';
  process.env.PASSWORD_REQUESTS_PER_MINUTE = '30';
});

const WRONG = 'not-the-password';

describe('hardening', () => {
  let t: TestApp;
  let admin: string;
  let prescriber: string;
  let pharmacist: string;
  let nurse: string;
  const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });
  const login = (username: string, password: string, from: string) =>
    request(t.http).post('/api/auth/login').set('X-Forwarded-For', from).send({ username, password });
  const unlock = (username: string) => request(t.http).delete(`/api/auth/lockouts/usernames/${username}`).set(bearer(admin));

  beforeAll(async () => {
    t = await createTestApp();
    admin = await t.tokenFor('sam.rivera');
    prescriber = await t.tokenFor('amara.osei');
    pharmacist = await t.tokenFor('lin.park');
    nurse = await t.tokenFor('kai.mendes');
  });
  afterAll(() => t.close());

  describe('wrong passwords', () => {
    it('locks a username after 5 wrong passwords: 429 with a clear message and Retry-After, even with the right password', async () => {
      for (let i = 0; i < 5; i++) await login('mei.tan', WRONG, '10.0.1.1').expect(401);
      const locked = await login('mei.tan', DEMO_PASSWORD, '10.0.1.1').expect(429);
      expect(locked.body).toEqual({
        statusCode: 429,
        message: 'Too many wrong passwords for mei.tan. Wait 15 minutes and try again, or ask an admin to unlock the account.',
      });
      expect(Number(locked.headers['retry-after'])).toBeGreaterThan(14 * 60);
      expect(Number(locked.headers['retry-after'])).toBeLessThanOrEqual(15 * 60);

      // The lock follows the username to another computer, and does not touch other people.
      await login('mei.tan', DEMO_PASSWORD, '10.0.1.2').expect(429);
      await login('tomas.ortiz', DEMO_PASSWORD, '10.0.1.1').expect(200);

      const lockouts = await request(t.http).get('/api/auth/lockouts').set(bearer(admin)).expect(200);
      expect(lockouts.body).toContainEqual({ kind: 'username', key: 'mei.tan', failures: 5, retryAfterSeconds: expect.any(Number) });
      await request(t.http).get('/api/auth/lockouts').set(bearer(nurse)).expect(403);
      await unlock('mei.tan').expect(204);
      await unlock('mei.tan').expect(404);
      await login('mei.tan', DEMO_PASSWORD, '10.0.1.1').expect(200);
    });

    it('locks an unknown username the same way, so a lock tells nobody which usernames exist', async () => {
      for (let i = 0; i < 5; i++) await login('no.such.person', WRONG, '10.0.2.1').expect(401);
      const locked = await login('no.such.person', WRONG, '10.0.2.1').expect(429);
      expect(locked.body.message).toMatch(/^Too many wrong passwords for no\.such\.person\. Wait 15 minutes/);
    });

    it('clears a username’s count when the right password is given', async () => {
      for (let i = 0; i < 3; i++) await login('tomas.ortiz', WRONG, '10.0.3.1').expect(401);
      await login('tomas.ortiz', DEMO_PASSWORD, '10.0.3.1').expect(200);
      for (let i = 0; i < 3; i++) await login('tomas.ortiz', WRONG, '10.0.3.1').expect(401);
      await login('tomas.ortiz', DEMO_PASSWORD, '10.0.3.1').expect(200);
    });

    it('locks an address after too many wrong passwords across usernames (8 in this file; 50 by default)', async () => {
      for (let i = 0; i < 8; i++) await login(`guess.${i}`, WRONG, '10.0.4.1').expect(401);
      const locked = await login('amara.osei', DEMO_PASSWORD, '10.0.4.1').expect(429);
      expect(locked.body.message).toBe(
        'Too many wrong passwords from this computer. Wait 15 minutes and try again, or ask an admin to unlock it.',
      );
      expect(locked.headers['retry-after']).toEqual(expect.stringMatching(/^\d+$/));
      await login('amara.osei', DEMO_PASSWORD, '10.0.4.2').expect(200);

      await request(t.http).delete('/api/auth/lockouts/addresses/10.0.4.1').set(bearer(admin)).expect(204);
      await login('amara.osei', DEMO_PASSWORD, '10.0.4.1').expect(200);
    });

    it('counts a wrong signature password: a pharmacist verifying an order is locked after 5, and so is their sign-in', async () => {
      const { body: order } = await request(t.http)
        .post('/api/orders')
        .set(bearer(prescriber))
        .send({ ...PCA_ORDER, patientId: (await t.addPatient()).id, indication: 'Pain after surgery' })
        .expect(201);
      const verify = (password: string) =>
        request(t.http)
          .post(`/api/orders/${order.id}/verify`)
          .set(bearer(pharmacist))
          .set('X-Forwarded-For', '10.0.5.1')
          .send({ signature: { password } });
      for (let i = 0; i < 5; i++) {
        const wrong = await verify(WRONG).expect(401);
        expect(wrong.body.errors).toEqual([{ field: 'signature.password', message: 'The password you signed with is not correct' }]);
      }
      const locked = await verify(DEMO_PASSWORD).expect(429);
      expect(locked.body.message).toMatch(/^Too many wrong passwords for lin\.park\. Wait 15 minutes/);
      await login('lin.park', DEMO_PASSWORD, '10.0.5.2').expect(429);
      // The session itself goes on: reading still works, only signing waits.
      await request(t.http).get(`/api/orders/${order.id}`).set(bearer(pharmacist)).expect(200);

      // The same wrong signatures counted against the address too: 3 more reach this file's 8.
      await unlock('lin.park').expect(204);
      for (let i = 0; i < 3; i++) await verify(WRONG).expect(401);
      const fromHere = await verify(DEMO_PASSWORD).expect(429);
      expect(fromHere.body.message).toMatch(/^Too many wrong passwords from this computer\./);

      await unlock('lin.park').expect(204);
      await request(t.http).delete('/api/auth/lockouts/addresses/10.0.5.1').set(bearer(admin)).expect(204);
      await verify(DEMO_PASSWORD).expect(200);
    });

    it('counts a colleague’s wrong password at the bedside check against the colleague', async () => {
      const started = await verifiedOrderWithSyringe(t.http, { prescriber, pharmacist, nurse }, await t.addPatient(), {
        ...PCA_ORDER,
        indication: 'Pain after surgery',
      });
      const first = await request(t.http)
        .post(`/api/orders/${started.id}/bedside-checks`)
        .set(bearer(nurse))
        .send({ ...started.patient.identity, releaseCode: started.code, settings: SETTINGS })
        .expect(201);
      const second = (password: string) =>
        request(t.http)
          .post(`/api/orders/${started.id}/bedside-checks/${first.body.id}/second`)
          .set(bearer(nurse))
          .set('X-Forwarded-For', '10.0.6.1')
          .send({ ...ROSA, password, settings: SETTINGS });
      for (let i = 0; i < 5; i++) await second(WRONG).expect(401);
      const locked = await second(DEMO_PASSWORD).expect(429);
      expect(locked.body.message).toMatch(/^Too many wrong passwords for rosa\.adeyemi\./);
      await unlock('rosa.adeyemi').expect(204);
      await second(DEMO_PASSWORD).expect(200);
    });

    it('limits requests that carry a password per address, right or wrong (30 a minute in this file; 300 by default)', async () => {
      for (let i = 0; i < 30; i += 6) {
        await Promise.all(Array.from({ length: 6 }, () => login('amara.osei', DEMO_PASSWORD, '10.0.7.1').expect(200)));
      }
      const limited = await login('amara.osei', DEMO_PASSWORD, '10.0.7.1').expect(429);
      expect(limited.body).toEqual({
        statusCode: 429,
        message: expect.stringMatching(/^Too many sign-ins and signatures from this computer in a short time\. Wait \d+ seconds/),
      });
      expect(Number(limited.headers['retry-after'])).toBeGreaterThan(0);
      // Requests without a password are not limited.
      await request(t.http).get('/api/auth/me').set(bearer(admin)).set('X-Forwarded-For', '10.0.7.1').expect(200);
      await login('amara.osei', DEMO_PASSWORD, '10.0.7.2').expect(200);
    });
  });

  describe('tokens', () => {
    it('issues tokens that last 8 hours by default', async () => {
      const payload = t.app.get(JwtService).decode<{ iat: number; exp: number }>(admin);
      expect(payload.exp - payload.iat).toBe(8 * 3600);
    });

    it('refuses an expired token with 401', async () => {
      const expired = t.app.get(JwtService).sign({ sub: 5, username: 'sam.rivera', role: 'admin' }, { expiresIn: -60 });
      const response = await request(t.http).get('/api/auth/me').set(bearer(expired)).expect(401);
      expect(response.body).toEqual({ statusCode: 401, message: 'Please sign in again: your session is missing or has expired' });
    });

    it('signing out ends that session on the server: its token is refused, other sessions go on', async () => {
      const here = await t.tokenFor('mei.tan');
      const elsewhere = await t.tokenFor('mei.tan');
      const jwt = t.app.get(JwtService);
      expect(jwt.decode<{ jti: string }>(here).jti).not.toBe(jwt.decode<{ jti: string }>(elsewhere).jti);

      await request(t.http).post('/api/auth/logout').set(bearer(here)).expect(204);
      const refused = await request(t.http).get('/api/auth/me').set(bearer(here)).expect(401);
      expect(refused.body.message).toBe('Please sign in again: your session is missing or has expired');
      await request(t.http).post('/api/auth/logout').set(bearer(here)).expect(401);
      await request(t.http).get('/api/auth/me').set(bearer(elsewhere)).expect(200);

      const [row] = await t.app
        .get(DataSource)
        .query('SELECT userId, expiresAt FROM revoked_tokens WHERE jti = ?', [jwt.decode<{ jti: string }>(here).jti]);
      expect(row.userId).toBe(6);
      const audit = await request(t.http).get('/api/audit?action=user.sign-out&limit=1').set(bearer(admin)).expect(200);
      expect(audit.body.events[0]).toMatchObject({ action: 'user.sign-out', entityType: 'user', entityId: '6', actorName: 'Mei Tan' });
    });

    it('signs a session out once when two sign-outs of it race', async () => {
      const session = await t.tokenFor('rosa.adeyemi');
      const replies = await Promise.all([0, 1].map(() => request(t.http).post('/api/auth/logout').set(bearer(session))));
      expect(replies.map((reply) => reply.status).sort()).toEqual(expect.arrayContaining([204]));
      expect(replies.every((reply) => reply.status === 204 || reply.status === 401)).toBe(true);
      const jti = t.app.get(JwtService).decode<{ jti: string }>(session).jti;
      expect(await t.app.get(DataSource).query('SELECT COUNT(*) AS n FROM revoked_tokens WHERE jti = ?', [jti])).toEqual([{ n: 1 }]);
    });

    it('clears revoked tokens once they would have expired anyway', async () => {
      await t.app
        .get(DataSource)
        .query(
          `INSERT INTO revoked_tokens (jti, userId, expiresAt) VALUES ('00000000-0000-4000-8000-000000000000', 4, '2020-01-01 00:00:00.000')`,
        );
      await request(t.http)
        .post('/api/auth/logout')
        .set(bearer(await t.tokenFor('kai.mendes')))
        .expect(204);
      expect(await t.app.get(DataSource).query(`SELECT jti FROM revoked_tokens WHERE expiresAt < '2026-01-01'`)).toEqual([]);
    });

    it('refuses a token without a session id, which Lockstep never issues', async () => {
      const bare = t.app.get(JwtService).sign({ sub: 5, username: 'sam.rivera', role: 'admin' });
      await request(t.http).get('/api/auth/me').set(bearer(bare)).expect(401);
    });
  });

  describe('headers and input', () => {
    it('sends the security headers and keeps API answers out of the browser cache', async () => {
      const response = await request(t.http).get('/api/health').expect(200);
      const csp = response.headers['content-security-policy'];
      for (const directive of [
        "default-src 'self'",
        "script-src 'self'",
        "style-src 'self' 'unsafe-inline'",
        "object-src 'none'",
        "frame-ancestors 'none'",
      ]) {
        expect(csp).toContain(directive);
      }
      expect(csp).not.toContain('upgrade-insecure-requests');
      expect(response.headers).toMatchObject({
        'x-content-type-options': 'nosniff',
        'x-frame-options': 'DENY',
        'referrer-policy': 'no-referrer',
        'cache-control': 'no-store',
      });
      expect(response.headers['strict-transport-security']).toContain('max-age=');
      expect(response.headers['x-powered-by']).toBeUndefined();
    });

    it('lets no other origin in: a cross-origin preflight gets no Access-Control-Allow-Origin', async () => {
      const preflight = await request(t.http)
        .options('/api/orders')
        .set('Origin', 'https://elsewhere.example')
        .set('Access-Control-Request-Method', 'POST')
        .set('Access-Control-Request-Headers', 'authorization, content-type');
      expect(preflight.headers['access-control-allow-origin']).toBeUndefined();
      expect(preflight.headers['access-control-allow-headers']).toBeUndefined();
      const simple = await request(t.http).get('/api/health').set('Origin', 'https://elsewhere.example').expect(200);
      expect(simple.headers['access-control-allow-origin']).toBeUndefined();
    });

    it('refuses a JSON body over 100 kB with 413 in the API error shape', async () => {
      const response = await request(t.http)
        .post('/api/orders/preview')
        .set(bearer(prescriber))
        .send({ indication: 'x'.repeat(110 * 1024) })
        .expect(413);
      expect(response.body).toEqual({ statusCode: 413, message: 'The request body is too large: the limit is 100 kB' });
    });

    it('answers malformed JSON with a clear 400 and no stack trace', async () => {
      const response = await request(t.http)
        .post('/api/auth/login')
        .set('Content-Type', 'application/json')
        .send('{"username": "kai.mendes",')
        .expect(400);
      expect(response.body).toEqual({ statusCode: 400, message: 'The request body is not valid JSON' });
    });

    it('answers an unknown API route with 404 in the API error shape', async () => {
      const response = await request(t.http).get('/api/no-such-thing').expect(404);
      expect(response.body).toEqual({ statusCode: 404, message: expect.any(String) });
      expect(JSON.stringify(response.body)).not.toMatch(/\bat \w|node_modules|\.ts:\d/);
    });
  });

  describe('request log', () => {
    it('writes one structured entry per request, with the user but never a password, token or query string', async () => {
      const entries: { message: unknown; params: unknown[] }[] = [];
      const capture = (message: unknown, ...params: unknown[]) => entries.push({ message, params });
      const logger: LoggerService = { log: capture, error: capture, warn: capture, debug: capture, verbose: capture, fatal: capture };
      t.app.useLogger(logger);
      try {
        const signedIn = await request(t.http)
          .post('/api/auth/login')
          .send({ username: 'kai.mendes', password: DEMO_PASSWORD })
          .expect(200);
        await request(t.http).get('/api/auth/me?token=secret-in-url').set(bearer(signedIn.body.accessToken)).expect(200);
        await request(t.http).post('/api/auth/login').send({ username: 'kai.mendes', password: 'a-wrong-secret' }).expect(401);
        // The entry is written when the server closes the answer, a moment after the client has it.
        await new Promise((resolve) => setTimeout(resolve, 50));

        const requests = entries.filter((entry) => entry.message === 'request').map((entry) => entry.params[0]);
        expect(requests).toEqual([
          { method: 'POST', path: '/api/auth/login', status: 200, durationMs: expect.any(Number), userId: null, address: '127.0.0.1' },
          { method: 'GET', path: '/api/auth/me', status: 200, durationMs: expect.any(Number), userId: 4, address: '127.0.0.1' },
          { method: 'POST', path: '/api/auth/login', status: 401, durationMs: expect.any(Number), userId: null, address: '127.0.0.1' },
        ]);
        const everything = JSON.stringify(entries);
        for (const secret of [DEMO_PASSWORD, 'a-wrong-secret', 'secret-in-url', signedIn.body.accessToken, 'Bearer']) {
          expect(everything).not.toContain(secret);
        }
      } finally {
        t.app.useLogger(false);
      }
    });
  });
});
