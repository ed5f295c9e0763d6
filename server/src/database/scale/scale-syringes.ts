import { DEFAULT_WARD_POLICY, observationFlags, reconcile, type ObservationValues, type PumpSettings, type SedationLevel } from '@lockstep/shared';
import type { Random } from './random.js';
import type { Staff } from './scale-reference.js';
import type { ScaleRegimen } from './scale-regimen.js';
import { type ScaleWriter, sqlTime } from './scale-writer.js';

const MINUTE = 60_000;
const HOUR = 60 * MINUTE;
/** A syringe is changed after the observation that finds less than this left. */
const CHANGE_BELOW_ML = 4;
const RELEASE_ALPHABET = '234679ACDEFGHJKMNPQRTUVWXYZ';

export type SyringeContext = { writer: ScaleWriter; random: Random; staff: Staff; toleranceMl: number; codes: ReleaseCodes };

export type ObservedOrder = {
  orderId: number;
  drugId: number;
  regimen: ScaleRegimen;
  start: number;
  /** Observations stop before this time (the order's end, or now; earlier for an overdue one). */
  stopAt: number;
  /** Discontinued at this time (its last syringe is reconciled), or null while it runs. */
  end: number | null;
  /** The last observation shows unacceptable sedation (an open urgent flag). */
  sedatedAtLast: boolean;
};

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
  const { regimen } = order;
  const demandMl = regimen.demandDose / regimen.concentrationPerMl;
  const basalMl = regimen.basalRatePerHour / regimen.concentrationPerMl;
  let release = startSyringe(ctx, order, order.start);
  let previous: ObservationValues | null = null;
  const jitter = () => r.int(-5, 5) * MINUTE;
  let at = order.start + HOUR + jitter();
  for (let hour = 1; at < order.stopAt; hour++) {
    const nextAt = order.start + (hour + 1) * HOUR + jitter();
    const last = nextAt >= order.stopAt;
    const early = hour <= 24;
    // Never more out of the syringe than was in it.
    const room = regimen.syringeMl - (previous?.volumeInfusedMl ?? 0) - basalMl;
    const delivered = Math.max(0, Math.min(r.int(0, early ? 4 : 3), Math.floor(room / demandMl)));
    const struggling = r.chance(0.01);
    const values: ObservationValues = {
      at: new Date(at).toISOString(),
      painScore: struggling ? r.int(7, 9) : Math.max(0, (early ? 4 : 3) + r.int(-2, 2)),
      sedationLevel: last && order.sedatedAtLast ? '3' : r.pick<SedationLevel>(['S', '1', '1', '1', '2']),
      respiratoryRate: last && order.sedatedAtLast ? 9 : r.int(11, 20),
      spo2: r.int(93, 99),
      attempts: (previous?.attempts ?? 0) + delivered + (struggling ? delivered + r.int(2, 4) : r.chance(0.3) ? r.int(1, 2) : 0),
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
      attempts: values.attempts,
      delivered: values.delivered,
      volumeInfusedMl: values.volumeInfusedMl,
      syringeRemainingMl: values.syringeRemainingMl,
      recordedById: r.chance(0.5) ? staff.nurse : staff.secondNurse,
      createdAt: sqlTime(at),
    });
    // Flags on the last observation of a running PCA are still open on the board.
    const acknowledgedAt = last && order.end === null ? null : at + r.int(10, 40) * MINUTE;
    for (const flag of observationFlags(values, previous, basalMl, DEFAULT_WARD_POLICY)) {
      const oncePerSyringe = flag.code === 'syringe.low';
      if (oncePerSyringe && release.lowFlagged) continue;
      if (oncePerSyringe) release.lowFlagged = true;
      writer.insert('flags', {
        orderId: order.orderId,
        releaseId: oncePerSyringe ? release.id : null,
        severity: flag.severity,
        code: flag.code,
        message: flag.message,
        action: flag.action,
        raisedAt: sqlTime(at),
        acknowledgedAt: acknowledgedAt === null ? null : sqlTime(acknowledgedAt),
        acknowledgedById: acknowledgedAt === null ? null : staff.chargeNurse,
        acknowledgeNote: acknowledgedAt === null ? null : 'Seen and acted on per protocol',
      });
    }
    previous = values;
    const changeAt = at + 10 * MINUTE;
    if (values.syringeRemainingMl < CHANGE_BELOW_ML && changeAt < order.stopAt) {
      takeDown(ctx, order, release.id, changeAt, values);
      release = startSyringe(ctx, order, changeAt);
      previous = null;
    }
    at = nextAt;
  }
  if (order.end !== null) takeDown(ctx, order, release.id, order.end, previous);
}

function startSyringe(ctx: SyringeContext, order: ObservedOrder, at: number): { id: number; lowFlagged: boolean } {
  const { writer, staff, random: r } = ctx;
  const { regimen } = order;
  const releasedAt = at - r.int(20, 60) * MINUTE;
  const id = writer.insert('syringe_releases', {
    orderId: order.orderId,
    releaseCode: ctx.codes.next(),
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
  return { id, lowFlagged: false };
}

/** The syringe comes down: what is left is wasted in front of a witness and reconciled. */
function takeDown(ctx: SyringeContext, order: ObservedOrder, releaseId: number, at: number, last: ObservationValues | null): void {
  const { writer, staff, random: r } = ctx;
  const infusedMl = last?.volumeInfusedMl ?? 0;
  // Now and then what is left does not add up, so the board has reconciliations to report.
  const wastedMl = round2(Math.max(0, order.regimen.syringeMl - infusedMl - (r.chance(0.02) ? 1 : 0)));
  const result = reconcile(order.regimen.syringeMl, infusedMl, wastedMl, ctx.toleranceMl);
  writer.finishRelease(releaseId);
  writer.insert('release_reconciliations', {
    releaseId,
    dispensedMl: order.regimen.syringeMl,
    infusedMl,
    wastedMl,
    discrepancyMl: result.discrepancyMl,
    mustReport: result.mustReport ? 1 : 0,
    toleranceMl: ctx.toleranceMl,
    recordedById: staff.nurse,
    witnessId: staff.secondNurse,
    at: sqlTime(at),
  });
}

function round2(value: number): number {
  return Math.round(value * 100) / 100;
}
