import type { EntityManager } from 'typeorm';
import { ageInYears, checkOrder, type OrderStatus, type Regimen } from '@lockstep/shared';
import { toLimitRuleResponse } from '../../library/dto/library-response.js';
import { LimitRule } from '../../library/entities/limit-rule.entity.js';
import type { DemoAuditEntry } from './demo-audit.js';
import { OrderEvent } from '../../orders/entities/order-event.entity.js';
import { PcaOrder } from '../../orders/entities/pca-order.entity.js';
import { Patient } from '../../patients/entities/patient.entity.js';
import { SyringeRelease } from '../../releases/entities/syringe-release.entity.js';
import { User } from '../../users/entities/user.entity.js';

// Invented demo orders, so the verification queue, "My orders" and the bedside have work at once.
type DemoOrder = {
  mrn: string;
  drug: string;
  regimen: Regimen;
  indication: string;
  signedMinutesAgo: number;
  status: OrderStatus;
  reason?: string;
  releaseCode?: string;
};

const DEMO_ORDERS: DemoOrder[] = [
  {
    mrn: 'KB100231',
    drug: 'morphine',
    regimen: { doseUnit: 'mg', concentrationPerMl: 1, demandDose: 1, lockoutMinutes: 10, basalRatePerHour: 0, fourHourLimit: 30 },
    indication: 'Pain after laparotomy',
    signedMinutesAgo: 45,
    status: 'awaiting_verification',
  },
  {
    mrn: 'KB100672',
    drug: 'hydromorphone',
    regimen: { doseUnit: 'mg', concentrationPerMl: 0.2, demandDose: 0.2, lockoutMinutes: 10, basalRatePerHour: 0.1, fourHourLimit: 6 },
    indication: 'Pain after bowel resection; regular opioid before admission',
    signedMinutesAgo: 180,
    status: 'verified',
    releaseCode: 'HK3-7QT',
  },
  {
    mrn: 'KB101127',
    drug: 'fentanyl',
    regimen: { doseUnit: 'mcg', concentrationPerMl: 10, demandDose: 20, lockoutMinutes: 6, basalRatePerHour: 0, fourHourLimit: 300 },
    indication: 'Pain after femoral fracture fixation',
    signedMinutesAgo: 120,
    status: 'returned',
    reason: 'Lockout of 6 minutes is shorter than the ward’s usual 10 minutes: please confirm or revise',
  },
];

/** Seeds the demo orders; answers the audit entries of their story, for the caller to record in time order. */
export async function seedDemoOrders(manager: EntityManager, users: User[]): Promise<DemoAuditEntry[]> {
  const story: DemoAuditEntry[] = [];
  const person = (username: string) => users.find((user) => user.username === username)!;
  const prescriber = person('amara.osei');
  const pharmacist = person('lin.park');
  for (const demo of DEMO_ORDERS) {
    const patient = await manager.findOneByOrFail(Patient, { mrn: demo.mrn });
    const rule = await manager
      .createQueryBuilder(LimitRule, 'rule')
      .innerJoinAndSelect('rule.drug', 'drug', 'drug.genericName = :name', { name: demo.drug })
      .innerJoin('rule.version', 'version', "version.wardId = :wardId AND version.status = 'active'", { wardId: patient.wardId })
      .where('abs(rule.concentrationPerMl - :c) < 1e-9', { c: demo.regimen.concentrationPerMl })
      .getOneOrFail();
    const signedAt = new Date(Date.now() - demo.signedMinutesAgo * 60_000);
    const decidedAt = new Date(signedAt.getTime() + 20 * 60_000);
    const findings = checkOrder(demo.regimen, { doseUnit: rule.doseUnit, perKg: rule.perKg, limits: rule.limits }, {
      weightKg: patient.weightKg,
      ageYears: ageInYears(patient.dateOfBirth),
      opioidTolerant: patient.opioidTolerant,
      sleepApnoea: patient.sleepApnoea,
      otherSedatives: patient.otherSedatives,
    });
    const order = await manager.save(
      manager.create(PcaOrder, {
        ...demo.regimen,
        patientId: patient.id,
        prescriberId: prescriber.id,
        drugId: rule.drugId,
        status: demo.status,
        regimenType: demo.regimen.basalRatePerHour > 0 ? 'demand_basal' : 'demand_only',
        version: 1,
        loadingDose: null,
        oneHourLimit: null,
        clinicianBolusDose: null,
        indication: demo.indication,
        reviewDate: new Date(Date.now() + 2 * 24 * 3600_000).toISOString().slice(0, 10),
        ruleSnapshot: toLimitRuleResponse(rule),
        findingsSnapshot: findings,
        overrides: [],
        signedAt,
        verifiedById: demo.status === 'verified' ? pharmacist.id : null,
        verifiedAt: demo.status === 'verified' ? decidedAt : null,
        statusChangedAt: demo.status === 'awaiting_verification' ? signedAt : decidedAt,
        statusReason: demo.reason ?? null,
      }),
    );
    await manager.insert(OrderEvent, { orderId: order.id, fromStatus: null, toStatus: 'awaiting_verification', userId: prescriber.id, at: signedAt, reason: null });
    const { concentrationPerMl, doseUnit, demandDose, lockoutMinutes, basalRatePerHour, fourHourLimit } = demo.regimen;
    story.push({
      actor: prescriber,
      action: 'order.create',
      entityType: 'order',
      entityId: order.id,
      at: signedAt,
      summary: { patientId: patient.id, drugId: rule.drugId, concentrationPerMl, doseUnit, demandDose, lockoutMinutes, basalRatePerHour, fourHourLimit, reviewDate: order.reviewDate },
    });
    if (demo.status !== 'awaiting_verification') {
      await manager.insert(OrderEvent, { orderId: order.id, fromStatus: 'awaiting_verification', toStatus: demo.status, userId: pharmacist.id, at: decidedAt, reason: demo.reason ?? null });
      story.push({
        actor: pharmacist,
        action: demo.status === 'verified' ? 'order.verify' : 'order.return',
        entityType: 'order',
        entityId: order.id,
        at: decidedAt,
        summary: { status: { from: 'awaiting_verification', to: demo.status }, ...(demo.reason ? { reason: demo.reason } : { signed: true }) },
      });
    }
    if (demo.releaseCode) {
      const releasedAt = new Date(decidedAt.getTime() + 15 * 60_000);
      story.push({ actor: pharmacist, action: 'order.release', entityType: 'order', entityId: order.id, at: releasedAt, summary: { releaseCode: demo.releaseCode, concentrationPerMl, volumeMl: 50, batch: 'DEMO-0412' } });
      await manager.insert(SyringeRelease, {
        orderId: order.id,
        releaseCode: demo.releaseCode,
        status: 'ready',
        concentrationPerMl: demo.regimen.concentrationPerMl,
        volumeMl: 50,
        batch: 'DEMO-0412',
        expiresAt: new Date(Date.now() + 7 * 24 * 3600_000),
        preparedBy: 'Lin Park',
        checkedBy: 'Tomas Ortiz',
        overrideReason: null,
        releasedById: pharmacist.id,
        releasedAt,
      });
    }
  }
  return story;
}
