import type { Database, Statement } from 'better-sqlite3';
import { shiftWindow, type HandoverBoard } from '@lockstep/shared';
import { storedDate as date } from '../src/database/stored-date.js';
import { boardRows } from '../src/handover/board-rows.js';
import { type BoardInputs, boardReadingsFrom, emptyInputs } from '../src/handover/row-figures.js';
import type { PcaOrder } from '../src/orders/entities/pca-order.entity.js';
import type { Ward } from '../src/wards/entities/ward.entity.js';
import { wardPolicy } from '../src/wards/ward-policy.js';

const HOUR = 3_600_000;

// The same reads as HandoverBoardService, written by hand: the same columns, conditions and
// orderings, so SQLite picks the same plans and the answer is the same JSON.
const SQL = {
  ward: `SELECT * FROM wards WHERE id = ?`,
  orders: `SELECT o.id, o.status, o.patientId, o.doseUnit, o.concentrationPerMl, o.demandDose, o.lockoutMinutes, o.basalRatePerHour, o.oneHourLimit, o.fourHourLimit,
      o.reviewDate, o.signedAt, o.statusChangedAt, o.startedAt, p.bed, p.familyName, p.givenName, p.mrn, p.dateOfBirth, p.weightKg, p.noKnownAllergies, d.genericName
    FROM pca_orders o LEFT JOIN patients p ON p.id = o.patientId LEFT JOIN drugs d ON d.id = o.drugId
    WHERE o.status IN ('awaiting_verification', 'verified', 'active') AND p.wardId = ?`,
  observations: (n: number) =>
    `SELECT id, orderId, releaseId, at, attempts, delivered, volumeInfusedMl FROM observations WHERE orderId IN (${marks(n)}) AND at >= ? ORDER BY orderId ASC, at ASC, id ASC`,
  latest: (
    n: number,
  ) => `SELECT id, orderId, releaseId, at, painScore, sedationLevel, respiratoryRate, spo2, syringeRemainingMl FROM observations
    WHERE id IN (SELECT max(id) FROM observations WHERE orderId IN (${marks(n)}) GROUP BY orderId)`,
  flags: (n: number) => `SELECT * FROM flags WHERE orderId IN (${marks(n)}) AND acknowledgedAt IS NULL ORDER BY raisedAt DESC`,
  releases: (n: number) => `SELECT id, orderId, volumeMl FROM syringe_releases WHERE orderId IN (${marks(n)}) AND status = 'in_use'`,
  starts: (n: number) =>
    `SELECT id, orderId, releaseId, firstAt, secondAt FROM bedside_checks WHERE orderId IN (${marks(n)}) AND status = 'matched'`,
  boluses: (n: number) => `SELECT id, orderId, amount, at FROM clinician_boluses WHERE orderId IN (${marks(n)}) AND at >= ?`,
  discrepancies: (n: number) =>
    `SELECT r.id, r.at, s.orderId FROM release_reconciliations r INNER JOIN syringe_releases s ON s.id = r.releaseId WHERE s.orderId IN (${marks(n)}) AND r.mustReport = 1`,
  allergies: (n: number) => `SELECT id, patientId, substance, reaction, severity FROM patient_allergies WHERE patientId IN (${marks(n)})`,
  pauses: (n: number) =>
    `SELECT orderId, resumedAt, naloxoneGivenAt FROM pca_pauses WHERE orderId IN (${marks(n)}) AND (resumedAt IS NULL OR naloxoneGivenAt IS NOT NULL)`,
  signoffs: `SELECT s.*, u.displayName FROM handover_signoffs s LEFT JOIN users u ON u.id = s.nurseId WHERE s.wardId = ? AND s.shiftDate = ? AND s.shift = ?`,
};

type Row = Record<string, string | number | null>;
type Reading = Omit<BoardInputs['observations'][number], 'at'> & { at: string };
type ListQuery = 'observations' | 'latest' | 'flags' | 'releases' | 'starts' | 'boluses' | 'discrepancies';

/**
 * The handover board straight from better-sqlite3: prepared statements (one per list length,
 * kept), rows turned into the plain objects the board's row builder reads, then that builder.
 * No ORM, no framework. The casts say "the columns the board reads, as TypeORM would give them".
 */
export class BaselineBoard {
  private readonly statements = new Map<string, Statement>();

  constructor(private readonly db: Database) {}

  board(wardId: number, now = new Date()): HandoverBoard | null {
    const ward = this.statement('ward', SQL.ward).get(wardId) as Ward | undefined;
    if (!ward) return null;
    const shift = shiftWindow(now, ward.dayShiftStart, ward.nightShiftStart);
    const orders = (this.statement('orders', SQL.orders).all(wardId) as Row[]).map(toOrder);
    const patientIds = [...new Set(orders.map((order) => order.patientId))];
    const allergies =
      patientIds.length === 0
        ? []
        : (this.statement(`allergies:${patientIds.length}`, SQL.allergies(patientIds.length)).all(...patientIds) as Row[]);
    for (const order of orders) order.patient.allergies = allergies.filter((row) => row.patientId === order.patientId) as never;
    const ids = orders.map((order) => order.id);
    const inputs = ids.length === 0 ? emptyInputs() : this.inputs(ids, wardId, shift, now);
    return {
      wardId,
      wardName: ward.name,
      generatedAt: now.toISOString(),
      shift,
      rows: boardRows(orders, inputs, wardPolicy(ward), shift, now),
    };
  }

  private inputs(ids: number[], wardId: number, shift: { shift: string; shiftDate: string }, now: Date): BoardInputs {
    const since = sqlTime(new Date(now.getTime() - 24 * HOUR));
    const readFrom = sqlTime(boardReadingsFrom(now));
    const n = ids.length;
    const list = (name: ListQuery) => this.statement(`${name}:${n}`, SQL[name](n));
    return {
      observations: (list('observations').all(...ids, readFrom) as Reading[]).map((row) => ({ ...row, at: date(row.at) })),
      latest: (list('latest').all(...ids) as Row[]).map((row) => ({
        ...row,
        at: date(row.at as string),
      })) as unknown as BoardInputs['latest'],
      flags: (list('flags').all(...ids) as Row[]).map((row) => ({
        ...row,
        raisedAt: date(row.raisedAt as string),
        acknowledgedAt: row.acknowledgedAt === null ? null : date(row.acknowledgedAt as string),
      })) as unknown as BoardInputs['flags'],
      releases: list('releases').all(...ids) as unknown as BoardInputs['releases'],
      starts: (list('starts').all(...ids) as Row[]).map((row) => ({
        ...row,
        firstAt: date(row.firstAt as string),
        secondAt: row.secondAt === null ? null : date(row.secondAt as string),
      })) as unknown as BoardInputs['starts'],
      boluses: (list('boluses').all(...ids, since) as Row[]).map((row) => ({
        ...row,
        at: date(row.at as string),
      })) as unknown as BoardInputs['boluses'],
      discrepancies: (list('discrepancies').all(...ids) as Row[]).map((row) => ({
        id: row.id,
        at: date(row.at as string),
        release: { orderId: row.orderId },
      })) as unknown as BoardInputs['discrepancies'],
      pauses: (this.statement(`pauses:${n}`, SQL.pauses(n)).all(...ids) as Row[]).map((row) => ({
        orderId: row.orderId as number,
        resumedAt: row.resumedAt === null ? null : date(row.resumedAt as string),
        naloxoneGivenAt: row.naloxoneGivenAt === null ? null : date(row.naloxoneGivenAt as string),
      })),
      signoffs: (this.statement('signoffs', SQL.signoffs).all(wardId, shift.shiftDate, shift.shift) as Row[]).map((row) => ({
        ...row,
        at: date(row.at as string),
        pumpSettingsMatch: row.pumpSettingsMatch === null ? null : row.pumpSettingsMatch === 1,
        nurse: { displayName: row.displayName },
      })) as unknown as BoardInputs['signoffs'],
    };
  }

  private statement(key: string, sql: string): Statement {
    let statement = this.statements.get(key);
    if (!statement) {
      statement = this.db.prepare(sql);
      this.statements.set(key, statement);
    }
    return statement;
  }
}

function toOrder(row: Row): PcaOrder {
  return {
    ...row,
    signedAt: date(row.signedAt as string),
    statusChangedAt: date(row.statusChangedAt as string),
    startedAt: row.startedAt === null ? null : date(row.startedAt as string),
    patient: {
      bed: row.bed,
      familyName: row.familyName,
      givenName: row.givenName,
      mrn: row.mrn,
      dateOfBirth: row.dateOfBirth,
      weightKg: row.weightKg,
      noKnownAllergies: row.noKnownAllergies === 1,
      allergies: [],
    },
    drug: { genericName: row.genericName },
  } as unknown as PcaOrder;
}

function sqlTime(at: Date): string {
  return at.toISOString().replace('T', ' ').slice(0, 23);
}

function marks(n: number): string {
  return Array.from({ length: n }, () => '?').join(', ');
}
