import { applyDecorators } from '@nestjs/common';
import { ApiOperation, ApiProduces, ApiResponse } from '@nestjs/swagger';
import { FHIR_JSON_MEDIA_TYPE } from '@lockstep/shared';

const R4 = 'https://hl7.org/fhir/R4';

const resourceSchema = (resourceType: string, page: string) => ({
  type: 'object' as const,
  description: `An HL7 FHIR R4 ${resourceType} resource; the mapping is in docs/integration.md`,
  properties: { resourceType: { type: 'string', enum: [resourceType] } },
  required: ['resourceType'],
  externalDocs: { description: `FHIR R4 ${resourceType}`, url: `${R4}/${page}` },
});

/** A FHIR route's success answer, in `application/fhir+json`. */
export const ApiFhirResponse = (resourceType: 'MedicationRequest' | 'Bundle', description: string) =>
  applyDecorators(
    ApiOperation({ summary: description }),
    ApiProduces(FHIR_JSON_MEDIA_TYPE),
    ApiResponse({ status: 200, description, schema: resourceSchema(resourceType, `${resourceType.toLowerCase()}.html`) }),
  );

/** FHIR routes answer every error as an OperationOutcome (fhir-exception.filter.ts). */
export const ApiFhirErrors = () =>
  applyDecorators(
    ...(
      [
        [400, 'The id is not a positive whole number'],
        [401, 'No valid sign-in token'],
        [404, 'No such order or patient'],
      ] as const
    ).map(([status, description]) =>
      ApiResponse({
        status,
        description: `${description} (an OperationOutcome)`,
        schema: resourceSchema('OperationOutcome', 'operationoutcome.html'),
      }),
    ),
  );
