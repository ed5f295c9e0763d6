import type { OpenAPIObject, OperationObject } from '@nestjs/swagger';

export const HTTP_METHODS = ['get', 'put', 'post', 'delete', 'patch'] as const;
export type HttpMethod = (typeof HTTP_METHODS)[number];

/** Every operation of the document with its path and method. */
export function operationsOf(document: OpenAPIObject): { path: string; method: HttpMethod; operation: OperationObject }[] {
  return Object.entries(document.paths).flatMap(([path, pathItem]) =>
    HTTP_METHODS.flatMap((method) => {
      const operation = pathItem[method];
      return operation ? [{ path, method, operation }] : [];
    }),
  );
}
