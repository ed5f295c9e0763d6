import type { EntityManager } from 'typeorm';
import type { Drug } from '../../drugs/entities/drug.entity.js';
import { PatientAllergy } from '../../patients/entities/patient-allergy.entity.js';
import { Patient } from '../../patients/entities/patient.entity.js';
import type { User } from '../../users/entities/user.entity.js';
import type { Ward } from '../../wards/entities/ward.entity.js';
import type { DemoAuditEntry } from './demo-audit.js';
import { DEMO_PATIENTS } from './demo-data.js';

const DAY_MS = 24 * 3600 * 1000;

/**
 * Writes the demo patients with their weights' dates and allergy entries, the entries recorded by
 * the demo prescriber on admission (two days before the seed runs). Returns the audit events
 * those entries and "no known allergies" records would have written.
 */
export async function seedDemoPatients(
  manager: EntityManager,
  wards: Ward[],
  drugs: Drug[],
  users: User[],
  now: number,
): Promise<DemoAuditEntry[]> {
  const wardId = (code: string) => wards.find((ward) => ward.code === code)!.id;
  const drugId = (name: string) => drugs.find((drug) => drug.genericName === name)!.id;
  const prescriber = users.find((user) => user.username === 'amara.osei')!;
  const admitted = new Date(now - 2 * DAY_MS);
  const story: DemoAuditEntry[] = [];

  for (const { wardCode, allergies, weightMeasuredDaysAgo, ...fields } of DEMO_PATIENTS) {
    const patient = await manager.save(
      manager.create(Patient, {
        ...fields,
        weightMeasuredOn: new Date(now - weightMeasuredDaysAgo * DAY_MS).toISOString().slice(0, 10),
        wardId: wardId(wardCode),
      }),
    );
    if (patient.noKnownAllergies)
      story.push({
        actor: prescriber,
        at: admitted,
        action: 'patient.no-known-allergies',
        entityType: 'patient',
        entityId: patient.id,
        summary: { noKnownAllergies: { from: false, to: true } },
      });
    for (const allergy of allergies) {
      const entry = await manager.save(
        manager.create(PatientAllergy, {
          patientId: patient.id,
          drugId: allergy.drug ? drugId(allergy.drug) : null,
          substance: allergy.substance,
          reaction: allergy.reaction,
          severity: allergy.severity,
          recordedById: prescriber.id,
          recordedAt: admitted,
        }),
      );
      story.push({
        actor: prescriber,
        at: admitted,
        action: 'patient.allergy-add',
        entityType: 'patient',
        entityId: patient.id,
        summary: {
          allergyId: entry.id,
          drugId: entry.drugId,
          substance: entry.substance,
          reaction: entry.reaction,
          severity: entry.severity,
        },
      });
    }
  }
  return story;
}
