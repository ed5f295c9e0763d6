import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { type DataSource, In } from 'typeorm';
import {
  checkOrder,
  type Finding,
  formatDose,
  type LibraryAffectedOrders,
  patientDisplayName,
  patientFactorsOf,
  type Regimen,
  ruleKey,
  tallMan,
} from '@lockstep/shared';
import { PcaOrder } from '../orders/entities/pca-order.entity.js';
import type { LimitRule } from './entities/limit-rule.entity.js';
import { LibraryService } from './library.service.js';

/** Orders a version's limits apply to the moment it is approved: verified (syringe may be released) or running. */
const OPEN_STATUSES = ['verified', 'active'] as const;

/**
 * Which running orders a library version would put outside its limits: each open order on the
 * version's ward checked with the shared `checkOrder` (the same check as signing) against the
 * version's rule for its drug and concentration. Only hard and soft findings are listed.
 */
@Injectable()
export class AffectedOrdersService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly library: LibraryService,
  ) {}

  async affectedOrders(versionId: number): Promise<LibraryAffectedOrders> {
    const version = await this.library.loadVersion(this.dataSource.manager, versionId);
    const orders = await this.dataSource.manager.find(PcaOrder, {
      where: { status: In([...OPEN_STATUSES]), patient: { wardId: version.wardId } },
      // The patient's allergy entries: patientFactorsOf needs them for the allergy check.
      relations: { patient: { allergies: true }, drug: true },
      order: { id: 'ASC' },
    });
    const rules = new Map<string, LimitRule>(version.rules.map((rule) => [ruleKey(rule), rule]));
    const now = new Date();
    const today = now.toISOString().slice(0, 10);
    const affected: LibraryAffectedOrders['orders'] = [];
    for (const order of orders) {
      const rule = rules.get(ruleKey(order));
      const findings = rule ? this.check(order, rule, now, today) : [noRuleFinding(order)];
      const outside = findings.filter((finding) => finding.severity === 'hard' || finding.severity === 'soft');
      if (outside.length === 0) continue;
      affected.push({
        orderId: order.id,
        status: order.status,
        patientId: order.patientId,
        patientName: patientDisplayName(order.patient),
        bed: order.patient.bed,
        drugName: order.drug.genericName,
        concentrationPerMl: order.concentrationPerMl,
        doseUnit: order.doseUnit,
        findings: outside,
      });
    }
    return { versionId: version.id, wardId: version.wardId, checked: orders.length, orders: affected };
  }

  private check(order: PcaOrder, rule: LimitRule, now: Date, today: string): Finding[] {
    const regimen: Regimen = {
      doseUnit: order.doseUnit,
      concentrationPerMl: order.concentrationPerMl,
      loadingDose: order.loadingDose,
      demandDose: order.demandDose,
      lockoutMinutes: order.lockoutMinutes,
      basalRatePerHour: order.basalRatePerHour,
      oneHourLimit: order.oneHourLimit,
      fourHourLimit: order.fourHourLimit,
      clinicianBolusDose: order.clinicianBolusDose,
    };
    return checkOrder(regimen, { doseUnit: rule.doseUnit, perKg: rule.perKg, limits: rule.limits }, patientFactorsOf(order.patient, now), {
      drug: { id: order.drug.id, genericName: order.drug.genericName },
      today,
    });
  }
}

function noRuleFinding(order: PcaOrder): Finding {
  return {
    field: 'concentrationPerMl',
    severity: 'hard',
    code: 'library.no-rule',
    message: `This version has no rule for ${tallMan(order.drug.genericName)} ${formatDose(order.concentrationPerMl, `${order.doseUnit}/mL`)}`,
  };
}
