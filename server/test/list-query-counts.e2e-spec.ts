import { getDataSourceToken } from '@nestjs/typeorm';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { queryCounter } from '../src/database/query-counter.js';
import { SyringeRelease } from '../src/releases/entities/syringe-release.entity.js';
import { seedBoardWard, type FixtureBed } from './support/board-fixture.js';
import { seedAuditEvents, seedLibraryVersions, seedObservations, seedUsers } from './support/list-fixture.js';
import { createTestApp, type TestApp } from './support/test-app.js';

// No N+1 queries: every list costs the same number of statements for a few rows as for many.

type Who = 'mei' | 'kai' | 'lin' | 'sam';
const USERNAMES: Record<Who, string> = { mei: 'mei.tan', kai: 'kai.mendes', lin: 'lin.park', sam: 'sam.rivera' };

const beds = (prefix: string, n: number): FixtureBed[] =>
  Array.from({ length: n }, (_, i) => ({
    bed: `${prefix}${i + 1}`,
    startedMinutesAgo: 300,
    observedMinutesAgo: 20 + i,
    urgentFlag: i % 3 === 0,
  }));

describe('list endpoints cost a fixed number of queries, however many rows', () => {
  let t: TestApp;
  let dataSource: DataSource;
  const token = {} as Record<Who, string>;
  let small: number;
  let large: number;
  let smallOrder: number;
  let largeOrder: number;

  const queries = (who: Who, url: string) =>
    queryCounter.measure(async () => {
      const response = await request(t.http)
        .get(url)
        .set({ Authorization: `Bearer ${token[who]}` });
      expect(response.status, `${url}: ${JSON.stringify(response.body).slice(0, 200)}`).toBe(200);
    });

  /** The first active order of a ward, and its running syringe. */
  const runningOrder = async (wardId: number) => {
    const [row] = await dataSource.query(
      `SELECT o.id FROM pca_orders o JOIN patients p ON p.id = o.patientId WHERE p.wardId = ? AND o.status = 'active' ORDER BY o.id LIMIT 1`,
      [wardId],
    );
    const release = await dataSource.manager.findOneByOrFail(SyringeRelease, { orderId: row.id, status: 'in_use' });
    return { orderId: row.id as number, releaseId: release.id };
  };

  beforeAll(async () => {
    t = await createTestApp();
    dataSource = t.app.get<DataSource>(getDataSourceToken());
    for (const who of Object.keys(USERNAMES) as Who[]) token[who] = await t.tokenFor(USERNAMES[who]);
    small = await seedBoardWard(dataSource, 'LQS', beds('S', 2));
    large = await seedBoardWard(dataSource, 'LQL', beds('L', 40));
    await seedLibraryVersions(dataSource, small, 1);
    await seedLibraryVersions(dataSource, large, 20);
    const smallRunning = await runningOrder(small);
    const largeRunning = await runningOrder(large);
    smallOrder = smallRunning.orderId;
    largeOrder = largeRunning.orderId;
    await seedObservations(dataSource, largeOrder, largeRunning.releaseId, 40);
    await seedAuditEvents(dataSource, smallOrder, 2);
    await seedAuditEvents(dataSource, largeOrder, 60);
  });
  afterAll(() => t.close());

  it.each([
    ['orders of a ward', 'kai', (ward: number) => `/api/orders?wardId=${ward}`],
    ['orders of a ward by status', 'kai', (ward: number) => `/api/orders?wardId=${ward}&status=verified,active`],
    ['orders of several wards (a nurse’s own)', 'kai', (ward: number) => `/api/orders?wardIds=1,${ward}&status=active`],
    ['patients of a ward', 'kai', (ward: number) => `/api/patients?wardId=${ward}`],
    ['handover board', 'mei', (ward: number) => `/api/wards/${ward}/handover`],
    ['library versions of a ward', 'lin', (ward: number) => `/api/library/versions?wardId=${ward}`],
  ] as const)('%s: 2 rows or 40', async (_name, who, url) => {
    const few = await queries(who, url(small));
    const many = await queries(who, url(large));
    expect(many).toBe(few);
  });

  it.each([
    ['observations of an order', 'kai', (order: number) => `/api/orders/${order}/observations`],
    ['audit search of an order', 'sam', (order: number) => `/api/audit?entityType=order&entityId=${order}&limit=200`],
    ["an order's audit story", 'kai', (order: number) => `/api/orders/${order}/audit`],
  ] as const)('%s: a few rows or dozens', async (_name, who, url) => {
    const few = await queries(who, url(smallOrder));
    const many = await queries(who, url(largeOrder));
    expect(many).toBe(few);
  });

  it('hospital-wide lists: the same before and after a ward of 40 more patients, orders and staff', async () => {
    const routes: [Who, string][] = [
      ['lin', '/api/orders?status=awaiting_verification,verified,active'],
      ['kai', '/api/patients'],
      ['lin', '/api/library/versions'],
      ['sam', '/api/users'],
      ['sam', '/api/audit'],
    ];
    const before = [];
    for (const [who, url] of routes) before.push(await queries(who, url));
    await seedBoardWard(dataSource, 'LQH', beds('H', 40));
    await seedUsers(dataSource, 'lq', 30, [small, large]);
    await seedAuditEvents(dataSource, largeOrder, 30);
    const after = [];
    for (const [who, url] of routes) after.push(await queries(who, url));
    expect(after).toEqual(before);
  });
});
