import type { ReactNode } from 'react';
import { Stack } from '@mantine/core';
import type { GetInputPropsReturnType } from '@mantine/form';
import { IconSignature } from '@tabler/icons-react';
import type { WitnessedStep } from '../hooks/use-witnessed-step';
import { BedsideSteps, type BedsideStep } from './bedside-steps';
import { ColleagueFields } from './colleague-fields';
import { StepActions, type StepActionsProps } from './step-actions';
import { StepAlert } from './step-alert';
import { StepPanel } from './step-panel';

export interface WitnessedStepContent {
  title: string;
  intro?: ReactNode;
  /** The step's own fields (on the witness's step, those above the witness). */
  fields?: ReactNode;
  /** The Next button's words. */
  next: string;
}

export interface WitnessedStepsProps {
  /** The indicator's three steps: what is filled in, the witness, the result. */
  steps: readonly BedsideStep[];
  /** The indicator's name, e.g. "Clinician bolus steps". */
  label: string;
  task: WitnessedStep;
  /** The title of a refusal that no field shows, e.g. "The bolus was not given". */
  notDone: string;
  fill: WitnessedStepContent;
  sign: WitnessedStepContent & { after?: ReactNode };
  witness: { username: GetInputPropsReturnType; password: GetInputPropsReturnType };
}

/** A witnessed bedside task in progress: the indicator, then the step the nurse is on. */
export function WitnessedSteps({ steps, label, task, notDone, fill, sign, witness }: WitnessedStepsProps) {
  const step = (number: number, content: WitnessedStepContent, body: ReactNode, actions: StepActionsProps) => (
    <StepPanel key={number} number={number} of={steps.length} title={content.title} intro={content.intro}>
      <form onSubmit={task.submit} noValidate>
        <Stack gap="lg">
          {body}
          <StepAlert title={notDone}>{task.alert}</StepAlert>
          <StepActions {...actions} />
        </Stack>
      </form>
    </StepPanel>
  );
  return (
    <>
      <BedsideSteps steps={steps} active={task.step} label={label} />
      {task.step === 0
        ? step(1, fill, fill.fields, { next: fill.next })
        : step(
            2,
            sign,
            <>
              {sign.fields}
              <ColleagueFields who="Witness" username={witness.username} password={witness.password} />
              {sign.after}
            </>,
            { next: sign.next, nextIcon: <IconSignature size={20} aria-hidden />, loading: task.pending, onBack: task.back },
          )}
    </>
  );
}

/** A witnessed bedside task recorded: every step done, then what was recorded. */
export function WitnessedDone({ steps, label, children }: { steps: readonly BedsideStep[]; label: string; children: ReactNode }) {
  return (
    <>
      <BedsideSteps steps={steps} active={steps.length} label={label} />
      {children}
    </>
  );
}
