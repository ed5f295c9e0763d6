import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { Repository } from 'typeorm';
import type { Patient as PatientResponse } from '@lockstep/shared';
import { toPatientResponse } from './dto/patient-response.js';
import { Patient } from './entities/patient.entity.js';

@Injectable()
export class PatientsService {
  constructor(@InjectRepository(Patient) private readonly patients: Repository<Patient>) {}

  async list(wardId?: number): Promise<PatientResponse[]> {
    const patients = await this.patients.find({
      where: wardId === undefined ? {} : { wardId },
      relations: { ward: true },
      order: { wardId: 'ASC', bed: 'ASC' },
    });
    return patients.map(toPatientResponse);
  }

  async get(id: number): Promise<PatientResponse> {
    const patient = await this.patients.findOne({ where: { id }, relations: { ward: true } });
    if (!patient) throw new NotFoundException(`No patient with id ${id}`);
    return toPatientResponse(patient);
  }
}
