import type { FhirIssueType, FhirOperationOutcome } from './fhir-types.js';

// R4 issue-type codes; the nearest for each answer Lockstep gives.
const ISSUE_TYPE_BY_STATUS: Readonly<Record<number, FhirIssueType>> = {
  400: 'invalid',
  401: 'login',
  403: 'forbidden',
  404: 'not-found',
  409: 'conflict',
  429: 'throttled',
};

/** An error answer as an R4 OperationOutcome, the way FHIR servers report errors (R4 http.html). */
export function toOperationOutcome(statusCode: number, message: string): FhirOperationOutcome {
  const code = ISSUE_TYPE_BY_STATUS[statusCode] ?? (statusCode >= 500 ? 'exception' : 'processing');
  return { resourceType: 'OperationOutcome', issue: [{ severity: 'error', code, diagnostics: message }] };
}
