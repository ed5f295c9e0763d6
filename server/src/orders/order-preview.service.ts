import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import {
  checkOrder,
  deriveOrderValues,
  duplicatePcaFinding,
  patientFactorsOf,
  ruleChoiceFindings,
  type Finding,
  type OrderDerivedValues,
  type OrderPreview,
  type Regimen,
} from '@lockstep/shared';
import { Drug } from '../drugs/entities/drug.entity.js';
import { toLimitRuleResponse } from '../library/dto/library-response.js';
import type { LimitRule } from '../library/entities/limit-rule.entity.js';
import { LibraryService } from '../library/library.service.js';
import { Patient } from '../patients/entities/patient.entity.js';
import { Ward } from '../wards/entities/ward.entity.js';
import type { OrderFieldsDto } from './dto/order-fields.dto.js';
import { fieldError } from '../common/errors/field-error.js';
import { findOpenPca } from './open-pca.js';

/** Derived values and findings for an order against its ward's active library. Writes nothing. */
@Injectable()
export class OrderPreviewService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly library: LibraryService,
  ) {}

  async preview(fields: OrderFieldsDto): Promise<OrderPreview> {
    const { derived, findings, rule } = await this.evaluate(fields);
    // Signing answers 409 for a second open PCA; the preview shows the same refusal as a finding first.
    const open = await findOpenPca(this.dataSource.manager, fields.patientId);
    return { derived, findings: open ? [duplicatePcaFinding(open), ...findings] : findings, rule: rule ? toLimitRuleResponse(rule) : null };
  }

  /** Everything signing needs: the patient, drug, active rule, findings and derived values. */
  async evaluate(fields: OrderFieldsDto): Promise<OrderEvaluation> {
    // Allergy entries loaded: patientFactorsOf refuses a patient without them.
    const patient = await this.dataSource.manager.findOne(Patient, { where: { id: fields.patientId }, relations: { allergies: true } });
    if (!patient) throw fieldError('patientId', `No patient with id ${fields.patientId}`);
    const drug = await this.dataSource.manager.findOneBy(Drug, { id: fields.drugId });
    if (!drug) throw fieldError('drugId', `No drug with id ${fields.drugId}`);

    const regimen: Regimen = { ...fields };
    const now = new Date();
    const factors = patientFactorsOf(patient, now);
    const ward = await this.dataSource.manager.findOneByOrFail(Ward, { id: patient.wardId });
    const context = {
      drug: { id: drug.id, genericName: drug.genericName },
      today: now.toISOString().slice(0, 10),
      weightMaxAgeDays: ward.weightMaxAgeDays,
    };
    // Chosen by the patient, not only the ward: a child gets a paediatric rule or none (shared chooseRule).
    const choice = await this.library.findActiveRule(
      patient.wardId,
      { drugId: drug.id, concentrationPerMl: fields.concentrationPerMl },
      factors,
    );
    const rule = choice.kind === 'none' ? null : choice.rule;
    const checked = checkOrder(
      regimen,
      rule ? { doseUnit: rule.doseUnit, perKg: rule.perKg, limits: rule.limits } : { doseUnit: drug.doseUnit, perKg: false, limits: {} },
      factors,
      context,
    );
    const choiceFindings = ruleChoiceFindings(choice, drug, fields, factors);
    // No rule blocks, so it leads; a rule from another ward's library is a caution, so it follows.
    const findings: Finding[] = rule ? [...checked, ...choiceFindings] : [...choiceFindings, ...checked];
    return { patient, drug, rule, findings, derived: deriveOrderValues(regimen) };
  }
}

export type OrderEvaluation = {
  patient: Patient;
  drug: Drug;
  rule: LimitRule | null;
  findings: Finding[];
  derived: OrderDerivedValues;
};
