import type { EntityManager } from 'typeorm';
import { BedsideCheck } from '../../bedside/entities/bedside-check.entity.js';
import { ClinicianBolus } from '../../bedside/entities/clinician-bolus.entity.js';
import { ReleaseReconciliation } from '../../bedside/entities/release-reconciliation.entity.js';
import { discrepancyMail, reconciliationAuditSummary } from '../../bedside/reconciliation-records.js';
import { Flag } from '../../flags/entities/flag.entity.js';
import { HandoverSignoff } from '../../handover/entities/handover-signoff.entity.js';
import { MailboxMessage } from '../../mail/entities/mailbox-message.entity.js';
import type { OutgoingMail } from '../../mail/mail.service.js';
import { Observation } from '../../observations/entities/observation.entity.js';
import { observationAuditSummary } from '../../observations/observation-audit.js';
import { syringeLowMail, urgentFlagsMail } from '../../observations/observation-notifications.js';
import { OrderEvent } from '../../orders/entities/order-event.entity.js';
import { PcaOrder } from '../../orders/entities/pca-order.entity.js';
import { orderAuditSummary } from '../../orders/order-audit.js';
import { orderAwaitingVerificationMail, orderReturnedMail, syringeReleasedMail } from '../../orders/order-notifications.js';
import { SyringeRelease } from '../../releases/entities/syringe-release.entity.js';
import { releaseAuditSummary } from '../../releases/release-audit.js';
import type { User } from '../../users/entities/user.entity.js';
import { type DemoAuditEntry, recordDemoStory } from './demo-audit.js';

type Story = { audit: DemoAuditEntry[]; mail: (OutgoingMail & { at: Date })[] };

/**
 * Tells the seeded orders' story after the fact, from the rows themselves: the audit event each
 * step would have appended (with the same summary the service writes) and the e-mail it would
 * have sent, each at the time it happened. `earlier` are entries told elsewhere (the libraries).
 */
export async function tellDemoStory(manager: EntityManager, users: User[], earlier: DemoAuditEntry[]): Promise<void> {
  const person = new Map(users.map((user) => [user.id, user]));
  const actor = (id: number) => person.get(id)!;
  const orders = new Map(
    (await manager.find(PcaOrder, { relations: { patient: { ward: true }, drug: true, prescriber: true } })).map((order) => [
      order.id,
      order,
    ]),
  );
  const releases = await manager.find(SyringeRelease, { order: { releasedAt: 'ASC', id: 'ASC' } });
  const story: Story = { audit: [...earlier], mail: [] };
  const tell = (entry: Omit<DemoAuditEntry, 'entityType'>) => story.audit.push({ ...entry, entityType: 'order' });
  const send = (mail: OutgoingMail, at: Date) => story.mail.push({ ...mail, at });

  for (const event of await manager.find(OrderEvent, { order: { id: 'ASC' } })) {
    const order = orders.get(event.orderId)!;
    const base = { actor: actor(event.userId), entityId: order.id, at: event.at };
    if (event.fromStatus === null) {
      tell({ ...base, action: 'order.create', summary: orderAuditSummary({ ...order, reviewDate: order.reviewDate }) });
      send(orderAwaitingVerificationMail(order), event.at);
    } else if (event.toStatus === 'verified') {
      tell({ ...base, action: 'order.verify', summary: { status: { from: event.fromStatus, to: 'verified' }, signed: true } });
    } else if (event.toStatus === 'returned') {
      tell({ ...base, action: 'order.return', summary: { status: { from: event.fromStatus, to: 'returned' }, reason: event.reason } });
      send(orderReturnedMail(order, event.reason ?? '', actor(event.userId).displayName), event.at);
    }
  }

  for (const release of releases) {
    tell({
      actor: actor(release.releasedById),
      entityId: release.orderId,
      at: release.releasedAt,
      action: 'order.release',
      summary: releaseAuditSummary(release),
    });
    send(syringeReleasedMail(orders.get(release.orderId)!, release), release.releasedAt);
  }

  const releaseById = new Map(releases.map((release) => [release.id, release]));
  for (const check of await manager.find(BedsideCheck)) {
    const { releaseCode } = releaseById.get(check.releaseId)!;
    const order = orders.get(check.orderId)!;
    tell({
      actor: actor(check.firstNurseId),
      entityId: check.orderId,
      at: check.firstAt,
      action: 'order.bedside-first-check',
      summary: { checkId: check.id, releaseCode, settings: check.firstSettings },
    });
    const starts = order.startedAt?.getTime() === check.secondAt!.getTime();
    tell({
      actor: actor(check.secondNurseId!),
      entityId: check.orderId,
      at: check.secondAt!,
      action: 'order.bedside-second-check',
      summary: { checkId: check.id, result: check.status, releaseCode, ...(starts ? { status: { from: 'verified', to: 'active' } } : {}) },
    });
  }

  const flags = await manager.find(Flag, { order: { id: 'ASC' } });
  const raisedWith = new Map<string, Flag[]>();
  for (const flag of flags) {
    const key = `${flag.orderId}@${flag.raisedAt.getTime()}`;
    raisedWith.set(key, [...(raisedWith.get(key) ?? []), flag]);
  }
  for (const observation of await manager.find(Observation, { order: { at: 'ASC', id: 'ASC' } })) {
    const order = orders.get(observation.orderId)!;
    const raised = raisedWith.get(`${observation.orderId}@${observation.at.getTime()}`) ?? [];
    tell({
      actor: actor(observation.recordedById),
      entityId: order.id,
      at: observation.at,
      action: 'order.observation',
      summary: observationAuditSummary(
        observation,
        raised.map((flag) => flag.code),
      ),
    });
    const urgent = raised.filter((flag) => flag.severity === 'urgent');
    if (urgent.length > 0)
      for (const to of [order.prescriber.email, order.patient.ward.nurseInChargeEmail])
        send(urgentFlagsMail(order, urgent, to), observation.at);
    const low = raised.find((flag) => flag.code === 'syringe.low');
    if (low) send(syringeLowMail(order, low), observation.at);
  }
  for (const flag of flags) {
    if (!flag.acknowledgedAt) continue;
    tell({
      actor: actor(flag.acknowledgedById!),
      entityId: flag.orderId,
      at: flag.acknowledgedAt,
      action: 'order.flag-acknowledge',
      summary: { flagId: flag.id, code: flag.code, severity: flag.severity, note: flag.acknowledgeNote },
    });
  }

  tellSyringeEnds(await manager.find(ReleaseReconciliation), releases, orders, actor, tell, send);

  for (const bolus of await manager.find(ClinicianBolus)) {
    const order = orders.get(bolus.orderId)!;
    const summary = {
      bolusId: bolus.id,
      amount: bolus.amount,
      doseUnit: order.doseUnit,
      reason: bolus.reason,
      overrideReason: bolus.overrideReason,
      witness: actor(bolus.witnessId).displayName,
    };
    tell({ actor: actor(bolus.givenById), entityId: bolus.orderId, at: bolus.at, action: 'order.bolus', summary });
  }
  for (const signoff of await manager.find(HandoverSignoff)) {
    const { id, wardId, shiftDate, shift, role } = signoff;
    const summary = { signoffId: id, wardId, shiftDate, shift, role, ...(role === 'incoming' ? { pumpSettingsMatch: true } : {}) };
    tell({ actor: actor(signoff.nurseId), entityId: signoff.orderId, at: signoff.at, action: 'order.handover-signoff', summary });
  }

  await recordDemoStory(manager, story.audit);
  // Oldest first, so the mailbox (newest first by id) reads as it would have filled.
  const mail = story.mail.sort((a, b) => a.at.getTime() - b.at.getTime());
  if (mail.length > 0)
    await manager.insert(
      MailboxMessage,
      mail.map(({ to, subject, text, at }) => ({ to, subject, text: text.trim(), at })),
    );
}

/** Each syringe taken down: a change to the next syringe, or the end of the PCA, with its reconciliation. */
function tellSyringeEnds(
  reconciliations: ReleaseReconciliation[],
  releases: SyringeRelease[],
  orders: Map<number, PcaOrder>,
  actor: (id: number) => User,
  tell: (entry: Omit<DemoAuditEntry, 'entityType'>) => void,
  send: (mail: OutgoingMail, at: Date) => void,
): void {
  const releaseById = new Map(releases.map((release) => [release.id, release]));
  for (const reconciliation of reconciliations) {
    const release = releaseById.get(reconciliation.releaseId)!;
    const order = orders.get(release.orderId)!;
    const result = { ...reconciliation, releaseCode: release.releaseCode };
    const witness = actor(reconciliation.witnessId).displayName;
    const next = releases.find((other) => other.orderId === order.id && other.releasedAt > release.releasedAt);
    const base = { actor: actor(reconciliation.recordedById), entityId: order.id, at: reconciliation.at };
    if (next) {
      tell({
        ...base,
        action: 'order.syringe-change',
        summary: { ...reconciliationAuditSummary(result), newReleaseCode: next.releaseCode, witness },
      });
    } else {
      const reason = order.statusReason;
      tell({
        ...base,
        action: 'order.discontinue',
        summary: { status: { from: 'active', to: 'discontinued' }, reason, ...reconciliationAuditSummary(result), witness },
      });
    }
    if (reconciliation.mustReport) send(discrepancyMail(order, reconciliation), reconciliation.at);
  }
}
