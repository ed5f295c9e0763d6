import type { INestApplication } from '@nestjs/common';
import { DocumentBuilder, type OpenAPIObject, SwaggerModule } from '@nestjs/swagger';
import { addIdempotencyKeyHeader } from '../idempotency/idempotency-openapi.js';
import { ApiErrorModel } from './api-error.model.js';
import { addAccessAndCommonErrors } from './document-access.js';
import { fillDocumentDefaults } from './document-defaults.js';
import { addResponseSchemas } from './response-schemas.js';
import { operationIdOf, readRouteFacts } from './route-facts.js';

export const OPENAPI_UI_PATH = 'api/docs';
export const OPENAPI_JSON_PATH = 'api/docs-json';

/** The OpenAPI 3 document of every route the app serves. Build it after `app.init()`. */
export function buildOpenApiDocument(app: INestApplication): OpenAPIObject {
  const config = new DocumentBuilder()
    .setTitle('Lockstep API')
    .setDescription(
      'REST API of Lockstep, which carries a ward’s PCA orders from the prescriber through pharmacy ' +
        'verification, the two-nurse bedside check, observations and handover. JSON in camelCase; ' +
        'sign in with `POST /api/auth/login` and send `Authorization: Bearer <accessToken>`. Every ' +
        'error answer is `{statusCode, message, errors?}` (FHIR routes answer an OperationOutcome). ' +
        'Each operation lists the roles that may call it (`x-roles`). FHIR export: docs/integration.md.',
    )
    .setVersion('0.1.0')
    .addBearerAuth({ type: 'http', scheme: 'bearer', bearerFormat: 'JWT', description: 'The accessToken from POST /api/auth/login' })
    .addSecurityRequirements('bearer')
    .build();
  const document = SwaggerModule.createDocument(app, config, { extraModels: [ApiErrorModel], operationIdFactory: operationIdOf });
  const facts = readRouteFacts(app);
  return addAccessAndCommonErrors(addIdempotencyKeyHeader(addResponseSchemas(fillDocumentDefaults(document, facts)), facts), facts);
}
