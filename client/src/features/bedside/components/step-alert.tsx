import type { ReactNode } from 'react';
import { Alert } from '@mantine/core';
import { IconAlertCircle } from '@tabler/icons-react';

/** A step's refusal that belongs to no single field, read out as soon as it appears. */
export function StepAlert({ title, children }: { title: string; children: ReactNode }) {
  if (!children) return null;
  return (
    <Alert color="red" variant="light" icon={<IconAlertCircle aria-hidden />} title={title} role="alert">
      {children}
    </Alert>
  );
}
