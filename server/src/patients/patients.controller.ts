import { Body, Controller, Delete, Get, HttpCode, Param, Post, Put, Query } from '@nestjs/common';
import { PATIENT_RECORD_ROLES, WEIGHT_ROLES, type Patient } from '@lockstep/shared';
import { ApiOperation } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ApiErrors } from '../common/openapi/api-errors.decorator.js';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe.js';
import { AddAllergyDto, OpioidToleranceDto, RecordWeightDto } from './dto/patient-record.dto.js';
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

  @ApiOperation({ summary: 'Record an allergy (a formulary drug or free text, the reaction and its severity)' })
  @ApiErrors(404)
  @Post(':id/allergies')
  @Roles(...PATIENT_RECORD_ROLES)
  addAllergy(@Param('id', ParseIdPipe) id: number, @Body() body: AddAllergyDto, @CurrentUser() user: AuthUser): Promise<Patient> {
    return this.patients.addAllergy(id, body, user);
  }

  @ApiOperation({ summary: 'Remove an allergy entry recorded in error (the audit trail keeps it)' })
  @ApiErrors(404)
  @Delete(':id/allergies/:allergyId')
  @Roles(...PATIENT_RECORD_ROLES)
  removeAllergy(
    @Param('id', ParseIdPipe) id: number,
    @Param('allergyId', ParseIdPipe) allergyId: number,
    @CurrentUser() user: AuthUser,
  ): Promise<Patient> {
    return this.patients.removeAllergy(id, allergyId, user);
  }

  @ApiOperation({ summary: 'Record that the patient has no known allergies (refused while entries exist)' })
  @ApiErrors(404, 409)
  @Post(':id/no-known-allergies')
  @HttpCode(200)
  @Roles(...PATIENT_RECORD_ROLES)
  recordNoKnownAllergies(@Param('id', ParseIdPipe) id: number, @CurrentUser() user: AuthUser): Promise<Patient> {
    return this.patients.recordNoKnownAllergies(id, user);
  }

  @ApiOperation({ summary: 'Record opioid tolerance and its basis (at least 60 mg oral morphine a day for a week or longer)' })
  @ApiErrors(404)
  @Put(':id/opioid-tolerance')
  @Roles(...PATIENT_RECORD_ROLES)
  updateTolerance(@Param('id', ParseIdPipe) id: number, @Body() body: OpioidToleranceDto, @CurrentUser() user: AuthUser): Promise<Patient> {
    return this.patients.updateTolerance(id, body, user);
  }

  @ApiOperation({ summary: 'Record a new weight and the day it was measured' })
  @ApiErrors(404)
  @Post(':id/weights')
  @Roles(...WEIGHT_ROLES)
  recordWeight(@Param('id', ParseIdPipe) id: number, @Body() body: RecordWeightDto, @CurrentUser() user: AuthUser): Promise<Patient> {
    return this.patients.recordWeight(id, body, user);
  }
}
