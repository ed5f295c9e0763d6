import type { ReactNode } from 'react';
import { Button, Group } from '@mantine/core';
import { IconArrowLeft, IconArrowRight } from '@tabler/icons-react';

export interface StepActionsProps {
  /** The submit button's words, e.g. "Next: syringe". */
  next: string;
  nextIcon?: ReactNode;
  loading?: boolean;
  disabled?: boolean;
  onBack?: () => void;
  backLabel?: string;
}

/** Big Back / Next buttons at the foot of a step; Next submits the step's form (Enter does too). */
export function StepActions({ next, nextIcon, loading, disabled, onBack, backLabel = 'Back' }: StepActionsProps) {
  return (
    <Group justify="space-between" mt="sm">
      {onBack ? (
        <Button variant="default" size="lg" leftSection={<IconArrowLeft size={20} aria-hidden />} onClick={onBack}>
          {backLabel}
        </Button>
      ) : (
        <span />
      )}
      <Button
        type="submit"
        size="lg"
        rightSection={nextIcon ?? <IconArrowRight size={20} aria-hidden />}
        loading={loading}
        disabled={disabled}
      >
        {next}
      </Button>
    </Group>
  );
}
