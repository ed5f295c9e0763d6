import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PcaOrder } from '../src/orders/entities/pca-order.entity.js';
import { transitionOrder } from '../src/orders/order-transitions.js';
import { ORDER, RELEASE, SETTINGS } from './support/pca.js';
import { createTestApp, DEMO_PASSWORD, type TestApp, type TestPatient } from './support/test-app.js';

// Each race fires its requests at once over real sockets (fetch against app.listen), so they
// overlap inside Nest exactly as two people pressing the same button would. Every race repeats.
const ROUNDS = 15;
const SUMMIT = 4; // demo ward ids: Harbour 1, Cedar 2, Wren 3, Summit 4
const SIGNED = { signature: { password: DEMO_PASSWORD } };

type Reply = { status: number; body: Record<string, unknown> };

// Fifteen rounds of bcrypt-signed requests take a while on a busy two-core machine.
describe('concurrency: simultaneous requests on one record', { timeout: 120_000 }, () => {
  let t: TestApp;
  let db: DataSource;
  let baseUrl: string;
  const token: Record<'amara' | 'ari' | 'lin' | 'tomas' | 'kai', string> = { amara: '', ari: '', lin: '', tomas: '', kai: '' };
  // A second prescriber (invented), for two doctors ordering for one patient at once.
  const ARI = { username: 'ari.vance', displayName: 'Dr Ari Vance', role: 'prescriber', wardIds: [1], password: 'a-long-enough-password' };
  const tally: Record<string, number> = {};

  const call = async (method: string, path: string, as: string, body?: object): Promise<Reply> => {
    const response = await fetch(`${baseUrl}${path}`, {
      method,
      headers: { Authorization: `Bearer ${as}`, ...(body ? { 'Content-Type': 'application/json' } : {}) },
      body: body ? JSON.stringify(body) : undefined,
    });
    const text = await response.text();
    return { status: response.status, body: text ? (JSON.parse(text) as Record<string, unknown>) : {} };
  };
  const ok = async (
    method: string,
    path: string,
    as: string,
    body: object | undefined,
    status: number,
  ): Promise<Record<string, unknown>> => {
    const reply = await call(method, path, as, body);
    expect(reply.status, `${method} ${path}: ${JSON.stringify(reply.body)}`).toBe(status);
    return reply.body;
  };
  const statuses = (replies: Reply[]) => replies.map((reply) => reply.status).sort();
  const count = async (sql: string, parameters: unknown[]): Promise<number> => Number((await db.query(sql, parameters))[0].n);

  /** Signed for a patient of its own (a patient may have only one open PCA), or for `patient`. */
  const signedOrder = async (patient?: TestPatient): Promise<number> =>
    (await ok('POST', '/api/orders', token.amara, { ...ORDER, patientId: (patient ?? (await t.addPatient())).id }, 201)).id as number;
  const verifiedWithSyringe = async (): Promise<{ id: number; code: string; patient: TestPatient }> => {
    const patient = await t.addPatient();
    const id = await signedOrder(patient);
    await ok('POST', `/api/orders/${id}/verify`, token.lin, SIGNED, 200);
    const release = await ok('POST', `/api/orders/${id}/releases`, token.lin, RELEASE, 201);
    return { id, code: release.releaseCode as string, patient };
  };

  beforeAll(async () => {
    t = await createTestApp();
    await t.app.listen(0, '127.0.0.1');
    baseUrl = `http://127.0.0.1:${((t.app.getHttpServer() as Server).address() as AddressInfo).port}`;
    db = t.app.get(DataSource);
    token.amara = await t.tokenFor('amara.osei');
    token.lin = await t.tokenFor('lin.park');
    token.tomas = await t.tokenFor('tomas.ortiz');
    token.kai = await t.tokenFor('kai.mendes');
    await ok('POST', '/api/users', await t.tokenFor('sam.rivera'), ARI, 201);
    token.ari = await t.tokenFor(ARI.username, ARI.password);
  });
  afterAll(async () => {
    console.log(
      `Races run: ${Object.entries(tally)
        .map(([race, rounds]) => `${race} ${rounds}`)
        .join(', ')}`,
    );
    await t.close();
  });

  it(`two prescribers order a PCA for one patient at once: one 201, one 409 naming it, one order written (${ROUNDS} rounds)`, async () => {
    for (let round = 0; round < ROUNDS; round++) {
      const patient = await t.addPatient();
      const body = { ...ORDER, patientId: patient.id };
      const bodies = [body, { ...body, signature: { password: ARI.password } }];
      const created = () => count(`SELECT COUNT(*) AS n FROM audit_event WHERE action = 'order.create'`, []);
      const before = await created();
      const replies = await Promise.all([token.amara, token.ari].map((as, i) => call('POST', '/api/orders', as, bodies[i])));
      expect(statuses(replies), JSON.stringify(replies)).toEqual([201, 409]);
      const winner = replies.find((reply) => reply.status === 201)!.body;
      const loser = replies.find((reply) => reply.status === 409)!.body;
      expect(loser).toMatchObject({ openOrderId: winner.id, message: expect.stringContaining(`open PCA (order ${winner.id as number},`) });
      expect(await count('SELECT COUNT(*) AS n FROM pca_orders WHERE patientId = ?', [patient.id])).toBe(1);
      expect(await created()).toBe(before + 1);
      tally['order/order'] = round + 1;
    }
  });

  it(`two pharmacists verify one order at once: one 200, one 409 with the current status (${ROUNDS} rounds)`, async () => {
    for (let round = 0; round < ROUNDS; round++) {
      const id = await signedOrder();
      const replies = await Promise.all([token.lin, token.tomas].map((as) => call('POST', `/api/orders/${id}/verify`, as, SIGNED)));
      expect(statuses(replies)).toEqual([200, 409]);
      const winner = replies.find((reply) => reply.status === 200)!;
      expect(replies.find((reply) => reply.status === 409)!.body).toMatchObject({ currentStatus: 'verified' });
      expect(winner.body).toMatchObject({ status: 'verified' });
      expect(await count(`SELECT COUNT(*) AS n FROM order_events WHERE orderId = ? AND toStatus = 'verified'`, [id])).toBe(1);
      const [order] = await db.query('SELECT status, rowVersion FROM pca_orders WHERE id = ?', [id]);
      expect(order).toEqual({ status: 'verified', rowVersion: 2 });
      tally['verify/verify'] = round + 1;
    }
  });

  it(`verify and return at once: exactly one wins and the order shows it (${ROUNDS} rounds)`, async () => {
    for (let round = 0; round < ROUNDS; round++) {
      const id = await signedOrder();
      const [verify, ret] = await Promise.all([
        call('POST', `/api/orders/${id}/verify`, token.lin, SIGNED),
        call('POST', `/api/orders/${id}/return`, token.tomas, { reason: 'Please confirm the lockout with the surgical team' }),
      ]);
      expect([verify.status, ret.status].sort()).toEqual([200, 409]);
      const [order] = await db.query('SELECT status FROM pca_orders WHERE id = ?', [id]);
      expect(order.status).toBe(verify.status === 200 ? 'verified' : 'returned');
      expect(await count(`SELECT COUNT(*) AS n FROM order_events WHERE orderId = ? AND fromStatus IS NOT NULL`, [id])).toBe(1);
      tally['verify/return'] = round + 1;
    }
  });

  it(`two second nurses sign one bedside check at once: one activation (${ROUNDS} rounds)`, async () => {
    for (let round = 0; round < ROUNDS; round++) {
      const { id, code, patient } = await verifiedWithSyringe();
      const first = await ok(
        'POST',
        `/api/orders/${id}/bedside-checks`,
        token.kai,
        { ...patient.identity, releaseCode: code, settings: SETTINGS },
        201,
      );
      const path = `/api/orders/${id}/bedside-checks/${first.id as number}/second`;
      const replies = await Promise.all(
        ['rosa.adeyemi', 'mei.tan'].map((username) =>
          call('POST', path, token.kai, { username, password: DEMO_PASSWORD, settings: SETTINGS }),
        ),
      );
      expect(statuses(replies), JSON.stringify(replies)).toEqual([200, 409]);
      expect(replies.find((reply) => reply.status === 200)!.body).toMatchObject({ status: 'matched', differences: [] });
      expect(await count(`SELECT COUNT(*) AS n FROM order_events WHERE orderId = ? AND toStatus = 'active'`, [id])).toBe(1);
      const [order] = await db.query('SELECT status, rowVersion FROM pca_orders WHERE id = ?', [id]);
      expect(order).toEqual({ status: 'active', rowVersion: 3 });
      const [check] = await db.query('SELECT status, rowVersion FROM bedside_checks WHERE id = ?', [first.id]);
      expect(check).toEqual({ status: 'matched', rowVersion: 2 });
      const [release] = await db.query('SELECT status, rowVersion FROM syringe_releases WHERE orderId = ?', [id]);
      expect(release).toEqual({ status: 'in_use', rowVersion: 2 });
      tally['second check/second check'] = round + 1;
    }
  });

  it(`two approvals of one library version at once: one 200, one 409, one active version (${ROUNDS} rounds)`, async () => {
    for (let round = 0; round < ROUNDS; round++) {
      const draft = await ok('POST', '/api/library/versions', token.lin, { wardId: SUMMIT, note: `Race round ${round}` }, 201);
      const id = draft.id as number;
      const { submittedAt } = await ok('POST', `/api/library/versions/${id}/submit`, token.lin, {}, 200);
      const replies = await Promise.all(
        [0, 1].map(() => call('POST', `/api/library/versions/${id}/approve`, token.tomas, { ...SIGNED, submittedAt })),
      );
      expect(statuses(replies), JSON.stringify(replies)).toEqual([200, 409]);
      const active = await db.query(`SELECT id FROM library_versions WHERE wardId = ? AND status = 'active'`, [SUMMIT]);
      expect(active).toEqual([{ id }]);
      expect(await count(`SELECT COUNT(*) AS n FROM library_versions WHERE wardId = ? AND status = 'retired'`, [SUMMIT])).toBe(round + 1);
      tally['approve/approve'] = round + 1;
    }
  });

  it(`two new drafts for one ward at once: one 201, one 409, never two open versions (${ROUNDS} rounds)`, async () => {
    for (let round = 0; round < ROUNDS; round++) {
      const replies = await Promise.all(
        [token.lin, token.tomas].map((as) => call('POST', '/api/library/versions', as, { wardId: SUMMIT })),
      );
      expect(statuses(replies), JSON.stringify(replies)).toEqual([201, 409]);
      expect(
        await count(`SELECT COUNT(*) AS n FROM library_versions WHERE wardId = ? AND status IN ('draft', 'pending_approval')`, [SUMMIT]),
      ).toBe(1);
      await ok(
        'DELETE',
        `/api/library/versions/${replies.find((reply) => reply.status === 201)!.body.id as number}`,
        token.lin,
        undefined,
        204,
      );
      tally['draft/draft'] = round + 1;
    }
  });

  it(`approve and withdraw at once: the version ends active or back in draft, never both (${ROUNDS} rounds)`, async () => {
    for (let round = 0; round < ROUNDS; round++) {
      const draft = await ok('POST', '/api/library/versions', token.lin, { wardId: SUMMIT }, 201);
      const id = draft.id as number;
      const { submittedAt } = await ok('POST', `/api/library/versions/${id}/submit`, token.lin, {}, 200);
      const [approve, withdraw] = await Promise.all([
        call('POST', `/api/library/versions/${id}/approve`, token.tomas, { ...SIGNED, submittedAt }),
        call('POST', `/api/library/versions/${id}/withdraw`, token.lin, {}),
      ]);
      expect([approve.status, withdraw.status].sort()).toEqual([200, 409]);
      const [version] = await db.query('SELECT status, approverId FROM library_versions WHERE id = ?', [id]);
      if (approve.status === 200) expect(version).toEqual({ status: 'active', approverId: expect.any(Number) });
      else {
        expect(version).toEqual({ status: 'draft', approverId: null });
        await ok('DELETE', `/api/library/versions/${id}`, token.lin, undefined, 204);
      }
      expect(await count(`SELECT COUNT(*) AS n FROM library_versions WHERE wardId = ? AND status = 'active'`, [SUMMIT])).toBe(1);
      tally['approve/withdraw'] = round + 1;
    }
  });

  it('the database itself refuses a second active or a second open version for a ward', async () => {
    const [retired] = await db.query(`SELECT id FROM library_versions WHERE wardId = ? AND status = 'retired' LIMIT 1`, [SUMMIT]);
    await expect(db.query(`UPDATE library_versions SET status = 'active' WHERE id = ?`, [retired.id])).rejects.toThrow(
      /UNIQUE constraint failed/,
    );
    await ok('POST', '/api/library/versions', token.lin, { wardId: SUMMIT }, 201);
    await expect(db.query(`UPDATE library_versions SET status = 'draft' WHERE id = ?`, [retired.id])).rejects.toThrow(
      /UNIQUE constraint failed/,
    );
  });

  // The races above are settled by the status re-read inside each (queued) transaction. This
  // proves the second line of defence: a write from a stale copy of the order changes nothing.
  it('refuses a status change written from a stale copy of the order (rowVersion guard): 409, nothing written', async () => {
    const id = await signedOrder();
    const stale = await db.manager.findOneByOrFail(PcaOrder, { id });
    await ok('POST', `/api/orders/${id}/verify`, token.lin, SIGNED, 200);
    const write = db.transaction((manager) => transitionOrder(manager, stale, 'returned', 3, 'Written from a stale copy'));
    await expect(write).rejects.toMatchObject({ response: { statusCode: 409, currentStatus: 'verified' } });
    const [order] = await db.query('SELECT status, rowVersion FROM pca_orders WHERE id = ?', [id]);
    expect(order).toEqual({ status: 'verified', rowVersion: 2 });
    expect(await count(`SELECT COUNT(*) AS n FROM order_events WHERE orderId = ?`, [id])).toBe(2);
  });

  it('leaves the audit chain unbroken after all the races', async () => {
    const verified = await ok('GET', '/api/audit/verify', await t.tokenFor('sam.rivera'), undefined, 200);
    expect(verified).toMatchObject({ ok: true, firstBadId: null });
    expect(verified.checked as number).toBeGreaterThan(6 * ROUNDS);
  });
});
