import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { syringeState, type HandoverBoard, type OrderDetail, type OrderListEntry, type OrderSummary } from '@lockstep/shared';
import { dataSourceOptions } from '../src/database/data-source-options.js';
import { seedDemoDataIfEmpty } from '../src/database/seed/demo-seed.js';
import { HandoverBoardService } from '../src/handover/handover-board.service.js';
import { createTestApp, type TestApp } from './support/test-app.js';

// The demo hospital on a freshly seeded database (issue: a demo ward in the middle of a shift).
// The figures below are the demo's own invented scenario, not clinical check values.

type Who = 'amara' | 'lin' | 'kai' | 'mei' | 'sam';
const USERNAMES: Record<Who, string> = { amara: 'amara.osei', lin: 'lin.park', kai: 'kai.mendes', mei: 'mei.tan', sam: 'sam.rivera' };
const HARBOUR = 1;
const WARDS = [1, 2, 3, 4];

describe('the demo hospital, caught in the middle of a shift', () => {
  let t: TestApp;
  const token = {} as Record<Who, string>;
  const get = (who: Who, url: string) =>
    request(t.http)
      .get(url)
      .set({ Authorization: `Bearer ${token[who]}` })
      .expect(200);
  const board = async (wardId: number) => (await get('mei', `/api/wards/${wardId}/handover`)).body as HandoverBoard;

  beforeAll(async () => {
    t = await createTestApp();
    for (const who of Object.keys(USERNAMES) as Who[]) token[who] = await t.tokenFor(USERNAMES[who]);
  });
  afterAll(() => t.close());

  it('Harbour’s board: five or more running PCAs, one urgent, one overdue, one syringe emptying this shift, one discrepancy', async () => {
    const { rows } = await board(HARBOUR);
    const running = rows.filter((row) => row.status === 'active');
    expect(running.length).toBeGreaterThanOrEqual(5);
    expect(
      running
        .filter((row) => row.flags.urgent > 0)
        .map((row) => row.flags.open.map((flag) => flag.code))
        .flat(),
    ).toContain('sedation.3');
    expect(running.some((row) => (row.nextObservation?.overdueMinutes ?? 0) > 0)).toBe(true);
    expect(running.some((row) => row.syringe.emptiesThisShift)).toBe(true);
    expect(rows.some((row) => row.pendingTasks.some((task) => task.code === 'reconciliation_discrepancy'))).toBe(true);
    expect(rows.map((row) => row.riskTier)).toEqual([...rows.map((row) => row.riskTier)].sort());
    // This shift's handover half done: some PCAs confirmed by both nurses, some not yet.
    const confirmed = running.filter((row) => row.signoffs.length === 2).length;
    expect(confirmed).toBeGreaterThan(0);
    expect(confirmed).toBeLessThan(running.length);
  });

  it('the demo’s pump totals fit each regimen: the flags it writes (first readings included) never say delivered more than allowed', async () => {
    const codes: { code: string; n: number }[] = await t.app.get(DataSource).query('SELECT code, count(*) AS n FROM flags GROUP BY code');
    const found = codes.map((row) => row.code);
    expect(found).toContain('sedation.3');
    expect(found).not.toContain('delivery.over-regimen');
    expect(found).not.toContain('delivery.volume-mismatch');
    expect(found).not.toContain('syringe.reading');
  });

  it('an order’s detail says when its next observation is due, as the board does; none before it runs', async () => {
    for (const row of (await board(HARBOUR)).rows) {
      const detail = (await get('kai', `/api/orders/${row.orderId}`)).body as OrderDetail;
      expect(detail.nextObservation?.dueAt ?? null, `order ${row.orderId}`).toBe(row.nextObservation?.dueAt ?? null);
      expect(detail.nextObservation?.severity ?? null).toBe(row.nextObservation?.severity ?? null);
      if (row.status !== 'active') expect(detail.nextObservation).toBeNull();
    }
  });

  it('the list of a ward’s orders says where each one’s syringes stand and when it is next observed, as its detail does', async () => {
    const list = (await get('kai', `/api/orders?wardId=${HARBOUR}&status=verified,active`)).body as OrderListEntry[];
    expect(list.map((entry) => entry.syringeState).sort()).toEqual(expect.arrayContaining(['ready', 'running']));
    for (const entry of list) {
      const detail = (await get('kai', `/api/orders/${entry.id}`)).body as OrderDetail;
      expect(entry.syringeState, `order ${entry.id}`).toBe(syringeState(detail.releases));
      expect(entry.nextObservation?.dueAt ?? null).toBe(detail.nextObservation?.dueAt ?? null);
    }
  });

  it('every running PCA has 24-hour figures, the same on its usage page as on the board', async () => {
    let running = 0;
    for (const wardId of WARDS) {
      for (const row of (await board(wardId)).rows.filter((r) => r.status === 'active')) {
        running++;
        const usage = (await get('kai', `/api/orders/${row.orderId}/usage?hours=24`)).body;
        expect(usage.rolling24hDose, `order ${row.orderId}`).toBeGreaterThan(0);
        expect(usage.buckets.filter((bucket: { delivered: number }) => bucket.delivered > 0).length).toBeGreaterThanOrEqual(6);
        expect(usage.oralMorphineEquivalent24hMg).toBeGreaterThan(0);
        // A syringe started more than a day ago once counted its whole use inside the window on the board.
        expect(row.total24hDose, `order ${row.orderId}`).toBeCloseTo(usage.rolling24hDose, 6);
      }
    }
    // Six on Harbour and one on each of the other wards, the paediatric one weight-based.
    expect(running).toBeGreaterThanOrEqual(9);
  });

  it('pump totals only rise within a syringe, never past what it held; a syringe change is reconciled', async () => {
    const { body: orders } = await get('kai', '/api/orders?status=active,discontinued');
    let changes = 0;
    for (const summary of orders as OrderSummary[]) {
      const { body: order } = (await get('kai', `/api/orders/${summary.id}`)) as { body: OrderDetail };
      const { body: observations } = await get('kai', `/api/orders/${summary.id}/observations`);
      expect(observations.length, `order ${summary.id}`).toBeGreaterThanOrEqual(6);
      expect(observations.length).toBeLessThanOrEqual(48);
      const volumes = new Map(order.releases.map((release) => [release.id, release.volumeMl]));
      const last = new Map<number, { attempts: number; delivered: number; volumeInfusedMl: number }>();
      for (const reading of observations) {
        const before = last.get(reading.releaseId) ?? { attempts: 0, delivered: 0, volumeInfusedMl: 0 };
        for (const counter of ['attempts', 'delivered', 'volumeInfusedMl'] as const)
          expect(reading[counter]).toBeGreaterThanOrEqual(before[counter]);
        expect(reading.delivered).toBeLessThanOrEqual(reading.attempts);
        expect(reading.volumeInfusedMl + reading.syringeRemainingMl).toBeCloseTo(volumes.get(reading.releaseId)!, 6);
        last.set(reading.releaseId, reading);
      }
      changes += order.releases.length - 1;
    }
    expect(changes).toBeGreaterThan(0);
    const story = (await get('kai', '/api/orders/8/audit')).body as { action: string }[];
    expect(story.map((event) => event.action)).toContain('order.syringe-change');
  });

  it('the orders waiting for each step, and a discontinued PCA with its witnessed waste', async () => {
    const queue = (await get('lin', '/api/orders?status=awaiting_verification')).body as OrderDetail[];
    expect(queue.length).toBeGreaterThan(0);
    const waiting = (await get('lin', `/api/orders/${queue[0].id}`)).body as OrderDetail;
    expect(waiting.overrides.length).toBeGreaterThan(0);
    expect(waiting.findings.filter((finding) => finding.severity === 'soft').map((finding) => finding.field)).toEqual(
      expect.arrayContaining(waiting.overrides.map((o) => o.field)),
    );

    const nurseList = (await get('kai', `/api/orders?wardId=${HARBOUR}&status=verified,active`)).body as OrderSummary[];
    const toCheck = nurseList.find((order) => order.status === 'verified')!;
    expect((await get('kai', `/api/orders/${toCheck.id}`)).body.releases.map((release: { status: string }) => release.status)).toEqual([
      'ready',
    ]);
    expect(nurseList.filter((order) => order.status === 'active').length).toBeGreaterThanOrEqual(5);

    const returned = (await get('amara', '/api/orders?mine=true&status=returned')).body as OrderSummary[];
    expect(returned.length).toBeGreaterThan(0);
    expect(returned[0].statusReason).toMatch(/lockout/i);

    const [ended] = (await get('kai', '/api/orders?status=discontinued')).body as OrderSummary[];
    const story = (await get('kai', `/api/orders/${ended.id}/audit`)).body as { action: string; summary: Record<string, unknown> }[];
    const discontinue = story.find((event) => event.action === 'order.discontinue')!;
    expect(discontinue.summary).toMatchObject({ witness: 'Rosa Adeyemi', mustReport: false });
    expect(discontinue.summary.wastedMl).toBeGreaterThan(0);
  });

  it('every ward keeps at least two admitted patients with no PCA, ready for a new order', async () => {
    const orders = (await get('amara', '/api/orders')).body as OrderSummary[];
    const withOrders = new Set(orders.map((order) => order.patientId));
    for (const wardId of WARDS) {
      const patients = (await get('amara', `/api/patients?wardId=${wardId}`)).body as { id: number }[];
      expect(patients.filter((patient) => !withOrders.has(patient.id)).length, `ward ${wardId}`).toBeGreaterThanOrEqual(2);
    }
  });

  it('tells its story: a verifiable audit chain with every observation, and the e-mail those events sent', async () => {
    expect((await get('sam', '/api/audit/verify')).body).toMatchObject({ ok: true });
    const { body: observations } = await get('kai', '/api/orders/5/observations');
    const story = (await get('kai', '/api/orders/5/audit')).body as { action: string; at: string }[];
    expect(story.filter((event) => event.action === 'order.observation')).toHaveLength(observations.length);
    expect(story.slice(0, 5).map((event) => event.action)).toEqual([
      'order.create',
      'order.verify',
      'order.release',
      'order.bedside-first-check',
      'order.bedside-second-check',
    ]);
    expect(story.map((event) => event.at)).toEqual([...story.map((event) => event.at)].sort());

    const mail = (await get('sam', '/api/dev/mailbox')).body as { subject: string }[];
    const subjects = mail.map((message) => message.subject);
    expect(subjects.some((subject) => subject.startsWith('URGENT: Sedation level 3'))).toBe(true);
    expect(subjects.some((subject) => subject.startsWith('Reconciliation discrepancy'))).toBe(true);
    expect(subjects.some((subject) => subject.includes('returned with a query'))).toBe(true);
  });
});

describe('the demo seed at any time of day', () => {
  const directory = mkdtempSync(path.join(tmpdir(), 'lockstep-demo-'));
  afterAll(() => rmSync(directory, { recursive: true, force: true }));

  const seedAt = async (name: string, now: Date) => {
    const dataSource = new DataSource(dataSourceOptions(path.join(directory, `${name}.sqlite`)));
    await dataSource.initialize();
    const started = performance.now();
    await seedDemoDataIfEmpty(dataSource, now.getTime());
    const seconds = (performance.now() - started) / 1000;
    return { dataSource, seconds };
  };
  const counts = (dataSource: DataSource) =>
    dataSource.query(
      `SELECT (SELECT count(*) FROM observations) AS observations, (SELECT count(*) FROM flags) AS flags, (SELECT count(*) FROM release_reconciliations) AS reconciliations, (SELECT count(*) FROM pca_orders) AS orders`,
    );

  let reference: DataSource;
  beforeAll(async () => {
    reference = (await seedAt('reference', new Date('2026-12-03T10:00:00Z'))).dataSource;
  });
  afterAll(() => reference.destroy());

  // Just before and after each shift change, and mid-shift: the board keeps its story whatever the clock.
  it.each(['2026-12-03T18:59:30Z', '2026-12-03T19:00:30Z', '2026-12-04T06:45:00Z', '2026-12-04T07:01:00Z', '2026-12-04T13:00:00Z'])(
    'seeded at %s',
    async (at) => {
      const now = new Date(at);
      const { dataSource, seconds } = await seedAt(at.replace(/\W/g, ''), now);
      try {
        expect(seconds).toBeLessThan(5);
        const { rows } = await new HandoverBoardService(dataSource).board(HARBOUR, now);
        const running = rows.filter((row) => row.status === 'active');
        expect(running.length).toBeGreaterThanOrEqual(5);
        expect(running.some((row) => row.flags.urgent > 0)).toBe(true);
        expect(running.some((row) => (row.nextObservation?.overdueMinutes ?? 0) > 0)).toBe(true);
        expect(running.some((row) => row.syringe.emptiesThisShift)).toBe(true);
        // The same picture every time: only the clock moves.
        expect(await counts(dataSource)).toEqual(await counts(reference));
      } finally {
        await dataSource.destroy();
      }
    },
  );
});
