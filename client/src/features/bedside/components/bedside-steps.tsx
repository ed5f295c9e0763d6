import type { CSSProperties } from 'react';
import { Stepper } from '@mantine/core';

export interface BedsideStep {
  label: string;
  description: string;
  /** E.g. red for a check that did not match. */
  color?: string;
}

// Read by assistive technology, not shown (the Stepper below is the visible indicator).
const VISUALLY_HIDDEN: CSSProperties = {
  position: 'absolute',
  width: 1,
  height: 1,
  padding: 0,
  margin: -1,
  overflow: 'hidden',
  clip: 'rect(0 0 0 0)',
  whiteSpace: 'nowrap',
  border: 0,
};

function stepState(index: number, active: number): string {
  if (index < active) return 'done';
  return index === active ? 'current step' : 'to do';
}

/**
 * The visible step indicator of a bedside task. Steps are shown, not clicked: each is done in
 * turn. Mantine draws the steps as buttons, so assistive technology reads a plain list instead.
 */
export function BedsideSteps({ steps, active, label }: { steps: readonly BedsideStep[]; active: number; label: string }) {
  return (
    <nav aria-label={label}>
      <ol style={VISUALLY_HIDDEN}>
        {steps.map((step, index) => (
          <li key={step.label} aria-current={index === active ? 'step' : undefined}>
            {step.label} ({step.description}): {stepState(index, active)}
          </li>
        ))}
      </ol>
      <div aria-hidden>
        <Stepper active={active} size="md" iconSize={40} allowNextStepsSelect={false} wrap>
          {steps.map((step) => (
            <Stepper.Step key={step.label} label={step.label} description={step.description} color={step.color} />
          ))}
        </Stepper>
      </div>
    </nav>
  );
}
