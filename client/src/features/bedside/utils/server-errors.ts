import { splitFieldErrors } from '@/lib/form-errors';
import { errorMessage, isApiRequestError } from '@/lib/api-error';

export interface PlacedErrors {
  /** Messages keyed by the form's own field names. */
  fieldErrors: Record<string, string>;
  /** What no field shows: for an alert above the form. */
  alert: string | null;
}

/**
 * Puts a server error's field messages on a form's fields. `renames` maps the API's paths onto
 * the form's names, whole or by a prefix ending in '.' (`{ 'settings.': '' }` puts
 * `settings.lockoutMinutes` on `lockoutMinutes`). A 401/403 about the colleague lands on the
 * field it names; anything without a field becomes the alert.
 */
export function placeServerErrors(
  error: unknown,
  formFields: readonly string[],
  renames: Readonly<Record<string, string>> = {},
): PlacedErrors {
  if (!isApiRequestError(error) || error.errors.length === 0) return { fieldErrors: {}, alert: errorMessage(error) };
  const renamed = error.errors.map((fieldError) => ({ ...fieldError, field: renameField(fieldError.field, renames) }));
  const { fieldErrors, otherErrors } = splitFieldErrors(renamed, formFields);
  const alert = otherErrors.length > 0 ? otherErrors.join(' ') : null;
  return { fieldErrors, alert };
}

function renameField(field: string, renames: Readonly<Record<string, string>>): string {
  if (renames[field]) return renames[field];
  for (const [from, to] of Object.entries(renames)) {
    if (from.endsWith('.') && field.startsWith(from)) return `${to}${field.slice(from.length)}`;
  }
  return field;
}

/** The first check's fields, in the step that shows each: patient, syringe, pump entry. */
export type CheckStepName = 'identify' | 'syringe' | 'first';

export function stepOfFirstCheckError(error: unknown): CheckStepName {
  if (!isApiRequestError(error)) return 'first';
  const fields = error.errors.map((fieldError) => fieldError.field);
  if (fields.some((field) => field === 'patientMrn' || field === 'patientDateOfBirth')) return 'identify';
  if (fields.includes('releaseCode') || error.status === 409) return 'syringe';
  return 'first';
}
