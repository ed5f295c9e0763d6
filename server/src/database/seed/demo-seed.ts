import type { DataSource, EntityManager } from 'typeorm';
import { Drug } from '../../drugs/entities/drug.entity.js';
import { writeDefaultEquianalgesicFactors } from '../../equianalgesic/default-factors.js';
import { LibraryVersion } from '../../library/entities/library-version.entity.js';
import { LibraryVersionEvent } from '../../library/entities/library-version-event.entity.js';
import { LimitRule } from '../../library/entities/limit-rule.entity.js';
import { User } from '../../users/entities/user.entity.js';
import { hashPassword } from '../../users/passwords.js';
import { Ward } from '../../wards/entities/ward.entity.js';
import { DEMO_DRUGS, DEMO_WARDS } from './demo-data.js';
import { DEMO_LIBRARIES, DEMO_PENDING_CHANGE } from './demo-library.js';
import type { DemoAuditEntry } from './demo-audit.js';
import { seedDemoOrders } from './demo-orders.js';
import { seedDemoPatients } from './demo-patients.js';
import { tellDemoStory } from './demo-story.js';
import { DEMO_PASSWORD, DEMO_STAFF } from './demo-staff.js';

/** Seeds the demo scenario in one transaction, only into an empty database. Returns whether it did. */
export async function seedDemoDataIfEmpty(dataSource: DataSource, now = Date.now()): Promise<boolean> {
  return dataSource.transaction(async (manager) => {
    const hasUsers = (await manager.count(User)) > 0;
    const hasWards = (await manager.count(Ward)) > 0;
    if (hasUsers || hasWards) return false;
    await seedDemoData(manager, now);
    return true;
  });
}

async function seedDemoData(manager: EntityManager, now: number): Promise<void> {
  const wards = await manager.save(
    Ward,
    DEMO_WARDS.map((ward) => manager.create(Ward, ward)),
  );
  const wardByCode = new Map(wards.map((ward) => [ward.code, ward]));

  const drugs = await manager.save(
    Drug,
    DEMO_DRUGS.map((drug) => manager.create(Drug, drug)),
  );
  await writeDefaultEquianalgesicFactors(manager, drugs, new Date(now - 30 * 24 * 3600 * 1000));

  // The demo accounts share one password, so one (slow, salted) hash serves them all.
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const users = await manager.save(
    User,
    DEMO_STAFF.map(({ wardCodes, ...person }) =>
      manager.create(User, {
        ...person,
        passwordHash,
        email: `${person.username}@kestrelbay.example`,
        active: true,
        wards: wardCodes.map((code) => wardByCode.get(code)!),
      }),
    ),
  );

  const libraryStory = await seedDemoLibraries(manager, wards, drugs, users, now);

  const patientStory = await seedDemoPatients(manager, wards, drugs, users, now);

  await seedDemoOrders(manager, users, now);
  await tellDemoStory(manager, users, [...libraryStory, ...patientStory]);
}

async function seedDemoLibraries(
  manager: EntityManager,
  wards: Ward[],
  drugs: Drug[],
  users: User[],
  now: number,
): Promise<DemoAuditEntry[]> {
  const story: DemoAuditEntry[] = [];
  const wardId = (code: string) => wards.find((ward) => ward.code === code)!.id;
  const drugId = (name: string) => drugs.find((drug) => drug.genericName === name)!.id;
  const author = users.find((user) => user.username === 'lin.park')!;
  const approver = users.find((user) => user.username === 'tomas.ortiz')!;
  const approvedAt = new Date(now - 30 * 24 * 3600 * 1000);

  for (const library of DEMO_LIBRARIES) {
    const version = await manager.save(
      manager.create(LibraryVersion, {
        wardId: wardId(library.wardCode),
        number: 1,
        status: 'active',
        note: library.note,
        authorId: author.id,
        approverId: approver.id,
        createdAt: new Date(approvedAt.getTime() - 2 * 24 * 3600 * 1000),
        submittedAt: approvedAt,
        approvedAt,
      }),
    );
    await manager.insert(
      LimitRule,
      library.rules.map(({ drug, ...rule }) => ({ ...rule, versionId: version.id, drugId: drugId(drug) })),
    );
    await manager.insert(LibraryVersionEvent, [
      { versionId: version.id, userId: author.id, kind: 'created', at: version.createdAt },
      { versionId: version.id, userId: author.id, kind: 'submitted', at: approvedAt },
    ]);
    story.push({
      actor: approver,
      action: 'library-version.approve',
      entityType: 'library-version',
      entityId: version.id,
      at: approvedAt,
      summary: { wardId: version.wardId, number: 1, status: { from: 'pending_approval', to: 'active' }, signed: true },
    });
  }

  const pending = DEMO_PENDING_CHANGE;
  const base = DEMO_LIBRARIES.find((library) => library.wardCode === pending.wardCode)!;
  const draft = await manager.save(
    manager.create(LibraryVersion, {
      wardId: wardId(pending.wardCode),
      number: 2,
      status: 'pending_approval',
      note: pending.note,
      authorId: author.id,
      createdAt: new Date(now - 26 * 3600 * 1000),
      submittedAt: new Date(now - 2 * 3600 * 1000),
    }),
  );
  await manager.insert(
    LimitRule,
    base.rules.map(({ drug, ...rule }) => ({
      ...rule,
      limits: drug === pending.drug ? { ...rule.limits, demandDose: pending.demandDose } : rule.limits,
      versionId: draft.id,
      drugId: drugId(drug),
    })),
  );
  await manager.insert(LibraryVersionEvent, [
    { versionId: draft.id, userId: author.id, kind: 'created', at: draft.createdAt },
    { versionId: draft.id, userId: author.id, kind: 'submitted', at: draft.submittedAt! },
  ]);
  story.push({
    actor: author,
    action: 'library-version.submit',
    entityType: 'library-version',
    entityId: draft.id,
    at: draft.submittedAt!,
    summary: { status: { from: 'draft', to: 'pending_approval' }, note: pending.note },
  });
  return story;
}
