import { useCallback, useState } from 'react';
import type { SecondCheckResponse } from '@lockstep/shared';
import type { IdentityValues } from '../utils/identity-check';
import type { PumpSettingsFormValues } from '@/utils/pump-settings-form';

export const CHECK_STEPS = ['identify', 'syringe', 'first', 'second', 'result'] as const;
export type CheckStep = (typeof CHECK_STEPS)[number];

/** Problems the server found in an earlier step, shown there when the nurse is sent back. */
export interface BouncedErrors {
  fields: Record<string, string>;
  alert: string | null;
}

export interface CheckState {
  /** Goes up with each new check, so every form starts again empty. */
  round: number;
  step: CheckStep;
  identity: IdentityValues;
  releaseCode: string;
  /** The first entry, kept only while the server sends the nurse back to fix the patient or syringe. */
  firstDraft: PumpSettingsFormValues | null;
  checkId: number | null;
  /** The order was already running when the first check was saved: this check starts a new syringe. */
  newSyringe: boolean;
  secondUsername: string | null;
  result: SecondCheckResponse | null;
  completedAt: string | null;
  bounced: BouncedErrors | null;
}

function freshCheck(round: number): CheckState {
  return {
    round,
    step: 'identify',
    identity: { patientMrn: '', patientDateOfBirth: '' },
    releaseCode: '',
    firstDraft: null,
    checkId: null,
    newSyringe: false,
    secondUsername: null,
    result: null,
    completedAt: null,
    bounced: null,
  };
}

/**
 * The guided bedside check, one step at a time. The first entry is dropped from the screen's
 * memory as soon as the server has it, so the second nurse can never see it.
 */
export function useBedsideCheck() {
  const [state, setState] = useState<CheckState>(() => freshCheck(1));

  const identified = useCallback((identity: IdentityValues) => setState((s) => ({ ...s, identity, bounced: null, step: 'syringe' })), []);
  const syringeScanned = useCallback((releaseCode: string) => setState((s) => ({ ...s, releaseCode, bounced: null, step: 'first' })), []);
  const goBack = useCallback((step: CheckStep) => setState((s) => (s.checkId === null ? { ...s, bounced: null, step } : s)), []);
  const firstSent = useCallback(
    (checkId: number, newSyringe: boolean) =>
      setState((s) => ({ ...s, checkId, newSyringe, firstDraft: null, bounced: null, step: 'second' })),
    [],
  );
  const firstBounced = useCallback(
    (step: CheckStep, draft: PumpSettingsFormValues, bounced: BouncedErrors) =>
      setState((s) => ({ ...s, step, firstDraft: draft, bounced })),
    [],
  );
  const compared = useCallback(
    (result: SecondCheckResponse, secondUsername: string) =>
      setState((s) => ({ ...s, result, secondUsername, completedAt: new Date().toISOString(), step: 'result' })),
    [],
  );
  const restart = useCallback(() => setState((s) => freshCheck(s.round + 1)), []);

  return { state, identified, syringeScanned, goBack, firstSent, firstBounced, compared, restart };
}
