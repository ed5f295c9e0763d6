import type { Database } from 'better-sqlite3';
import type { EntityManager } from 'typeorm';
import type { BetterSqlite3Driver } from 'typeorm/driver/better-sqlite3/BetterSqlite3Driver.js';
import { patientFactorsOf, shiftWindow } from '@lockstep/shared';
import { Drug } from '../../drugs/entities/drug.entity.js';
import { toLimitRuleResponse } from '../../library/dto/library-response.js';
import { LimitRule } from '../../library/entities/limit-rule.entity.js';
import { Patient } from '../../patients/entities/patient.entity.js';
import type { User } from '../../users/entities/user.entity.js';
import { Ward } from '../../wards/entities/ward.entity.js';
import { vitalsPatient } from '../../observations/vitals-patient.js';
import { wardPolicy } from '../../wards/ward-policy.js';
import { Random } from '../scale/random.js';
import { childBandOf } from '../scale/observation-script.js';
import { type OrderContext, type ScalePatient, vitalsFactsOf, writePca, writeUnstartedOrder } from '../scale/scale-orders.js';
import type { Drugs, Staff, WrittenWard } from '../scale/scale-reference.js';
import { ReleaseCodes } from '../scale/scale-syringes.js';
import { ScaleWriter } from '../scale/scale-writer.js';
import { DEMO_PCAS, DEMO_UNSTARTED_ORDERS, type DemoPca } from './demo-pcas.js';
import { DemoScript } from './demo-script.js';

const MINUTE = 60_000;
const HOUR = 60 * MINUTE;
// The same invented hospital every time: only the clock moves.
const DEMO_RANDOM_SEED = 20261203;

type DemoPatient = { ward: WrittenWard; shifts: ShiftStarts; patient: ScalePatient };
type ShiftStarts = Pick<Ward, 'dayShiftStart' | 'nightShiftStart'>;

/**
 * Writes the demo's orders through the scale seed's writers (the same rows the app writes: findings
 * from the real order check, flags from the real observation rules, reconciliations from the real
 * arithmetic), with times counted back from `now`. Runs inside the caller's transaction: TypeORM's
 * better-sqlite3 driver has one connection, and the writers' statements run on it.
 */
export async function seedDemoOrders(manager: EntityManager, users: User[], now: number): Promise<void> {
  const writer = new ScaleWriter((manager.connection.driver as BetterSqlite3Driver).databaseConnection as Database);
  const ctx: OrderContext = {
    writer,
    random: new Random(DEMO_RANDOM_SEED),
    staff: demoStaff(users),
    drugs: await demoDrugs(manager),
    codes: new ReleaseCodes(),
    now,
  };
  const patients = await demoPatients(manager);
  const find = (mrn: string) => patients.get(mrn) ?? missing(mrn);

  for (const order of DEMO_UNSTARTED_ORDERS) {
    const { ward, patient } = find(order.mrn);
    const signedAt = now - order.signedMinutesAgo * MINUTE;
    writeUnstartedOrder(ctx, {
      ...order,
      ward,
      patient,
      signedAt,
      decidedAt: signedAt + (order.decidedAfterMinutes ?? 0) * MINUTE,
      releaseCode: order.releaseCode ?? null,
    });
  }
  for (const pca of DEMO_PCAS) writeDemoPca(ctx, find(pca.mrn), pca);
  writer.flushObservations();
}

function writeDemoPca(ctx: OrderContext, { ward, shifts, patient }: DemoPatient, pca: DemoPca): void {
  const { now, random } = ctx;
  const start = pca.start === 'syringe-empties-this-shift' ? startToEmptyThisShift(pca, shifts, now) : now - pca.start.minutesAgo * MINUTE;
  const end = pca.endedMinutesAgo === undefined ? null : now - pca.endedMinutesAgo * MINUTE;
  const stopAt = end ?? now - (pca.unobservedMinutes ?? 0) * MINUTE;
  // Verified before pharmacy releases the first syringe (20 to 60 minutes before the start).
  const signedAt = start - random.int(110, 160) * MINUTE;
  writePca(ctx, {
    ward,
    patient,
    regimen: pca.regimen,
    signedAt,
    verifiedAt: signedAt + random.int(15, 40) * MINUTE,
    start,
    end,
    stopAt,
    script: new DemoScript(
      random,
      pca.script,
      Math.floor((stopAt - start) / HOUR),
      childBandOf(vitalsPatient(vitalsFactsOf(ward, patient), new Date(start))),
    ),
    // Left to run low: pharmacy has been asked for the next syringe.
    changeSyringes: pca.start !== 'syringe-empties-this-shift',
    bolusAt: pca.bolusAfterHours === undefined ? null : start + pca.bolusAfterHours * HOUR + 12 * MINUTE,
    currentShift: pca.currentShift,
    overrideReason: pca.overrideReason,
  });
}

/**
 * A start time such that the syringe, used at a steady rate and observed on the hour, has an hour
 * left at its last observation and so is projected empty before the current shift ends, whatever
 * the time of day: the last observation is 15 minutes ago, or longer ago near the shift's end.
 */
function startToEmptyThisShift(pca: DemoPca, shifts: ShiftStarts, now: number): number {
  const { regimen, script } = pca;
  const mlPerHour = (script.doses[0] * regimen.demandDose + regimen.basalRatePerHour) / regimen.concentrationPerMl;
  const hoursToEmpty = regimen.syringeMl / mlPerHour;
  if (script.doses.length !== 1 || !script.onTheHour || !Number.isInteger(hoursToEmpty)) {
    throw new Error(`The demo PCA for ${pca.mrn} must empty its syringe in whole hours at a steady rate, observed on the hour`);
  }
  const shiftLeft = Date.parse(shiftWindow(new Date(now), shifts.dayShiftStart, shifts.nightShiftStart).endsAt) - now;
  const sinceLastObservation = Math.min(HOUR - MINUTE / 2, Math.max(15 * MINUTE, HOUR - shiftLeft / 2));
  return now - sinceLastObservation - (hoursToEmpty - 1) * HOUR;
}

function demoStaff(users: User[]): Staff {
  const id = (username: string) => (users.find((user) => user.username === username) ?? missing(username)).id;
  const rosa = users.find((user) => user.username === 'rosa.adeyemi') ?? missing('rosa.adeyemi');
  return {
    prescriber: id('amara.osei'),
    pharmacist: id('lin.park'),
    approver: id('tomas.ortiz'),
    nurse: id('kai.mendes'),
    secondNurse: rosa.id,
    secondNurseName: rosa.displayName,
    chargeNurse: id('mei.tan'),
  };
}

async function demoDrugs(manager: EntityManager): Promise<Drugs> {
  const drugs = await manager.find(Drug);
  return new Map(drugs.map((drug) => [drug.genericName, { id: drug.id, doseUnit: drug.doseUnit }]));
}

/** Each demo patient with their ward's active rules and policy, by MRN. */
async function demoPatients(manager: EntityManager): Promise<Map<string, DemoPatient>> {
  const rules = await manager
    .createQueryBuilder(LimitRule, 'rule')
    .innerJoinAndSelect('rule.drug', 'drug')
    .innerJoinAndSelect('rule.version', 'version', "version.status = 'active'")
    .getMany();
  const wards = new Map(
    (await manager.find(Ward)).map((ward) => {
      const mine = rules.filter((rule) => rule.version.wardId === ward.id);
      const written: WrittenWard = {
        id: ward.id,
        paediatric: ward.weightBasedDosing,
        population: ward.population,
        rules: new Map(mine.map((rule) => [rule.drug.genericName, toLimitRuleResponse(rule)])),
        policy: wardPolicy(ward),
      };
      return [ward.id, { ward: written, shifts: ward }];
    }),
  );
  // With their allergy entries: each seeded order is checked with the same patient facts signing uses.
  const patients = await manager.find(Patient, { relations: { allergies: true } });
  const today = new Date();
  return new Map(
    patients.map((patient) => [
      patient.mrn,
      {
        ...wards.get(patient.wardId)!,
        patient: { ...patientFactorsOf(patient, today), id: patient.id, weightKg: patient.weightKg ?? 0, dateOfBirth: patient.dateOfBirth },
      },
    ]),
  );
}

function missing(what: string): never {
  throw new Error(`The demo data has no ${what}`);
}
