import type { ReactNode } from 'react';
import { ThemeIcon } from '@mantine/core';
import { IconCircleCheck } from '@tabler/icons-react';
import { StepPanel } from './step-panel';

/** The last step of a bedside task: what was recorded. */
export function DonePanel({ number, title, children }: { number: number; title: string; children: ReactNode }) {
  const icon = (
    <ThemeIcon color="teal" size={44} radius="xl" variant="light">
      <IconCircleCheck size={30} aria-hidden />
    </ThemeIcon>
  );
  return (
    <StepPanel number={number} of={number} title={title} icon={icon}>
      {children}
    </StepPanel>
  );
}
