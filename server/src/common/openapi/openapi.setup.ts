import type { INestApplication } from '@nestjs/common';
import { SwaggerModule } from '@nestjs/swagger';
import { buildOpenApiDocument, OPENAPI_JSON_PATH, OPENAPI_UI_PATH } from './openapi-document.js';

/**
 * The API's documentation at /api/docs (Swagger UI) and /api/docs-json, public like any API
 * reference on the hospital network: it shows routes and fields, never data. The document is built
 * on the first request, once every module has registered its routes.
 */
export function setupOpenApi(app: INestApplication): void {
  SwaggerModule.setup(OPENAPI_UI_PATH, app, () => buildOpenApiDocument(app), {
    jsonDocumentUrl: OPENAPI_JSON_PATH,
    raw: ['json'],
    customSiteTitle: 'Lockstep API',
  });
}
