import type { BenchOptions } from './bench-options.js';
import type { DatasetFacts } from './datasets.js';
import type { LoadSpec } from './load.js';
import { observationRequests } from './observation-writes.js';

export type Tokens = { chargeNurse: string; nurse: string };

type Context = { baseUrl: string; options: BenchOptions; facts: DatasetFacts; tokens: Tokens };

const bearer = (token: string) => ({ authorization: `Bearer ${token}` });

/** The charge nurse's handover board of the busiest ward. */
export function boardLoad({ baseUrl, options, facts, tokens }: Context, name = 'board'): LoadSpec {
  return {
    name,
    baseUrl,
    connections: options.connections,
    seconds: options.seconds,
    request: { method: 'GET', path: `/api/wards/${facts.busyWard.id}/handover`, headers: bearer(tokens.chargeNurse) },
  };
}

/** The bedside list of that ward: orders waiting for a bedside check and running ones. */
export function ordersLoad({ baseUrl, options, facts, tokens }: Context): LoadSpec {
  const path = `/api/orders?wardId=${facts.busyWard.id}&status=verified,active`;
  return {
    name: 'orders list',
    baseUrl,
    connections: options.connections,
    seconds: options.seconds,
    request: { method: 'GET', path, headers: bearer(tokens.nurse) },
  };
}

/** The 24-hour usage of each running PCA on that ward in turn. */
export function usageLoad({ baseUrl, options, facts, tokens }: Context): LoadSpec {
  const ids = facts.busyWardActiveOrderIds;
  let next = 0;
  return {
    name: 'usage',
    baseUrl,
    connections: options.connections,
    seconds: options.seconds,
    request: {
      method: 'GET',
      path: `/api/orders/${ids[0]}/usage?hours=24`,
      headers: bearer(tokens.nurse),
      setupRequest: (request) => ({ ...request, path: `/api/orders/${ids[next++ % ids.length]}/usage?hours=24` }),
    },
  };
}

/** Room left in a syringe for a PCA to be written to (each write adds 0.05 mL). */
const WRITE_HEADROOM_ML = 2;

/**
 * Observations written to every running PCA in the hospital but the busy ward's (a connection per
 * share of them), so the board measured next time is the same board even on reused data.
 */
export function writesLoad({ baseUrl, options, facts, tokens }: Context): LoadSpec {
  const busy = new Set(facts.busyWardActiveOrderIds);
  // Each write adds 0.05 mL; a PCA whose syringe is nearly spent (the seed leaves some to run low)
  // would soon report more than the syringe held, which the API refuses (400). 2 mL is 40 writes.
  const orders = facts.activeOrders.filter(
    (order) => !busy.has(order.orderId) && order.syringeMl - order.volumeInfusedMl >= WRITE_HEADROOM_ML,
  );
  const connections = Math.min(options.connections, orders.length);
  return {
    name: 'observation writes',
    baseUrl,
    connections,
    seconds: options.seconds,
    request: { method: 'GET', path: '/api/health' },
    requestsFor: observationRequests(orders, connections, bearer(tokens.nurse).authorization),
  };
}
