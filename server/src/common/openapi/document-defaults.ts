import type { OpenAPIObject } from '@nestjs/swagger';
import { operationsOf } from './operations.js';
import type { RouteFacts } from './route-facts.js';

/**
 * What swagger leaves out: every numeric path parameter goes through ParseIdPipe, so it is a whole
 * number from 1; and an operation that declares its error answers loses swagger's default success
 * answer, so it is put back (the @HttpCode status, else 201 for POST and 200 for the rest), with
 * the operation's summary as its description.
 */
export function fillDocumentDefaults(document: OpenAPIObject, facts: ReadonlyMap<string, RouteFacts>): OpenAPIObject {
  for (const { method, operation } of operationsOf(document)) {
    for (const parameter of operation.parameters ?? []) {
      if ('$ref' in parameter || parameter.in !== 'path' || !parameter.schema || '$ref' in parameter.schema) continue;
      if (parameter.schema.type === 'number') parameter.schema = { type: 'integer', minimum: 1 };
    }
    const successes = Object.entries(operation.responses).filter(([status]) => status.startsWith('2'));
    if (successes.length === 0) {
      const status = facts.get(operation.operationId ?? '')?.httpCode ?? (method === 'post' ? 201 : 200);
      operation.responses[status] = { description: '' };
      successes.push([String(status), operation.responses[status]]);
    }
    for (const [, response] of successes) {
      if (response && !('$ref' in response) && !response.description) response.description = operation.summary ?? 'Success';
    }
  }
  return document;
}
