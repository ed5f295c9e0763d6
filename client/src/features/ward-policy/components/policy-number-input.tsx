import { Badge, Group, Paper, Text } from '@mantine/core';
import type { GetInputPropsReturnType } from '@mantine/form';
import { IconAdjustments } from '@tabler/icons-react';
import { DEFAULT_WARD_POLICY } from '@lockstep/shared';
import { NumberField } from '@/components/ui/number-field';
import { shippedDefault, type PolicyNumberField } from '../utils/policy-form';

export interface PolicyNumberInputProps {
  field: PolicyNumberField;
  /** The ward's saved value: "Local" marks one that differs from the shipped default. */
  savedValue: number;
  inputProps: GetInputPropsReturnType;
}

/** One policy value with its unit and what it does, and beside it the default Lockstep shipped with. */
export function PolicyNumberInput({ field, savedValue, inputProps }: PolicyNumberInputProps) {
  const local = savedValue !== DEFAULT_WARD_POLICY[field.key];
  return (
    <Group align="flex-start" gap="md" wrap="nowrap">
      <NumberField
        id={`policy-${field.key}`}
        label={`${field.label} (${field.unit})`}
        description={`${field.help}.`}
        integer={field.integer}
        style={{ flex: 1 }}
        {...inputProps}
      />
      <Paper
        bg="var(--mantine-color-gray-0)"
        px="sm"
        py={6}
        radius="sm"
        w={220}
        style={{ flexShrink: 0 }}
        data-testid={`default-${field.key}`}
      >
        <Text size="xs" c="dimmed">
          Shipped default
        </Text>
        <Group gap={6} wrap="nowrap">
          <Text size="sm" fw={600} className="tabular-nums">
            {shippedDefault(field)}
          </Text>
          {local ? (
            <Badge
              size="xs"
              variant="light"
              color="lagoon"
              leftSection={<IconAdjustments size={10} aria-hidden />}
              title="This ward's saved value differs from the shipped default"
            >
              Changed locally
            </Badge>
          ) : null}
        </Group>
      </Paper>
    </Group>
  );
}
