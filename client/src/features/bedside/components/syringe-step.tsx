import { Stack } from '@mantine/core';
import { useForm } from '@mantine/form';
import { normaliseReleaseCode, type SyringeReleaseResponse } from '@lockstep/shared';
import type { BouncedErrors } from '../hooks/use-bedside-check';
import { releaseCodeProblem } from '../utils/identity-check';
import { ReleaseCodeInput } from './release-code-input';
import { StepActions } from './step-actions';
import { StepAlert } from './step-alert';
import { StepPanel } from './step-panel';

export interface SyringeStepProps {
  releases: readonly Pick<SyringeReleaseResponse, 'releaseCode' | 'status'>[];
  initialCode: string;
  bounced: BouncedErrors | null;
  stepCount: number;
  onNext: (releaseCode: string) => void;
  onBack: () => void;
}

/** Step 2: the release code from the syringe label, scanned or typed (any case, dash optional). */
export function SyringeStep({ releases, initialCode, bounced, stepCount, onNext, onBack }: SyringeStepProps) {
  const form = useForm({
    initialValues: { releaseCode: initialCode },
    initialErrors: bounced?.fields ?? {},
    validate: { releaseCode: (value) => releaseCodeProblem(value, releases) },
  });

  return (
    <StepPanel
      number={2}
      of={stepCount}
      title="Check the syringe"
      intro="Scan the release code on the syringe label, or type it. Capital letters and the dash are optional."
    >
      <form onSubmit={form.onSubmit(({ releaseCode }) => onNext(normaliseReleaseCode(releaseCode)))} noValidate>
        <Stack gap="lg">
          <ReleaseCodeInput
            label="Release code"
            description="On the pharmacy label, e.g. K7M-4QX"
            inputProps={form.getInputProps('releaseCode')}
          />
          <StepAlert title="This syringe cannot be used">{bounced?.alert}</StepAlert>
          <StepActions next="Next: first check" onBack={onBack} />
        </Stack>
      </form>
    </StepPanel>
  );
}
