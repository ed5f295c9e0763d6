import type { Random } from './random.js';
import { PatientFactory } from './scale-patients.js';
import type { ScaleOptions } from './scale-options.js';
import { type OrderContext, type ScalePatient, writePcaStory, writeWaitingOrder } from './scale-orders.js';
import { planWards } from './scale-plan.js';
import { type WrittenWard, writeStaffAndDrugs, writeWards } from './scale-reference.js';
import { ReleaseCodes } from './scale-syringes.js';
import type { ScaleWriter } from './scale-writer.js';

const MINUTE = 60_000;
const HOUR = 60 * MINUTE;
const DAY = 24 * HOUR;

/**
 * The whole invented hospital. Every bed is occupied; a bed with a running PCA has had PCAs back
 * to back for `days` days (earlier patients discharged: the schema has no discharge, so they keep
 * their last ward and bed), and each ward has orders waiting for pharmacy or a bedside check.
 */
export function writeHospital(writer: ScaleWriter, random: Random, options: ScaleOptions, passwordHash: string, now: number): void {
  const { staff, drugs, userIds } = writeStaffAndDrugs(writer, passwordHash);
  const wards = writeWards(writer, planWards(options), drugs, staff, userIds, now);
  const patients = new PatientFactory(writer, random, now);
  const ctx: OrderContext = { writer, random, staff, drugs, codes: new ReleaseCodes(), now };
  for (const ward of wards) {
    const beds = shuffle(
      random,
      Array.from({ length: ward.beds }, (_, i) => `${ward.code[0]}${String(i + 1).padStart(2, '0')}`),
    );
    const occupants = beds.map((bed) => ({ bed, patient: admit(patients, ward, bed) }));
    for (const { bed, patient } of occupants.slice(0, ward.active)) writeBedHistory(ctx, patients, ward, bed, patient, options.days);
    const waiting = occupants.slice(ward.active);
    const awaiting = Math.max(1, Math.round(ward.active / 8));
    const verified = Math.max(1, Math.round(ward.active / 12));
    waiting.slice(0, awaiting).forEach(({ patient }) => writeWaitingOrder(ctx, ward, patient, 'awaiting_verification'));
    waiting.slice(awaiting, awaiting + verified).forEach(({ patient }) => writeWaitingOrder(ctx, ward, patient, 'verified'));
  }
  writer.flushObservations();
}

/** PCAs one after another in one bed; the last, the current occupant's, is still running. */
function writeBedHistory(
  ctx: OrderContext,
  patients: PatientFactory,
  ward: WrittenWard,
  bed: string,
  occupant: ScalePatient,
  days: number,
): void {
  const { random: r, now } = ctx;
  let start = now - days * DAY + r.int(0, 36 * 60) * MINUTE;
  for (;;) {
    const end = start + r.int(36 * 60, 96 * 60) * MINUTE;
    if (end >= now - HOUR) {
      const story = {
        ward,
        patient: occupant,
        start: Math.min(start, now - 20 * MINUTE),
        end: null,
        overdue: r.chance(0.08),
        sedatedAtLast: r.chance(0.06),
      };
      writePcaStory(ctx, story);
      return;
    }
    writePcaStory(ctx, { ward, patient: admit(patients, ward, bed), start, end, overdue: false, sedatedAtLast: false });
    start = end + r.int(2 * 60, 10 * 60) * MINUTE;
  }
}

function admit(patients: PatientFactory, ward: WrittenWard, bed: string): ScalePatient {
  return patients.create(ward.id, bed, ward.paediatric);
}

function shuffle<T>(random: Random, items: T[]): T[] {
  for (let i = items.length - 1; i > 0; i--) {
    const j = random.int(0, i);
    [items[i], items[j]] = [items[j], items[i]];
  }
  return items;
}
