import { z } from 'zod';

/**
 * Every API answer's schema, by name. The server's OpenAPI document is written from this registry
 * (zod writes the JSON Schema), and the client parses answers with the same schemas.
 */
export const responseSchemas = z.registry<{ id: string }>();

/** Registers `schema` as the named answer and hands it back, typed as it was. */
export function answer<T extends z.ZodType>(id: string, schema: T): T {
  responseSchemas.add(schema, { id });
  return schema;
}
