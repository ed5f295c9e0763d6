import {
  DEFAULT_EQUIANALGESIC_FACTORS,
  DEFAULT_WARD_POLICY,
  type LimitRuleResponse,
  type Population,
  populationKey,
  rulePopulationOf,
  type WardPolicy,
} from '@lockstep/shared';
import { DEMO_DRUGS } from '../seed/demo-data.js';
import { DEMO_LIBRARIES } from '../seed/demo-library.js';
import { DEMO_STAFF } from '../seed/demo-staff.js';
import type { PlannedWard } from './scale-plan.js';
import { type ScaleWriter, sqlTime } from './scale-writer.js';

export type Staff = {
  prescriber: number;
  pharmacist: number;
  approver: number;
  nurse: number;
  secondNurse: number;
  secondNurseName: string;
  chargeNurse: number;
};
export type Drugs = Map<string, { id: number; doseUnit: string }>;
/**
 * What the PCA writers need of a ward: its id, whether it doses by weight (`paediatric`: children's regimens and
 * patients), its population (the observation bands), its active rules by drug and its policy.
 */
export type WrittenWard = {
  id: number;
  paediatric: boolean;
  population: Population;
  rules: Map<string, LimitRuleResponse>;
  policy: WardPolicy;
};

const DAY = 86_400_000;

/**
 * The demo drugs and staff: the same usernames and the demo password (`passwordHash` of it, made
 * once by the caller), so the usual sign-ins work.
 */
export function writeStaffAndDrugs(
  writer: ScaleWriter,
  passwordHash: string,
): { staff: Staff; drugs: Drugs; userIds: Map<string, number> } {
  const drugs: Drugs = new Map(DEMO_DRUGS.map((drug) => [drug.genericName, { id: writer.insert('drugs', drug), doseUnit: drug.doseUnit }]));
  // Pharmacy's shipped equianalgesic table, so the usage page shows its oral-morphine figure.
  for (const { genericName, ...factor } of DEFAULT_EQUIANALGESIC_FACTORS) {
    const drug = drugs.get(genericName);
    if (drug) writer.insert('equianalgesic_factors', { ...factor, drugId: drug.id, changedById: null, changedAt: sqlTime(Date.now()) });
  }
  const userIds = new Map<string, number>();
  for (const person of DEMO_STAFF) {
    const id = writer.insert('users', {
      username: person.username,
      displayName: person.displayName,
      role: person.role,
      passwordHash,
      email: `${person.username}@kestrelbay.example`,
    });
    userIds.set(person.username, id);
  }
  const id = (username: string) => userIds.get(username)!;
  const secondNurseName = DEMO_STAFF.find((person) => person.username === 'rosa.adeyemi')!.displayName;
  const staff = {
    prescriber: id('amara.osei'),
    pharmacist: id('lin.park'),
    approver: id('tomas.ortiz'),
    nurse: id('kai.mendes'),
    secondNurse: id('rosa.adeyemi'),
    secondNurseName,
    chargeNurse: id('mei.tan'),
  };
  return { staff, drugs, userIds };
}

/** The wards, each with an active dose-limit library version (the demo's adult or paediatric rules). */
export function writeWards(
  writer: ScaleWriter,
  planned: PlannedWard[],
  drugs: Drugs,
  staff: Staff,
  userIds: Map<string, number>,
  now: number,
): (PlannedWard & WrittenWard)[] {
  const approvedAt = now - 60 * DAY;
  const wards = planned.map((ward) => {
    const slug = ward.name.toLowerCase().replace(/\s+/g, '-');
    const id = writer.insert('wards', {
      code: ward.code,
      name: ward.name,
      specialty: ward.specialty,
      weightBasedDosing: ward.weightBasedDosing ? 1 : 0,
      population: ward.population,
      pharmacyEmail: `pharmacy.${slug}@kestrelbay.example`,
      nurseInChargeEmail: `nurse-in-charge.${slug}@kestrelbay.example`,
    });
    const library = ward.weightBasedDosing
      ? DEMO_LIBRARIES.find((l) => l.wardCode === 'WRE')!
      : DEMO_LIBRARIES.find((l) => l.wardCode === 'HAR')!;
    const versionId = writer.insert('library_versions', {
      wardId: id,
      number: 1,
      status: 'active',
      note: library.note,
      authorId: staff.pharmacist,
      approverId: staff.approver,
      createdAt: sqlTime(approvedAt - 2 * DAY),
      submittedAt: sqlTime(approvedAt - DAY),
      approvedAt: sqlTime(approvedAt),
    });
    const rules = new Map<string, LimitRuleResponse>();
    for (const rule of library.rules) {
      const drug = drugs.get(rule.drug)!;
      const ruleId = writer.insert('limit_rules', {
        versionId,
        drugId: drug.id,
        concentrationPerMl: rule.concentrationPerMl,
        doseUnit: rule.doseUnit,
        perKg: rule.perKg ? 1 : 0,
        ...rulePopulationOf(rule),
        populationKey: populationKey(rule),
        limits: JSON.stringify(rule.limits),
      });
      rules.set(rule.drug, {
        id: ruleId,
        drugId: drug.id,
        drugName: rule.drug,
        concentrationPerMl: rule.concentrationPerMl,
        doseUnit: rule.doseUnit,
        perKg: rule.perKg,
        ...rulePopulationOf(rule),
        limits: rule.limits,
      });
    }
    return { ...ward, id, paediatric: ward.weightBasedDosing, rules, policy: DEFAULT_WARD_POLICY };
  });
  // The demo staff keep their demo wards; prescribers and pharmacists cover the whole hospital.
  for (const person of DEMO_STAFF) {
    const everywhere = person.role === 'prescriber' || person.role === 'pharmacist';
    for (const ward of wards) {
      if (everywhere || person.wardCodes.includes(ward.code))
        writer.insert('user_wards', { userId: userIds.get(person.username)!, wardId: ward.id });
    }
  }
  return wards;
}
