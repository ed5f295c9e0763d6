import type { ReactNode } from 'react';
import { Alert, Badge, Group, Radio, Stack, Text } from '@mantine/core';
import { IconAlertOctagon } from '@tabler/icons-react';
import { SEDATION_DESCRIPTIONS, SEDATION_LEVELS } from '@lockstep/shared';
import { isUnacceptableSedation } from '../utils/sedation';

export interface SedationFieldProps {
  value: string;
  onChange: (value: string) => void;
  error?: ReactNode;
  /** The scale's action when 3 or 4 is chosen. */
  warning?: string;
}

/**
 * The Pasero Opioid-induced Sedation Scale as a radio group, each level with its words beside it.
 * Native radios: Tab reaches the group, the arrow keys choose, Tab goes on.
 */
export function SedationField({ value, onChange, error, warning }: SedationFieldProps) {
  return (
    <Stack gap="xs">
      <Radio.Group
        label="Sedation level"
        description="Pasero Opioid-induced Sedation Scale: assess before waking the patient for the pain score"
        withAsterisk
        value={value}
        onChange={onChange}
        error={error}
        size="md"
      >
        <Stack gap={6} mt="xs">
          {SEDATION_LEVELS.map((level) => {
            const unacceptable = isUnacceptableSedation(level);
            return (
              <Radio
                key={level}
                id={`observation-sedation-${level}`}
                value={level}
                size="md"
                styles={{ body: { alignItems: 'center' }, labelWrapper: { width: '100%' } }}
                label={
                  <Group gap="sm" wrap="nowrap" justify="space-between">
                    <Group gap="sm" wrap="nowrap">
                      <Text component="span" fw={700} fz="lg" w={20} ta="center">
                        {level}
                      </Text>
                      <Text component="span">{SEDATION_DESCRIPTIONS[level]}</Text>
                    </Group>
                    {unacceptable ? (
                      <Badge color="red" variant="light" leftSection={<IconAlertOctagon size={12} aria-hidden />} style={{ flexShrink: 0 }}>
                        Unacceptable
                      </Badge>
                    ) : null}
                  </Group>
                }
              />
            );
          })}
        </Stack>
      </Radio.Group>
      {warning ? (
        <Alert color="red" variant="light" icon={<IconAlertOctagon aria-hidden />} title="Urgent: saving raises an urgent flag">
          {warning}
        </Alert>
      ) : null}
    </Stack>
  );
}
