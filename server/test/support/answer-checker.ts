import type { OpenAPIObject, ResponseObject, SchemaObject } from '@nestjs/swagger';
import { Ajv } from 'ajv';
import request from 'supertest';
import type { App } from 'supertest/types.js';

/** Why an answer does not fit the API document's schema for it, or null when it fits. */
export type AnswerCheck = (method: string, path: string, status: number, body: unknown) => string | null;

/**
 * Checks live answers against the app's own OpenAPI document (its components written from the
 * shared zod schemas). `path` may be Express-style (`/api/users/:id`) or the document's (`{id}`).
 */
export async function answerChecker(http: App): Promise<{ document: OpenAPIObject; check: AnswerCheck }> {
  const document = (await request(http).get('/api/docs-json').expect(200)).body as OpenAPIObject;
  const ajv = new Ajv({ allErrors: true, strict: false, validateFormats: false });
  for (const [id, schema] of Object.entries(document.components?.schemas ?? {}))
    ajv.addSchema(toDraft7(schema), `#/components/schemas/${id}`);
  const check: AnswerCheck = (method, path, status, body) => {
    const documented = path.replace(/:([A-Za-z_]\w*)/g, '{$1}');
    const operation = Object.entries(document.paths).find(([candidate]) => sameRoute(candidate, documented))?.[1][
      method.toLowerCase() as 'get'
    ];
    if (!operation) return `${method.toUpperCase()} ${path} is not in the API document`;
    const response = operation.responses[String(status)] as ResponseObject | undefined;
    if (!response) return `${method.toUpperCase()} ${path} answered ${status}, which the document does not list`;
    const schema = bodySchema(response);
    if (!schema) return status === 204 ? null : `${method.toUpperCase()} ${path} ${status} has no schema in the document`;
    const validate = ajv.compile(toDraft7(schema));
    return validate(body) ? null : `${method.toUpperCase()} ${path} ${status}: ${ajv.errorsText(validate.errors)}`;
  };
  return { document, check };
}

/** `/api/wards/{wardId}/library` and `/api/wards/{id}/library` name the same route. */
function sameRoute(a: string, b: string): boolean {
  const shape = (path: string) => path.replace(/\{[^}]+\}/g, '{}');
  return shape(a) === shape(b);
}

/** The answer body's schema, whatever its JSON media type (FHIR answers are application/fhir+json). */
export function bodySchema(response: ResponseObject): SchemaObject | undefined {
  return Object.values(response.content ?? {}).find((media) => media.schema)?.schema as SchemaObject | undefined;
}

/**
 * OpenAPI 3.0 writes an exclusive bound as `minimum` plus `exclusiveMinimum: true`; JSON Schema
 * draft 7 (Ajv) as `exclusiveMinimum: <bound>`; and `nullable: true` as a null type allowed beside the others.
 */
function toDraft7(schema: unknown): object {
  if (Array.isArray(schema)) return schema.map(toDraft7);
  if (typeof schema !== 'object' || schema === null) return schema as object;
  const copy: Record<string, unknown> = Object.fromEntries(Object.entries(schema).map(([key, value]) => [key, toDraft7(value)]));
  for (const [exclusive, bound] of [
    ['exclusiveMinimum', 'minimum'],
    ['exclusiveMaximum', 'maximum'],
  ] as const) {
    if (copy[exclusive] === true) {
      copy[exclusive] = copy[bound];
      delete copy[bound];
    } else if (copy[exclusive] === false) delete copy[exclusive];
  }
  if (copy.nullable === true) {
    delete copy.nullable;
    if (Array.isArray(copy.enum)) copy.enum = [...copy.enum, null];
    if (typeof copy.type === 'string') return { ...copy, type: [copy.type, 'null'] };
    return { anyOf: [copy, { type: 'null' }] };
  }
  return copy;
}
