import { spawn } from 'node:child_process';
import path from 'node:path';
import Database from 'better-sqlite3';
import type { BenchOptions } from './bench-options.js';
import { SERVER_ROOT } from './paths.js';

export type DatasetSize = { wards: number; beds: number; active: number; days: number };
export type Dataset = DatasetSize & { label: string; file: string; seedSeconds: number | null };

export type ActiveOrder = { orderId: number; syringeMl: number; attempts: number; delivered: number; volumeInfusedMl: number };

/** What the bench needs to know about a dataset before loading it. */
export type DatasetFacts = {
  busyWard: { id: number; name: string; boardRows: number };
  busyWardActiveOrderIds: number[];
  /** Every running PCA in the hospital, with its running syringe's latest pump totals. */
  activeOrders: ActiveOrder[];
  counts: { wards: number; patients: number; orders: number; observations: number };
};

export function datasetSizes(options: BenchOptions): { full: DatasetSize; small: DatasetSize } {
  const full = { wards: options.wards, beds: options.beds, active: options.active, days: options.days };
  const divide = (value: number) => Math.max(1, Math.round(value / options.factor));
  return { full, small: { wards: divide(full.wards), beds: divide(full.beds), active: divide(full.active), days: full.days } };
}

/** Writes a dataset with the built seed script (`npm run seed:scale`), returning its seconds. */
export async function writeDataset(size: DatasetSize, file: string): Promise<number> {
  const script = path.join(SERVER_ROOT, 'dist', 'database', 'scale', 'scale-seed.js');
  const args = [
    script,
    '--wards',
    String(size.wards),
    '--beds',
    String(size.beds),
    '--active',
    String(size.active),
    '--days',
    String(size.days),
    '--out',
    file,
  ];
  const started = performance.now();
  await new Promise<void>((resolve, reject) => {
    const child = spawn(process.execPath, args, { cwd: SERVER_ROOT, stdio: ['ignore', 'inherit', 'inherit'] });
    child.once('error', reject);
    child.once('exit', (code) => (code === 0 ? resolve() : reject(new Error(`seed:scale exited with ${code}`))));
  });
  return (performance.now() - started) / 1000;
}

export function readFacts(file: string): DatasetFacts {
  const db = new Database(file, { readonly: true });
  try {
    const busyWard = db
      .prepare(
        `SELECT w.id, w.name, count(*) AS boardRows FROM pca_orders o JOIN patients p ON p.id = o.patientId JOIN wards w ON w.id = p.wardId
         WHERE o.status IN ('awaiting_verification', 'verified', 'active') GROUP BY w.id ORDER BY boardRows DESC, w.id LIMIT 1`,
      )
      .get() as DatasetFacts['busyWard'];
    const busyWardActiveOrderIds = db
      .prepare(
        `SELECT o.id FROM pca_orders o JOIN patients p ON p.id = o.patientId WHERE o.status = 'active' AND p.wardId = ? ORDER BY o.id`,
      )
      .pluck()
      .all(busyWard.id) as number[];
    const activeOrders = db
      .prepare(
        `SELECT o.id AS orderId, r.volumeMl AS syringeMl, coalesce(ob.attempts, 0) AS attempts, coalesce(ob.delivered, 0) AS delivered, coalesce(ob.volumeInfusedMl, 0) AS volumeInfusedMl
         FROM pca_orders o JOIN syringe_releases r ON r.orderId = o.id AND r.status = 'in_use'
         LEFT JOIN observations ob ON ob.id = (SELECT id FROM observations WHERE orderId = o.id AND releaseId = r.id ORDER BY at DESC, id DESC LIMIT 1)
         WHERE o.status = 'active' ORDER BY o.id`,
      )
      .all() as ActiveOrder[];
    const counts = db
      .prepare(
        `SELECT (SELECT count(*) FROM wards) AS wards, (SELECT count(*) FROM patients) AS patients, (SELECT count(*) FROM pca_orders) AS orders, (SELECT count(*) FROM observations) AS observations`,
      )
      .get() as DatasetFacts['counts'];
    return { busyWard, busyWardActiveOrderIds, activeOrders, counts };
  } finally {
    db.close();
  }
}
