import type { OpenAPIObject, SchemaObject } from '@nestjs/swagger';
import { z } from 'zod';
import {
  auditEventSchema,
  auditPageSchema,
  auditVerifySchema,
  bolusResponseSchema,
  demoAccountsSchema,
  discontinueResponseSchema,
  pcaPauseStateSchema,
  drugSchema,
  equianalgesicFactorSchema,
  firstCheckResponseSchema,
  flagSchema,
  handoverBoardSchema,
  healthSchema,
  importPreviewSchema,
  libraryAffectedOrdersSchema,
  libraryVersionDetailSchema,
  libraryVersionSchema,
  lockoutSchema,
  loginResponseSchema,
  mailboxMessageSchema,
  observationSchema,
  orderDetailSchema,
  orderPreviewSchema,
  orderListEntrySchema,
  patientSchema,
  recordedObservationSchema,
  responseSchemas,
  secondCheckResponseSchema,
  sessionProfileSchema,
  signoffSchema,
  syringeChangeResponseSchema,
  syringeReleaseSchema,
  usageSchema,
  userSchema,
  versionDiffSchema,
  wardPolicyChangeSchema,
  wardPolicyChangesSchema,
  wardPolicySettingsSchema,
  wardSchema,
} from '@lockstep/shared';
import { operationsOf } from './operations.js';

type Answer = { schema: z.ZodType; list?: true; status?: string };

/**
 * The JSON answer of every route, from the shared zod schemas the client parses answers with (zod
 * writes the JSON Schema). Keyed as the document names operations. Routes that answer no JSON
 * (204s, the CSV export, the event stream) and the FHIR routes (documented by the FHIR module)
 * are not here; the OpenAPI test fails on a JSON answer without a schema.
 */
export const RESPONSE_SCHEMAS: Readonly<Record<string, Answer | Answer[]>> = {
  'POST /api/auth/login': { schema: loginResponseSchema },
  'GET /api/auth/me': { schema: sessionProfileSchema },
  'GET /api/auth/demo-accounts': { schema: demoAccountsSchema },
  'GET /api/auth/lockouts': { schema: lockoutSchema, list: true },
  'GET /api/users': { schema: userSchema, list: true },
  'POST /api/users': { schema: userSchema },
  'PATCH /api/users/{id}': { schema: userSchema },
  'GET /api/wards': { schema: wardSchema, list: true },
  'GET /api/wards/{wardId}/policy': { schema: wardPolicySettingsSchema },
  'PATCH /api/wards/{wardId}/policy': { schema: wardPolicySettingsSchema },
  'GET /api/wards/policy-changes': { schema: wardPolicyChangesSchema },
  'POST /api/wards/{wardId}/policy-changes': { schema: wardPolicyChangeSchema },
  'POST /api/wards/policy-changes/{changeId}/sign-off': { schema: wardPolicyChangeSchema },
  'POST /api/wards/policy-changes/{changeId}/decline': { schema: wardPolicyChangeSchema },
  'GET /api/patients': { schema: patientSchema, list: true },
  'GET /api/patients/{id}': { schema: patientSchema },
  'POST /api/patients/{id}/allergies': { schema: patientSchema },
  'DELETE /api/patients/{id}/allergies/{allergyId}': { schema: patientSchema },
  'POST /api/patients/{id}/no-known-allergies': { schema: patientSchema },
  'PUT /api/patients/{id}/opioid-tolerance': { schema: patientSchema },
  'PUT /api/patients/{id}/spo2-scale': { schema: patientSchema },
  'POST /api/patients/{id}/weights': { schema: patientSchema },
  'GET /api/drugs': { schema: drugSchema, list: true },
  'GET /api/equianalgesic-factors': { schema: equianalgesicFactorSchema, list: true },
  'PUT /api/equianalgesic-factors/{drugId}/{route}': { schema: equianalgesicFactorSchema },
  'GET /api/dev/mailbox': { schema: mailboxMessageSchema, list: true },
  'GET /api/library/versions': { schema: libraryVersionSchema, list: true },
  'POST /api/library/versions': { schema: libraryVersionDetailSchema },
  'GET /api/library/versions/{id}': { schema: libraryVersionDetailSchema },
  'GET /api/library/versions/{id}/diff': { schema: versionDiffSchema },
  'PUT /api/library/versions/{id}/rules': { schema: libraryVersionDetailSchema },
  'POST /api/library/versions/{id}/submit': { schema: libraryVersionDetailSchema },
  'POST /api/library/versions/{id}/withdraw': { schema: libraryVersionDetailSchema },
  'POST /api/library/versions/{id}/approve': { schema: libraryVersionDetailSchema },
  'POST /api/library/versions/{id}/send-back': { schema: libraryVersionDetailSchema },
  'GET /api/library/versions/{id}/affected-orders': { schema: libraryAffectedOrdersSchema },
  'POST /api/library/import': [
    { schema: importPreviewSchema, status: '200' },
    { schema: libraryVersionDetailSchema, status: '201' },
  ],
  'GET /api/wards/{wardId}/library': { schema: libraryVersionDetailSchema },
  'POST /api/orders/preview': { schema: orderPreviewSchema },
  'POST /api/orders': { schema: orderDetailSchema },
  'GET /api/orders': { schema: orderListEntrySchema, list: true },
  'GET /api/orders/{id}': { schema: orderDetailSchema },
  'POST /api/orders/{id}/revise': { schema: orderDetailSchema },
  'POST /api/orders/{id}/cancel': { schema: orderDetailSchema },
  'POST /api/orders/{id}/verify': { schema: orderDetailSchema },
  'POST /api/orders/{id}/return': { schema: orderDetailSchema },
  'POST /api/orders/{id}/reject': { schema: orderDetailSchema },
  'POST /api/orders/{orderId}/releases': { schema: syringeReleaseSchema },
  'POST /api/flags/{id}/acknowledge': { schema: flagSchema },
  'POST /api/orders/{orderId}/bedside-checks': { schema: firstCheckResponseSchema },
  'POST /api/orders/{orderId}/bedside-checks/{checkId}/second': { schema: secondCheckResponseSchema },
  'POST /api/orders/{orderId}/boluses': { schema: bolusResponseSchema },
  'POST /api/orders/{orderId}/syringe-changes': { schema: syringeChangeResponseSchema },
  'POST /api/orders/{orderId}/discontinue': { schema: discontinueResponseSchema },
  'GET /api/orders/{orderId}/pause': { schema: pcaPauseStateSchema },
  'POST /api/orders/{orderId}/naloxone': { schema: pcaPauseStateSchema },
  'POST /api/orders/{orderId}/pause': { schema: pcaPauseStateSchema },
  'POST /api/orders/{orderId}/resume': { schema: pcaPauseStateSchema },
  'POST /api/orders/{orderId}/observations': { schema: recordedObservationSchema },
  'GET /api/orders/{orderId}/observations': { schema: observationSchema, list: true },
  'GET /api/orders/{orderId}/usage': { schema: usageSchema },
  'GET /api/wards/{wardId}/handover': { schema: handoverBoardSchema },
  'GET /api/wards/{wardId}/handover/signoffs': { schema: signoffSchema, list: true },
  'POST /api/wards/{wardId}/handover/signoffs': { schema: signoffSchema },
  'GET /api/audit': { schema: auditPageSchema },
  'GET /api/audit/verify': { schema: auditVerifySchema },
  'GET /api/orders/{id}/audit': { schema: auditEventSchema, list: true },
  'GET /api/health': { schema: healthSchema },
};

/** Puts every named answer schema into the document's components and each route's answer beside it. */
export function addResponseSchemas(document: OpenAPIObject): OpenAPIObject {
  const { schemas } = z.toJSONSchema(responseSchemas, { target: 'openapi-3.0', uri: (id) => `#/components/schemas/${id}` });
  document.components ??= {};
  document.components.schemas ??= {};
  for (const [id, schema] of Object.entries(schemas)) {
    const { $id: _id, $schema: _schema, ...rest } = schema as Record<string, unknown>;
    document.components.schemas[id] = rest as SchemaObject;
  }
  for (const { path, method, operation } of operationsOf(document)) {
    const listed = RESPONSE_SCHEMAS[`${method.toUpperCase()} ${path}`];
    if (!listed) continue;
    for (const answer of Array.isArray(listed) ? listed : [listed]) {
      const status = answer.status ?? Object.keys(operation.responses).find((code) => code.startsWith('2'));
      const response = status ? operation.responses[status] : undefined;
      if (!response || '$ref' in response)
        throw new Error(`No ${status ?? 'success'} answer to describe for ${method.toUpperCase()} ${path}`);
      const ref = { $ref: `#/components/schemas/${idOf(answer.schema)}` };
      response.content = { 'application/json': { schema: answer.list ? { type: 'array', items: ref } : ref } };
    }
  }
  return document;
}

function idOf(schema: z.ZodType): string {
  const id = responseSchemas.get(schema)?.id;
  if (!id) throw new Error('An answer schema is not in the shared response registry: name it with answer()');
  return id;
}
