import { useState, type FormEvent } from 'react';
import type { ColleagueRequest } from '@lockstep/shared';
import { useIdempotencyKey } from '@/hooks/use-idempotency-key';
import { isApiRequestError } from '@/lib/api-error';
import { placeServerErrors } from '../utils/server-errors';
import { stepWithErrors, validateStepFields, type StepForm } from '../utils/step-form';

/** A witnessed task's form holds the witness's username and password beside its own fields. */
export type WitnessedValues = { witness: ColleagueRequest };

export function emptyWitness(): ColleagueRequest {
  return { username: '', password: '' };
}

export const WITNESS_RULES = {
  username: (value: string) => (value.trim() ? null : 'The witness enters their username'),
  password: (value: string) => (value ? null : 'The witness enters their password'),
};

/** The part of a Mantine form the task drives. */
interface WitnessedForm<Values extends WitnessedValues> extends StepForm {
  getValues: () => Values;
  setFieldValue: (path: 'witness.password', value: string) => void;
  setErrors: (errors: Record<string, string>) => void;
}

/** The part of a TanStack mutation the task drives: the request and the task's `Idempotency-Key`. */
interface WitnessedMutation<Request, Result> {
  mutate: (
    variables: { request: Request; idempotencyKey: string },
    options: { onSuccess: (result: Result) => void; onError: (error: unknown) => void },
  ) => void;
  isPending: boolean;
}

export interface WitnessedStepOptions<Values extends WitnessedValues, Request, Result> {
  form: WitnessedForm<Values>;
  /** Each step's form fields in turn; the last step is the witness's, and its Next sends. */
  stepFields: readonly (readonly string[])[];
  mutation: WitnessedMutation<Request, Result>;
  /** The request from the checked form, with the witness as typed (username trimmed). */
  toRequest: (values: Values, witness: ColleagueRequest) => Request;
  /** Sees a refusal's field errors before they are shown, e.g. to show a field the server asked for. */
  onRefused?: (fieldErrors: Record<string, string>) => void;
}

/**
 * Fill → witness signs → result: the bolus, syringe change and discontinue screens. Each Next
 * checks only its own step's fields. A refusal sends the nurse back to the step holding the field
 * at fault; a wrong witness password (the request is `signed`, so no sign-out) shows beside the
 * witness's field and is cleared for another try. One `Idempotency-Key` per opening of the
 * screen, kept for a retry (a double-click or a lost answer gives one record) and renewed after a
 * success.
 */
export function useWitnessedStep<Values extends WitnessedValues, Request, Result>({
  form,
  stepFields,
  mutation,
  toRequest,
  onRefused,
}: WitnessedStepOptions<Values, Request, Result>) {
  const [step, setStep] = useState(0);
  const [result, setResult] = useState<Result | null>(null);
  const [alert, setAlert] = useState<string | null>(null);
  const idempotency = useIdempotencyKey();

  const refused = (error: unknown) => {
    form.setFieldValue('witness.password', '');
    const placed = placeServerErrors(error, stepFields.flat());
    // 403: this witness may not co-sign (a pharmacist, say); that belongs beside the username.
    if (isApiRequestError(error) && error.status === 403) placed.fieldErrors['witness.username'] = error.message;
    onRefused?.(placed.fieldErrors);
    form.setErrors(placed.fieldErrors);
    setAlert(placed.alert);
    setStep((current) => stepWithErrors(Object.keys(placed.fieldErrors), stepFields) ?? current);
  };

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    if (!validateStepFields(form, stepFields[step])) return;
    setAlert(null);
    if (step < stepFields.length - 1) {
      setStep(step + 1);
      return;
    }
    const values = form.getValues();
    const witness = { username: values.witness.username.trim(), password: values.witness.password };
    mutation.mutate(
      { request: toRequest(values, witness), idempotencyKey: idempotency.key },
      {
        onSuccess: (answer) => {
          idempotency.renew();
          setResult(answer);
        },
        onError: refused,
      },
    );
  };

  const back = () => setStep((current) => Math.max(0, current - 1));
  return { step, result, alert, submit, back, pending: mutation.isPending };
}

export type WitnessedStep = Pick<ReturnType<typeof useWitnessedStep>, 'step' | 'alert' | 'submit' | 'back' | 'pending'>;
