import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { OrderListEntry } from '@lockstep/shared';
import { createTestApp, type TestApp } from './support/test-app.js';

// A nurse's lists narrowed to several wards at once (kai.mendes looks after Harbour and Summit), on
// the demo hospital: running PCAs on every ward, Cedar's and Wren's included.
const HARBOUR = 1;
const CEDAR = 2;
const WREN = 3;
const SUMMIT = 4;

describe('GET /api/orders?wardIds=: several wards at once', () => {
  let t: TestApp;
  let kai = '';
  const list = async (query: string) =>
    (
      await request(t.http)
        .get(`/api/orders?${query}`)
        .set({ Authorization: `Bearer ${kai}` })
        .expect(200)
    ).body as OrderListEntry[];
  const refused = async (query: string) =>
    (
      await request(t.http)
        .get(`/api/orders?${query}`)
        .set({ Authorization: `Bearer ${kai}` })
        .expect(400)
    ).body as { message: string; errors: { field: string; message: string }[] };
  const ids = (entries: readonly OrderListEntry[]) => entries.map((entry) => entry.id).sort((a, b) => a - b);

  beforeAll(async () => {
    t = await createTestApp();
    kai = await t.tokenFor('kai.mendes');
  });
  afterAll(() => t.close());

  it("lists the running PCAs of the wards asked for and no other ward's: the same as asking each ward in turn", async () => {
    const every = await list('status=active');
    expect(new Set(every.map((entry) => entry.wardId))).toEqual(new Set([HARBOUR, CEDAR, WREN, SUMMIT]));
    const harbour = await list(`status=active&wardId=${HARBOUR}`);
    const summit = await list(`status=active&wardId=${SUMMIT}`);
    const both = await list(`status=active&wardIds=${HARBOUR},${SUMMIT}`);
    expect(harbour.length).toBeGreaterThan(0);
    expect(summit.length).toBeGreaterThan(0);
    expect(ids(both)).toEqual(ids([...harbour, ...summit]));
    expect(both.every((entry) => entry.wardId === HARBOUR || entry.wardId === SUMMIT)).toBe(true);
    // Each entry still carries its schedule, as the Observations due list needs.
    expect(both.every((entry) => entry.nextObservation !== null)).toBe(true);
  });

  it('takes the parameter repeated, spaces around the commas, one ward, and a ward repeated', async () => {
    const both = ids(await list(`status=active&wardIds=${HARBOUR},${SUMMIT}`));
    expect(ids(await list(`status=active&wardIds=${SUMMIT}&wardIds=${HARBOUR}`))).toEqual(both);
    expect(ids(await list(`status=active&wardIds=${HARBOUR}%20,%20${SUMMIT}`))).toEqual(both);
    expect(ids(await list(`status=active&wardIds=${HARBOUR},${SUMMIT},${HARBOUR}`))).toEqual(both);
    expect(ids(await list(`status=active&wardIds=${CEDAR}`))).toEqual(ids(await list(`status=active&wardId=${CEDAR}`)));
  });

  it('with wardId too, keeps only the wards in both (none when they differ)', async () => {
    const harbour = ids(await list(`status=active&wardId=${HARBOUR}`));
    expect(ids(await list(`status=active&wardId=${HARBOUR}&wardIds=${HARBOUR},${SUMMIT}`))).toEqual(harbour);
    expect(await list(`status=active&wardId=${CEDAR}&wardIds=${HARBOUR},${SUMMIT}`)).toEqual([]);
  });

  it('refuses a blank, non-numeric, zero, negative or fractional ward id naming wardIds, never reading it as every ward', async () => {
    for (const bad of ['', ',', `${HARBOUR},`, `${HARBOUR},,${SUMMIT}`, 'abc', '0', '-1', '1.5', 'Infinity', 'NaN']) {
      const body = await refused(`status=active&wardIds=${encodeURIComponent(bad)}`);
      expect(
        body.errors.map((error) => error.field),
        bad,
      ).toEqual(expect.arrayContaining(['wardIds']));
    }
  });

  it('refuses more than 100 wards', async () => {
    const many = Array.from({ length: 101 }, (_, index) => index + 1).join(',');
    const body = await refused(`status=active&wardIds=${many}`);
    expect(body.errors).toContainEqual({ field: 'wardIds', message: 'wardIds lists at most 100 wards' });
  });
});
