import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { type DataSource, In } from 'typeorm';
import {
  checkOrder,
  chooseRule,
  type Finding,
  type LibraryAffectedOrders,
  type OtherLibrary,
  patientDisplayName,
  patientFactorsOf,
  type Regimen,
  ruleChoiceFindings,
} from '@lockstep/shared';
import { PcaOrder } from '../orders/entities/pca-order.entity.js';
import type { LibraryVersion } from './entities/library-version.entity.js';
import { LimitRule } from './entities/limit-rule.entity.js';
import { LibraryService } from './library.service.js';

/** Orders a version's limits apply to the moment it is approved: verified (syringe may be released) or running. */
const OPEN_STATUSES = ['verified', 'active'] as const;

/**
 * Which running orders a library version would put outside its limits: each open order on the
 * version's ward checked with the shared `checkOrder` (the same check as signing) against the
 * rule the version would give it, chosen by the patient as at signing (shared `chooseRule`: the
 * version's rules first, then the other wards' active libraries; no rule is a hard finding).
 * Only hard and soft findings are listed.
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
    const others = orders.length > 0 ? await this.otherLibraries(version) : [];
    const now = new Date();
    const affected: LibraryAffectedOrders['orders'] = [];
    for (const order of orders) {
      const outside = this.check(version, others, order, now).filter(
        (finding) => finding.severity === 'hard' || finding.severity === 'soft',
      );
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

  private check(version: LibraryVersion, others: OtherLibrary<LimitRule>[], order: PcaOrder, now: Date): Finding[] {
    const factors = patientFactorsOf(order.patient, now);
    const choice = chooseRule(order, factors, version.rules, others);
    const choiceFindings = ruleChoiceFindings(choice, order.drug, order, factors);
    if (choice.kind === 'none') return choiceFindings;
    const { rule } = choice;
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
    const context = {
      drug: { id: order.drug.id, genericName: order.drug.genericName },
      today: now.toISOString().slice(0, 10),
      weightMaxAgeDays: version.ward.weightMaxAgeDays,
    };
    const limitRule = { doseUnit: rule.doseUnit, perKg: rule.perKg, limits: rule.limits };
    return [...checkOrder(regimen, limitRule, factors, context), ...choiceFindings];
  }

  /** The other wards' active libraries, by ward name, for a patient this version has no rule for (as at signing). */
  private async otherLibraries(version: LibraryVersion): Promise<OtherLibrary<LimitRule>[]> {
    const rules = await this.dataSource.manager
      .createQueryBuilder(LimitRule, 'rule')
      .innerJoinAndSelect('rule.version', 'version', 'version.wardId != :wardId AND version.status = :status', {
        wardId: version.wardId,
        status: 'active',
      })
      .innerJoinAndSelect('version.ward', 'ward')
      .orderBy('ward.name', 'ASC')
      .addOrderBy('rule.id', 'ASC')
      .getMany();
    const byWard = new Map<string, LimitRule[]>();
    for (const rule of rules) byWard.set(rule.version.ward.name, [...(byWard.get(rule.version.ward.name) ?? []), rule]);
    return [...byWard].map(([wardName, wardRules]) => ({ wardName, rules: wardRules }));
  }
}
