import type { DataSource } from 'typeorm';
import { BedsideCheck } from '../../src/bedside/entities/bedside-check.entity.js';
import { Flag } from '../../src/flags/entities/flag.entity.js';
import { Observation } from '../../src/observations/entities/observation.entity.js';
import { PcaOrder } from '../../src/orders/entities/pca-order.entity.js';
import { Patient } from '../../src/patients/entities/patient.entity.js';
import { SyringeRelease } from '../../src/releases/entities/syringe-release.entity.js';
import { Ward } from '../../src/wards/entities/ward.entity.js';
import { SETTINGS } from './pca.js';

export type FixtureBed = {
  bed: string;
  startedMinutesAgo: number;
  /** Minutes ago of the last observation, or null for none. */
  observedMinutesAgo: number | null;
  syringeRemainingMl?: number;
  urgentFlag?: boolean;
};

const MINUTE = 60_000;

/**
 * A ward of active morphine PCAs written straight to the database, with times chosen by the test
 * (the API always stamps "now"). Invented test data; user ids are the demo prescriber (1),
 * pharmacist (2) and nurses (4, 5).
 */
export async function seedBoardWard(dataSource: DataSource, code: string, beds: FixtureBed[]): Promise<number> {
  return dataSource.transaction(async (manager) => {
    const ward = await manager.save(manager.create(Ward, { code, name: `Test ${code}`, specialty: 'Test', weightBasedDosing: false }));
    const now = Date.now();
    for (const [index, spec] of beds.entries()) {
      const patient = await manager.save(
        manager.create(Patient, {
          mrn: `${code}${String(index).padStart(5, '0')}`,
          givenName: 'Test',
          familyName: `Patient ${index}`,
          dateOfBirth: '1970-01-01',
          sex: 'unknown',
          weightKg: 70,
          wardId: ward.id,
          bed: spec.bed,
        }),
      );
      const startedAt = new Date(now - spec.startedMinutesAgo * MINUTE);
      const order = await manager.save(
        manager.create(PcaOrder, {
          patientId: patient.id,
          prescriberId: 1,
          drugId: 1,
          status: 'active',
          regimenType: 'demand_only',
          version: 1,
          supersedesId: null,
          concentrationPerMl: 1,
          doseUnit: 'mg',
          loadingDose: null,
          demandDose: 1,
          lockoutMinutes: 10,
          basalRatePerHour: 0,
          oneHourLimit: null,
          fourHourLimit: 30,
          clinicianBolusDose: null,
          indication: 'Test',
          reviewDate: '2099-01-01',
          ruleSnapshot: null,
          findingsSnapshot: [],
          overrides: [],
          signedAt: startedAt,
          verifiedById: 2,
          verifiedAt: startedAt,
          startedAt,
          statusChangedAt: startedAt,
          statusReason: null,
        }),
      );
      const release = await manager.save(
        manager.create(SyringeRelease, {
          orderId: order.id,
          releaseCode: `T${code}${index}`.slice(0, 12),
          status: 'in_use',
          concentrationPerMl: 1,
          volumeMl: 50,
          batch: 'T',
          expiresAt: new Date(now + 86_400_000),
          preparedBy: 'T',
          checkedBy: 'T',
          overrideReason: null,
          releasedById: 2,
          releasedAt: startedAt,
        }),
      );
      await manager.save(
        manager.create(BedsideCheck, {
          orderId: order.id,
          releaseId: release.id,
          status: 'matched',
          firstNurseId: 4,
          firstSettings: SETTINGS,
          firstAt: startedAt,
          secondNurseId: 5,
          secondSettings: SETTINGS,
          secondAt: startedAt,
          differences: [],
        }),
      );
      if (spec.observedMinutesAgo !== null) {
        const remaining = spec.syringeRemainingMl ?? 40;
        await manager.save(
          manager.create(Observation, {
            orderId: order.id,
            releaseId: release.id,
            at: new Date(now - spec.observedMinutesAgo * MINUTE),
            painScore: 3,
            sedationLevel: '1',
            respiratoryRate: 14,
            spo2: 97,
            oxygenLitresPerMinute: 0,
            attempts: 12,
            delivered: 10,
            volumeInfusedMl: 50 - remaining,
            syringeRemainingMl: remaining,
            note: '',
            recordedById: 4,
          }),
        );
      }
      if (spec.urgentFlag) {
        await manager.save(
          manager.create(Flag, {
            orderId: order.id,
            releaseId: null,
            severity: 'urgent',
            code: 'sedation.3',
            message: 'Sedation level 3',
            action: 'Reduce the dose',
            raisedAt: new Date(now),
            acknowledgedAt: null,
            acknowledgedById: null,
            acknowledgeNote: null,
          }),
        );
      }
    }
    return ward.id;
  });
}
