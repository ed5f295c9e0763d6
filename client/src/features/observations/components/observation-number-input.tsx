import type { ReactNode } from 'react';
import { Group, Text } from '@mantine/core';
import type { GetInputPropsReturnType } from '@mantine/form';
import { NumberField } from '@/components/ui/number-field';
import { SEVERITY_LOOK } from '@/components/ui/severity-look';
import { NUMBER_RULES, type NumberField as ObservationField } from '../utils/observation-form';
import type { FieldWarning } from '../utils/observation-warnings';

export interface ObservationNumberInputProps {
  field: ObservationField;
  label: string;
  description: ReactNode;
  /** What saving this value will raise, said before it is saved: urgent or review, each in its own words and look. */
  warning?: FieldWarning;
  inputProps: GetInputPropsReturnType;
}

/** One large number box. No steppers: a stray click must never change a reading. */
export function ObservationNumberInput({ field, label, description, warning, inputProps }: ObservationNumberInputProps) {
  const rule = NUMBER_RULES[field];
  const look = warning ? SEVERITY_LOOK[warning.severity] : null;
  return (
    <NumberField
      id={`observation-${field}`}
      label={label}
      description={
        warning && look ? (
          <Group gap={4} component="span" c={look.textColor} wrap="nowrap" data-warning={warning.severity}>
            <look.icon size={14} aria-hidden style={{ flexShrink: 0 }} />
            <Text span inherit fw={warning.severity === 'urgent' ? 700 : 600}>
              {look.label}: {warning.text}
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
