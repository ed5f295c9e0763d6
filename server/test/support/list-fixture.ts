import type { DataSource } from 'typeorm';
import { recordAudit } from '../../src/audit/record-audit.js';
import { LibraryVersion } from '../../src/library/entities/library-version.entity.js';
import { LimitRule } from '../../src/library/entities/limit-rule.entity.js';
import { Observation } from '../../src/observations/entities/observation.entity.js';
import { User } from '../../src/users/entities/user.entity.js';
import { Ward } from '../../src/wards/entities/ward.entity.js';

// Extra rows for the list endpoints, written straight to the database (invented test data). User
// ids 2 and 3 are the demo pharmacists, 4 a demo nurse; drug 1 is morphine.

/** `count` retired library versions of a ward, each with a rule, before its one active version. */
export async function seedLibraryVersions(dataSource: DataSource, wardId: number, count: number): Promise<void> {
  await dataSource.transaction(async (manager) => {
    const day = 86_400_000;
    for (let number = 1; number <= count + 1; number++) {
      const at = new Date(Date.now() - (count + 2 - number) * day);
      const version = await manager.save(
        manager.create(LibraryVersion, {
          wardId,
          number,
          status: number > count ? 'active' : 'retired',
          note: `Test version ${number}`,
          authorId: 2,
          approverId: 3,
          createdAt: at,
          submittedAt: at,
          approvedAt: at,
          retiredAt: number > count ? null : new Date(at.getTime() + day),
        }),
      );
      await manager.insert(LimitRule, {
        versionId: version.id,
        drugId: 1,
        concentrationPerMl: 1,
        doseUnit: 'mg',
        perKg: false,
        limits: { demandDose: { hardMin: 0.2, hardMax: 3 } },
      });
    }
  });
}

/** `count` audit events about one order. */
export async function seedAuditEvents(dataSource: DataSource, orderId: number, count: number): Promise<void> {
  await dataSource.transaction(async (manager) => {
    for (let i = 0; i < count; i++) {
      await recordAudit(
        manager,
        { id: 4, displayName: 'Kai Mendes' },
        { action: 'order.observation', entityType: 'order', entityId: orderId, summary: { test: i } },
      );
    }
  });
}

/** `count` nurses, each on every ward given. */
export async function seedUsers(dataSource: DataSource, prefix: string, count: number, wardIds: number[]): Promise<void> {
  await dataSource.transaction(async (manager) => {
    const wards = await manager.findBy(
      Ward,
      wardIds.map((id) => ({ id })),
    );
    for (let i = 0; i < count; i++) {
      await manager.save(
        manager.create(User, {
          username: `${prefix}.${i}`,
          displayName: `Test Nurse ${prefix} ${i}`,
          role: 'nurse',
          email: '',
          passwordHash: 'not-a-real-hash',
          active: true,
          wards,
        }),
      );
    }
  });
}

/** `count` more hourly observations on an order's running syringe, pump totals rising. */
export async function seedObservations(dataSource: DataSource, orderId: number, releaseId: number, count: number): Promise<void> {
  await dataSource.transaction(async (manager) => {
    const start = Date.now() - (count + 1) * 3_600_000;
    for (let i = 0; i < count; i++) {
      await manager.insert(Observation, {
        orderId,
        releaseId,
        at: new Date(start + i * 3_600_000),
        painScore: 3,
        sedationLevel: '1',
        respiratoryRate: 14,
        spo2: 97,
        oxygenLitresPerMinute: 0,
        attempts: i,
        delivered: i,
        volumeInfusedMl: i * 0.5,
        syringeRemainingMl: 50 - i * 0.5,
        note: '',
        recordedById: 4,
      });
    }
  });
}
