import { Controller, Get, Param, Query } from '@nestjs/common';
import type { Patient } from '@lockstep/shared';
import { ApiOperation } from '@nestjs/swagger';
import { ApiErrors } from '../common/openapi/api-errors.decorator.js';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe.js';
import { PatientQueryDto } from './dto/patient-query.dto.js';
import { PatientsService } from './patients.service.js';

@Controller('patients')
export class PatientsController {
  constructor(private readonly patients: PatientsService) {}

  @ApiOperation({ summary: 'Patients, by ward and bed' })
  @Get()
  list(@Query() query: PatientQueryDto): Promise<Patient[]> {
    return this.patients.list(query.wardId);
  }

  @ApiOperation({ summary: 'One patient' })
  @ApiErrors(404)
  @Get(':id')
  get(@Param('id', ParseIdPipe) id: number): Promise<Patient> {
    return this.patients.get(id);
  }
}
