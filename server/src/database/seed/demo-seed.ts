import type { DataSource, EntityManager } from 'typeorm';
import { Drug } from '../../drugs/entities/drug.entity.js';
import { Patient } from '../../patients/entities/patient.entity.js';
import { User } from '../../users/entities/user.entity.js';
import { hashPassword } from '../../users/passwords.js';
import { Ward } from '../../wards/entities/ward.entity.js';
import { DEMO_DRUGS, DEMO_PATIENTS, DEMO_WARDS } from './demo-data.js';
import { DEMO_PASSWORD, DEMO_STAFF } from './demo-staff.js';

/** Seeds the demo scenario in one transaction, only into an empty database. Returns whether it did. */
export async function seedDemoDataIfEmpty(dataSource: DataSource): Promise<boolean> {
  return dataSource.transaction(async (manager) => {
    const hasUsers = (await manager.count(User)) > 0;
    const hasWards = (await manager.count(Ward)) > 0;
    if (hasUsers || hasWards) return false;
    await seedDemoData(manager);
    return true;
  });
}

async function seedDemoData(manager: EntityManager): Promise<void> {
  const wards = await manager.save(Ward, DEMO_WARDS.map((ward) => manager.create(Ward, ward)));
  const wardByCode = new Map(wards.map((ward) => [ward.code, ward]));

  await manager.save(Drug, DEMO_DRUGS.map((drug) => manager.create(Drug, drug)));

  // The demo accounts share one password, so one (slow, salted) hash serves them all.
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  await manager.save(
    User,
    DEMO_STAFF.map(({ wardCodes, ...person }) =>
      manager.create(User, {
        ...person,
        passwordHash,
        active: true,
        wards: wardCodes.map((code) => wardByCode.get(code)!),
      }),
    ),
  );

  await manager.save(
    Patient,
    DEMO_PATIENTS.map(({ wardCode, ...patient }) =>
      manager.create(Patient, { ...patient, wardId: wardByCode.get(wardCode)!.id }),
    ),
  );
}
