import { Controller, Get, Header, Param, Req, UseFilters } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Request } from 'express';
import { CLINICAL_ROLES, FHIR_JSON_MEDIA_TYPE, type FhirBundle, type FhirMedicationRequest } from '@lockstep/shared';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe.js';
import { FhirExceptionFilter } from './fhir-exception.filter.js';
import { ApiFhirErrors, ApiFhirResponse } from './fhir-openapi.decorators.js';
import { FhirService } from './fhir.service.js';

/** Where this controller is served: the global `api` prefix plus the controller's path. */
const FHIR_BASE_PATH = '/api/fhir';

/** HL7 FHIR R4 export of PCA orders (docs/integration.md). Read only. */
@ApiTags('FHIR')
@Controller('fhir')
@Roles(...CLINICAL_ROLES, 'admin')
@UseFilters(FhirExceptionFilter)
export class FhirController {
  constructor(private readonly fhir: FhirService) {}

  @Get('MedicationRequest/:orderId')
  @Header('Content-Type', FHIR_JSON_MEDIA_TYPE)
  @ApiFhirResponse('MedicationRequest', 'The order as a FHIR R4 MedicationRequest')
  @ApiFhirErrors()
  medicationRequest(@Param('orderId', ParseIdPipe) orderId: number): Promise<FhirMedicationRequest> {
    return this.fhir.medicationRequest(orderId);
  }

  @Get('Patient/:id/pca-bundle')
  @Header('Content-Type', FHIR_JSON_MEDIA_TYPE)
  @ApiFhirResponse('Bundle', 'A FHIR R4 Bundle (type collection) of every PCA order of the patient, in every status')
  @ApiFhirErrors()
  pcaBundle(@Param('id', ParseIdPipe) patientId: number, @Req() request: Request): Promise<FhirBundle> {
    return this.fhir.pcaBundle(patientId, `${request.protocol}://${request.get('host')}${FHIR_BASE_PATH}`);
  }
}
