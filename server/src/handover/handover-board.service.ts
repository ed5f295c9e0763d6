import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { type DataSource, In, IsNull, MoreThanOrEqual } from 'typeorm';
import { shiftWindow, type HandoverBoard } from '@lockstep/shared';
import { BedsideCheck } from '../bedside/entities/bedside-check.entity.js';
import { ClinicianBolus } from '../bedside/entities/clinician-bolus.entity.js';
import { PcaPause } from '../bedside/entities/pca-pause.entity.js';
import { ReleaseReconciliation } from '../bedside/entities/release-reconciliation.entity.js';
import { storedDate } from '../database/stored-date.js';
import { Flag } from '../flags/entities/flag.entity.js';
import { Observation } from '../observations/entities/observation.entity.js';
import { PcaOrder } from '../orders/entities/pca-order.entity.js';
import { SyringeRelease } from '../releases/entities/syringe-release.entity.js';
import { Ward } from '../wards/entities/ward.entity.js';
import { wardPolicy } from '../wards/ward-policy.js';
import { HandoverSignoff } from './entities/handover-signoff.entity.js';
import { boardRows } from './board-rows.js';
import { type BoardInputs, type BoardReading, boardReadingsFrom, emptyInputs } from './row-figures.js';

const ON_BOARD = ['awaiting_verification', 'verified', 'active'] as const;
const HOUR = 3_600_000;

// Only the columns the board shows or computes with: a ward's orders carry large JSON snapshots
// that it never shows.
const ORDER_COLUMNS = {
  id: true,
  status: true,
  patientId: true,
  doseUnit: true,
  concentrationPerMl: true,
  demandDose: true,
  lockoutMinutes: true,
  basalRatePerHour: true,
  oneHourLimit: true,
  fourHourLimit: true,
  reviewDate: true,
  signedAt: true,
  statusChangedAt: true,
  startedAt: true,
  version: true,
  loadingDose: true,
  patient: {
    id: true,
    bed: true,
    familyName: true,
    givenName: true,
    mrn: true,
    dateOfBirth: true,
    weightKg: true,
    noKnownAllergies: true,
    allergies: { id: true, substance: true, reaction: true, severity: true },
  },
  drug: { id: true, genericName: true },
} as const;
const READING_COLUMNS = ['orderId', 'releaseId', 'at', 'attempts', 'delivered', 'volumeInfusedMl'] as const;
type RawReading = Omit<BoardReading, 'at'> & { at: string | Date };
const LATEST_COLUMNS = [
  'id',
  'orderId',
  'releaseId',
  'at',
  'painScore',
  'sedationLevel',
  'respiratoryRate',
  'spo2',
  'syringeRemainingMl',
] as const;
const PAUSE_COLUMNS = ['orderId', 'resumedAt', 'naloxoneGivenAt'] as const;
type RawPause = { orderId: number; resumedAt: string | Date | null; naloxoneGivenAt: string | Date | null };
const SIGNOFF_COLUMNS = {
  id: true,
  orderId: true,
  shiftDate: true,
  shift: true,
  role: true,
  pumpSettingsMatch: true,
  at: true,
  nurse: { id: true, displayName: true },
} as const;

/**
 * The handover board of one ward. A fixed number of queries however many patients: each kind of
 * fact is fetched once for all the ward's orders and grouped in memory (board-rows.ts).
 */
@Injectable()
export class HandoverBoardService {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  async board(wardId: number, now = new Date()): Promise<HandoverBoard> {
    const manager = this.dataSource.manager;
    const ward = await manager.findOneBy(Ward, { id: wardId });
    if (!ward) throw new NotFoundException(`No ward with id ${wardId}`);
    const shift = shiftWindow(now, ward.dayShiftStart, ward.nightShiftStart);
    const orders = await manager.find(PcaOrder, {
      select: ORDER_COLUMNS,
      where: { status: In([...ON_BOARD]), patient: { wardId } },
      relations: { patient: { allergies: true }, drug: true },
    });
    const ids = orders.map((order) => order.id);
    const inputs = ids.length === 0 ? emptyInputs() : await this.inputs(ids, wardId, shift, now);

    const rows = boardRows(orders, inputs, wardPolicy(ward), shift, now);
    return { wardId, wardName: ward.name, generatedAt: now.toISOString(), shift, rows };
  }

  private async inputs(ids: number[], wardId: number, shift: { shift: string; shiftDate: string }, now: Date): Promise<BoardInputs> {
    const manager = this.dataSource.manager;
    const since = new Date(now.getTime() - 24 * HOUR);
    const readFrom = boardReadingsFrom(now);
    const [observations, latest, flags, releases, starts, boluses, discrepancies, signoffs, pauses] = await Promise.all([
      // Raw rows: a ward's day of readings is hundreds of rows, and making entities of them cost
      // more than the query.
      manager
        .createQueryBuilder(Observation, 'o')
        .select(READING_COLUMNS.map((column) => `o.${column} AS "${column}"`))
        .where('o.orderId IN (:...ids) AND o.at >= :readFrom', { ids, readFrom })
        // The index's own order (orderId, at): each order's readings in time order, no sort step.
        .orderBy('o.orderId', 'ASC')
        .addOrderBy('o.at', 'ASC')
        .addOrderBy('o.id', 'ASC')
        .getRawMany<RawReading>()
        .then((rows) => rows.map((row): BoardReading => ({ ...row, at: storedDate(row.at) }))),
      manager
        .createQueryBuilder(Observation, 'o')
        .select(LATEST_COLUMNS.map((column) => `o.${column}`))
        .where('o.id IN (SELECT max(id) FROM observations WHERE orderId IN (:...ids) GROUP BY orderId)', { ids })
        .getMany(),
      // Open flags, and the urgent flags of the readings' window acknowledged or not: an urgent flag
      // keeps observations every 15 minutes until a reading after it (the monitoring schedule).
      manager.find(Flag, {
        where: [
          { orderId: In(ids), acknowledgedAt: IsNull() },
          { orderId: In(ids), severity: 'urgent', raisedAt: MoreThanOrEqual(readFrom) },
        ],
        order: { raisedAt: 'DESC' },
      }),
      manager.find(SyringeRelease, { select: { id: true, orderId: true, volumeMl: true }, where: { orderId: In(ids), status: 'in_use' } }),
      manager.find(BedsideCheck, {
        select: { id: true, orderId: true, releaseId: true, firstAt: true, secondAt: true },
        where: { orderId: In(ids), status: 'matched' },
      }),
      manager.find(ClinicianBolus, {
        select: { id: true, orderId: true, amount: true, at: true },
        where: { orderId: In(ids), at: MoreThanOrEqual(since) },
      }),
      manager.find(ReleaseReconciliation, {
        select: { id: true, at: true, release: { id: true, orderId: true } },
        where: { mustReport: true, release: { orderId: In(ids) } },
        relations: { release: true },
      }),
      manager.find(HandoverSignoff, {
        select: SIGNOFF_COLUMNS,
        where: { wardId, shiftDate: shift.shiftDate, shift: shift.shift as 'day' | 'night' },
        relations: { nurse: true },
      }),
      // Only the pauses that matter to the board: open ones (the PCA is paused) and naloxone given (the
      // after-naloxone watch). Its own query, as raw rows: joined to the orders' query instead (one
      // statement fewer), the board took 0.15-0.2 ms longer, of about 5 ms (the benchmark's full
      // dataset, the two versions run alternately in one process).
      manager
        .createQueryBuilder(PcaPause, 'p')
        .select(PAUSE_COLUMNS.map((column) => `p.${column} AS "${column}"`))
        .where('p.orderId IN (:...ids) AND (p.resumedAt IS NULL OR p.naloxoneGivenAt IS NOT NULL)', { ids })
        .getRawMany<RawPause>()
        .then((rows) =>
          rows.map((row) => ({
            orderId: row.orderId,
            resumedAt: row.resumedAt === null ? null : storedDate(row.resumedAt),
            naloxoneGivenAt: row.naloxoneGivenAt === null ? null : storedDate(row.naloxoneGivenAt),
          })),
        ),
    ]);
    return { observations, latest, flags, releases, starts, boluses, discrepancies, signoffs, pauses };
  }
}
