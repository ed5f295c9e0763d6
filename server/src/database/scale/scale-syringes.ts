import {
  observationFlags,
  type PreviousReading,
  reconcile,
  syringeStartReading,
  type FlagDraft,
  type ObservationValues,
  type PumpSettings,
  type WardPolicy,
} from '@lockstep/shared';
import { discrepancyFlag } from '../../bedside/reconciliation-records.js';
import { vitalsPatient, type VitalsPatientFacts } from '../../observations/vitals-patient.js';
import type { ObservationScript } from './observation-script.js';
import type { Random } from './random.js';
import type { Staff } from './scale-reference.js';
import type { ScaleRegimen } from './scale-regimen.js';
import { type ScaleWriter, sqlTime } from './scale-writer.js';

const MINUTE = 60_000;
const HOUR = 60 * MINUTE;
/** A syringe is changed after the observation that finds less than this left. */
const CHANGE_BELOW_ML = 4;
const RELEASE_ALPHABET = '234679ACDEFGHJKMNPQRTUVWXYZ';

export type SyringeContext = { writer: ScaleWriter; random: Random; staff: Staff; policy: WardPolicy; codes: ReleaseCodes };

export type ObservedOrder = {
  orderId: number;
  drugId: number;
  regimen: ScaleRegimen;
  start: number;
  /** Observations stop before this time (the order's end, or now; earlier for an overdue one). */
  stopAt: number;
  /** Discontinued at this time (its last syringe is reconciled), or null while it runs. */
  end: number | null;
  /** The patient's age, ward population and SpO2 scale: each observation's flags use their bands, as the app's do. */
  patient: VitalsPatientFacts;
  /** Where each observation's values come from. */
  script: ObservationScript;
  /** False when the next syringe never came: the running one is left to run low. */
  changeSyringes?: boolean;
};

type RunningSyringe = { id: number; releaseCode: string; lowFlagged: boolean };

/** Distinct, label-safe release codes: a counter times a number coprime to 27^6, written in base 27. */
export class ReleaseCodes {
  private count = 0;

  next(): string {
    let n = (++this.count * 1_000_003) % 27 ** 6;
    let code = '';
    for (let i = 0; i < 6; i++) {
      code = RELEASE_ALPHABET[n % 27] + code;
      n = Math.floor(n / 27);
    }
    return `${code.slice(0, 3)}-${code.slice(3)}`;
  }
}

/**
 * Every syringe of one order, with its bedside check, hourly observations (pump totals rising
 * within each syringe), the flags those observations raise by the real rules, a syringe change
 * whenever one runs low, and a reconciliation for each syringe taken down.
 */
export function writeSyringes(ctx: SyringeContext, order: ObservedOrder): void {
  const { random: r, writer, staff } = ctx;
  const { regimen, script } = order;
  const demandMl = regimen.demandDose / regimen.concentrationPerMl;
  const basalMl = regimen.basalRatePerHour / regimen.concentrationPerMl;
  let syringes = 0;
  let release = startSyringe(ctx, order, order.start);
  let previous: ObservationValues | null = null;
  // This syringe's readings, its start first: the first observation's flags, and the 1- and 4-hour limits.
  let readings: PreviousReading[] = [syringeStartReading(new Date(order.start).toISOString())];
  let at = order.start + HOUR + script.offsetMinutes() * MINUTE;
  for (let hour = 1; at < order.stopAt; hour++) {
    const nextAt = order.start + (hour + 1) * HOUR + script.offsetMinutes() * MINUTE;
    const last = nextAt >= order.stopAt;
    const planned = script.hour({ hour, last });
    // Never more out of the syringe than was in it.
    const room = regimen.syringeMl - (previous?.volumeInfusedMl ?? 0) - basalMl;
    const delivered = Math.max(0, Math.min(planned.delivered, Math.floor(room / demandMl + 1e-9)));
    const values: ObservationValues = {
      at: new Date(at).toISOString(),
      painScore: planned.painScore,
      sedationLevel: planned.sedationLevel,
      respiratoryRate: planned.respiratoryRate,
      spo2: planned.spo2,
      // On air: the seeded patients need no oxygen.
      oxygenLitresPerMinute: 0,
      attempts: (previous?.attempts ?? 0) + delivered + planned.refused,
      delivered: (previous?.delivered ?? 0) + delivered,
      volumeInfusedMl: round2(Math.min(regimen.syringeMl, (previous?.volumeInfusedMl ?? 0) + delivered * demandMl + basalMl)),
      syringeRemainingMl: 0,
    };
    values.syringeRemainingMl = round2(Math.max(0, regimen.syringeMl - values.volumeInfusedMl));
    writer.deferObservation({
      orderId: order.orderId,
      releaseId: release.id,
      at: sqlTime(at),
      painScore: values.painScore,
      sedationLevel: values.sedationLevel,
      respiratoryRate: values.respiratoryRate,
      spo2: values.spo2,
      oxygenLitresPerMinute: values.oxygenLitresPerMinute ?? 0,
      attempts: values.attempts,
      delivered: values.delivered,
      volumeInfusedMl: values.volumeInfusedMl,
      syringeRemainingMl: values.syringeRemainingMl,
      recordedById: r.chance(0.5) ? staff.nurse : staff.secondNurse,
      createdAt: sqlTime(at),
    });
    // Flags on the last observation of a running PCA are still open on the board.
    const acknowledgedAt = last && order.end === null ? null : at + r.int(10, 40) * MINUTE;
    const earlier = readings.filter((reading) => at - Date.parse(reading.at) <= 4 * HOUR);
    const context = { regimen, earlier, syringeVolumeMl: regimen.syringeMl, patient: vitalsPatient(order.patient, new Date(at)) };
    for (const flag of observationFlags(values, previous ?? readings[0]!, basalMl, ctx.policy, context)) {
      const oncePerSyringe = flag.code === 'syringe.low';
      if (oncePerSyringe && release.lowFlagged) continue;
      if (oncePerSyringe) release.lowFlagged = true;
      writeFlag(ctx, order.orderId, oncePerSyringe ? release.id : null, flag, at, acknowledgedAt);
    }
    previous = values;
    readings.push(values);
    const changeAt = at + 10 * MINUTE;
    if (order.changeSyringes !== false && values.syringeRemainingMl < CHANGE_BELOW_ML && changeAt < order.stopAt) {
      takeDown(ctx, order, release, changeAt, values, syringes++);
      release = startSyringe(ctx, order, changeAt);
      previous = null;
      readings = [syringeStartReading(new Date(changeAt).toISOString())];
    }
    at = nextAt;
  }
  if (order.end !== null) takeDown(ctx, order, release, order.end, previous, syringes);
}

function startSyringe(ctx: SyringeContext, order: ObservedOrder, at: number): RunningSyringe {
  const { writer, staff, random: r } = ctx;
  const { regimen } = order;
  const releasedAt = at - r.int(20, 60) * MINUTE;
  const releaseCode = ctx.codes.next();
  const id = writer.insert('syringe_releases', {
    orderId: order.orderId,
    releaseCode,
    status: 'in_use',
    concentrationPerMl: regimen.concentrationPerMl,
    volumeMl: regimen.syringeMl,
    batch: `KB-${new Date(releasedAt).toISOString().slice(2, 10).replaceAll('-', '')}-${r.int(10, 99)}`,
    expiresAt: sqlTime(releasedAt + 7 * 24 * HOUR),
    preparedBy: 'Lin Park',
    checkedBy: 'Tomas Ortiz',
    releasedById: staff.pharmacist,
    releasedAt: sqlTime(releasedAt),
    rowVersion: 2,
  });
  const settings: PumpSettings = {
    drugId: order.drugId,
    concentrationPerMl: regimen.concentrationPerMl,
    syringeVolumeMl: regimen.syringeMl,
    loadingDose: regimen.loadingDose,
    demandDose: regimen.demandDose,
    lockoutMinutes: regimen.lockoutMinutes,
    basalRatePerHour: regimen.basalRatePerHour,
    oneHourLimit: regimen.oneHourLimit,
    fourHourLimit: regimen.fourHourLimit,
  };
  const json = JSON.stringify(settings);
  writer.insert('bedside_checks', {
    orderId: order.orderId,
    releaseId: id,
    status: 'matched',
    firstNurseId: staff.nurse,
    firstSettings: json,
    firstAt: sqlTime(at - 5 * MINUTE),
    secondNurseId: staff.secondNurse,
    secondSettings: json,
    secondAt: sqlTime(at),
    differences: '[]',
    rowVersion: 2,
  });
  return { id, releaseCode, lowFlagged: false };
}

/** The syringe comes down: what is left is wasted in front of a witness and reconciled; a shortfall is flagged for pharmacy. */
function takeDown(
  ctx: SyringeContext,
  order: ObservedOrder,
  syringe: RunningSyringe,
  at: number,
  last: ObservationValues | null,
  index: number,
): void {
  const { writer, staff } = ctx;
  const dispensedMl = order.regimen.syringeMl;
  const infusedMl = last?.volumeInfusedMl ?? 0;
  const wastedMl = round2(Math.max(0, dispensedMl - infusedMl - order.script.missingAtTakeDown(index)));
  const result = reconcile(dispensedMl, infusedMl, wastedMl, ctx.policy.reconciliationToleranceMl);
  writer.finishRelease(syringe.id);
  writer.insert('release_reconciliations', {
    releaseId: syringe.id,
    dispensedMl,
    infusedMl,
    wastedMl,
    discrepancyMl: result.discrepancyMl,
    mustReport: result.mustReport ? 1 : 0,
    toleranceMl: ctx.policy.reconciliationToleranceMl,
    recordedById: staff.nurse,
    witnessId: staff.secondNurse,
    at: sqlTime(at),
  });
  // Open until pharmacy has reviewed the controlled-drug record.
  if (result.mustReport)
    writeFlag(ctx, order.orderId, null, discrepancyFlag({ ...result, dispensedMl, infusedMl, wastedMl }, syringe.releaseCode), at, null);
}

function writeFlag(
  ctx: SyringeContext,
  orderId: number,
  releaseId: number | null,
  flag: FlagDraft,
  at: number,
  acknowledgedAt: number | null,
): void {
  ctx.writer.insert('flags', {
    orderId,
    releaseId,
    severity: flag.severity,
    code: flag.code,
    message: flag.message,
    action: flag.action,
    raisedAt: sqlTime(at),
    acknowledgedAt: acknowledgedAt === null ? null : sqlTime(acknowledgedAt),
    acknowledgedById: acknowledgedAt === null ? null : ctx.staff.chargeNurse,
    acknowledgeNote: acknowledgedAt === null ? null : 'Seen and acted on per protocol',
  });
}

function round2(value: number): number {
  return Math.round(value * 100) / 100;
}
