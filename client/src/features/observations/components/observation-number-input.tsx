import type { ReactNode } from 'react';
import { Group, Text } from '@mantine/core';
import type { GetInputPropsReturnType } from '@mantine/form';
import { IconAlertOctagon } from '@tabler/icons-react';
import { NumberField } from '@/components/ui/number-field';
import { NUMBER_RULES, type NumberField as ObservationField } from '../utils/observation-form';

export interface ObservationNumberInputProps {
  field: ObservationField;
  label: string;
  description: ReactNode;
  /** What saving this value will raise, said before it is saved. */
  warning?: string;
  inputProps: GetInputPropsReturnType;
}

/** One large number box. No steppers: a stray click must never change a reading. */
export function ObservationNumberInput({ field, label, description, warning, inputProps }: ObservationNumberInputProps) {
  const rule = NUMBER_RULES[field];
  return (
    <NumberField
      id={`observation-${field}`}
      label={label}
      description={
        warning ? (
          <Group gap={4} component="span" c="red.8" wrap="nowrap">
            <IconAlertOctagon size={14} aria-hidden style={{ flexShrink: 0 }} />
            <Text span inherit fw={600}>
              Urgent: {warning}
            </Text>
          </Group>
        ) : (
          description
        )
      }
      size="lg"
      integer={rule.integer}
      {...inputProps}
    />
  );
}
