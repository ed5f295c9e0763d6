import type { OpenAPIObject, OperationObject, ParameterObject, ReferenceObject, ResponseObject } from '@nestjs/swagger';
import { operationsOf } from '../openapi/operations.js';
import type { RouteFacts } from '../openapi/route-facts.js';
import { IDEMPOTENCY_KEY_HEADER, IDEMPOTENT_REPLAYED_HEADER } from './idempotency.service.js';

const ERROR_SCHEMA: ReferenceObject = { $ref: '#/components/schemas/ApiErrorModel' };

const REPLAY =
  `One key per form opening, 1 to 200 printable characters (else 400). The same request sent again by the same user with the ` +
  `same key answers the first one's status and body with \`${IDEMPOTENT_REPLAYED_HEADER}: true\` and records nothing, also while ` +
  `the first is still running; the key with another path or body is 422. A refused or failed request frees its key. Keys are ` +
  `kept 24 hours (docs/design.md, "One record per action").`;

/**
 * The `Idempotency-Key` header on every POST the replay covers (IdempotencyInterceptor): signed-in
 * routes with a JSON body or none. A route that already documents the header keeps its own words
 * for a repeat without the key (or with a new one).
 */
export function addIdempotencyKeyHeader(document: OpenAPIObject, facts: ReadonlyMap<string, RouteFacts>): OpenAPIObject {
  for (const { method, operation } of operationsOf(document)) {
    if (method !== 'post' || facts.get(operation.operationId ?? '')?.access.public || isUpload(operation)) continue;
    const parameters = (operation.parameters ??= []);
    const own = parameters.find(
      (parameter): parameter is ParameterObject => !('$ref' in parameter) && parameter.name === IDEMPOTENCY_KEY_HEADER,
    );
    const withoutKey = own?.description?.replace(/^Sent by the client with each write; /, '');
    const header: ParameterObject = {
      name: IDEMPOTENCY_KEY_HEADER,
      in: 'header',
      required: false,
      schema: { type: 'string', minLength: 1, maxLength: 200 },
      description: withoutKey ? `${REPLAY} Without a key, or with a new one: ${withoutKey}` : REPLAY,
    };
    if (own) Object.assign(own, header);
    else parameters.push(header);
    addError(operation, 400, 'Bad input: `errors` names each failing field (or the Idempotency-Key header)');
    addError(operation, 422, 'This Idempotency-Key was used for a different request: send a new key');
  }
  return document;
}

function isUpload(operation: OperationObject): boolean {
  const body = operation.requestBody;
  return !!body && !('$ref' in body) && 'multipart/form-data' in body.content;
}

function addError(operation: OperationObject, status: number, description: string): void {
  const response: ResponseObject = { description, content: { 'application/json': { schema: ERROR_SCHEMA } } };
  operation.responses[status] ??= response;
}
