/** The part of a Mantine form a stepped task needs. */
export interface StepForm {
  validateField: (path: string) => { hasError: boolean };
}

/**
 * Validates the fields of one step, every one of them (so all its problems show at once), and
 * says whether the nurse may go on.
 */
export function validateStepFields(form: StepForm, fields: readonly string[]): boolean {
  return fields.map((field) => form.validateField(field).hasError).every((hasError) => !hasError);
}

/** The first step (by index) that holds a field with an error: where a server refusal sends the nurse. */
export function stepWithErrors(errorFields: readonly string[], stepFields: readonly (readonly string[])[]): number | undefined {
  const index = stepFields.findIndex((fields) => fields.some((field) => errorFields.includes(field)));
  return index === -1 ? undefined : index;
}
