import type { OpenAPIObject, OperationObject, ReferenceObject, ResponseObject, SchemaObject } from '@nestjs/swagger';
import { ROLE_LABELS, ROLES } from '@lockstep/shared';
import { ERROR_DESCRIPTIONS, type ErrorStatus } from './api-errors.decorator.js';
import { operationsOf } from './operations.js';
import type { RouteAccess, RouteFacts } from './route-facts.js';

const ERROR_SCHEMA: ReferenceObject = { $ref: '#/components/schemas/ApiErrorModel' };

/**
 * Completes every operation from the route itself, so nothing is written twice: who may call it
 * (`x-roles`, or `x-public` with no security) from the @Roles and @Public metadata the guards
 * read, and the error answers the global machinery gives: 401 and 403 from the guards, 400 for
 * bad parameters or bodies (validation pipe, ParseIdPipe), 413 for a body over the limit, 429 for
 * a body carrying a password (PasswordRateGuard and the wrong-password limits).
 */
export function addAccessAndCommonErrors(document: OpenAPIObject, facts: ReadonlyMap<string, RouteFacts>): OpenAPIObject {
  for (const { operation } of operationsOf(document)) {
    const route = facts.get(operation.operationId ?? '');
    if (!route) throw new Error(`No route metadata for the OpenAPI operation ${operation.operationId}`);
    const signs = bodyCarriesPassword(document, operation);
    describeAccess(operation, route.access, signs);
    if (operation.requestBody || operation.parameters?.some(isValidated)) addError(operation, 400);
    if (operation.requestBody) addError(operation, 413);
    if (signs) addError(operation, 429);
    operation.responses = Object.fromEntries(Object.entries(operation.responses).sort(([a], [b]) => a.localeCompare(b)));
  }
  return document;
}

/** Query DTOs go through the validation pipe, numeric path parameters through ParseIdPipe. */
function isValidated(parameter: NonNullable<OperationObject['parameters']>[number]): boolean {
  if ('$ref' in parameter) return true;
  return (
    parameter.in === 'query' ||
    (parameter.in === 'path' && !!parameter.schema && !('$ref' in parameter.schema) && parameter.schema.type === 'integer')
  );
}

function describeAccess(operation: OperationObject, route: RouteAccess, signs: boolean): void {
  const extensions = operation as OperationObject & Record<`x-${string}`, unknown>;
  if (route.public) {
    operation.security = [];
    extensions['x-public'] = true;
    appendDescription(operation, 'Public: no sign-in needed.');
    return;
  }
  const roles = route.roles ?? ROLES;
  extensions['x-roles'] = [...roles];
  appendDescription(
    operation,
    route.roles ? `Roles: ${roles.map((role) => ROLE_LABELS[role].toLowerCase()).join(', ')}.` : 'Any signed-in role.',
  );
  addError(operation, 401, signs ? 'No valid sign-in token, or a wrong password in the body (a signature or a colleague’s)' : undefined);
  if (roles.length < ROLES.length) addError(operation, 403);
}

function appendDescription(operation: OperationObject, text: string): void {
  operation.description = operation.description ? `${operation.description}\n\n${text}` : text;
}

function addError(operation: OperationObject, status: ErrorStatus, description: string = ERROR_DESCRIPTIONS[status]): void {
  const response: ResponseObject = { description, content: { 'application/json': { schema: ERROR_SCHEMA } } };
  operation.responses[status] ??= response;
}

/** As PasswordRateGuard's `carriesPassword`: a `password` property at the top or one level down. */
function bodyCarriesPassword(document: OpenAPIObject, operation: OperationObject): boolean {
  const body = operation.requestBody && !('$ref' in operation.requestBody) ? operation.requestBody : null;
  const schema = resolve(document, body?.content['application/json']?.schema);
  const properties = Object.values(schema?.properties ?? {});
  return (
    'password' in (schema?.properties ?? {}) || properties.some((property) => 'password' in (resolve(document, property)?.properties ?? {}))
  );
}

function resolve(document: OpenAPIObject, schema: SchemaObject | ReferenceObject | undefined): SchemaObject | undefined {
  // A $ref with a description beside it comes as `allOf: [{$ref}]`.
  if (schema && !('$ref' in schema) && schema.allOf?.length === 1) return resolve(document, schema.allOf[0]);
  if (!schema || !('$ref' in schema)) return schema;
  const name = schema.$ref.replace('#/components/schemas/', '');
  return resolve(document, document.components?.schemas?.[name]);
}
