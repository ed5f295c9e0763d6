import { type OrderStatus, type PatientFactors, regimenTypeOf, shiftWindow } from '@lockstep/shared';
import { vitalsPatient, type VitalsPatientFacts } from '../../observations/vitals-patient.js';
import type { Random } from './random.js';
import type { Drugs, Staff, WrittenWard } from './scale-reference.js';
import { pickRegimen, signingRecord, type ScaleRegimen } from './scale-regimen.js';
import { childBandOf, RandomScript, type ObservationScript } from './observation-script.js';
import { type ReleaseCodes, writeSyringes } from './scale-syringes.js';
import { type ScaleWriter, sqlTime } from './scale-writer.js';

const MINUTE = 60_000;
const HOUR = 60 * MINUTE;
const DAY = 24 * HOUR;
const DISCONTINUE_REASON = 'Stepped down to oral analgesia';

export type OrderContext = { writer: ScaleWriter; random: Random; staff: Staff; drugs: Drugs; codes: ReleaseCodes; now: number };
export type ScalePatient = PatientFactors & { id: number; weightKg: number; dateOfBirth: string };

/** What the observation bands need of the patient on this ward (the seeds never choose SpO2 scale 2). */
export function vitalsFactsOf(ward: WrittenWard, patient: ScalePatient): VitalsPatientFacts {
  return { dateOfBirth: patient.dateOfBirth, wardPopulation: ward.population, spo2Scale: '1' };
}

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
  const { random: r, now } = ctx;
  const regimen = pickRegimen(r, story.ward.paediatric, story.patient.weightKg);
  // Verified before pharmacy releases the first syringe (20 to 60 minutes before the start).
  const signedAt = story.start - r.int(90, 180) * MINUTE;
  const verifiedAt = signedAt + r.int(15, 30) * MINUTE;
  const stopAt = story.end ?? (story.overdue ? now - r.int(150, 240) * MINUTE : now);
  const bolusAt = r.chance(0.3) ? story.start + r.int(30, 360) * MINUTE : null;
  writePca(ctx, {
    ...story,
    regimen,
    signedAt,
    verifiedAt,
    stopAt,
    script: new RandomScript(
      r,
      story.sedatedAtLast,
      childBandOf(vitalsPatient(vitalsFactsOf(story.ward, story.patient), new Date(story.start))),
    ),
    bolusAt: bolusAt !== null && bolusAt < (story.end ?? now) ? bolusAt : null,
    currentShift: 'both',
  });
}

/** How far this shift's handover got for a running PCA: both nurses, only the outgoing one, or neither yet. */
export type HandoverProgress = 'both' | 'outgoing' | 'none';

/** One PCA's whole course with every choice made: the scale seed draws them, the demo scripts them. */
export type PcaCourse = {
  ward: WrittenWard;
  patient: ScalePatient;
  regimen: ScaleRegimen;
  signedAt: number;
  verifiedAt: number;
  start: number;
  /** Discontinued then; null while it runs. */
  end: number | null;
  /** Observations stop before this time: the end, now, or earlier for one that is overdue. */
  stopAt: number;
  script: ObservationScript;
  /** False when the next syringe has not come from pharmacy: the running one is left to run low. */
  changeSyringes?: boolean;
  bolusAt: number | null;
  currentShift: HandoverProgress;
  /** The prescriber's reason for each soft finding; a generic one when not given. */
  overrideReason?: string;
};

/** Writes the order, its syringes and observations, a clinician bolus and the handover sign-offs; answers the order id. */
export function writePca(ctx: OrderContext, course: PcaCourse): number {
  const { staff, now } = ctx;
  const events: Event[] = [
    { from: null, to: 'awaiting_verification', userId: staff.prescriber, at: course.signedAt, reason: null },
    { from: 'awaiting_verification', to: 'verified', userId: staff.pharmacist, at: course.verifiedAt, reason: null },
    {
      from: 'verified',
      to: 'active',
      userId: staff.nurse,
      at: course.start,
      reason: `Bedside check matched; second check by ${staff.secondNurseName}`,
    },
  ];
  if (course.end !== null)
    events.push({ from: 'active', to: 'discontinued', userId: staff.nurse, at: course.end, reason: DISCONTINUE_REASON });
  const { regimen } = course;
  const orderId = writeOrder(ctx, course.ward, course.patient, regimen, events, course.start, course.overrideReason);
  writeSyringes(
    { ...ctx, policy: course.ward.policy },
    {
      orderId,
      drugId: ctx.drugs.get(regimen.drug)!.id,
      regimen,
      start: course.start,
      stopAt: course.stopAt,
      end: course.end,
      patient: vitalsFactsOf(course.ward, course.patient),
      script: course.script,
      changeSyringes: course.changeSyringes,
    },
  );
  if (course.bolusAt !== null) {
    ctx.writer.insert('clinician_boluses', {
      orderId,
      amount: regimen.clinicianBolusDose,
      reason: 'Breakthrough pain on moving',
      givenById: staff.nurse,
      witnessId: staff.secondNurse,
      at: sqlTime(course.bolusAt),
    });
  }
  writeSignoffs(ctx, course.ward.id, orderId, course.start, course.end ?? now, course.currentShift);
  return orderId;
}

/** An order still with pharmacy, or verified with its syringe waiting for the bedside check. */
export function writeWaitingOrder(
  ctx: OrderContext,
  ward: WrittenWard,
  patient: ScalePatient,
  status: 'awaiting_verification' | 'verified',
): void {
  const { random: r, now } = ctx;
  const regimen = pickRegimen(r, ward.paediatric, patient.weightKg);
  const signedAt = now - r.int(20, 240) * MINUTE;
  writeUnstartedOrder(ctx, {
    ward,
    patient,
    regimen,
    status,
    signedAt,
    decidedAt: signedAt + 15 * MINUTE,
    releaseCode: status === 'verified' ? ctx.codes.next() : null,
  });
}

export type UnstartedOrder = {
  ward: WrittenWard;
  patient: ScalePatient;
  regimen: ScaleRegimen;
  status: 'awaiting_verification' | 'verified' | 'returned';
  signedAt: number;
  /** When pharmacy verified or returned it. */
  decidedAt: number;
  /** Pharmacy's query, for a returned order. */
  reason?: string;
  overrideReason?: string;
  /** A ready syringe for a verified order: its release code. */
  releaseCode: string | null;
  batch?: string;
};

/** An order not yet started: with pharmacy, returned to the prescriber, or verified with a ready syringe. Answers its id. */
export function writeUnstartedOrder(ctx: OrderContext, order: UnstartedOrder): number {
  const { staff } = ctx;
  const { regimen, status } = order;
  const events: Event[] = [{ from: null, to: 'awaiting_verification', userId: staff.prescriber, at: order.signedAt, reason: null }];
  if (status !== 'awaiting_verification')
    events.push({ from: 'awaiting_verification', to: status, userId: staff.pharmacist, at: order.decidedAt, reason: order.reason ?? null });
  const orderId = writeOrder(ctx, order.ward, order.patient, regimen, events, null, order.overrideReason);
  if (order.releaseCode !== null) {
    const releasedAt = order.decidedAt + 15 * MINUTE;
    ctx.writer.insert('syringe_releases', {
      orderId,
      releaseCode: order.releaseCode,
      status: 'ready',
      concentrationPerMl: regimen.concentrationPerMl,
      volumeMl: regimen.syringeMl,
      batch: order.batch ?? 'KB-WAITING',
      expiresAt: sqlTime(releasedAt + 7 * DAY),
      preparedBy: 'Lin Park',
      checkedBy: 'Tomas Ortiz',
      releasedById: staff.pharmacist,
      releasedAt: sqlTime(releasedAt),
      rowVersion: 1,
    });
  }
  return orderId;
}

type Event = { from: OrderStatus | null; to: OrderStatus; userId: number; at: number; reason: string | null };

function writeOrder(
  ctx: OrderContext,
  ward: WrittenWard,
  patient: ScalePatient,
  regimen: ScaleRegimen,
  events: Event[],
  startedAt: number | null,
  overrideReason?: string,
): number {
  const { writer, staff } = ctx;
  const rule = ward.rules.get(regimen.drug)!;
  const { findings, overrides } = signingRecord(regimen, rule, patient, overrideReason);
  const last = events[events.length - 1];
  const verified = events.find((event) => event.to === 'verified');
  const orderId = writer.insert('pca_orders', {
    patientId: patient.id,
    prescriberId: staff.prescriber,
    drugId: ctx.drugs.get(regimen.drug)!.id,
    status: last.to,
    regimenType: regimenTypeOf(regimen.basalRatePerHour),
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
  for (const event of events)
    writer.insert('order_events', {
      orderId,
      fromStatus: event.from,
      toStatus: event.to,
      userId: event.userId,
      at: sqlTime(event.at),
      reason: event.reason,
    });
  return orderId;
}

/**
 * At every shift change while the PCA ran, the outgoing and the incoming nurse confirmed it; at
 * the change that began the shift still running at `until`, only as far as `current` says.
 */
function writeSignoffs(ctx: OrderContext, wardId: number, orderId: number, start: number, until: number, current: HandoverProgress): void {
  const { random: r, staff, writer } = ctx;
  let boundary = Date.parse(shiftWindow(new Date(start), '07:00', '19:00').endsAt);
  while (boundary < until) {
    const shift = shiftWindow(new Date(boundary + MINUTE), '07:00', '19:00');
    const ongoing = Date.parse(shift.endsAt) > until;
    const progress = ongoing ? current : 'both';
    // Minutes into the shift, but never after `until` however soon after the change that is.
    const room = until - boundary;
    const outgoingAt = boundary + Math.min(r.int(2, 15) * MINUTE, room / 3);
    const incomingAt = outgoingAt + Math.min(r.int(1, 5) * MINUTE, room / 3);
    const signoff = { wardId, orderId, shiftDate: shift.shiftDate, shift: shift.shift };
    if (progress !== 'none')
      writer.insert('handover_signoffs', {
        ...signoff,
        role: 'outgoing',
        nurseId: staff.nurse,
        pumpSettingsMatch: null,
        at: sqlTime(outgoingAt),
      });
    if (progress === 'both')
      writer.insert('handover_signoffs', {
        ...signoff,
        role: 'incoming',
        nurseId: staff.secondNurse,
        pumpSettingsMatch: 1,
        at: sqlTime(incomingAt),
      });
    boundary = Date.parse(shift.endsAt);
  }
}
