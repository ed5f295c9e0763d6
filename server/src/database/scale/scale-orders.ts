import { shiftWindow, type OrderStatus, type PatientFactors } from '@lockstep/shared';
import type { Random } from './random.js';
import type { Drugs, Staff, WrittenWard } from './scale-reference.js';
import { pickRegimen, signingRecord, type ScaleRegimen } from './scale-regimen.js';
import { type ReleaseCodes, writeSyringes } from './scale-syringes.js';
import { type ScaleWriter, sqlTime } from './scale-writer.js';

const MINUTE = 60_000;
const HOUR = 60 * MINUTE;
const DAY = 24 * HOUR;

export type OrderContext = { writer: ScaleWriter; random: Random; staff: Staff; drugs: Drugs; codes: ReleaseCodes; now: number };
export type ScalePatient = PatientFactors & { id: number; weightKg: number };

export type PcaStory = {
  ward: WrittenWard;
  patient: ScalePatient;
  start: number;
  /** Discontinued then; null while it runs. */
  end: number | null;
  /** A running PCA whose observations stopped a few hours ago. */
  overdue: boolean;
  sedatedAtLast: boolean;
};

/** A PCA from signing to now or to its discontinuation, with everything recorded along the way. */
export function writePcaStory(ctx: OrderContext, story: PcaStory): void {
  const { random: r, staff, now } = ctx;
  const regimen = pickRegimen(r, story.ward.paediatric, story.patient.weightKg);
  const signedAt = story.start - r.int(60, 180) * MINUTE;
  const verifiedAt = signedAt + r.int(15, 45) * MINUTE;
  const events: Event[] = [
    { from: null, to: 'awaiting_verification', userId: staff.prescriber, at: signedAt, reason: null },
    { from: 'awaiting_verification', to: 'verified', userId: staff.pharmacist, at: verifiedAt, reason: null },
    { from: 'verified', to: 'active', userId: staff.nurse, at: story.start, reason: null },
  ];
  if (story.end !== null) events.push({ from: 'active', to: 'discontinued', userId: staff.nurse, at: story.end, reason: 'Stepped down to oral analgesia' });
  const orderId = writeOrder(ctx, story.ward, story.patient, regimen, events, story.start);

  const stopAt = story.end ?? (story.overdue ? now - r.int(150, 240) * MINUTE : now);
  writeSyringes({ ...ctx, toleranceMl: 0.5 }, { orderId, drugId: ctx.drugs.get(regimen.drug)!.id, regimen, start: story.start, stopAt, end: story.end, sedatedAtLast: story.sedatedAtLast });

  if (r.chance(0.3)) {
    const at = story.start + r.int(30, 360) * MINUTE;
    if (at < (story.end ?? now)) {
      ctx.writer.insert('clinician_boluses', { orderId, amount: regimen.clinicianBolusDose, reason: 'Breakthrough pain on moving', givenById: staff.nurse, witnessId: staff.secondNurse, at: sqlTime(at) });
    }
  }
  writeSignoffs(ctx, story.ward.id, orderId, story.start, story.end ?? now);
}

/** An order still with pharmacy, or verified with its syringe waiting for the bedside check. */
export function writeWaitingOrder(ctx: OrderContext, ward: WrittenWard, patient: ScalePatient, status: 'awaiting_verification' | 'verified'): void {
  const { random: r, staff, now } = ctx;
  const regimen = pickRegimen(r, ward.paediatric, patient.weightKg);
  const signedAt = now - r.int(20, 240) * MINUTE;
  const events: Event[] = [{ from: null, to: 'awaiting_verification', userId: staff.prescriber, at: signedAt, reason: null }];
  if (status === 'verified') events.push({ from: 'awaiting_verification', to: 'verified', userId: staff.pharmacist, at: signedAt + 15 * MINUTE, reason: null });
  const orderId = writeOrder(ctx, ward, patient, regimen, events, null);
  if (status === 'verified') {
    const releasedAt = signedAt + 30 * MINUTE;
    ctx.writer.insert('syringe_releases', {
      orderId, releaseCode: ctx.codes.next(), status: 'ready', concentrationPerMl: regimen.concentrationPerMl, volumeMl: regimen.syringeMl, batch: 'KB-WAITING',
      expiresAt: sqlTime(releasedAt + 7 * DAY), preparedBy: 'Lin Park', checkedBy: 'Tomas Ortiz', releasedById: staff.pharmacist, releasedAt: sqlTime(releasedAt), rowVersion: 1,
    });
  }
}

type Event = { from: OrderStatus | null; to: OrderStatus; userId: number; at: number; reason: string | null };

function writeOrder(ctx: OrderContext, ward: WrittenWard, patient: ScalePatient, regimen: ScaleRegimen, events: Event[], startedAt: number | null): number {
  const { writer, staff } = ctx;
  const rule = ward.rules.get(regimen.drug)!;
  const { findings, overrides } = signingRecord(regimen, rule, patient);
  const last = events[events.length - 1];
  const verified = events.find((event) => event.to === 'verified');
  const orderId = writer.insert('pca_orders', {
    patientId: patient.id,
    prescriberId: staff.prescriber,
    drugId: ctx.drugs.get(regimen.drug)!.id,
    status: last.to,
    regimenType: regimen.basalRatePerHour > 0 ? 'demand_basal' : 'demand_only',
    version: 1,
    concentrationPerMl: regimen.concentrationPerMl,
    doseUnit: regimen.doseUnit,
    loadingDose: regimen.loadingDose,
    demandDose: regimen.demandDose,
    lockoutMinutes: regimen.lockoutMinutes,
    basalRatePerHour: regimen.basalRatePerHour,
    oneHourLimit: regimen.oneHourLimit,
    fourHourLimit: regimen.fourHourLimit,
    clinicianBolusDose: regimen.clinicianBolusDose,
    indication: regimen.indication,
    reviewDate: new Date(events[0].at + 3 * DAY).toISOString().slice(0, 10),
    ruleSnapshot: JSON.stringify(rule),
    findingsSnapshot: JSON.stringify(findings),
    overrides: JSON.stringify(overrides),
    signedAt: sqlTime(events[0].at),
    verifiedById: verified ? staff.pharmacist : null,
    verifiedAt: verified ? sqlTime(verified.at) : null,
    statusChangedAt: sqlTime(last.at),
    statusReason: last.reason,
    startedAt: startedAt === null ? null : sqlTime(startedAt),
    rowVersion: events.length,
  });
  for (const event of events) writer.insert('order_events', { orderId, fromStatus: event.from, toStatus: event.to, userId: event.userId, at: sqlTime(event.at), reason: event.reason });
  return orderId;
}

/** At every shift change while the PCA ran, the outgoing and the incoming nurse confirmed it. */
function writeSignoffs(ctx: OrderContext, wardId: number, orderId: number, start: number, until: number): void {
  let boundary = Date.parse(shiftWindow(new Date(start), '07:00', '19:00').endsAt);
  while (boundary < until) {
    const shift = shiftWindow(new Date(boundary + MINUTE), '07:00', '19:00');
    const outgoingAt = boundary + ctx.random.int(2, 15) * MINUTE;
    const incomingAt = outgoingAt + ctx.random.int(1, 5) * MINUTE;
    if (incomingAt < until) {
      ctx.writer.insert('handover_signoffs', { wardId, orderId, shiftDate: shift.shiftDate, shift: shift.shift, role: 'outgoing', nurseId: ctx.staff.nurse, pumpSettingsMatch: null, at: sqlTime(outgoingAt) });
      ctx.writer.insert('handover_signoffs', { wardId, orderId, shiftDate: shift.shiftDate, shift: shift.shift, role: 'incoming', nurseId: ctx.staff.secondNurse, pumpSettingsMatch: 1, at: sqlTime(incomingAt) });
    }
    boundary = Date.parse(shift.endsAt);
  }
}
