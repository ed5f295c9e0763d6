import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { EntityManager, Repository } from 'typeorm';
import { latestTodayAnywhere, toleranceClaimProblem, weightDateProblem, type Patient as PatientResponse } from '@lockstep/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { changedFields, recordAudit } from '../audit/record-audit.js';
import { fieldError } from '../common/errors/field-error.js';
import { Drug } from '../drugs/entities/drug.entity.js';
import type { AddAllergyDto, OpioidToleranceDto, RecordWeightDto, Spo2ScaleDto } from './dto/patient-record.dto.js';
import { toPatientResponse } from './dto/patient-response.js';
import { PatientAllergy } from './entities/patient-allergy.entity.js';
import { Patient } from './entities/patient.entity.js';

/** What every patient answer loads: the ward's name and each allergy entry with who recorded it. */
const PATIENT_RELATIONS = { ward: true, allergies: { recordedBy: true } } as const;

@Injectable()
export class PatientsService {
  constructor(@InjectRepository(Patient) private readonly patients: Repository<Patient>) {}

  async list(wardId?: number): Promise<PatientResponse[]> {
    const patients = await this.patients.find({
      where: wardId === undefined ? {} : { wardId },
      relations: PATIENT_RELATIONS,
      order: { wardId: 'ASC', bed: 'ASC' },
    });
    return patients.map(toPatientResponse);
  }

  async get(id: number): Promise<PatientResponse> {
    const patient = await this.patients.findOne({ where: { id }, relations: PATIENT_RELATIONS });
    if (!patient) throw new NotFoundException(`No patient with id ${id}`);
    return toPatientResponse(patient);
  }

  /** Adds one entry; a formulary drug's entry takes the drug's generic name as its substance. Clears "no known allergies". */
  async addAllergy(id: number, body: AddAllergyDto, user: AuthUser): Promise<PatientResponse> {
    await this.patients.manager.transaction(async (manager) => {
      const patient = await this.lockedPatient(manager, id);
      const drugId = body.drugId ?? null;
      let substance = body.substance;
      if (drugId !== null) {
        const drug = await manager.findOneBy(Drug, { id: drugId });
        if (!drug) throw fieldError('drugId', `No drug with id ${drugId}`);
        substance = drug.genericName;
      }
      const existing = await manager.findBy(PatientAllergy, { patientId: id });
      const same = existing.find(
        (entry) => (drugId !== null && entry.drugId === drugId) || entry.substance.toLowerCase() === substance.toLowerCase(),
      );
      if (same) throw fieldError('substance', `${same.substance} is already recorded: remove that entry first to change it`);
      const { id: allergyId } = await manager.save(
        manager.create(PatientAllergy, {
          patientId: id,
          drugId,
          substance,
          reaction: body.reaction,
          severity: body.severity,
          recordedById: user.id,
          recordedAt: new Date(),
        }),
      );
      if (patient.noKnownAllergies) await manager.update(Patient, { id }, { noKnownAllergies: false });
      await recordAudit(manager, user, {
        action: 'patient.allergy-add',
        entityType: 'patient',
        entityId: id,
        summary: {
          allergyId,
          drugId,
          substance,
          reaction: body.reaction,
          severity: body.severity,
          ...(patient.noKnownAllergies ? { noKnownAllergies: { from: true, to: false } } : {}),
        },
      });
    });
    return this.get(id);
  }

  async removeAllergy(id: number, allergyId: number, user: AuthUser): Promise<PatientResponse> {
    await this.patients.manager.transaction(async (manager) => {
      await this.lockedPatient(manager, id);
      const entry = await manager.findOneBy(PatientAllergy, { id: allergyId, patientId: id });
      if (!entry) throw new NotFoundException(`Patient ${id} has no allergy entry ${allergyId}`);
      await manager.delete(PatientAllergy, { id: allergyId });
      await recordAudit(manager, user, {
        action: 'patient.allergy-remove',
        entityType: 'patient',
        entityId: id,
        summary: { allergyId, drugId: entry.drugId, substance: entry.substance, reaction: entry.reaction, severity: entry.severity },
      });
    });
    return this.get(id);
  }

  /** Records "no known allergies"; refused while entries exist. Already recorded: nothing changes and nothing is recorded (a repeated request is harmless). */
  async recordNoKnownAllergies(id: number, user: AuthUser): Promise<PatientResponse> {
    await this.patients.manager.transaction(async (manager) => {
      const patient = await this.lockedPatient(manager, id);
      const entries = await manager.countBy(PatientAllergy, { patientId: id });
      if (entries > 0)
        throw new ConflictException(
          `The patient has ${entries} recorded allerg${entries === 1 ? 'y' : 'ies'}: remove the entries before recording no known allergies`,
        );
      if (patient.noKnownAllergies) return;
      await manager.update(Patient, { id }, { noKnownAllergies: true });
      await recordAudit(manager, user, {
        action: 'patient.no-known-allergies',
        entityType: 'patient',
        entityId: id,
        summary: { noKnownAllergies: { from: patient.noKnownAllergies, to: true } },
      });
    });
    return this.get(id);
  }

  /** The tolerance claim must agree with its basis (shared toleranceClaimProblem); unchanged values write nothing. */
  async updateTolerance(id: number, body: OpioidToleranceDto, user: AuthUser): Promise<PatientResponse> {
    const basis = { oralMorphineMgPerDay: body.oralMorphineMgPerDay, days: body.days };
    const problem = toleranceClaimProblem(body.opioidTolerant, basis);
    if (problem) throw fieldError(problem.field, problem.message);
    await this.patients.manager.transaction(async (manager) => {
      const patient = await this.lockedPatient(manager, id);
      const after = {
        opioidTolerant: body.opioidTolerant,
        toleranceOralMorphineMgPerDay: body.oralMorphineMgPerDay,
        toleranceDays: body.days,
      };
      const changed = changedFields(patient, after);
      if (Object.keys(changed).length === 0) return;
      await manager.update(Patient, { id }, after);
      await recordAudit(manager, user, { action: 'patient.tolerance-update', entityType: 'patient', entityId: id, summary: changed });
    });
    return this.get(id);
  }

  /** The NEWS2 SpO2 scale a prescriber chose; the same scale again writes nothing. */
  async updateSpo2Scale(id: number, body: Spo2ScaleDto, user: AuthUser): Promise<PatientResponse> {
    await this.patients.manager.transaction(async (manager) => {
      const patient = await this.lockedPatient(manager, id);
      const changed = changedFields(patient, { spo2Scale: body.spo2Scale });
      if (Object.keys(changed).length === 0) return;
      await manager.update(Patient, { id }, { spo2Scale: body.spo2Scale });
      await recordAudit(manager, user, { action: 'patient.spo2-scale', entityType: 'patient', entityId: id, summary: changed });
    });
    return this.get(id);
  }

  /** A new weight and its day: not after today anywhere on Earth, not before birth. The same weight and day again records nothing. */
  async recordWeight(id: number, body: RecordWeightDto, user: AuthUser): Promise<PatientResponse> {
    await this.patients.manager.transaction(async (manager) => {
      const patient = await this.lockedPatient(manager, id);
      const problem = weightDateProblem(body.measuredOn, patient.dateOfBirth, latestTodayAnywhere(new Date()));
      if (problem) throw fieldError('measuredOn', problem);
      if (patient.weightKg === body.weightKg && patient.weightMeasuredOn === body.measuredOn) return;
      await manager.update(Patient, { id }, { weightKg: body.weightKg, weightMeasuredOn: body.measuredOn });
      await recordAudit(manager, user, {
        action: 'patient.weight-record',
        entityType: 'patient',
        entityId: id,
        summary: {
          weightKg: { from: patient.weightKg, to: body.weightKg },
          weightMeasuredOn: { from: patient.weightMeasuredOn, to: body.measuredOn },
        },
      });
    });
    return this.get(id);
  }

  /** The patient inside a write's transaction (transactions are queued one at a time), or 404. */
  private async lockedPatient(manager: EntityManager, id: number): Promise<Patient> {
    const patient = await manager.findOneBy(Patient, { id });
    if (!patient) throw new NotFoundException(`No patient with id ${id}`);
    return patient;
  }
}
