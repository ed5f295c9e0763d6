import { Body, Controller, Delete, Get, HttpCode, Param, Post, Put, Query } from '@nestjs/common';
import { PATIENT_RECORD_ROLES, PRESCRIBING_ROLES, WEIGHT_ROLES, type Patient } from '@lockstep/shared';
import { ApiHeader, ApiOperation } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ApiErrors } from '../common/openapi/api-errors.decorator.js';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe.js';
import { AddAllergyDto, OpioidToleranceDto, RecordWeightDto, Spo2ScaleDto } from './dto/patient-record.dto.js';
import { PatientQueryDto } from './dto/patient-query.dto.js';
import { PatientsService } from './patients.service.js';

/** The `Idempotency-Key` header every write takes: on a POST the same key replays the first answer (common/idempotency/); each route says what a repeat without it does. */
const idempotencyKey = (repeat: string) => ({
  name: 'Idempotency-Key',
  required: false,
  description: `Sent by the client with each write; ${repeat}`,
});

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
  @ApiHeader(idempotencyKey('an entry already recorded is refused (400 on substance), and nothing changes'))
  @ApiErrors(404)
  @Post(':id/allergies')
  @Roles(...PATIENT_RECORD_ROLES)
  addAllergy(@Param('id', ParseIdPipe) id: number, @Body() body: AddAllergyDto, @CurrentUser() user: AuthUser): Promise<Patient> {
    return this.patients.addAllergy(id, body, user);
  }

  @ApiOperation({ summary: 'Remove an allergy entry recorded in error (the audit trail keeps it)' })
  @ApiHeader(idempotencyKey('a removal repeated after it succeeded is 404 (the entry is gone), and nothing changes'))
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
  @ApiHeader(idempotencyKey('"no known allergies" already recorded changes and records nothing'))
  @ApiErrors(404, 409)
  @Post(':id/no-known-allergies')
  @HttpCode(200)
  @Roles(...PATIENT_RECORD_ROLES)
  recordNoKnownAllergies(@Param('id', ParseIdPipe) id: number, @CurrentUser() user: AuthUser): Promise<Patient> {
    return this.patients.recordNoKnownAllergies(id, user);
  }

  @ApiOperation({ summary: 'Record opioid tolerance and its basis (at least 60 mg oral morphine a day for a week or longer)' })
  @ApiHeader(idempotencyKey('the same tolerance and basis again changes and records nothing'))
  @ApiErrors(404)
  @Put(':id/opioid-tolerance')
  @Roles(...PATIENT_RECORD_ROLES)
  updateTolerance(@Param('id', ParseIdPipe) id: number, @Body() body: OpioidToleranceDto, @CurrentUser() user: AuthUser): Promise<Patient> {
    return this.patients.updateTolerance(id, body, user);
  }

  @ApiOperation({ summary: 'Choose the NEWS2 SpO2 scale: 2 only for confirmed hypercapnic respiratory failure (prescribers)' })
  @ApiHeader(idempotencyKey('the same scale again changes and records nothing'))
  @ApiErrors(404)
  @Put(':id/spo2-scale')
  @Roles(...PRESCRIBING_ROLES)
  updateSpo2Scale(@Param('id', ParseIdPipe) id: number, @Body() body: Spo2ScaleDto, @CurrentUser() user: AuthUser): Promise<Patient> {
    return this.patients.updateSpo2Scale(id, body, user);
  }

  @ApiOperation({ summary: 'Record a new weight and the day it was measured' })
  @ApiHeader(idempotencyKey('the same weight and day again changes and records nothing'))
  @ApiErrors(404)
  @Post(':id/weights')
  @Roles(...WEIGHT_ROLES)
  recordWeight(@Param('id', ParseIdPipe) id: number, @Body() body: RecordWeightDto, @CurrentUser() user: AuthUser): Promise<Patient> {
    return this.patients.recordWeight(id, body, user);
  }
}
