import type { z } from 'zod';
import type { FieldError } from './api-error.schema.js';

/**
 * A request schema's issues as the server's 400 names them: one `{field, message}` per field (the
 * first rule it breaks), the field a dotted path, and each unknown key named by its own path with
 * the server's words for it.
 */
export function requestFieldErrors(error: z.ZodError): FieldError[] {
  const errors = new Map<string, string>();
  const add = (path: readonly PropertyKey[], message: string) => {
    const field = path.map(String).join('.');
    if (!errors.has(field)) errors.set(field, message);
  };
  for (const issue of error.issues) {
    if (issue.code === 'unrecognized_keys') for (const key of issue.keys) add([...issue.path, key], `property ${key} should not exist`);
    else add(issue.path, issue.message);
  }
  return [...errors].map(([field, message]) => ({ field, message }));
}
