import { SimpleGrid, Stack, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import type { Patient } from '@lockstep/shared';
import { formatCalendarDate } from '@/utils/format-date';
import type { BouncedErrors } from '../hooks/use-bedside-check';
import { identityErrors, type IdentityValues } from '../utils/identity-check';
import { StepActions } from './step-actions';
import { StepAlert } from './step-alert';
import { StepPanel } from './step-panel';

export interface IdentifyStepProps {
  /** The order's patient, to compare with; the identifiers are never shown or filled in. */
  patient: Pick<Patient, 'mrn' | 'dateOfBirth'> | undefined;
  initialValues: IdentityValues;
  bounced: BouncedErrors | null;
  stepCount: number;
  onNext: (values: IdentityValues) => void;
}

const today = () => new Date().toISOString().slice(0, 10);

// The browser shows a date in its own order (07/28 or 28/07): read it back with the month in
// words, so a swapped day and month is seen before it matters.
function dateReadBack(value: string): string {
  return /^\d{4}-\d{2}-\d{2}$/.test(value) ? `From the wristband: ${formatCalendarDate(value)}` : 'From the wristband';
}

/** Step 1: two identifiers typed from the wristband, both matching the order's patient. */
export function IdentifyStep({ patient, initialValues, bounced, stepCount, onNext }: IdentifyStepProps) {
  const form = useForm<IdentityValues>({
    initialValues,
    initialErrors: bounced?.fields ?? {},
    validate: (values) => (patient ? identityErrors(values, patient) : {}),
  });

  return (
    <StepPanel
      number={1}
      of={stepCount}
      title="Identify the patient"
      intro="Read the MRN and date of birth from the patient’s wristband and type them here. Both must match this order’s patient."
    >
      <form
        onSubmit={form.onSubmit((values) =>
          onNext({ patientMrn: values.patientMrn.trim(), patientDateOfBirth: values.patientDateOfBirth }),
        )}
        noValidate
      >
        <Stack gap="lg">
          <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="lg">
            <TextInput
              label="MRN"
              description="From the wristband"
              size="lg"
              autoComplete="off"
              autoCapitalize="characters"
              spellCheck={false}
              withAsterisk
              classNames={{ input: 'tabular-nums' }}
              {...form.getInputProps('patientMrn')}
            />
            <TextInput
              label="Date of birth"
              description={dateReadBack(form.values.patientDateOfBirth)}
              type="date"
              size="lg"
              max={today()}
              withAsterisk
              classNames={{ input: 'tabular-nums' }}
              {...form.getInputProps('patientDateOfBirth')}
            />
          </SimpleGrid>
          <StepAlert title="Stop: check the wristband">{bounced?.alert}</StepAlert>
          <StepActions next="Next: syringe" disabled={!patient} />
        </Stack>
      </form>
    </StepPanel>
  );
}
