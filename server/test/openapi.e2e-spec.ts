import { readdirSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { ROUTE_ARGS_METADATA } from '@nestjs/common/constants.js';
import { RouteParamtypes } from '@nestjs/common/enums/route-paramtypes.enum.js';
import { ModulesContainer } from '@nestjs/core';
import type { OpenAPIObject, OperationObject, ParameterObject, ReferenceObject, SchemaObject } from '@nestjs/swagger';
import { getMetadataStorage, ValidationTypes } from 'class-validator';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { appRoutes, routeKey } from './support/app-routes.js';
import { createTestApp, type TestApp } from './support/test-app.js';

/** Every DTO class, found by file rather than listed, so a new one is checked without anyone adding it. */
async function dtoClasses(): Promise<Map<string, new () => object>> {
  const src = fileURLToPath(new URL('../src/', import.meta.url));
  const files = readdirSync(src, { recursive: true, encoding: 'utf8' }).filter((file) => /(^|\/)dto\/[^/]+\.dto\.ts$/.test(file));
  const modules = await Promise.all(
    files.map((file) => import(pathToFileURL(path.join(src, file)).href) as Promise<Record<string, unknown>>),
  );
  const classes = modules
    .flatMap((module) => Object.values(module))
    .filter((value): value is new () => object => typeof value === 'function' && value.name.endsWith('Dto'));
  return new Map(classes.map((dto) => [dto.name, dto]));
}

const WRITE_METHODS = new Set(['post', 'put', 'patch', 'delete']);
/** SwaggerModule's own routes: the UI, its assets and the JSON. */
const isDocsRoute = (key: string) => /^GET \/api\/docs(\/|-json|$)/.test(key);

type Operation = { key: string; method: string; path: string; operation: OperationObject & { 'x-roles'?: string[]; 'x-public'?: boolean } };

describe('OpenAPI document at /api/docs-json', () => {
  let t: TestApp;
  let document: OpenAPIObject;
  let operations: Operation[];

  beforeAll(async () => {
    t = await createTestApp();
    const response = await request(t.http).get('/api/docs-json').expect(200);
    expect(response.headers['content-type']).toMatch(/^application\/json/);
    document = response.body as OpenAPIObject;
    operations = Object.entries(document.paths).flatMap(([path, item]) =>
      Object.entries(item)
        .filter(([method]) => ['get', ...WRITE_METHODS].includes(method))
        .map(([method, operation]) => ({
          key: routeKey(method, path.replace(/\{([^}]+)\}/g, ':$1')),
          method,
          path,
          operation: operation as Operation['operation'],
        })),
    );
  });
  afterAll(async () => {
    console.log(
      `OpenAPI: ${operations.length} operations on ${Object.keys(document.paths).length} paths, ${Object.keys(document.components?.schemas ?? {}).length} schemas`,
    );
    await t.close();
  });

  const servedRoutes = () => appRoutes(t.app).filter((key) => key.split(' ')[1].startsWith('/api/') && !isDocsRoute(key));

  it('documents every route the app serves', () => {
    const documented = new Set(operations.map(({ key }) => key));
    expect(
      servedRoutes().filter((key) => !documented.has(key)),
      'routes missing from the OpenAPI document',
    ).toEqual([]);
  });

  it('documents no route the app does not serve, and each once', () => {
    const served = new Set(servedRoutes());
    expect(
      operations.filter(({ key }) => !served.has(key)).map(({ key }) => key),
      'documented routes that do not exist',
    ).toEqual([]);
    expect(new Set(operations.map(({ key }) => key)).size).toBe(operations.length);
  });

  it('serves the Swagger UI at /api/docs without a sign-in', async () => {
    const response = await request(t.http).get('/api/docs').expect(200);
    expect(response.headers['content-type']).toMatch(/^text\/html/);
    expect(response.text).toContain('swagger-ui-bundle.js');
    await request(t.http).get('/api/docs/swagger-ui-init.js').expect(200);
  });

  it('says who may call each route, as the guards decide', () => {
    for (const { key, operation } of operations) {
      if (operation['x-public']) {
        expect(operation.security, key).toEqual([]);
        continue;
      }
      expect(operation['x-roles']?.length, `${key} x-roles`).toBeGreaterThan(0);
      expect(operation.description, key).toMatch(/Roles: |Any signed-in role/);
      expect(operation.responses, key).toHaveProperty('401');
      if (operation['x-roles']!.length < 5) expect(operation.responses, key).toHaveProperty('403');
    }
    const byKey = new Map(operations.map(({ key, operation }) => [key, operation]));
    expect(byKey.get('POST /api/orders/:param/verify')?.['x-roles']).toEqual(['pharmacist']);
    expect(byKey.get('POST /api/orders/:param/bedside-checks')?.['x-roles']).toEqual(['nurse', 'charge_nurse']);
    expect(byKey.get('GET /api/orders/:param')?.['x-roles']).toHaveLength(5);
    expect(['POST /api/auth/login', 'GET /api/health', 'GET /api/auth/demo-accounts'].map((key) => byKey.get(key)?.['x-public'])).toEqual([
      true,
      true,
      true,
    ]);
    expect(document.components?.securitySchemes?.bearer).toMatchObject({ type: 'http', scheme: 'bearer' });
    expect(document.security).toEqual([{ bearer: [] }]);
  });

  it('gives every route a summary and a success answer', () => {
    for (const { key, operation } of operations) {
      expect(operation.summary, key).toBeTruthy();
      const successes = Object.keys(operation.responses).filter((status) => status.startsWith('2'));
      expect(successes.length, key).toBeGreaterThan(0);
    }
  });

  it('documents the request body and the error answers of every write route', () => {
    const writes = operations.filter(({ method }) => WRITE_METHODS.has(method));
    expect(writes.length).toBeGreaterThan(20);
    for (const { key, operation } of writes) {
      const errors = Object.keys(operation.responses).filter((status) => /^[45]/.test(status));
      expect(errors.length, `${key} error answers`).toBeGreaterThan(0);
      if (!handlerArgument(t, operation.operationId!, RouteParamtypes.BODY)) continue;
      const body = operation.requestBody as { content: Record<string, { schema: SchemaObject | ReferenceObject }> } | undefined;
      expect(body, `${key} request body`).toBeDefined();
      const schema = resolve(document, Object.values(body!.content)[0].schema);
      expect(Object.keys(schema?.properties ?? {}).length, `${key} body properties`).toBeGreaterThan(0);
      for (const status of ['400', '413']) expect(operation.responses, `${key} ${status}`).toHaveProperty(status);
      for (const status of errors) {
        const content = (operation.responses[status] as { content?: Record<string, { schema: ReferenceObject }> }).content;
        expect(content?.['application/json']?.schema, `${key} ${status} body`).toEqual({ $ref: '#/components/schemas/ApiErrorModel' });
      }
    }
  });

  it('gives every numeric id in a path as a whole number from 1, and answers a bad one with 400', () => {
    for (const { key, operation } of operations) {
      for (const parameter of operation.parameters ?? []) {
        if (
          '$ref' in parameter ||
          parameter.in !== 'path' ||
          !parameter.schema ||
          '$ref' in parameter.schema ||
          parameter.schema.type === 'string'
        )
          continue;
        expect(parameter.schema, `${key} ${parameter.name}`).toEqual({ type: 'integer', minimum: 1 });
        expect(operation.responses, key).toHaveProperty('400');
      }
    }
  });

  it('documents each request body as its validators check it', async () => {
    const classes = await dtoClasses();
    const schemas = (document.components?.schemas ?? {}) as Record<string, SchemaObject>;
    const checked = [...classes]
      .filter(([name]) => schemas[name])
      .map(([name, dto]) => (expectMatchesValidators(document, name, dto, schemas[name]), name));
    // The multipart upload's model is ImportLibraryDto's fields plus the file, which multer reads.
    const { file, ...fields } = schemas.ImportLibraryUploadModel.properties ?? {};
    expect(file).toMatchObject({ type: 'string', format: 'binary' });
    const upload = schemas.ImportLibraryUploadModel;
    expectMatchesValidators(document, 'ImportLibraryUploadModel', classes.get('ImportLibraryDto')!, {
      ...upload,
      properties: fields,
      required: upload.required?.filter((name) => name !== 'file'),
    });
    checked.push('ImportLibraryUploadModel');
    expect(checked.length).toBeGreaterThanOrEqual(25);
    for (const { key, operation } of operations) {
      const ref = JSON.stringify(operation.requestBody ?? {}).match(/#\/components\/schemas\/(\w+)/)?.[1];
      if (ref) expect(checked, key).toContain(ref);
    }
  });

  it('documents each query as its validators check it', () => {
    let checked = 0;
    for (const { key, operation } of operations) {
      const dto = handlerArgument(t, operation.operationId!, RouteParamtypes.QUERY);
      const parameters = (operation.parameters ?? []).filter(
        (parameter): parameter is ParameterObject => !('$ref' in parameter) && parameter.in === 'query',
      );
      if (!dto) {
        expect(parameters, key).toEqual([]);
        continue;
      }
      const properties = Object.fromEntries(
        parameters.map((parameter) => [parameter.name, { ...(parameter.schema as SchemaObject), description: parameter.description }]),
      );
      const required = parameters.filter((parameter) => parameter.required).map((parameter) => parameter.name);
      expectMatchesValidators(document, `${key} query`, dto, { type: 'object', properties, required });
      checked += 1;
    }
    expect(checked).toBeGreaterThanOrEqual(5);
  });
});

/** A DTO class, as Nest's route metadata and class-validator's storage hold it. */
// eslint-disable-next-line @typescript-eslint/no-unsafe-function-type -- class-validator's own parameter type
type DtoClass = Function;

/** The schema has exactly the validated properties, the right ones required, and each rule's bounds. */
function expectMatchesValidators(document: OpenAPIObject, name: string, dto: DtoClass, schema: SchemaObject): void {
  const rules = getMetadataStorage().getTargetValidationMetadatas(dto, '', true, false);
  expect(Object.keys(schema.properties ?? {}).sort(), `${name} properties`).toEqual(
    [...new Set(rules.map((rule) => rule.propertyName))].sort(),
  );
  // Required: @IsDefined, unless a condition (@IsOptional, @ValidateIf) skips a missing value.
  const skipsMissing = (property: string) =>
    rules.some(
      (rule) =>
        rule.propertyName === property &&
        rule.type === ValidationTypes.CONDITIONAL_VALIDATION &&
        !(rule.constraints[0] as (object: object, value: unknown) => boolean)({}, undefined),
    );
  const required = rules
    .filter((rule) => rule.type === ValidationTypes.IS_DEFINED && !skipsMissing(rule.propertyName))
    .map((rule) => rule.propertyName);
  expect([...(schema.required ?? [])].sort(), `${name} required`).toEqual(required.sort());
  for (const rule of rules) {
    const property = resolveProperty(document, schema.properties?.[rule.propertyName]);
    const target = rule.each && property.type === 'array' ? resolveProperty(document, property.items) : property;
    expectDocumented(`${name}.${rule.propertyName}`, rule.name, rule.constraints, target);
  }
}

/** A documented property agrees with one class-validator rule. */
function expectDocumented(where: string, rule: string | undefined, constraints: unknown[] | undefined, schema: SchemaObject): void {
  const [first, second] = constraints ?? [];
  switch (rule) {
    case 'min':
      return expect(schema.minimum, where).toBe(first);
    case 'max':
      return expect(schema.maximum, where).toBe(first);
    case 'minLength':
      return expect(schema.minLength, where).toBe(first);
    case 'maxLength':
      return expect(schema.maxLength, where).toBe(first);
    case 'length':
      return expect([schema.minLength, schema.maxLength], where).toEqual([first, second]);
    case 'arrayMaxSize':
      return expect(schema.maxItems, where).toBe(first);
    case 'isIn':
      // A list of statuses arrives as one comma-separated string (OrderQueryDto): its values are in the description.
      if (schema.type === 'string' && !schema.enum) return expect(schema.description, where).toContain((first as string[]).join(', '));
      return expect(schema.enum, where).toEqual([...(first as string[])]);
    case 'isInt':
      return expect(schema.type, where).toBe('integer');
    case 'isNumber':
      return expect(['number', 'integer'], where).toContain(schema.type);
    case 'isString':
      return expect(schema.type, where).toBe('string');
    case 'isBoolean':
      return expect(schema.type, where).toBe('boolean');
    case 'isPositive':
      // > 0: a whole number from 1, or any number above an exclusive 0.
      if (schema.type === 'integer') return expect(schema.minimum, where).toBe(1);
      return expect([schema.minimum, schema.exclusiveMinimum], where).toEqual([0, true]);
    case 'matches':
      return expect(schema.pattern, where).toBe((first as RegExp).source);
    case 'isEmail':
      return expect(schema.format, where).toBe('email');
    case 'isIso8601':
    case 'isRfc3339':
      return expect(['date', 'date-time'], where).toContain(schema.format);
    default:
      return undefined;
  }
}

function resolve(document: OpenAPIObject, schema: SchemaObject | ReferenceObject | undefined): SchemaObject | undefined {
  if (schema && !('$ref' in schema) && schema.allOf?.length === 1) return resolve(document, schema.allOf[0]);
  if (!schema || !('$ref' in schema)) return schema;
  return resolve(document, document.components?.schemas?.[schema.$ref.split('/').pop()!]);
}

function resolveProperty(document: OpenAPIObject, schema: SchemaObject | ReferenceObject | undefined): SchemaObject {
  const resolved = resolve(document, schema);
  expect(resolved, 'a documented property').toBeDefined();
  return resolved!;
}

/** The class of the handler's parameter of this kind (@Body, @Query), read from Nest's route metadata. */
function handlerArgument(t: TestApp, operationId: string, kind: RouteParamtypes): DtoClass | undefined {
  for (const module of t.app.get(ModulesContainer).values()) {
    for (const { metatype } of module.controllers.values()) {
      if (!metatype || !operationId.startsWith(`${metatype.name}_`)) continue;
      const method = operationId.slice(metatype.name.length + 1);
      const args = (Reflect.getMetadata(ROUTE_ARGS_METADATA, metatype, method) ?? {}) as Record<string, { index: number }>;
      const entry = Object.entries(args).find(([argKey]) => argKey.startsWith(`${kind}:`));
      if (!entry) return undefined;
      return (Reflect.getMetadata('design:paramtypes', metatype.prototype, method) as DtoClass[])[entry[1].index];
    }
  }
  throw new Error(`No handler for ${operationId}`);
}
