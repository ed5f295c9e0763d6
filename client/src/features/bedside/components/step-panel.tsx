import { useEffect, useRef, type ReactNode } from 'react';
import { Group, Paper, Stack, Text, Title } from '@mantine/core';

export interface StepPanelProps {
  /** 1-based, for "Step 2 of 5". */
  number: number;
  of: number;
  title: string;
  /** Shown before the title, e.g. the result's icon. */
  icon?: ReactNode;
  intro?: ReactNode;
  children: ReactNode;
}

const FIRST_FIELD = 'input:not([type=hidden]):not([disabled]), textarea:not([disabled])';

/**
 * One step of a bedside task. On arrival the first input takes the focus (or the heading, when
 * the step has none), so a nurse can type straight away and a screen reader says where they are.
 */
export function StepPanel({ number, of, title, icon, intro, children }: StepPanelProps) {
  const panel = useRef<HTMLElement>(null);
  const heading = useRef<HTMLHeadingElement>(null);

  useEffect(() => {
    // A new step is a new screen: start at the top (the step indicator), then put the cursor in.
    window.scrollTo({ top: 0 });
    const field = panel.current?.querySelector<HTMLElement>(FIRST_FIELD);
    (field ?? heading.current)?.focus();
  }, []);

  return (
    <Paper withBorder radius="md" p={{ base: 'md', sm: 'xl' }} component="section" ref={panel} aria-labelledby={`step-${number}-title`}>
      <Stack gap="lg">
        <Stack gap={4}>
          <Text size="sm" c="dimmed" fw={600}>
            Step {number} of {of}
          </Text>
          <Group gap="sm" wrap="nowrap">
            {icon}
            <Title order={2} id={`step-${number}-title`} ref={heading} tabIndex={-1}>
              {title}
            </Title>
          </Group>
          {intro ? <Text c="dimmed">{intro}</Text> : null}
        </Stack>
        {children}
      </Stack>
    </Paper>
  );
}
