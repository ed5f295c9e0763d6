import type { Request } from 'autocannon';
import type { ActiveOrder } from './datasets.js';

/**
 * Each connection writes observations to its own share of the running PCAs in turn, so one
 * order's writes never race each other and its pump totals always go up, as the API demands.
 * Every body is a valid, unremarkable observation (no flag raised by its values).
 */
export function observationRequests(
  orders: readonly ActiveOrder[],
  connections: number,
  authorization: string,
): (connection: number) => Request[] {
  const state = orders.map((order) => ({ ...order }));
  return (connection) => {
    const mine = state.filter((_, index) => index % connections === connection);
    if (mine.length === 0) throw new Error(`More connections (${connections}) than running PCAs to write to (${orders.length})`);
    let turn = 0;
    return [
      {
        method: 'POST',
        path: `/api/orders/${mine[0].orderId}/observations`,
        headers: { authorization, 'content-type': 'application/json' },
        setupRequest: (request) => {
          const order = mine[turn++ % mine.length];
          order.attempts += 2;
          order.delivered += 1;
          order.volumeInfusedMl = Math.round((order.volumeInfusedMl + 0.05) * 100) / 100;
          const body = {
            painScore: 2,
            sedationLevel: '1',
            respiratoryRate: 14,
            spo2: 97,
            oxygenLitresPerMinute: 0,
            attempts: order.attempts,
            delivered: order.delivered,
            volumeInfusedMl: order.volumeInfusedMl,
            syringeRemainingMl: Math.max(0, Math.round((order.syringeMl - order.volumeInfusedMl) * 100) / 100),
          };
          return { ...request, path: `/api/orders/${order.orderId}/observations`, body: JSON.stringify(body) };
        },
      },
    ];
  };
}
