import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { type DataSource, In, IsNull, MoreThanOrEqual } from 'typeorm';
import { ageInYears, compareHandoverRows, riskTier, shiftWindow, type HandoverBoard, type HandoverRow, type PendingTask } from '@lockstep/shared';
import { BedsideCheck } from '../bedside/entities/bedside-check.entity.js';
import { ClinicianBolus } from '../bedside/entities/clinician-bolus.entity.js';
import { ReleaseReconciliation } from '../bedside/entities/release-reconciliation.entity.js';
import { Flag } from '../flags/entities/flag.entity.js';
import { toFlagResponse } from '../flags/flags.service.js';
import { Observation } from '../observations/entities/observation.entity.js';
import { PcaOrder } from '../orders/entities/pca-order.entity.js';
import { SyringeRelease } from '../releases/entities/syringe-release.entity.js';
import { Ward } from '../wards/entities/ward.entity.js';
import { wardPolicy } from '../wards/ward-policy.js';
import { toSignoffResponse } from './dto/signoff-response.js';
import { HandoverSignoff } from './entities/handover-signoff.entity.js';
import { type BoardInputs, rowFigures } from './row-figures.js';

const ON_BOARD = ['awaiting_verification', 'verified', 'active'] as const;
const HOUR = 3_600_000;

/**
 * The handover board of one ward. A fixed number of queries however many patients: each kind of
 * fact is fetched once for all the ward's orders and grouped in memory.
 */
@Injectable()
export class HandoverBoardService {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  async board(wardId: number, now = new Date()): Promise<HandoverBoard> {
    const manager = this.dataSource.manager;
    const ward = await manager.findOneBy(Ward, { id: wardId });
    if (!ward) throw new NotFoundException(`No ward with id ${wardId}`);
    const shift = shiftWindow(now, ward.dayShiftStart, ward.nightShiftStart);
    const orders = await manager.find(PcaOrder, { where: { status: In([...ON_BOARD]), patient: { wardId } }, relations: { patient: true, drug: true } });
    const ids = orders.map((order) => order.id);
    const inputs = ids.length === 0 ? emptyInputs() : await this.inputs(ids, wardId, shift, now);

    const policy = wardPolicy(ward);
    const rows: HandoverRow[] = orders.map((order) => {
      const figures = rowFigures(order, inputs, policy, now, Date.parse(shift.endsAt));
      const openFlags = inputs.flags.filter((flag) => flag.orderId === order.id);
      const flags = {
        urgent: openFlags.filter((flag) => flag.severity === 'urgent').length,
        review: openFlags.filter((flag) => flag.severity === 'review').length,
        info: openFlags.filter((flag) => flag.severity === 'info').length,
        open: openFlags.map(toFlagResponse),
      };
      const row: Omit<HandoverRow, 'riskTier'> = {
        orderId: order.id,
        status: order.status,
        bed: order.patient.bed,
        patient: {
          id: order.patientId,
          name: `${order.patient.familyName.toUpperCase()}, ${order.patient.givenName}`,
          mrn: order.patient.mrn,
          ageYears: ageInYears(order.patient.dateOfBirth, now),
          weightKg: order.patient.weightKg,
        },
        drugName: order.drug.genericName,
        doseUnit: order.doseUnit,
        concentrationPerMl: order.concentrationPerMl,
        regimen: { demandDose: order.demandDose, lockoutMinutes: order.lockoutMinutes, basalRatePerHour: order.basalRatePerHour, oneHourLimit: order.oneHourLimit, fourHourLimit: order.fourHourLimit },
        startedAt: order.startedAt?.toISOString() ?? null,
        minutesSinceStart: order.startedAt ? Math.floor((now.getTime() - order.startedAt.getTime()) / 60_000) : null,
        ...figures,
        flags,
        pendingTasks: pendingTasks(order, inputs, now),
        signoffs: inputs.signoffs.filter((signoff) => signoff.orderId === order.id).map(toSignoffResponse),
      };
      return { ...row, riskTier: riskTier(row) };
    });
    rows.sort(compareHandoverRows);
    return { wardId, wardName: ward.name, generatedAt: now.toISOString(), shift, rows };
  }

  private async inputs(ids: number[], wardId: number, shift: { shift: string; shiftDate: string }, now: Date): Promise<BoardInputs> {
    const manager = this.dataSource.manager;
    const since = new Date(now.getTime() - 24 * HOUR);
    const [observations, latest, flags, releases, starts, boluses, discrepancies, signoffs] = await Promise.all([
      manager.find(Observation, { where: { orderId: In(ids), at: MoreThanOrEqual(since) }, order: { at: 'ASC', id: 'ASC' } }),
      manager
        .createQueryBuilder(Observation, 'o')
        .where('o.id IN (SELECT max(id) FROM observations WHERE orderId IN (:...ids) GROUP BY orderId)', { ids })
        .getMany(),
      manager.find(Flag, { where: { orderId: In(ids), acknowledgedAt: IsNull() }, order: { raisedAt: 'DESC' } }),
      manager.find(SyringeRelease, { where: { orderId: In(ids), status: 'in_use' } }),
      manager.find(BedsideCheck, { where: { orderId: In(ids), status: 'matched' } }),
      manager.find(ClinicianBolus, { where: { orderId: In(ids), at: MoreThanOrEqual(since) } }),
      manager
        .createQueryBuilder(ReleaseReconciliation, 'r')
        .innerJoinAndSelect('r.release', 'release')
        .where('release.orderId IN (:...ids) AND r.mustReport = 1', { ids })
        .getMany(),
      manager.find(HandoverSignoff, { where: { wardId, shiftDate: shift.shiftDate, shift: shift.shift as 'day' | 'night' }, relations: { nurse: true } }),
    ]);
    return { observations, latest, flags, releases, starts, boluses, discrepancies, signoffs };
  }
}

function emptyInputs(): BoardInputs {
  return { observations: [], latest: [], flags: [], releases: [], starts: [], boluses: [], discrepancies: [], signoffs: [] };
}

function pendingTasks(order: PcaOrder, inputs: BoardInputs, now: Date): PendingTask[] {
  const tasks: PendingTask[] = [];
  if (order.status === 'awaiting_verification') tasks.push({ code: 'awaiting_verification', since: order.signedAt.toISOString() });
  if (order.status === 'verified') tasks.push({ code: 'awaiting_bedside_check', since: order.statusChangedAt.toISOString() });
  const discrepancy = inputs.discrepancies.find((reconciliation) => reconciliation.release.orderId === order.id);
  if (discrepancy) tasks.push({ code: 'reconciliation_discrepancy', since: discrepancy.at.toISOString() });
  if (order.reviewDate < now.toISOString().slice(0, 10)) tasks.push({ code: 'review_date_passed', since: order.reviewDate });
  return tasks;
}
