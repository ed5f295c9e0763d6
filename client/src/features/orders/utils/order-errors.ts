import {
  createOrderSchema,
  REGIMEN_FIELDS,
  type CreateOrderRequest,
  type FieldError,
  type OrderFields,
  type RegimenField,
} from '@lockstep/shared';
import type { OrderFormValues } from './order-form';

const RULE_FIELDS: ReadonlySet<string> = new Set(['concentrationPerMl', 'drugId', 'doseUnit']);
const OVERRIDE_PATH = /^overrides\.(\d+)(?:\.|$)/;

function isRegimenField(field: string): field is RegimenField {
  return (REGIMEN_FIELDS as readonly string[]).includes(field);
}

/** The form path of the reason for a soft finding on `field`: a regimen value's, or another finding's (a recorded allergy on `drugId`). */
function reasonPath(field: string): string {
  return isRegimenField(field) ? `reasons.${field}` : `otherReasons.${field}`;
}

/**
 * The form path for an API or schema path: a regimen field's value (or, when that field has a
 * soft finding, its reason), the reason for another field's soft finding (a recorded allergy on
 * `drugId`), the rule select for drug and concentration, the reason of the n-th override. Null
 * for what the form has no input for.
 */
export function orderFormPath(field: string, overrideFields: readonly string[], softFields: readonly string[]): string | null {
  if (isRegimenField(field)) return softFields.includes(field) ? `reasons.${field}` : field;
  if (softFields.includes(field)) return reasonPath(field);
  if (field === 'indication' || field === 'reviewDate') return field;
  if (RULE_FIELDS.has(field)) return 'ruleId';
  const override = OVERRIDE_PATH.exec(field);
  if (override) {
    const target = overrideFields[Number(override[1])];
    return target !== undefined && (isRegimenField(target) || softFields.includes(target)) ? reasonPath(target) : null;
  }
  return null;
}

export interface PlacedOrderErrors {
  fieldErrors: Record<string, string>;
  otherErrors: string[];
}

/** A 400's `[{field, message}]` placed beside the order form's inputs; the rest for an alert. */
export function placeOrderErrors(
  errors: readonly FieldError[],
  overrideFields: readonly string[],
  softFields: readonly string[],
): PlacedOrderErrors {
  const fieldErrors: Record<string, string> = {};
  const otherErrors: string[] = [];
  for (const { field, message } of errors) {
    const path = orderFormPath(field, overrideFields, softFields);
    if (path) fieldErrors[path] ??= message;
    else otherErrors.push(message);
  }
  return { fieldErrors, otherErrors };
}

/** What signing sends, short of the password: the fields, review date and a reason per soft finding. */
export function orderRequest(fields: OrderFields, values: OrderFormValues, soft: readonly string[], password: string): CreateOrderRequest {
  const reasonFor = (field: string) => (isRegimenField(field) ? values.reasons[field] : (values.otherReasons[field] ?? ''));
  return {
    ...fields,
    reviewDate: values.reviewDate,
    overrides: soft.map((field) => ({ field, reason: reasonFor(field).trim() })),
    signature: { password },
  };
}

const unsignedOrderSchema = createOrderSchema.omit({ signature: true });

/** The shared schema's verdict on everything but the password, keyed by form path. */
export function unsignedOrderErrors(request: Omit<CreateOrderRequest, 'signature'>, soft: readonly string[]): Record<string, string> {
  const parsed = unsignedOrderSchema.safeParse(request);
  if (parsed.success) return {};
  const overrideFields = request.overrides.map((override) => override.field);
  const errors: FieldError[] = parsed.error.issues.map((issue) => ({ field: issue.path.join('.'), message: issue.message }));
  return placeOrderErrors(errors, overrideFields, soft).fieldErrors;
}
