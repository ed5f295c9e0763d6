import type { FieldError } from '@lockstep/shared';
import { isApiRequestError } from './api-error';

export interface SplitFieldErrors {
  /** Messages keyed by form path, ready for `form.setErrors`. */
  fieldErrors: Record<string, string>;
  /** Messages for fields the form does not show; the caller shows them in an alert. */
  otherErrors: string[];
}

/**
 * Sorts the server's `[{field, message}]` onto the form's fields. A nested path the form does
 * not have (`wardIds.2`) falls back to its first segment (`wardIds`), so the message still
 * lands beside the input that holds it.
 */
export function splitFieldErrors(errors: FieldError[], formFields: readonly string[]): SplitFieldErrors {
  const known = new Set(formFields);
  const fieldErrors: Record<string, string> = {};
  const otherErrors: string[] = [];
  for (const { field, message } of errors) {
    const target = known.has(field) ? field : field.split('.')[0];
    if (known.has(target)) {
      // Keep the first message per field: it is usually the most basic problem.
      fieldErrors[target] ??= message;
    } else {
      otherErrors.push(field ? `${field}: ${message}` : message);
    }
  }
  return { fieldErrors, otherErrors };
}

interface FormWithErrors {
  setErrors: (errors: Record<string, string>) => void;
  getValues: () => object;
}

/**
 * Puts a 400's field errors beside the form's inputs. Returns what could not be placed (or
 * the error's message when it carried no field errors), for an alert above the form.
 */
export function applyServerErrors(form: FormWithErrors, error: unknown): string[] {
  if (!isApiRequestError(error) || error.errors.length === 0) {
    return [isApiRequestError(error) ? error.message : 'Something went wrong. Try again.'];
  }
  const { fieldErrors, otherErrors } = splitFieldErrors(error.errors, Object.keys(form.getValues()));
  form.setErrors(fieldErrors);
  return otherErrors;
}
